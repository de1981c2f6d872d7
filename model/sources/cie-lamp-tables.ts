/**
 * CIE illuminants representing typical lamps, by their CIE names (CIE 015:2018):
 *  - FL1–FL12 (fluorescent; Tables 10.1–10.3). We use the normative 5 nm table, linearly
 *    interpolated to 1 nm (the interpolation CIE 015 recommends). The CIE's separate 1 nm FL
 *    set is marked "approximated" by the CIE and draws the mercury lines as 1 nm peaks; it is
 *    not used, so that results follow the normative table.
 *  - LED-B1…B5, LED-BH1, LED-RGB1, LED-V1, LED-V2 (LED; Tables 12.1/12.2). We use the CIE's
 *    1 nm full-precision table: the 5 nm printed table is that table sampled every 5 nm and
 *    rounded to 2 decimals, so the 1 nm table is the more exact form of the same data.
 * Values are relative, on the common photometric scale of the CIE tables.
 */
import { datasetColumn, numericDataset } from '../data/datasets.js';
import { resampleLinear } from '../photometry/resample.js';
import { spectrum, type Spectrum } from '../photometry/spectrum.js';

const FL_TABLE = 'spectra/cie_fluorescent_FL1_FL12_5nm.csv';
const LED_TABLE = 'spectra/cie_led_illuminants_1nm.csv';

export const CIE_FL_NAMES = ['FL1', 'FL2', 'FL3', 'FL4', 'FL5', 'FL6', 'FL7', 'FL8', 'FL9', 'FL10', 'FL11', 'FL12'] as const;
export const CIE_LED_NAMES = ['LED-B1', 'LED-B2', 'LED-B3', 'LED-B4', 'LED-B5', 'LED-BH1', 'LED-RGB1', 'LED-V1', 'LED-V2'] as const;
export type CieLampName = (typeof CIE_FL_NAMES)[number] | (typeof CIE_LED_NAMES)[number];

export function isCieLampName(name: string): name is CieLampName {
  return (CIE_FL_NAMES as readonly string[]).includes(name) || (CIE_LED_NAMES as readonly string[]).includes(name);
}

const cache = new Map<CieLampName, Spectrum>();

/** Relative SPD of a CIE FL or LED illuminant on the canonical grid. */
export function cieLampSpectrum(name: CieLampName): Spectrum {
  let s = cache.get(name);
  if (s === undefined) {
    const table = (CIE_FL_NAMES as readonly string[]).includes(name) ? FL_TABLE : LED_TABLE;
    if (!numericDataset(table).columns.includes(name)) throw new Error(`CIE table ${table} has no column ${name}`);
    s = spectrum(resampleLinear(datasetColumn(table, 'wavelength_nm'), datasetColumn(table, name)).values, false);
    cache.set(name, s);
  }
  return s;
}
