import { describe, expect, it } from 'vitest';
import { CohortConvergence } from './convergence.js';
import type { OccupantOutcome } from './aggregate-cohort.js';
import { occupantStream } from './occupant-stream.js';
import { standardNormal } from './normal-draw.js';

/** Outcome i of a synthetic cohort: metric drawn N(2, 0.5²) from occupant i's own stream. */
const synthetic = (i: number): OccupantOutcome => ({
  occupantIndex: i,
  byStrategy: { base: { shift_h: 2 + 0.5 * standardNormal(occupantStream(5, i, 9)) } },
});

describe('cohort convergence readout', () => {
  it('checkpoints only on the contiguous prefix, so arrival order does not change the stop point', () => {
    const n = 400;
    const options = { batchSize: 50, tolerance: { default: 0.05 } };
    const inOrder = new CohortConvergence(options);
    for (let i = 0; i < n; i++) inOrder.add(synthetic(i));
    const shuffled = new CohortConvergence(options);
    // Deterministic interleaving like two workers racing: odd indices first, then even.
    const order = [...Array.from({ length: n / 2 }, (_, k) => 2 * k + 1), ...Array.from({ length: n / 2 }, (_, k) => 2 * k)];
    let checkpointsBeforeEvens = 0;
    order.forEach((i, step) => {
      const done = shuffled.add(synthetic(i));
      if (step < n / 2) checkpointsBeforeEvens += done.length;
    });
    expect(checkpointsBeforeEvens).toBe(0); // occupant 0 missing: no prefix yet
    expect(shuffled.checkpoints).toEqual(inOrder.checkpoints);
    expect(shuffled.stopAt).toBe(inOrder.stopAt);
    expect(inOrder.checkpoints.map((c) => c.occupants)).toEqual([50, 100, 150, 200, 250, 300, 350, 400]);
  });

  it('stops once median and IQR change by no more than the tolerance over the last batch', () => {
    const c = new CohortConvergence({ batchSize: 100, tolerance: { default: 0.05 } });
    for (let i = 0; i < 2000 && c.stopAt === null; i++) c.add(synthetic(i));
    const stop = c.stopAt;
    expect(stop).not.toBeNull();
    const last = c.checkpoints[c.checkpoints.length - 1];
    expect(last?.converged).toBe(true);
    expect(last?.metrics['base/shift_h']?.medianChange).toBeLessThanOrEqual(0.05);
    expect(last?.metrics['base/shift_h']?.iqrChange).toBeLessThanOrEqual(0.05);
    // Every earlier checkpoint failed the rule (or came before the minimum of two batches).
    for (const cp of c.checkpoints.slice(0, -1)) expect(cp.converged).toBe(false);
    // The running median has settled near the true median 2 (SE ≈ 1.2533·0.5/√n; 4 SE).
    expect(Math.abs((last?.metrics['base/shift_h']?.median ?? 0) - 2)).toBeLessThan(4 * (1.2533 * 0.5) / Math.sqrt(stop ?? 1));
  });

  it('a per-metric tolerance overrides the default; an unreachable one never stops', () => {
    const c = new CohortConvergence({ batchSize: 50, tolerance: { default: 10, 'base/shift_h': 0 } });
    for (let i = 0; i < 300; i++) c.add(synthetic(i));
    expect(c.stopAt).toBeNull();
  });

  it('refuses duplicate occupants and bad settings', () => {
    const c = new CohortConvergence({ batchSize: 10, tolerance: { default: 0.1 } });
    c.add(synthetic(0));
    expect(() => c.add(synthetic(0))).toThrow(/added twice/);
    expect(() => new CohortConvergence({ batchSize: 0, tolerance: { default: 0.1 } })).toThrow(/batchSize/);
    expect(() => new CohortConvergence({ batchSize: 5, tolerance: { default: -1 } })).toThrow(/tolerance.default/);
  });
});
