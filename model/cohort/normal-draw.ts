/**
 * Standard normal variates for trait sampling. Box–Muller transform (Box GEP, Muller ME,
 * Ann Math Stat 29:610–611, 1958): z = √(−2 ln u1) · cos(2π u2) with u1 ∈ (0, 1], u2 ∈ [0, 1).
 * One variate per pair of uniforms (the sine partner is discarded) keeps every draw
 * self-contained. Truncation by redrawing keeps traits inside a physiological band.
 */
import type { Xoshiro128StarStar } from './xoshiro128starstar.js';

export function standardNormal(rng: Xoshiro128StarStar): number {
  const u1 = 1 - rng.nextFloat64();
  const u2 = rng.nextFloat64();
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}

/**
 * Standard normal conditioned on |z| ≤ limit (redraw outside). With limit 4 the standard
 * deviation is 0.99946 of the untruncated one (truncated-normal variance 1 − 2·4·φ(4)/(2Φ(4) − 1)),
 * well inside the sampling tolerance of any cohort this tool runs.
 */
export function truncatedStandardNormal(rng: Xoshiro128StarStar, limit: number): number {
  if (!(limit > 0.5)) throw new RangeError(`truncation limit must exceed 0.5 standard deviations, got ${String(limit)}`);
  for (;;) {
    const z = standardNormal(rng);
    if (Math.abs(z) <= limit) return z;
  }
}
