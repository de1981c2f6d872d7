/**
 * `zeitlight run --cohort <n> --seed <s>`: for each persona, n virtual occupants drawn around
 * the persona with the published between-person spreads (model/cohort populationCohortSpread:
 * intrinsic period, light sensitivity, habitual sleep timing; age kept), each run for every
 * strategy on the worker pool (cli/workers; one job per occupant), summarised per strategy
 * (median, IQR, 5–95 %). Deterministic for a given seed whatever the number of workers. With a
 * stop rule the cohort ends early at the first checkpoint where every running median and IQR
 * moved less than its tolerance over the last batch (model/cohort/convergence.ts).
 */
import { assertCohortSeed } from '../../model/cohort/occupant-stream.js';
import { populationCohortSpread, type CohortSpread } from '../../model/cohort/occupant-traits.js';
import type { CohortSummary } from '../../model/cohort/aggregate-cohort.js';
import type { ConvergenceOptions } from '../../model/cohort/convergence.js';
import type { RunInput } from '../../schedules/run/index.js';
import { runCohortPool } from '../workers/cohort-run.js';
import { COHORT_METRICS, type CohortJob } from './cohort-job.js';

/**
 * Stop rule for the headline metrics, in their results.json units: batches of 50, at least 200
 * occupants; 0.05 h (3 min) for timings and durations, 1 percentage point for suppression, 0.01 for
 * shares, 0.05 h/day for hours above 250 lx, 0.5 lx for the pre-sleep mean (common practice;
 * docs/methods/cohort.md §5).
 */
export const COHORT_STOP_RULE: ConvergenceOptions = {
  batchSize: 50,
  minOccupants: 200,
  tolerance: {
    default: 0.05,
    mean_melatonin_suppression_pct: 1,
    work_hours_kss_ge_7_share: 0.01,
    mean_pre_sleep_mel_edi_lx: 0.5,
  },
};

export interface CohortSection {
  readonly size: number;
  readonly seed: number;
  readonly spread: CohortSpread;
  readonly metrics: readonly string[];
  readonly personas: readonly { readonly id: string; readonly summary: CohortSummary; readonly occupants_run: number; readonly converged_at: number | null }[];
  readonly note: string;
}

export interface CohortRunSettings {
  readonly workers?: number;
  /** Stop each persona's cohort when the readout has settled (COHORT_STOP_RULE unless given). */
  readonly stopRule?: ConvergenceOptions | undefined;
  readonly spread?: CohortSpread;
  readonly onProgress?: (text: string) => void;
}

let runCounter = 0;

export async function runCohorts(input: RunInput, size: number, seed: number, settings: CohortRunSettings = {}): Promise<CohortSection> {
  assertCohortSeed(seed);
  const spread = settings.spread ?? populationCohortSpread(null);
  const personas: CohortSection['personas'][number][] = [];
  const runId = `${Date.now()}-${++runCounter}`;
  for (const p of input.scenario.personas) {
    const jobs: CohortJob[] = Array.from({ length: size }, (_, i) => ({
      scenario: input.scenario,
      ...(input.weather !== undefined ? { weather: input.weather } : {}),
      ...(input.lightLogTexts !== undefined ? { lightLogTexts: input.lightLogTexts } : {}),
      personaId: p.id,
      seed,
      occupantIndex: i,
      spread,
      preparationKey: `${runId}/${p.id}`,
    }));
    const onProgress = settings.onProgress;
    // Convergence readout for the progress line: the latest checkpoint and whether it settled.
    let readout = '';
    const run = await runCohortPool({
      jobs,
      jobModule: new URL('./cohort-job.js', import.meta.url),
      ...(settings.workers !== undefined ? { workers: settings.workers } : {}),
      ...(settings.stopRule !== undefined ? { convergence: { ...settings.stopRule, stopWhenConverged: true } } : {}),
      ...(onProgress !== undefined
        ? {
            onProgress: (pr) => {
              const last = pr.checkpoints[pr.checkpoints.length - 1];
              if (last !== undefined) readout = ` · checkpoint ${last.occupants}: ${last.converged ? 'medians and IQRs settled' : 'still moving'}`;
              onProgress(`${p.name}: ${pr.completed}/${pr.total} occupants${readout}`);
            },
          }
        : {}),
    });
    personas.push({ id: p.id, summary: run.summary, occupants_run: run.outcomes.length, converged_at: run.convergedAt });
  }
  return {
    size,
    seed,
    spread,
    metrics: COHORT_METRICS,
    personas,
    note: 'Virtual occupants vary intrinsic period, light sensitivity and habitual sleep timing around each persona (published spreads, model/cohort); occupant i of every persona uses the same seeded draws; age and the light of the routine stay as written; prescribed sleep moves by the occupant\'s mid-sleep shift except into work or travel.',
  };
}
