/**
 * Default ΔT = TT − UT (s) when the user gives none. Polynomial fits of Espenak & Meeus (2006,
 * "Polynomial expressions for Delta T", NASA eclipse web site), written from memory:
 *   1986–2005: 63.86 + 0.3345t − 0.060374t² + 0.0017275t³ + 0.000651814t⁴ + 0.00002373599t⁵, t = y − 2000
 *   2005–2050: 62.92 + 0.32217t + 0.005589t², t = y − 2000
 *   otherwise: −20 + 32u² with u = (y − 1820)/100 (long-term parabola)
 * A ΔT error of 10 s moves the sun by about 0.0001°, far below what matters for light at the eye.
 */
export function defaultDeltaT_s(decimalYear: number): number {
  const y = decimalYear;
  if (y >= 1986 && y < 2005) {
    const t = y - 2000;
    return 63.86 + t * (0.3345 + t * (-0.060374 + t * (0.0017275 + t * (0.000651814 + t * 0.00002373599))));
  }
  if (y >= 2005 && y < 2050) {
    const t = y - 2000;
    return 62.92 + t * (0.32217 + t * 0.005589);
  }
  const u = (y - 1820) / 100;
  return -20 + 32 * u * u;
}

/** Decimal year of a UT instant (for ΔT only; month accuracy is plenty). */
export function decimalYearFromEpochMs(epochMs: number): number {
  return 1970 + epochMs / (365.2425 * 86_400_000);
}
