import { describe, expect, it } from 'vitest';
import { ActivityLog } from '../state/activity-log.js';
import type { CohortWorkerToPage, PageToCohortWorker } from './cohort-protocol.js';
import type { WorkerLike } from './cohort-pool.js';
import { CohortRunner } from './cohort-runner.js';

/** A stand-in worker that answers occupant 0 last (after `lateBy_ms`) and every other at once. */
function firstOccupantLateWorker(lateBy_ms: number): () => WorkerLike {
  return () => {
    const w: WorkerLike = {
      onmessage: null,
      onerror: null,
      terminate: () => {},
      postMessage: (m: PageToCohortWorker) => {
        if (m.type !== 'job') return;
        const reply: CohortWorkerToPage = { type: 'outcome', personaId: m.job.personaId, outcome: { occupantIndex: m.job.occupantIndex, byStrategy: { baseline: { dlmo_h: 20 + m.job.occupantIndex / 100 } } } };
        setTimeout(() => w.onmessage?.({ data: reply }), m.job.occupantIndex === 0 ? lateBy_ms : 0);
      },
    };
    return w;
  };
}

/** A stand-in worker that answers every occupant at once with a metric equal to its index. */
function instantWorker(): WorkerLike {
  const w: WorkerLike = {
    onmessage: null,
    onerror: null,
    terminate: () => {},
    postMessage: (m: PageToCohortWorker) => {
      if (m.type !== 'job') return;
      const reply: CohortWorkerToPage = { type: 'outcome', personaId: m.job.personaId, outcome: { occupantIndex: m.job.occupantIndex, byStrategy: { baseline: { dlmo_h: 20 + m.job.occupantIndex / 100 } } } };
      queueMicrotask(() => w.onmessage?.({ data: reply }));
    },
  };
  return w;
}

describe('cohort runner', () => {
  it('records every convergence readout and the finish, so a cohort that ends at once still shows its progress afterwards', async () => {
    const log = new ActivityLog();
    const runner = new CohortRunner(instantWorker, () => 2, () => 0, log);
    await runner.start({} as never, { size: 20, seed: 3, personaIds: ['p'], stopRule: false, ageRange_y: null });
    const kinds = log.entries().map((e) => e.kind);
    expect(kinds[0]).toBe('cohort-started');
    expect(kinds.at(-1)).toBe('cohort-finished');
    const readouts = log.entries().filter((e) => e.kind === 'cohort-readout');
    // Batches of 5 for a cohort of 20 (convergenceOptionsFor): readouts after 5, 10, 15 and 20.
    expect(readouts.map((e) => e.detail.occupants)).toEqual([5, 10, 15, 20]);
    expect(readouts.every((e) => (e.detail.metrics as number) >= 1)).toBe(true);
    const done = runner.getSnapshot();
    expect(done.status).toBe('done');
    if (done.status === 'done') expect(done.outcome.personas[0]?.checkpoints.at(-1)?.occupants).toBe(20);
  });

  it('records each readout in order when a late first occupant completes several batches at once', async () => {
    const log = new ActivityLog();
    // Two workers: occupant 0 answers last, so the readouts after 5 and after 10 occupants both
    // become possible only when it arrives.
    const runner = new CohortRunner(firstOccupantLateWorker(30), () => 2, () => 0, log);
    await runner.start({} as never, { size: 12, seed: 3, personaIds: ['p'], stopRule: false, ageRange_y: null });
    const readouts = log.entries().filter((e) => e.kind === 'cohort-readout');
    expect(readouts.map((e) => e.detail.occupants)).toEqual([5, 10]);
  });
});
