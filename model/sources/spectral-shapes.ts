/**
 * Building blocks for parametric spectra and filters on the canonical grid. These are
 * modelling shapes (common practice in lighting simulation), not published tables.
 */
import { GRID_LENGTH, gridWavelength_nm } from '../photometry/wavelength-grid.js';

/** Gaussian band in wavelength with peak 1 at `peak_nm` and full width at half maximum `fwhm_nm`. */
export function gaussianBand(peak_nm: number, fwhm_nm: number): Float64Array {
  const sigma = fwhm_nm / (2 * Math.sqrt(2 * Math.LN2));
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = Math.exp(-0.5 * ((gridWavelength_nm(i) - peak_nm) / sigma) ** 2);
  return out;
}

/** Logistic edge rising from 0 to 1 around `edge_nm`; `width_nm` is the 27 %→73 % half-width. */
export function logisticEdge(wavelength_nm: number, edge_nm: number, width_nm: number): number {
  return 1 / (1 + Math.exp(-(wavelength_nm - edge_nm) / width_nm));
}

/** Weighted sum of grid arrays. */
export function weightedSumOfBands(bands: readonly Float64Array[], weights: readonly number[]): Float64Array {
  const out = new Float64Array(GRID_LENGTH);
  bands.forEach((b, j) => {
    const w = weights[j] ?? 0;
    for (let i = 0; i < GRID_LENGTH; i++) out[i] = (out[i] as number) + w * (b[i] as number);
  });
  return out;
}
