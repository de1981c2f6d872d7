import { describe, expect, it } from 'vitest';
import { quantileOfSorted, summarizeDistribution } from './quantiles.js';

describe('quantiles (Hyndman & Fan 1996 definition 7)', () => {
  it('match the worked values of the definition for 1…10', () => {
    // Definition 7 on x = 1…10: h = 9p + 1 (1-based) → Q(0.25) = 3.25, Q(0.5) = 5.5, Q(0.75) = 7.75,
    // Q(0.05) = 1.45, Q(0.95) = 9.55 (the values R's quantile(1:10, type = 7) prints).
    const xs = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    expect(quantileOfSorted(xs, 0.25)).toBeCloseTo(3.25, 12);
    expect(quantileOfSorted(xs, 0.5)).toBeCloseTo(5.5, 12);
    expect(quantileOfSorted(xs, 0.75)).toBeCloseTo(7.75, 12);
    expect(quantileOfSorted(xs, 0.05)).toBeCloseTo(1.45, 12);
    expect(quantileOfSorted(xs, 0.95)).toBeCloseTo(9.55, 12);
    expect(quantileOfSorted(xs, 0)).toBe(1);
    expect(quantileOfSorted(xs, 1)).toBe(10);
  });

  it('returns the value itself for identical values (zero-spread cohort = single person)', () => {
    const v = 0.1 + 0.2; // a value with no short binary form
    const s = summarizeDistribution([v, v, v, v, v, v, v]);
    expect(s?.median).toBe(v);
    expect(s?.q25).toBe(v);
    expect(s?.p95).toBe(v);
    expect(s?.iqr).toBe(0);
  });

  it('count null and NaN as missing and summarise the rest', () => {
    const s = summarizeDistribution([3, null, 1, Number.NaN, 2]);
    expect(s).toMatchObject({ n: 3, missing: 2, median: 2, min: 1, max: 3, mean: 2 });
    expect(summarizeDistribution([null, Number.NaN])).toBeNull();
  });

  it('reject an empty list and probabilities outside [0, 1]', () => {
    expect(() => quantileOfSorted([], 0.5)).toThrow(/empty/);
    expect(() => quantileOfSorted([1], 1.5)).toThrow(/probability/);
  });
});
