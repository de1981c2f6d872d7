/**
 * Correlated colour temperature (CCT) and distance from the Planckian locus (Duv) by the
 * combined method of Ohno, Y. (2014) "Practical use and calculation of CCT and Duv",
 * LEUKOS 10(1):47–55, doi:10.1080/15502724.2014.839020 (equations written from memory of the
 * paper and checked against the CIE tables in tests).
 *
 * Variant used here:
 *  - Planckian locus from Planck's law with c2 = 1.4388e-2 m·K (CIE 015:2018), CIE 1931 2° CMFs
 *    summed over 380–780 nm at 1 nm (the same sums as the test spectrum), in CIE 1960 (u, v).
 *  - Table: 1000 K to 100 000 K in 1 % steps. The nearest entry m is found, then the table is
 *    refined "in cascade" (Ohno 2014): T_{m−1}…T_{m+1} is divided into 10 geometric steps and
 *    the search repeated until the step is below 0.01 %. With so fine a step the paper's
 *    correction factor for the parabolic solution at 1 % steps is not needed and not applied.
 *  - Triangular solution when |Duv| < 0.002, otherwise the parabolic solution (the paper's
 *    combined rule).
 * Triangular:  l = |P_{m+1} − P_{m−1}|,  x = (d²_{m−1} − d²_{m+1} + l²)/(2l),
 *              T = T_{m−1} + (T_{m+1} − T_{m−1}) x/l,  |Duv| = √(d²_{m−1} − x²)
 * Parabolic:   d(T) ≈ aT² + bT + c through (T_{m−1}, d_{m−1}), (T_m, d_m), (T_{m+1}, d_{m+1}),
 *              T = −b/(2a),  |Duv| = aT² + bT + c
 * Sign of Duv: positive above the locus (v greater than the locus v at T).
 */
import { C2_CIE015_NM_K } from './planck.js';
import { cie1931Cmf, tristimulus, uv1960Of, type Uv1960 } from './colorimetry.js';
import { GRID_LENGTH, gridWavelength_nm } from './wavelength-grid.js';
import type { Spectrum } from './spectrum.js';

export const CCT_TABLE_MIN_K = 1000;
export const CCT_TABLE_MAX_K = 100000;
const COARSE_RATIO = 1.01;
const REFINE_DIVISIONS = 10;
const FINEST_RATIO = 1.0001;
/** Ohno 2014: the triangular solution is used below this |Duv|, the parabolic one above. */
const TRIANGULAR_LIMIT_DUV = 0.002;

export interface CctResult {
  /** CCT in K; NaN when the chromaticity lies beyond the ends of the table (1000–100 000 K). */
  readonly cct_K: number;
  /** Signed distance from the Planckian locus in CIE 1960 (u, v); positive above the locus. */
  readonly duv: number;
  readonly solution: 'triangular' | 'parabolic' | 'out-of-range';
}

let lambdaPow5: Float64Array | undefined;
let c2OverLambda: Float64Array | undefined;

/** (u, v) of the Planckian radiator at T (K): Planck's law (planck.ts) weighted by the CMFs. */
export function planckianUv(temperature_K: number): Uv1960 {
  if (lambdaPow5 === undefined || c2OverLambda === undefined) {
    lambdaPow5 = new Float64Array(GRID_LENGTH);
    c2OverLambda = new Float64Array(GRID_LENGTH);
    for (let i = 0; i < GRID_LENGTH; i++) {
      lambdaPow5[i] = gridWavelength_nm(i) ** -5;
      c2OverLambda[i] = C2_CIE015_NM_K / gridWavelength_nm(i);
    }
  }
  const { xBar, yBar, zBar } = cie1931Cmf();
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const p = (lambdaPow5[i] as number) / Math.expm1((c2OverLambda[i] as number) / temperature_K);
    X += p * (xBar[i] as number);
    Y += p * (yBar[i] as number);
    Z += p * (zBar[i] as number);
  }
  return uv1960Of({ X, Y, Z });
}

interface LocusTable {
  readonly t: Float64Array;
  readonly u: Float64Array;
  readonly v: Float64Array;
}

/** Locus table T_i = tFrom · ratio^i; `known` supplies points already computed (index → u, v). */
function locusTable(tFrom_K: number, ratio: number, count: number, known: ReadonlyMap<number, Uv1960> = new Map()): LocusTable {
  const t = new Float64Array(count);
  const u = new Float64Array(count);
  const v = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    t[i] = tFrom_K * ratio ** i;
    const p = known.get(i) ?? planckianUv(t[i] as number);
    u[i] = p.u;
    v[i] = p.v;
  }
  return { t, u, v };
}

let coarse: LocusTable | undefined;

function coarseTable(): LocusTable {
  const count = Math.ceil(Math.log(CCT_TABLE_MAX_K / CCT_TABLE_MIN_K) / Math.log(COARSE_RATIO)) + 1;
  coarse ??= locusTable(CCT_TABLE_MIN_K, COARSE_RATIO, count);
  return coarse;
}

function nearestIndex(table: LocusTable, p: Uv1960): number {
  let best = 0;
  let bestD2 = Number.POSITIVE_INFINITY;
  for (let i = 0; i < table.t.length; i++) {
    const du = p.u - (table.u[i] as number);
    const dv = p.v - (table.v[i] as number);
    const d2 = du * du + dv * dv;
    if (d2 < bestD2) {
      bestD2 = d2;
      best = i;
    }
  }
  return best;
}

function distance(table: LocusTable, i: number, p: Uv1960): number {
  return Math.hypot(p.u - (table.u[i] as number), p.v - (table.v[i] as number));
}

/** CCT and Duv of a chromaticity given in CIE 1960 (u, v). */
export function cctDuvFromUv(p: Uv1960): CctResult {
  if (!Number.isFinite(p.u) || !Number.isFinite(p.v)) return { cct_K: Number.NaN, duv: Number.NaN, solution: 'out-of-range' };
  let table = coarseTable();
  let m = nearestIndex(table, p);
  if (m === 0 || m === table.t.length - 1) return { cct_K: Number.NaN, duv: Number.NaN, solution: 'out-of-range' };
  let ratio = COARSE_RATIO;
  while (ratio > FINEST_RATIO) {
    const t0 = table.t[m - 1] as number;
    ratio = ((table.t[m + 1] as number) / t0) ** (1 / REFINE_DIVISIONS);
    const half = REFINE_DIVISIONS / 2;
    const known = new Map<number, Uv1960>([
      [0, { u: table.u[m - 1] as number, v: table.v[m - 1] as number }],
      [half, { u: table.u[m] as number, v: table.v[m] as number }],
      [REFINE_DIVISIONS, { u: table.u[m + 1] as number, v: table.v[m + 1] as number }],
    ]);
    table = locusTable(t0, ratio, REFINE_DIVISIONS + 1, known);
    m = Math.min(Math.max(nearestIndex(table, p), 1), REFINE_DIVISIONS - 1);
  }
  const tm1 = table.t[m - 1] as number;
  const tm = table.t[m] as number;
  const tp1 = table.t[m + 1] as number;
  const dm1 = distance(table, m - 1, p);
  const dm = distance(table, m, p);
  const dp1 = distance(table, m + 1, p);

  // Triangular solution.
  const l = Math.hypot((table.u[m + 1] as number) - (table.u[m - 1] as number), (table.v[m + 1] as number) - (table.v[m - 1] as number));
  const x = (dm1 * dm1 - dp1 * dp1 + l * l) / (2 * l);
  const tTri = tm1 + ((tp1 - tm1) * x) / l;
  const vAtTri = (table.v[m - 1] as number) + (((table.v[m + 1] as number) - (table.v[m - 1] as number)) * x) / l;
  const duvTri = Math.sqrt(Math.max(dm1 * dm1 - x * x, 0)) * Math.sign(p.v - vAtTri);
  if (Math.abs(duvTri) < TRIANGULAR_LIMIT_DUV) return { cct_K: tTri, duv: duvTri, solution: 'triangular' };

  // Parabolic solution.
  const X = (tp1 - tm) * (tm1 - tp1) * (tm - tm1);
  const a = (tm1 * (dp1 - dm) + tm * (dm1 - dp1) + tp1 * (dm - dm1)) / X;
  const b = -(tm1 * tm1 * (dp1 - dm) + tm * tm * (dm1 - dp1) + tp1 * tp1 * (dm - dm1)) / X;
  const c = -(dm1 * (tp1 - tm) * tm * tp1 + dm * (tm1 - tp1) * tm1 * tp1 + dp1 * (tm - tm1) * tm1 * tm) / X;
  const tPar = -b / (2 * a);
  const sign = Math.sign(p.v - planckianUv(tPar).v);
  return { cct_K: tPar, duv: sign * (a * tPar * tPar + b * tPar + c), solution: 'parabolic' };
}

/** CCT and Duv of a spectrum (CIE 1931 2° observer, Ohno 2014 combined method). */
export function cctDuv(s: Spectrum): CctResult {
  return cctDuvFromUv(uv1960Of(tristimulus(s)));
}
