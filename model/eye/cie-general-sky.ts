/**
 * CIE standard general sky: relative sky luminance of the 15 sky types of ISO 15469:2004 /
 * CIE S 011/E:2003 (parameters of Darula & Kittler 2002; the full 15-type table partly from memory).
 *
 *   gradation   φ(Z) = 1 + a·exp(b / cos Z)            (φ(90°) = 1)
 *   indicatrix  f(χ) = 1 + c·[exp(d·χ) − exp(d·π/2)] + e·cos²χ
 *   L(Z, χ)/L_z = f(χ)·φ(Z) / (f(Z_s)·φ(0))
 *   cos χ = cos Z_s cos Z + sin Z_s sin Z cos(A − A_s)
 * Z: zenith angle of the sky element, χ: its angular distance from the sun, Z_s: solar zenith.
 */

export interface CieSkyParameters {
  readonly a: number;
  readonly b: number;
  readonly c: number;
  readonly d: number;
  readonly e: number;
}

/** Sky types 1…15 (index 0 is type 1). ISO 15469:2004 Table 1. */
export const CIE_SKY_TYPES: readonly CieSkyParameters[] = [
  { a: 4.0, b: -0.7, c: 0, d: -1.0, e: 0.0 },
  { a: 4.0, b: -0.7, c: 2, d: -1.5, e: 0.15 },
  { a: 1.1, b: -0.8, c: 0, d: -1.0, e: 0.0 },
  { a: 1.1, b: -0.8, c: 2, d: -1.5, e: 0.15 },
  { a: 0.0, b: -1.0, c: 0, d: -1.0, e: 0.0 },
  { a: 0.0, b: -1.0, c: 2, d: -1.5, e: 0.15 },
  { a: 0.0, b: -1.0, c: 5, d: -2.5, e: 0.3 },
  { a: 0.0, b: -1.0, c: 10, d: -3.0, e: 0.45 },
  { a: -1.0, b: -0.55, c: 2, d: -1.5, e: 0.15 },
  { a: -1.0, b: -0.55, c: 5, d: -2.5, e: 0.3 },
  { a: -1.0, b: -0.55, c: 10, d: -3.0, e: 0.45 },
  { a: -1.0, b: -0.32, c: 10, d: -3.0, e: 0.45 },
  { a: -1.0, b: -0.32, c: 16, d: -3.0, e: 0.3 },
  { a: -1.0, b: -0.15, c: 16, d: -3.0, e: 0.3 },
  { a: -1.0, b: -0.15, c: 24, d: -2.8, e: 0.15 },
];

export const CIE_SKY_TYPE_COUNT = 15;
/** CIE standard overcast sky (type 1), uniform sky (type 5), CIE standard clear sky (type 12). */
export const SKY_OVERCAST = 1;
export const SKY_UNIFORM = 5;
export const SKY_CLEAR = 12;

export function cieSkyParameters(type: number): CieSkyParameters {
  const p = Number.isInteger(type) ? CIE_SKY_TYPES[type - 1] : undefined;
  if (p === undefined) throw new Error(`sky type must be an integer 1–15, got ${type}`);
  return p;
}

function gradation(p: CieSkyParameters, cosZ: number): number {
  // φ(90°) = 1: exp(b / cos Z) → 0 as cos Z → 0⁺ (b < 0 for every type).
  return cosZ <= 1e-9 ? 1 : 1 + p.a * Math.exp(p.b / cosZ);
}

function indicatrix(p: CieSkyParameters, chi_rad: number): number {
  const c = Math.cos(chi_rad);
  return 1 + p.c * (Math.exp(p.d * chi_rad) - Math.exp((p.d * Math.PI) / 2)) + p.e * c * c;
}

/**
 * Relative luminance L/L_z of the sky element with direction cosines (toward the element) in the
 * site frame, for the sun at `sunDir` (unit vector, any altitude: below the horizon the CIE
 * formulas are used unchanged with Z_s up to 90°, which keeps the twilight sky finite).
 */
export function relativeSkyLuminance(p: CieSkyParameters, dirZ: number, cosChi: number, sunCosZ: number): number {
  const chi = Math.acos(Math.max(-1, Math.min(1, cosChi)));
  const zs = Math.acos(Math.max(0, Math.min(1, sunCosZ)));
  return (indicatrix(p, chi) * gradation(p, dirZ)) / (indicatrix(p, zs) * gradation(p, 1));
}
