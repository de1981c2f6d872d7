/**
 * Cohort through the whole pipeline: 1 000 virtual occupants of the demo's desk worker
 * (published between-person spreads: intrinsic period, light sensitivity, habitual sleep timing),
 * 14 days, baseline + 3 strategies = 4 strategy runs per occupant, on every core (worker_threads),
 * exactly as `zeitlight run --cohort 1000 --seed 1` runs them (cli/run-output/cohort-runs.ts).
 *
 * Keys:
 *  - cohort_1000_s: wall time of the cohort (start of the pool to the summary), seconds;
 *  - cohort_1000_cpu_s: process CPU time over the same span (user + system, all threads);
 *  - cohort_peak_mb: peak resident set size during the run. Worker threads live in the same
 *    process as the main thread, so the process RSS (process.memoryUsage().rss, sampled every
 *    20 ms on the main thread, whose event loop is idle while workers compute) covers main and
 *    workers together; cohort_rss_before_mb is the RSS just before the run.
 * One run by default (about a minute on 2 cores); ZEITLIGHT_BENCH_COHORT_REPEATS=n gives the
 * median of n, ZEITLIGHT_BENCH_COHORT_SIZE=m a smaller cohort (keys then named for m).
 */
import { availableParallelism } from 'node:os';
import { runCohorts } from '../../cli/run-output/cohort-runs.js';
import { demoPart } from '../../schedules/demo/demo-part.js';
import { validateScenarioValue } from '../../schedules/validation/validate-scenario.js';

const SIZE = Number(process.env['ZEITLIGHT_BENCH_COHORT_SIZE'] ?? 1000);
const REPEATS = Math.max(1, Number(process.env['ZEITLIGHT_BENCH_COHORT_REPEATS'] ?? 1));

function benchScenario() {
  const desk = demoPart(['desk-worker']);
  const v = validateScenarioValue({ ...desk, run: { startDate: '2026-03-23', days: 14 }, strategies: (desk.strategies ?? []).slice(0, 3) });
  if (v.scenario === undefined) throw new Error('cohort bench scenario is invalid');
  return v.scenario;
}

const mb = (bytes: number) => Math.round((bytes / 1048576) * 10) / 10;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;

export async function bench(): Promise<Record<string, unknown>> {
  const scenario = benchScenario();
  const walls: number[] = [];
  const cpus: number[] = [];
  const peaks: number[] = [];
  let before = 0;
  let strategyRuns = 0;
  for (let r = 0; r < REPEATS; r++) {
    (globalThis as { gc?: () => void }).gc?.();
    before = process.memoryUsage().rss;
    let peak = before;
    const timer = setInterval(() => {
      peak = Math.max(peak, process.memoryUsage().rss);
    }, 20);
    const cpu0 = process.cpuUsage();
    const t0 = performance.now();
    const section = await runCohorts({ scenario }, SIZE, 1);
    const wall = performance.now() - t0;
    const cpu = process.cpuUsage(cpu0);
    clearInterval(timer);
    peak = Math.max(peak, process.memoryUsage().rss);
    strategyRuns = Object.keys(section.personas[0]?.summary.strategies ?? {}).length;
    walls.push(wall / 1000);
    cpus.push((cpu.user + cpu.system) / 1e6);
    peaks.push(peak);
  }
  const tag = `cohort_${SIZE}`;
  const wall_s = median(walls);
  const cpu_s = median(cpus);
  return {
    [`${tag}_s`]: Math.round(wall_s * 100) / 100,
    [`${tag}_cpu_s`]: Math.round(cpu_s * 100) / 100,
    cohort_peak_mb: mb(median(peaks)),
    cohort_rss_before_mb: mb(before),
    cohort_occupants: SIZE,
    cohort_strategy_runs_per_occupant: strategyRuns,
    cohort_days: 14,
    cohort_workers: availableParallelism(),
    cohort_cpu_ms_per_occupant: Math.round((cpu_s * 1000) / SIZE),
    cohort_cpu_ms_per_person_day: Math.round(((cpu_s * 1000) / (SIZE * Math.max(1, strategyRuns) * 14)) * 100) / 100,
    cohort_repeats: REPEATS,
    goal_cohort_1000_s: 10,
    goal_cohort_peak_mb: 500,
  };
}
