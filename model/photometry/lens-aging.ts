/**
 * Age-dependent lens transmittance of the observer relative to the 32-year-old reference
 * observer of CIE S 026:2018, as a Transmittance applied to the spectrum at the eye:
 *   τ_rel(λ, a) = τ(λ, a) / τ(λ, 32) = 10^−[D(λ, a) − D(λ, 32)]
 * with the optical density of the ocular media D(λ, a) of CIE 203:2012 (after van de Kraats &
 * van Norren 2007, JOSA A 24(7):1842–1857). Only its age-dependent terms survive the ratio:
 *   D(λ, a) − D(λ, 32) = (a² − 32²) · [ 0.000031 (400/λ)⁴
 *                                       − 0.000063 · 2.13 · exp(−(0.029 (λ − 370))²)
 *                                       + 0.000186 · 11.95 · exp(−(0.021 (λ − 325))²)
 *                                       + 0.000132 · 1.43 · exp(−(0.008 (λ − 325))²) ]
 * λ in nm, a in years. The density formula was written from memory and then confirmed term by
 * term against two independent public implementations of CIE 203:2012 (one of which applies it
 * as the CIE S 026 age correction relative to 32 years); see docs/methods/photometry.md.
 * Photopic illuminance (V(λ)) is defined for the standard observer and is not age-corrected.
 */
import type { Transmittance } from './spectrum.js';
import { GRID_LENGTH, gridWavelength_nm } from './wavelength-grid.js';

export const REFERENCE_OBSERVER_AGE_YEARS = 32;
export const LENS_AGE_MIN_YEARS = 1;
export const LENS_AGE_MAX_YEARS = 100;

/** Age-dependent part of the ocular-media density per (a² − 32²), at λ (nm). */
function densityPerAgeSquared(wavelength_nm: number): number {
  const l = wavelength_nm;
  return (
    0.000031 * (400 / l) ** 4 -
    0.000063 * 2.13 * Math.exp(-((0.029 * (l - 370)) ** 2)) +
    0.000186 * 11.95 * Math.exp(-((0.021 * (l - 325)) ** 2)) +
    0.000132 * 1.43 * Math.exp(-((0.008 * (l - 325)) ** 2))
  );
}

/** Relative lens transmittance τ(λ, a)/τ(λ, 32) at one wavelength. */
export function relativeLensTransmittance(wavelength_nm: number, age_years: number): number {
  const dd = (age_years * age_years - REFERENCE_OBSERVER_AGE_YEARS ** 2) * densityPerAgeSquared(wavelength_nm);
  return 10 ** -dd;
}

const cache = new Map<number, Transmittance>();

/**
 * Lens transmittance of an observer of `age_years` relative to the 32-year-old CIE S 026
 * reference observer, on the canonical grid (> 1 below 32 years, < 1 above). Multiply the
 * spectrum at the eye by it (applyTransmittance) before computing α-opic quantities.
 */
export function lensTransmittanceRelativeTo32(age_years: number): Transmittance {
  if (!(age_years >= LENS_AGE_MIN_YEARS && age_years <= LENS_AGE_MAX_YEARS)) {
    throw new RangeError(`age ${age_years} years is outside ${LENS_AGE_MIN_YEARS}–${LENS_AGE_MAX_YEARS} years`);
  }
  let t = cache.get(age_years);
  if (t === undefined) {
    const values = new Float64Array(GRID_LENGTH);
    for (let i = 0; i < GRID_LENGTH; i++) values[i] = relativeLensTransmittance(gridWavelength_nm(i), age_years);
    t = { values, label: `lens transmittance at ${age_years} years relative to 32 years (CIE S 026 / CIE 203)` };
    if (cache.size < 256) cache.set(age_years, t);
  }
  return t;
}
