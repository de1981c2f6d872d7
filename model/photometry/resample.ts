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

/**
 * Resampling of measured data of any step onto the canonical grid:
 *  - step ≥ 1 nm (median): linear interpolation at each grid wavelength (resampleLinear);
 *  - step < 1 nm: mean of the piecewise-linear data over the 1 nm bin [λ − 0.5, λ + 0.5] nm
 *    (clipped to the data range), so narrow lines between grid points keep their power instead
 *    of being missed or over-weighted by point sampling.
 * Grid wavelengths outside the data range get zero in both cases.
 */
export function resampleToGrid(wavelengths_nm: ArrayLike<number>, values: ArrayLike<number>): ResampleResult & { readonly method: 'linear' | 'bin-mean' } {
  const n = wavelengths_nm.length;
  const steps: number[] = [];
  for (let k = 1; k < n; k++) steps.push((wavelengths_nm[k] as number) - (wavelengths_nm[k - 1] as number));
  steps.sort((a, b) => a - b);
  const medianStep = steps.length > 0 ? (steps[Math.floor(steps.length / 2)] as number) : Number.POSITIVE_INFINITY;
  if (medianStep >= 1) return { ...resampleLinear(wavelengths_nm, values), method: 'linear' };

  const first = wavelengths_nm[0] as number;
  const last = wavelengths_nm[n - 1] as number;
  const out = new Float64Array(GRID_LENGTH);
  let k = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const w = gridWavelength_nm(i);
    if (w < first || w > last) continue;
    const a = Math.max(w - 0.5, first);
    const b = Math.min(w + 0.5, last);
    while (k < n - 2 && (wavelengths_nm[k + 1] as number) <= a) k++;
    let integral = 0;
    for (let j = k; j < n - 1; j++) {
      const x0 = wavelengths_nm[j] as number;
      const x1 = wavelengths_nm[j + 1] as number;
      if (x0 >= b) break;
      const lo = Math.max(x0, a);
      const hi = Math.min(x1, b);
      if (hi <= lo) continue;
      const y0 = values[j] as number;
      const slope = ((values[j + 1] as number) - y0) / (x1 - x0);
      // ∫ linear segment over [lo, hi] = (hi − lo) × value at the midpoint.
      integral += (hi - lo) * (y0 + slope * ((lo + hi) / 2 - x0));
    }
    out[i] = b > a ? integral / (b - a) : (values[k] as number);
  }
  return { values: out, coveredFrom_nm: first, coveredTo_nm: last, method: 'bin-mean' };
}
