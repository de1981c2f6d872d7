/**
 * CIE D-series daylight illuminant at any correlated colour temperature, 4000–25000 K, from the
 * daylight components S0, S1, S2 (CIE 015:2018 §4.1; recipe as documented with the bundled
 * table and checked against the tabulated D65 in tests):
 *   x_D = −4.6070e9/T³ + 2.9678e6/T² + 0.09911e3/T + 0.244063   (4000 K ≤ T ≤ 7000 K)
 *   x_D = −2.0064e9/T³ + 1.9018e6/T² + 0.24748e3/T + 0.237040   (7000 K < T ≤ 25000 K)
 *   y_D = −3.000 x_D² + 2.870 x_D − 0.275
 *   M = 0.0241 + 0.2562 x_D − 0.7341 y_D
 *   M1 = (−1.3515 − 1.7703 x_D + 5.9114 y_D)/M,  M2 = (0.0300 − 31.4424 x_D + 30.0717 y_D)/M
 *   S(λ) = S0(λ) + M1 S1(λ) + M2 S2(λ), linear interpolation from 5 nm to 1 nm (CIE 15).
 * CIE 15 rounds M1, M2 to three decimals; `roundCoefficients` reproduces that for checks
 * against the published tables. T is the CCT on today's c2 = 1.4388e-2 m·K scale; nominal
 * "D65" is T = 6500 × 1.4388/1.4380 ≈ 6503.6 K.
 */
import { datasetColumn } from '../data/datasets.js';
import { resampleLinear } from '../photometry/resample.js';
import { spectrum, type Spectrum } from '../photometry/spectrum.js';
import { GRID_LENGTH } from '../photometry/wavelength-grid.js';

export const DAYLIGHT_CCT_MIN_K = 4000;
export const DAYLIGHT_CCT_MAX_K = 25000;
/** Conversion of a nominal D-series CCT (old c2 = 1.4380e-2 m·K) to today's scale (CIE 015:2018). */
export const NOMINAL_TO_ACTUAL_CCT = 1.4388 / 1.438;

const TABLE = 'spectra/cie_daylight_components_S0_S1_S2_5nm.csv';
let components: { s0: Float64Array; s1: Float64Array; s2: Float64Array } | undefined;

function daylightComponents() {
  if (components === undefined) {
    const wl = datasetColumn(TABLE, 'wavelength_nm');
    components = {
      s0: resampleLinear(wl, datasetColumn(TABLE, 'S0')).values,
      s1: resampleLinear(wl, datasetColumn(TABLE, 'S1')).values,
      s2: resampleLinear(wl, datasetColumn(TABLE, 'S2')).values,
    };
  }
  return components;
}

/** Chromaticity (x, y) of the CIE daylight locus at CCT T (K). */
export function daylightChromaticity(cct_K: number): { x: number; y: number } {
  if (!(cct_K >= DAYLIGHT_CCT_MIN_K && cct_K <= DAYLIGHT_CCT_MAX_K)) {
    throw new RangeError(`daylight CCT ${cct_K} K is outside the CIE D-series range ${DAYLIGHT_CCT_MIN_K}–${DAYLIGHT_CCT_MAX_K} K`);
  }
  const t = cct_K;
  const x =
    t <= 7000
      ? -4.607e9 / t ** 3 + 2.9678e6 / t ** 2 + 0.09911e3 / t + 0.244063
      : -2.0064e9 / t ** 3 + 1.9018e6 / t ** 2 + 0.24748e3 / t + 0.23704;
  return { x, y: -3.0 * x * x + 2.87 * x - 0.275 };
}

/** Relative SPD (S0 scale, 100 at 560 nm) of the CIE daylight illuminant at CCT T (K). */
export function cieDaylightSpectrum(cct_K: number, options: { roundCoefficients?: boolean } = {}): Spectrum {
  const { x, y } = daylightChromaticity(cct_K);
  const m = 0.0241 + 0.2562 * x - 0.7341 * y;
  let m1 = (-1.3515 - 1.7703 * x + 5.9114 * y) / m;
  let m2 = (0.03 - 31.4424 * x + 30.0717 * y) / m;
  if (options.roundCoefficients === true) {
    m1 = Math.round(m1 * 1000) / 1000;
    m2 = Math.round(m2 * 1000) / 1000;
  }
  const { s0, s1, s2 } = daylightComponents();
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = (s0[i] as number) + m1 * (s1[i] as number) + m2 * (s2[i] as number);
  return spectrum(out, false);
}
