/**
 * Thermal sources: Planckian radiator at any temperature, CIE standard illuminant A, and the
 * equal-energy spectrum E.
 *  - Planckian radiator: Planck's law with c2 = 1.4388e-2 m·K (CIE 015:2018), relative,
 *    normalised to 100 at 560 nm.
 *  - Illuminant A (ISO/CIE 11664-2:2022 eq. 1, exactly as defined):
 *      S_A(λ) = 100 · (560/λ)⁵ · [exp(c2/(2848 · 560)) − 1] / [exp(c2/(2848 · λ)) − 1]
 *    with c2 = 1.435e-2 m·K and 2848 K (historical pair kept by the standard; same spectrum as
 *    a Planckian radiator of ≈2856 K on today's c2 scale). The tabulated A is this formula
 *    rounded to 6 significant figures (checked in tests).
 *  - Equal-energy spectrum E: constant spectral power (CIE 015:2018), here 100 everywhere.
 */
import { planckRelative, C2_CIE015_NM_K } from '../photometry/planck.js';
import { spectrum, type Spectrum } from '../photometry/spectrum.js';
import { GRID_LENGTH, gridWavelength_nm } from '../photometry/wavelength-grid.js';

/** c2 of the definition of illuminant A, nm·K (= 1.435e-2 m·K). */
export const ILLUMINANT_A_C2_NM_K = 1.435e7;
/** Temperature of the definition of illuminant A, K (with c2 = 1.435e-2 m·K). */
export const ILLUMINANT_A_T_K = 2848;
export const PLANCKIAN_MIN_K = 1000;
export const PLANCKIAN_MAX_K = 100000;

function normalisedPlanck(temperature_K: number, c2_nm_K: number): Spectrum {
  const ref = planckRelative(560, temperature_K, c2_nm_K);
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = (100 * planckRelative(gridWavelength_nm(i), temperature_K, c2_nm_K)) / ref;
  return spectrum(out, false);
}

/** Relative SPD of a Planckian radiator at T (K), 100 at 560 nm. */
export function planckianSpectrum(temperature_K: number): Spectrum {
  if (!(temperature_K >= PLANCKIAN_MIN_K && temperature_K <= PLANCKIAN_MAX_K)) {
    throw new RangeError(`Planckian temperature ${temperature_K} K is outside ${PLANCKIAN_MIN_K}–${PLANCKIAN_MAX_K} K`);
  }
  return normalisedPlanck(temperature_K, C2_CIE015_NM_K);
}

/** CIE standard illuminant A from its defining formula, 100 at 560 nm. */
export function illuminantA(): Spectrum {
  return normalisedPlanck(ILLUMINANT_A_T_K, ILLUMINANT_A_C2_NM_K);
}

/** Equal-energy spectrum E (constant 100). */
export function equalEnergySpectrum(): Spectrum {
  return spectrum(new Float64Array(GRID_LENGTH).fill(100), false);
}
