/**
 * CIE S 026:2018 α-opic action spectra and V(λ) on the canonical grid, loaded from the
 * embedded CIE tables (model/data/spectra). Relative, energy-based, maximum 1.
 */
import { datasetColumn } from '../data/datasets.js';
import { resampleLinear } from './resample.js';

export const ALPHA_OPIC_KEYS = ['sc', 'mc', 'lc', 'rh', 'mel'] as const;
export type AlphaOpicKey = (typeof ALPHA_OPIC_KEYS)[number];

const ACTION_TABLE = 'spectra/cie_s026_alpha_opic_action_spectra_1nm.csv';
const V_TABLE = 'spectra/cie_1924_photopic_luminous_efficiency_V_1nm.csv';
const COLUMN_OF: Record<AlphaOpicKey, string> = { sc: 's_cone', mc: 'm_cone', lc: 'l_cone', rh: 'rhodopic', mel: 'melanopic' };

function onGrid(table: string, column: string): Float64Array {
  return resampleLinear(datasetColumn(table, 'wavelength_nm'), datasetColumn(table, column)).values;
}

let cachedAction: Record<AlphaOpicKey, Float64Array> | undefined;
let cachedV: Float64Array | undefined;

/** s_α(λ) for the five α-opic quantities (CIE S 026:2018 Table 2). */
export function actionSpectra(): Readonly<Record<AlphaOpicKey, Float64Array>> {
  cachedAction ??= {
    sc: onGrid(ACTION_TABLE, COLUMN_OF.sc),
    mc: onGrid(ACTION_TABLE, COLUMN_OF.mc),
    lc: onGrid(ACTION_TABLE, COLUMN_OF.lc),
    rh: onGrid(ACTION_TABLE, COLUMN_OF.rh),
    mel: onGrid(ACTION_TABLE, COLUMN_OF.mel),
  };
  return cachedAction;
}

/** CIE 1924 photopic V(λ) (CIE 018:2019 Table 1). */
export function photopicV(): Float64Array {
  cachedV ??= onGrid(V_TABLE, 'V');
  return cachedV;
}
