/**
 * A spectral distribution on the canonical 380–780 nm, 1 nm grid (wavelength-grid.ts).
 * `values` are spectral irradiance in W·m⁻²·nm⁻¹ when `absolute` is true, otherwise relative
 * (arbitrary) units as tabulated by the source. Spectra are immutable values.
 */
import { GRID_LENGTH } from './wavelength-grid.js';

export interface Spectrum {
  readonly values: Float64Array;
  /** True for spectral irradiance in W·m⁻²·nm⁻¹; false for a relative SPD. */
  readonly absolute: boolean;
}

export function spectrum(values: Float64Array, absolute: boolean): Spectrum {
  if (values.length !== GRID_LENGTH) throw new Error(`spectrum: expected ${GRID_LENGTH} values on the 380–780 nm grid, got ${values.length}`);
  return { values, absolute };
}

export function scaleSpectrum(s: Spectrum, factor: number): Spectrum {
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = (s.values[i] as number) * factor;
  return { values: out, absolute: s.absolute };
}

/** Sum of sources (all absolute, or all relative). */
export function addSpectra(...parts: readonly Spectrum[]): Spectrum {
  const out = new Float64Array(GRID_LENGTH);
  for (const p of parts) for (let i = 0; i < GRID_LENGTH; i++) out[i] = (out[i] as number) + (p.values[i] as number);
  return { values: out, absolute: parts.length > 0 && parts.every((p) => p.absolute) };
}

/** Spectral transmittance (0–1 per wavelength) on the canonical grid: glazing, eyewear, lens. */
export interface Transmittance {
  readonly values: Float64Array;
  readonly label: string;
}

export function applyTransmittance(s: Spectrum, t: Transmittance): Spectrum {
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = (s.values[i] as number) * (t.values[i] as number);
  return { values: out, absolute: s.absolute };
}
