/**
 * Exact order statistics of the per-occupant scalars a cohort keeps. Quantiles use
 * Hyndman & Fan (Am Stat 50:361–365, 1996) definition 7: linear interpolation between order
 * statistics at h = (n − 1)·p (the default of R and of NumPy).
 */

/** Quantile p ∈ [0, 1] of values already sorted ascending (no NaN). */
export function quantileOfSorted(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) throw new RangeError('quantile of an empty list');
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile probability must lie in [0, 1], got ${String(p)}`);
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const a = sorted[lo] as number;
  const b = sorted[Math.min(lo + 1, sorted.length - 1)] as number;
  return a + (h - lo) * (b - a);
}

/** Spread summary of one metric over a cohort. */
export interface DistributionSummary {
  /** Occupants with a finite value. */
  n: number;
  /** Occupants without one (e.g. no DLMO found in the window). */
  missing: number;
  median: number;
  q25: number;
  q75: number;
  iqr: number;
  p05: number;
  p95: number;
  min: number;
  max: number;
  mean: number;
}

/** Summary of the finite values; null entries and NaN count as missing. Null when none is finite. */
export function summarizeDistribution(values: readonly (number | null)[]): DistributionSummary | null {
  const finite: number[] = [];
  for (const v of values) if (v !== null && Number.isFinite(v)) finite.push(v);
  if (finite.length === 0) return null;
  finite.sort((x, y) => x - y);
  let sum = 0;
  for (const v of finite) sum += v;
  const q25 = quantileOfSorted(finite, 0.25);
  const q75 = quantileOfSorted(finite, 0.75);
  return {
    n: finite.length,
    missing: values.length - finite.length,
    median: quantileOfSorted(finite, 0.5),
    q25,
    q75,
    iqr: q75 - q25,
    p05: quantileOfSorted(finite, 0.05),
    p95: quantileOfSorted(finite, 0.95),
    min: finite[0] as number,
    max: finite[finite.length - 1] as number,
    mean: sum / finite.length,
  };
}
