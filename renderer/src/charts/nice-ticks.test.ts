import { describe, expect, it } from 'vitest';
import { niceTicks } from './nice-ticks.js';

describe('nice axis ticks (1-2-5 steps, common practice)', () => {
  it('turns a cohort range of −0.13 … 0.57 into round steps that cover it', () => {
    const axis = niceTicks(-0.13, 0.57, 5);
    expect(axis.ticks).toEqual([-0.2, 0, 0.2, 0.4, 0.6]);
    expect(axis.domain).toEqual([-0.2, 0.6]);
    expect(axis.decimals).toBe(1);
  });

  it('covers the data with at most the asked number of ticks, each a whole multiple of the step', () => {
    for (const [lo, hi, n] of [
      [0, 1, 5],
      [-0.8, -0.1, 5],
      [12, 87, 6],
      [0.1, 0.12, 5],
      [20.1, 22.7, 6],
      [0, 2.7, 5],
      [-1.5, 1.5, 6],
      [0, 100, 5],
    ] as const) {
      const axis = niceTicks(lo, hi, n);
      expect(axis.ticks.length).toBeLessThanOrEqual(n);
      expect(axis.ticks.length).toBeGreaterThanOrEqual(2);
      expect(axis.domain[0]).toBeLessThanOrEqual(lo);
      expect(axis.domain[1]).toBeGreaterThanOrEqual(hi);
      for (const t of axis.ticks) expect(Math.abs(t / axis.step - Math.round(t / axis.step))).toBeLessThan(1e-9);
      expect([1, 2, 2.5, 5]).toContain(Number((axis.step / 10 ** Math.floor(Math.log10(axis.step))).toFixed(6)));
    }
  });

  it('gives the decimals a step needs: 0.25 needs two, 5 needs none', () => {
    expect(niceTicks(0, 1, 5).decimals).toBe(2);
    expect(niceTicks(0, 1, 5).ticks).toEqual([0, 0.25, 0.5, 0.75, 1]);
    expect(niceTicks(0, 20, 5).decimals).toBe(0);
  });

  it('opens a readable axis around a single value', () => {
    const axis = niceTicks(3, 3, 5);
    expect(axis.domain[0]).toBeLessThan(3);
    expect(axis.domain[1]).toBeGreaterThan(3);
  });
});
