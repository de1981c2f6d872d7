/**
 * Planck's law as a relative spectral distribution (the absolute factor c1 is omitted):
 *   S(λ, T) ∝ λ⁻⁵ / (exp(c2 / (λ T)) − 1)
 * λ in nm, T in K, c2 in nm·K. Today's second radiation constant c2 = 1.438777e-2 m·K
 * (CODATA, from memory); CIE 015:2018 uses c2 = 1.4388e-2 m·K for the Planckian locus, which
 * we adopt. CIE illuminant A keeps its historical c2 = 1.435e-2 m·K (ISO/CIE 11664-2:2022 eq. 1).
 */
import { GRID_LENGTH, gridWavelength_nm } from './wavelength-grid.js';

/** c2 used for the Planckian locus (CIE 015:2018), in nm·K (= 1.4388e-2 m·K). */
export const C2_CIE015_NM_K = 1.4388e7;

/** Relative Planckian spectral radiance at one wavelength (arbitrary units, λ⁻⁵ scale in nm). */
export function planckRelative(wavelength_nm: number, temperature_K: number, c2_nm_K: number = C2_CIE015_NM_K): number {
  return wavelength_nm ** -5 / Math.expm1(c2_nm_K / (wavelength_nm * temperature_K));
}

/** Relative Planckian spectrum on the canonical grid (raw λ⁻⁵ scale; callers normalise). */
export function planckOnGrid(temperature_K: number, c2_nm_K: number = C2_CIE015_NM_K): Float64Array {
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = planckRelative(gridWavelength_nm(i), temperature_K, c2_nm_K);
  return out;
}
