/**
 * Conversion between melanopic EDI at the eye and the native input of the Kronauer-family and
 * Hannay models, which were fitted to photopic lux of cool-white fluorescent light (St Hilaire
 * et al. 2007 J Pineal Res: fluorescent white light in all their data sets; a Brigham study
 * used "4,100 K fluorescent" lamps).
 *
 *   I_native (lx of the calibration source) = mel-EDI (lx) / mel-DER_cal
 *
 * This is equivalent to Tekieh et al. 2020's substitution of melanopic irradiance for lux in
 * Process L (the pathway is treated as purely melanopic). Settled choice: mel-DER_cal is the
 * CIE S 026 melanopic DER of CIE illuminant FL2 (cool white, 4230 K), computed from the
 * embedded CIE FL table with the product's own α-opic code: 0.569. Tekieh's constants imply
 * 0.610–0.618 for their "4100 K" lamp (8.0854e-4 and 8.19e-4 W m⁻² lx⁻¹ divided by
 * K_mel,v^D65 = 1.3262e-3 W/lm); the 7 % difference is within the spread of real cool-white
 * tubes, and FL2 is a published, reproducible spectrum. Change CALIBRATION_ILLUMINANT to move.
 */
import { datasetColumn } from '../data/datasets.js';
import { alphaOpicDer } from '../photometry/alpha-opic.js';
import { resampleLinear } from '../photometry/resample.js';
import { spectrum } from '../photometry/spectrum.js';
import { scaledLightSeries, type LightSeries } from './light-series.js';

/** CIE fluorescent illuminant standing in for the models' cool-white calibration lamps. */
export const CALIBRATION_ILLUMINANT = 'FL2';

let cachedDer: number | undefined;

/** Melanopic DER of the calibration source (CIE S 026 on the embedded CIE FL2 table). */
export function calibrationMelanopicDer(): number {
  if (cachedDer === undefined) {
    const table = 'spectra/cie_fluorescent_FL1_FL12_1nm.csv';
    const s = spectrum(resampleLinear(datasetColumn(table, 'wavelength_nm'), datasetColumn(table, CALIBRATION_ILLUMINANT)).values, false);
    cachedDer = alphaOpicDer(s).mel;
  }
  return cachedDer;
}

/** Native lux of the calibration source equivalent to a melanopic EDI. */
export function nativeLuxFromMelEdi(melEdi_lx: number): number {
  return melEdi_lx / calibrationMelanopicDer();
}

/** The series in native lux (unchanged if it already is). */
export function nativeLightSeries(series: LightSeries): LightSeries {
  return series.unit === 'native_lx' ? series : scaledLightSeries(series, 1 / calibrationMelanopicDer(), 'native_lx');
}
