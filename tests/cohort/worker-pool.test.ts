import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rmSync } from 'node:fs';
import { compileWorkers, type CompiledWorkers } from './compile-workers.js';
import type * as PoolModule from '../../cli/workers/job-pool.js';
import { runJob, type SelfCheckJob, type SelfCheckResult } from '../../cli/workers/self-check-job.js';
import { populationCohortSpread } from '../../model/cohort/occupant-traits.js';

let compiled: CompiledWorkers;
let pool: typeof PoolModule;

beforeAll(async () => {
  compiled = compileWorkers();
  pool = (await import(compiled.url('cli/workers/job-pool.ts').href)) as typeof PoolModule;
}, 120_000);
afterAll(() => rmSync(compiled.root, { recursive: true, force: true }));

const jobs = (n: number, extra: Partial<SelfCheckJob> = {}): SelfCheckJob[] =>
  Array.from({ length: n }, (_, i) => ({
    seed: 20261201,
    occupantIndex: i,
    persona: { intrinsicPeriod_h: 24.18, lightSensitivity: 1, age_y: 40 },
    spread: populationCohortSpread([25, 55]),
    // Uneven work so that jobs finish out of order on several workers.
    iterations: 2000 + ((i * 7919) % 13) * 3000,
    ...extra,
  }));

describe('worker pool', () => {
  it('returns the same results, in occupant order, with 1, 2 and 4 workers — equal to running in-process', async () => {
    const list = jobs(60);
    const expected = list.map(runJob);
    const jobModule = compiled.url('cli/workers/self-check-job.ts');
    for (const workers of [1, 2, 4]) {
      const arrivals: number[] = [];
      const run = await pool.runJobPool<SelfCheckJob, SelfCheckResult>({
        jobs: list,
        jobModule,
        workers,
        onResult: (e) => arrivals.push(e.index),
      });
      expect(run.workers).toBe(workers);
      expect(run.results).toEqual(expected);
      expect(arrivals.slice().sort((a, b) => a - b)).toEqual(list.map((_, i) => i));
    }
  });

  it('reports progress for every job with a running count', async () => {
    const counts: number[] = [];
    await pool.runJobPool<SelfCheckJob, SelfCheckResult>({
      jobs: jobs(10),
      jobModule: compiled.url('cli/workers/self-check-job.ts'),
      workers: 2,
      onResult: (e) => counts.push(e.completed),
    });
    expect(counts).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  });

  it('stops early on request and still returns exactly the first k results', async () => {
    const list = jobs(40);
    const run = await pool.runJobPool<SelfCheckJob, SelfCheckResult>({
      jobs: list,
      jobModule: compiled.url('cli/workers/self-check-job.ts'),
      workers: 3,
      onResult: (e, control) => {
        if (e.completed >= 5) control.stopAfter(12);
      },
    });
    expect(run.stoppedEarly).toBe(true);
    expect(run.results).toEqual(list.slice(0, 12).map(runJob));
  });

  it('names the job and its message when a job throws', async () => {
    const list = jobs(6);
    list[4] = { ...(list[4] as SelfCheckJob), failWith: 'light log row 17: lux is negative' };
    await expect(
      pool.runJobPool({ jobs: list, jobModule: compiled.url('cli/workers/self-check-job.ts'), workers: 2 }),
    ).rejects.toThrow(/job 4 failed: light log row 17: lux is negative/);
  });

  it('reports a worker that exits while running a job', async () => {
    await expect(
      pool.runJobPool({ jobs: [{ exitCode: 3 }], jobModule: compiled.url('tests/cohort/fixtures/exiting-job.ts'), workers: 1 }),
    ).rejects.toThrow(/worker 0 exited unexpectedly with code 3 while running job 0/);
  });

  it('explains a missing job module or export instead of hanging', async () => {
    await expect(pool.runJobPool({ jobs: [1], jobModule: compiled.url('cli/workers/no-such-job.ts') })).rejects.toThrow(/job module .*no-such-job\.js not found/);
    await expect(
      pool.runJobPool({ jobs: [1], jobModule: compiled.url('cli/workers/self-check-job.ts'), exportName: 'missing' }),
    ).rejects.toThrow(/no exported function "missing"/);
    await expect(pool.runJobPool({ jobs: [1], jobModule: compiled.url('cli/workers/self-check-job.ts'), workers: 0 })).rejects.toThrow(/workers: must be/);
  });

  it('an empty job list needs no workers', async () => {
    const run = await pool.runJobPool({ jobs: [], jobModule: compiled.url('cli/workers/self-check-job.ts') });
    expect(run).toEqual({ results: [], workers: 0, stoppedEarly: false });
  });

  it('can be cancelled while running, naming how far it got', async () => {
    const controller = new AbortController();
    await expect(
      pool.runJobPool<SelfCheckJob, SelfCheckResult>({
        jobs: jobs(30),
        jobModule: compiled.url('cli/workers/self-check-job.ts'),
        workers: 2,
        signal: controller.signal,
        onResult: (e) => {
          if (e.completed === 3) controller.abort();
        },
      }),
    ).rejects.toThrow(/cancelled after 3 of 30 jobs/);
    await expect(pool.runJobPool({ jobs: [1], jobModule: compiled.url('cli/workers/self-check-job.ts'), signal: controller.signal })).rejects.toThrow(/cancelled before it started/);
  });

  it('says which job cannot be sent when a job is not cloneable', async () => {
    const bad = [{ f: () => 1 }];
    await expect(pool.runJobPool({ jobs: bad, jobModule: compiled.url('cli/workers/self-check-job.ts'), workers: 1 })).rejects.toThrow(/job 0 cannot be sent to a worker/);
  });
});
