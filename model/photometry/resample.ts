/**
 * Resampling of a tabulated function onto the canonical 1 nm grid by linear interpolation,
 * the method CIE 015:2018 recommends for interpolating the daylight components and which the
 * CIE's own 1 nm tables reproduce (CIE 015:2018 §7; see docs/methods). Outside the tabulated
 * range the function is taken as zero; `coverage` tells the caller what part of 380–780 nm
 * the data covered so the edge can warn.
 */
import { GRID_LENGTH, gridWavelength_nm } from './wavelength-grid.js';

export interface ResampleResult {
  readonly values: Float64Array;
  /** First and last tabulated wavelength (nm). */
  readonly coveredFrom_nm: number;
  readonly coveredTo_nm: number;
}

/**
 * `wavelengths_nm` must be strictly increasing (callers validate user data first).
 */
export function resampleLinear(wavelengths_nm: ArrayLike<number>, values: ArrayLike<number>): ResampleResult {
  const n = wavelengths_nm.length;
  if (n === 0 || values.length !== n) throw new Error('resampleLinear: wavelength and value arrays must be non-empty and equally long');
  const out = new Float64Array(GRID_LENGTH);
  const first = wavelengths_nm[0] as number;
  const last = wavelengths_nm[n - 1] as number;
  let k = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const w = gridWavelength_nm(i);
    if (w < first || w > last) continue;
    while (k < n - 2 && (wavelengths_nm[k + 1] as number) < w) k++;
    const w0 = wavelengths_nm[k] as number;
    const w1 = wavelengths_nm[Math.min(k + 1, n - 1)] as number;
    const v0 = values[k] as number;
    const v1 = values[Math.min(k + 1, n - 1)] as number;
    out[i] = w1 === w0 ? v0 : v0 + ((v1 - v0) * (w - w0)) / (w1 - w0);
  }
  return { values: out, coveredFrom_nm: first, coveredTo_nm: last };
}
