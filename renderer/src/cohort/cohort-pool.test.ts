import { describe, expect, it } from 'vitest';
import { populationCohortSpread } from '../../../model/cohort/occupant-traits.js';
import { sampleOccupantTraits } from '../../../model/cohort/sample-occupants.js';
import type { CohortWorkerToPage, PageToCohortWorker } from './cohort-protocol.js';
import { convergenceOptionsFor, runCohortOnPool, type CohortRequest, type WorkerLike } from './cohort-pool.js';

/**
 * A stand-in worker: each occupant's "metric" is its drawn intrinsic period, answered after a
 * delay that differs by worker and occupant, so completion order changes with the worker count.
 */
function fakeWorkerFactory(delays: (index: number, worker: number) => number) {
  let made = 0;
  const create = (): WorkerLike => {
    const id = made++;
    const w: WorkerLike = {
      onmessage: null,
      onerror: null,
      terminate: () => {},
      postMessage: (m: PageToCohortWorker) => {
        if (m.type !== 'job') return;
        const t = sampleOccupantTraits({ intrinsicPeriod_h: 24.2, lightSensitivity: 1, age_y: 40 }, m.job.spread, m.job.seed, m.job.occupantIndex);
        const reply: CohortWorkerToPage = { type: 'outcome', personaId: m.job.personaId, outcome: { occupantIndex: m.job.occupantIndex, byStrategy: { baseline: { dlmo_h: t.intrinsicPeriod_h }, bright: { dlmo_h: t.intrinsicPeriod_h - 0.5 } } } };
        setTimeout(() => w.onmessage?.({ data: reply }), delays(m.job.occupantIndex, id));
      },
    };
    return w;
  };
  return { create, made: () => made };
}

const request = (patch: Partial<CohortRequest> = {}): CohortRequest => ({ scenario: {}, personaIds: ['a', 'b'], size: 40, seed: 7, spread: populationCohortSpread(null), stopRule: false, ...patch });

describe('cohort on a pool of workers', () => {
  it('gives identical summaries for 1, 2 and 4 workers with the same seed', async () => {
    const results = [];
    for (const n of [1, 2, 4]) {
      const f = fakeWorkerFactory((i, w) => ((i * 7 + w * 3) % 5) * 2);
      const run = runCohortOnPool(f.create, n, request(), () => {});
      const out = await run.done;
      expect(out.workers).toBe(n);
      expect(f.made()).toBe(n);
      results.push(out.personas);
    }
    expect(results[1]).toEqual(results[0]);
    expect(results[2]).toEqual(results[0]);
    expect(results[0]?.[0]?.occupants).toBe(40);
    expect(results[0]?.[0]?.stopReason).toBe('all-occupants');
    // Every persona's occupant i uses the same seeded draw (model/cohort occupant streams).
    expect(results[0]?.[0]?.summary).toEqual(results[0]?.[1]?.summary);
  });

  it('streams progress with running median and IQR checkpoints every batch', async () => {
    const f = fakeWorkerFactory(() => 0);
    const seen: number[] = [];
    const checkpoints: number[] = [];
    await runCohortOnPool(f.create, 2, request({ personaIds: ['a'] }), (p) => {
      seen.push(p.overallCompleted);
      if (p.checkpoint !== null) checkpoints.push(p.checkpoint.occupants);
    }).done;
    expect(seen).toEqual(Array.from({ length: 40 }, (_, i) => i + 1));
    const batch = convergenceOptionsFor(40).batchSize;
    expect(checkpoints).toEqual(Array.from({ length: 40 / batch }, (_, i) => (i + 1) * batch));
  });

  it('stops a persona when the running median and IQR settle, at the same occupant count for any worker count', async () => {
    const stops = [];
    for (const n of [1, 3]) {
      // Zero spread: every occupant equal, so the readout settles at the first allowed checkpoint.
      const f = fakeWorkerFactory((i, w) => (i + w) % 3);
      const out = await runCohortOnPool(f.create, n, request({ size: 200, stopRule: true, spread: { intrinsicPeriodSd_h: 0, lightSensitivitySdLn: 0, ageRange_y: null, habitualMidSleepSd_h: 0 } }), () => {}).done;
      stops.push(out.personas.map((p) => [p.occupants, p.stopReason]));
    }
    const min = convergenceOptionsFor(200).minOccupants;
    expect(stops[0]).toEqual([
      [min, 'converged'],
      [min, 'converged'],
    ]);
    expect(stops[1]).toEqual(stops[0]);
  });

  it('summarises only the occupants finished in order when stopped by hand', async () => {
    const f = fakeWorkerFactory(() => 1);
    const run = runCohortOnPool(f.create, 2, request({ personaIds: ['a'], size: 1000 }), (p) => {
      if (p.overallCompleted === 25) run.stop();
    });
    const out = await run.done;
    expect(out.personas[0]?.stopReason).toBe('stopped');
    expect(out.personas[0]?.summary.occupants).toBe(out.personas[0]?.occupants);
    expect(out.personas[0]?.occupants).toBeLessThanOrEqual(25);
  });
});
