import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rmSync } from 'node:fs';
import { compileWorkers, type CompiledWorkers } from './compile-workers.js';
import type * as CohortRunModule from '../../cli/workers/cohort-run.js';
import { runOutcomeJob, type SelfCheckJob } from '../../cli/workers/self-check-job.js';
import { populationCohortSpread, zeroCohortSpread, type CohortSpread } from '../../model/cohort/occupant-traits.js';

let compiled: CompiledWorkers;
let cohort: typeof CohortRunModule;

beforeAll(async () => {
  compiled = compileWorkers();
  cohort = (await import(compiled.url('cli/workers/cohort-run.ts').href)) as typeof CohortRunModule;
}, 120_000);
afterAll(() => rmSync(compiled.root, { recursive: true, force: true }));

const persona = { intrinsicPeriod_h: 24.18, lightSensitivity: 1, age_y: 40 };
const jobs = (n: number, spread: CohortSpread): SelfCheckJob[] =>
  Array.from({ length: n }, (_, i) => ({ seed: 77, occupantIndex: i, persona, spread, iterations: 500 + (i % 5) * 4000 }));

describe('cohort run on the worker pool', () => {
  it('same seed → identical summaries, checkpoints and stop point with 1, 2 and 4 workers', async () => {
    const list = jobs(600, populationCohortSpread());
    const convergence = { batchSize: 50, tolerance: { default: 0.01, checksum: 1e9 }, stopWhenConverged: true };
    const runs = [];
    for (const workers of [1, 2, 4]) {
      runs.push(await cohort.runCohortPool({ jobs: list, jobModule: compiled.url('cli/workers/self-check-job.ts'), exportName: 'runOutcomeJob', workers, convergence }));
    }
    const [one, two, four] = runs;
    expect(one?.convergedAt).not.toBeNull();
    expect(one?.convergedAt).toBeLessThan(600);
    expect(one?.outcomes.length).toBe(one?.convergedAt);
    expect(one?.outcomes).toEqual(list.slice(0, one?.convergedAt ?? 0).map(runOutcomeJob));
    for (const other of [two, four]) {
      expect(other?.summary).toEqual(one?.summary);
      expect(other?.checkpoints).toEqual(one?.checkpoints);
      expect(other?.convergedAt).toBe(one?.convergedAt);
    }
  });

  it('a zero-spread cohort has the single person’s outcome as its median', async () => {
    const list = jobs(12, zeroCohortSpread()).map((j) => ({ ...j, iterations: 1000 }));
    const single = runOutcomeJob({ ...(list[0] as SelfCheckJob), occupantIndex: 0 });
    const run = await cohort.runCohortPool({ jobs: list, jobModule: compiled.url('cli/workers/self-check-job.ts'), exportName: 'runOutcomeJob', workers: 2 });
    expect(run.summary.strategies.baseline?.periodExcess_h?.median).toBe(single.byStrategy.baseline?.periodExcess_h);
    expect(run.summary.strategies.brighter?.periodExcess_h?.iqr).toBe(0);
    expect(run.convergedAt).toBeNull();
  });

  it('streams progress up to the final count', async () => {
    const seen: number[] = [];
    await cohort.runCohortPool({
      jobs: jobs(8, populationCohortSpread()),
      jobModule: compiled.url('cli/workers/self-check-job.ts'),
      exportName: 'runOutcomeJob',
      workers: 2,
      onProgress: (p) => seen.push(p.completed),
    });
    expect(seen).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
  });

  it('refuses a job whose outcome belongs to another occupant', async () => {
    const list = jobs(4, populationCohortSpread());
    list[2] = { ...(list[2] as SelfCheckJob), occupantIndex: 9 };
    await expect(
      cohort.runCohortPool({ jobs: list, jobModule: compiled.url('cli/workers/self-check-job.ts'), exportName: 'runOutcomeJob', workers: 2 }),
    ).rejects.toThrow(/job 2 returned the outcome of occupant 9/);
  });
});
