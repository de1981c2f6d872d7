/** ∫ v dt over [a, b] by the trapezoidal rule on samples (linear interpolation at the ends). */
export function trapezoid(t: readonly number[], v: readonly number[], a: number, b: number): number {
  let sum = 0;
  for (let i = 0; i + 1 < t.length; i++) {
    const t0 = t[i] as number;
    const t1 = t[i + 1] as number;
    const lo = Math.max(a, t0);
    const hi = Math.min(b, t1);
    if (hi <= lo) continue;
    const v0 = v[i] as number;
    const v1 = v[i + 1] as number;
    const at = (tq: number) => v0 + ((v1 - v0) * (tq - t0)) / (t1 - t0);
    sum += 0.5 * (at(lo) + at(hi)) * (hi - lo);
  }
  return sum;
}
