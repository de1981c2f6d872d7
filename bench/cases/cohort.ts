/**
 * Cohort costs outside the circadian pipeline: seeded sampling of 1 000 occupants, per-strategy
 * aggregation and the convergence readout, and the worker pool's own overhead with a toy job.
 */
import { availableParallelism } from 'node:os';
import { aggregateCohort, type OccupantOutcome } from '../../model/cohort/aggregate-cohort.js';
import { CohortConvergence } from '../../model/cohort/convergence.js';
import { populationCohortSpread } from '../../model/cohort/occupant-traits.js';
import { sampleCohort } from '../../model/cohort/sample-occupants.js';
import { runJobPool } from '../../cli/workers/job-pool.js';
import type { SelfCheckJob } from '../../cli/workers/self-check-job.js';
import { medianMs } from '../timing.js';

const OCCUPANTS = 1000;
const STRATEGIES = ['baseline', 'daylight', 'tunable', 'screens'];
const persona = { intrinsicPeriod_h: 24.18, lightSensitivity: 1, age_y: 40 };
const spread = populationCohortSpread([25, 55]);

async function medianAsyncMs(fn: () => Promise<unknown>, repeats = 5, warmup = 1): Promise<number> {
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)] as number;
}

function outcomes(): OccupantOutcome[] {
  return sampleCohort(persona, spread, 1, OCCUPANTS).map((t) => {
    const byStrategy: Record<string, Record<string, number>> = {};
    STRATEGIES.forEach((s, k) => {
      byStrategy[s] = {
        phaseShift_h: (t.intrinsicPeriod_h - 24.18) * 10 - k * 0.1 * Math.log(t.lightSensitivity),
        melatoninSuppression_pct: 30 + 10 * Math.log(t.lightSensitivity) + k,
        kss7Share: 0.1 + 0.01 * t.habitualMidSleepShift_h,
        midSleep_h: 3.5 + t.habitualMidSleepShift_h,
      };
    });
    return { occupantIndex: t.occupantIndex, byStrategy };
  });
}

export async function bench(): Promise<Record<string, unknown>> {
  const sampleMs = medianMs(() => sampleCohort(persona, spread, 42, OCCUPANTS));
  const data = outcomes();
  const aggregateMs = medianMs(() => aggregateCohort(data));
  const convergenceMs = medianMs(() => {
    const c = new CohortConvergence({ batchSize: 50, tolerance: { default: 0 } });
    for (const o of data) c.add(o);
  });

  const jobModule = new URL('../../cli/workers/self-check-job.js', import.meta.url);
  const cores = availableParallelism();
  const job = (i: number, iterations: number): SelfCheckJob => ({ seed: 1, occupantIndex: i, persona, spread, iterations });
  const trivial = Array.from({ length: OCCUPANTS }, (_, i) => job(i, 0));
  const startupMs = await medianAsyncMs(() => runJobPool({ jobs: trivial.slice(0, cores), jobModule, workers: cores }));
  const trivialMs = await medianAsyncMs(() => runJobPool({ jobs: trivial, jobModule, workers: cores }));
  // A CPU-bound toy job (about 10 ms each) to see how close the pool comes to the core count.
  const heavy = Array.from({ length: 100 }, (_, i) => job(i, 50_000));
  const heavyOneMs = await medianAsyncMs(() => runJobPool({ jobs: heavy, jobModule, workers: 1 }), 3);
  const heavyAllMs = await medianAsyncMs(() => runJobPool({ jobs: heavy, jobModule, workers: cores }), 3);

  return {
    cohort_sample_1000_ms: sampleMs,
    cohort_aggregate_1000x4_ms: aggregateMs,
    cohort_convergence_1000_ms: convergenceMs,
    pool_workers: cores,
    pool_startup_ms: startupMs,
    pool_trivial_1000_jobs_ms: trivialMs,
    pool_overhead_us_per_job: ((trivialMs - startupMs) * 1000) / OCCUPANTS,
    pool_cpu_100_jobs_1_worker_ms: heavyOneMs,
    pool_cpu_100_jobs_all_workers_ms: heavyAllMs,
    pool_speedup: heavyOneMs / heavyAllMs,
  };
}
