/**
 * `zeitlight run --cohort <n> --seed <s>`: for each persona, n virtual occupants drawn around
 * the persona with the published between-person spreads (model/cohort populationCohortSpread:
 * intrinsic period, light sensitivity; age kept), each run through the whole pipeline on the
 * worker pool (cli/workers), summarised per strategy (median, IQR, 5–95 %). Deterministic for a
 * given seed whatever the number of workers.
 */
import { assertCohortSeed } from '../../model/cohort/occupant-stream.js';
import { populationCohortSpread } from '../../model/cohort/occupant-traits.js';
import type { CohortSummary } from '../../model/cohort/aggregate-cohort.js';
import type { RunInput } from '../../schedules/run/index.js';
import { runCohortPool } from '../workers/cohort-run.js';
import { COHORT_METRICS, type CohortJob } from './cohort-job.js';

export interface CohortSection {
  readonly size: number;
  readonly seed: number;
  readonly spread: ReturnType<typeof populationCohortSpread>;
  readonly metrics: readonly string[];
  readonly personas: readonly { readonly id: string; readonly summary: CohortSummary }[];
  readonly note: string;
}

export async function runCohorts(input: RunInput, size: number, seed: number, workers: number | undefined, onProgress?: (text: string) => void): Promise<CohortSection> {
  assertCohortSeed(seed);
  const spread = populationCohortSpread(null);
  const personas: { id: string; summary: CohortSummary }[] = [];
  for (const p of input.scenario.personas) {
    const jobs: CohortJob[] = Array.from({ length: size }, (_, i) => ({
      scenario: input.scenario,
      ...(input.weather !== undefined ? { weather: input.weather } : {}),
      ...(input.lightLogTexts !== undefined ? { lightLogTexts: input.lightLogTexts } : {}),
      personaId: p.id,
      seed,
      occupantIndex: i,
      spread,
    }));
    const run = await runCohortPool({
      jobs,
      jobModule: new URL('./cohort-job.js', import.meta.url),
      ...(workers !== undefined ? { workers } : {}),
      ...(onProgress !== undefined ? { onProgress: (pr) => onProgress(`${p.name}: ${pr.completed}/${pr.total} occupants`) } : {}),
    });
    personas.push({ id: p.id, summary: run.summary });
  }
  return {
    size,
    seed,
    spread,
    metrics: COHORT_METRICS,
    personas,
    note: 'Virtual occupants vary intrinsic period and light sensitivity around each persona (published spreads, model/cohort); each occupant i of every persona uses the same seeded draws; age and routine stay as written.',
  };
}
