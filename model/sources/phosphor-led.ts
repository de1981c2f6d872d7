/**
 * Parametric phosphor-converted white LED at a chosen CCT. PARAMETRIC MODEL, NOT A PUBLISHED
 * TABLE: three Gaussian bands — a blue InGaN pump, a broad yellow-green garnet-type phosphor and
 * a red nitride-type phosphor — with peak and width values typical of commercial white LEDs
 * (representative values chosen by us from general knowledge, from memory). Their weights are
 * solved so that the mixture sits exactly on the Planckian locus (Duv = 0) at the requested CCT.
 * For published LED spectra use the CIE LED illuminants (cie-lamp-tables.ts).
 */
import { uv1960ToXy } from '../photometry/colorimetry.js';
import { planckianUv } from '../photometry/cct-ohno.js';
import { spectrum, type Spectrum } from '../photometry/spectrum.js';
import { gaussianBand, weightedSumOfBands } from './spectral-shapes.js';
import { mixWeightsForChromaticity } from './three-primary-mix.js';

export const PHOSPHOR_LED_CCT_MIN_K = 2200;
export const PHOSPHOR_LED_CCT_MAX_K = 8000;

/** Band parameters (nm): pump peak/FWHM, yellow-green phosphor, red phosphor. Representative values. */
export const PHOSPHOR_LED_BANDS = {
  pump: { peak_nm: 450, fwhm_nm: 20 },
  yellowGreen: { peak_nm: 550, fwhm_nm: 110 },
  red: { peak_nm: 625, fwhm_nm: 85 },
} as const;

const cache = new Map<number, Spectrum>();

/** Relative SPD (peak-free arbitrary scale) of the parametric pc-LED at `cct_K` on the Planckian locus. */
export function phosphorLedSpectrum(cct_K: number): Spectrum {
  if (!(cct_K >= PHOSPHOR_LED_CCT_MIN_K && cct_K <= PHOSPHOR_LED_CCT_MAX_K)) {
    throw new RangeError(`phosphor LED CCT ${cct_K} K is outside the modelled range ${PHOSPHOR_LED_CCT_MIN_K}–${PHOSPHOR_LED_CCT_MAX_K} K`);
  }
  let s = cache.get(cct_K);
  if (s === undefined) {
    const b = PHOSPHOR_LED_BANDS;
    const bands = [gaussianBand(b.pump.peak_nm, b.pump.fwhm_nm), gaussianBand(b.yellowGreen.peak_nm, b.yellowGreen.fwhm_nm), gaussianBand(b.red.peak_nm, b.red.fwhm_nm)] as const;
    const w = mixWeightsForChromaticity(bands, uv1960ToXy(planckianUv(cct_K)));
    if (w.some((x) => !(x >= 0))) throw new RangeError(`phosphor LED model cannot reach ${cct_K} K with non-negative band weights`);
    const values = weightedSumOfBands(bands, w);
    const peak = values.reduce((m, v) => Math.max(m, v), 0);
    s = spectrum(values.map((v) => (100 * v) / peak), false);
    if (cache.size < 512) cache.set(cct_K, s);
  }
  return s;
}
