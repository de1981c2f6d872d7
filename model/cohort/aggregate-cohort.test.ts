import { describe, expect, it } from 'vitest';
import { aggregateCohort, seriesBands, type OccupantOutcome } from './aggregate-cohort.js';

const outcome = (i: number, base: number, dark: number | null): OccupantOutcome => ({
  occupantIndex: i,
  byStrategy: {
    baseline: { phaseShift_h: base, kss7Share: 0.1 },
    daylight: { phaseShift_h: dark },
  },
});

describe('cohort aggregation', () => {
  it('summarises every metric of every strategy, counting absent values as missing', () => {
    const outcomes = [outcome(0, 1, 4), outcome(1, 2, null), outcome(2, 3, 6), outcome(3, 4, 5)];
    const s = aggregateCohort(outcomes);
    expect(s.occupants).toBe(4);
    // Definition-7 quantiles of 1, 2, 3, 4: median 2.5, Q1 1.75, Q3 3.25.
    expect(s.strategies.baseline?.phaseShift_h).toMatchObject({ n: 4, median: 2.5, q25: 1.75, q75: 3.25, iqr: 1.5 });
    expect(s.strategies.daylight?.phaseShift_h).toMatchObject({ n: 3, missing: 1, median: 5 });
  });

  it('a metric only some occupants report leaves the rest missing', () => {
    const s = aggregateCohort([
      { occupantIndex: 0, byStrategy: { a: { x: 1 } } },
      { occupantIndex: 1, byStrategy: { a: { x: 2, y: 9 } } },
    ]);
    expect(s.strategies.a?.y).toMatchObject({ n: 1, missing: 1, median: 9 });
  });

  it('zero-spread cohort: the median of identical occupants is the single-person value exactly', () => {
    const single = { phaseShift_h: -0.734_219, melatoninSuppression_pct: 37.1234567 };
    const s = aggregateCohort(Array.from({ length: 25 }, (_, i) => ({ occupantIndex: i, byStrategy: { s: single } })));
    expect(s.strategies.s?.phaseShift_h?.median).toBe(single.phaseShift_h);
    expect(s.strategies.s?.melatoninSuppression_pct?.median).toBe(single.melatoninSuppression_pct);
  });

  it('series bands are step-wise quantiles, null where nobody has a value', () => {
    const bands = seriesBands([
      [1, 10, null],
      [2, 20, null],
      [3, 30],
    ]);
    expect(bands.median).toEqual([2, 20, null]);
    expect(bands.q25).toEqual([1.5, 15, null]);
    expect(bands.q75).toEqual([2.5, 25, null]);
  });
});
