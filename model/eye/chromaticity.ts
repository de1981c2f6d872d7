/**
 * CIE 1931 chromaticity of a spectrum and its correlated colour temperature by McCamy's cubic
 * (McCamy 1992, Color Res. Appl. 17(2):142–144; coefficients from memory as given in
 * light-at-eye.md §5.2, stated good to about 2 K for 2 000–12 500 K near the Planckian locus):
 *   n = (x − 0.3320)/(0.1858 − y),  CCT ≈ 449n³ + 3525n² + 6823.3n + 5520.33
 * Used only to turn a tunable-white CCT setting into a channel mix.
 */
import { datasetColumn } from '../data/datasets.js';
import { resampleLinear } from '../photometry/resample.js';
import type { Spectrum } from '../photometry/spectrum.js';
import { GRID_LENGTH } from '../photometry/wavelength-grid.js';

const CMF = 'spectra/cie_1931_2deg_colour_matching_functions_1nm.csv';
let cmf: { x: Float64Array; y: Float64Array; z: Float64Array } | undefined;

function cmfOnGrid() {
  if (cmf === undefined) {
    const wl = datasetColumn(CMF, 'wavelength_nm');
    cmf = { x: resampleLinear(wl, datasetColumn(CMF, 'x_bar')).values, y: resampleLinear(wl, datasetColumn(CMF, 'y_bar')).values, z: resampleLinear(wl, datasetColumn(CMF, 'z_bar')).values };
  }
  return cmf;
}

export interface Tristimulus {
  readonly X: number;
  readonly Y: number;
  readonly Z: number;
}

/** Tristimulus values (relative, 1 nm sums over 380–780 nm). */
export function tristimulus(s: Spectrum): Tristimulus {
  const c = cmfOnGrid();
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const v = s.values[i] as number;
    X += v * (c.x[i] as number);
    Y += v * (c.y[i] as number);
    Z += v * (c.z[i] as number);
  }
  return { X, Y, Z };
}

export function mccamyCct_K(X: number, Y: number, Z: number): number {
  const sum = X + Y + Z;
  const x = X / sum;
  const y = Y / sum;
  const n = (x - 0.332) / (0.1858 - y);
  return 449 * n ** 3 + 3525 * n ** 2 + 6823.3 * n + 5520.33;
}
