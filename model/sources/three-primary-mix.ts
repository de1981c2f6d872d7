/**
 * Mixing three spectral components to a target chromaticity: the tristimulus values of a
 * mixture add (Grassmann's law), so weights w with Σ w_i (X_i, Y_i, Z_i) = (x/y, 1, z/y),
 * z = 1 − x − y, give the target (x, y) at unit Y. Solved by Cramer's rule. Used by the
 * parametric phosphor LED and the display model.
 */
import { tristimulusOfValues, type Chromaticity } from '../photometry/colorimetry.js';

export function mixWeightsForChromaticity(components: readonly [Float64Array, Float64Array, Float64Array], target: Chromaticity): [number, number, number] {
  const t = components.map((c) => tristimulusOfValues(c));
  const [a, b, c] = t as [ReturnType<typeof tristimulusOfValues>, ReturnType<typeof tristimulusOfValues>, ReturnType<typeof tristimulusOfValues>];
  const rhs = [target.x / target.y, 1, (1 - target.x - target.y) / target.y] as const;
  const m = [
    [a.X, b.X, c.X],
    [a.Y, b.Y, c.Y],
    [a.Z, b.Z, c.Z],
  ] as const;
  const det = (q: readonly (readonly number[])[]) => {
    const r0 = q[0] as readonly number[];
    const r1 = q[1] as readonly number[];
    const r2 = q[2] as readonly number[];
    const g = (r: readonly number[], i: number) => r[i] as number;
    return (
      g(r0, 0) * (g(r1, 1) * g(r2, 2) - g(r1, 2) * g(r2, 1)) -
      g(r0, 1) * (g(r1, 0) * g(r2, 2) - g(r1, 2) * g(r2, 0)) +
      g(r0, 2) * (g(r1, 0) * g(r2, 1) - g(r1, 1) * g(r2, 0))
    );
  };
  const d = det(m);
  const withColumn = (col: number) => m.map((row, i) => row.map((v, j) => (j === col ? (rhs[i] as number) : v)));
  return [det(withColumn(0)) / d, det(withColumn(1)) / d, det(withColumn(2)) / d];
}
