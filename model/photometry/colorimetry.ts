/**
 * CIE 1931 2° colorimetry of a spectrum on the canonical grid (ISO/CIE 11664-1:2019; CMFs from
 * the embedded CIE table). Sums run over 380–780 nm at 1 nm, the range of every Zeitlight
 * spectrum; the CIE tabulates the CMFs over 360–830 nm, and the omitted tails change the
 * chromaticity of smooth white-light spectra by less than 1e-4 (common practice).
 *   X = Σ S(λ) x̄(λ) Δλ,  Y = Σ S(λ) ȳ(λ) Δλ,  Z = Σ S(λ) z̄(λ) Δλ
 *   x = X/(X+Y+Z), y = Y/(X+Y+Z)
 *   CIE 1960 UCS: u = 4X/(X+15Y+3Z), v = 6Y/(X+15Y+3Z)   (CIE 015:2018)
 */
import { datasetColumn } from '../data/datasets.js';
import { resampleLinear } from './resample.js';
import type { Spectrum } from './spectrum.js';
import { GRID_LENGTH, GRID_STEP_NM } from './wavelength-grid.js';

const CMF_TABLE = 'spectra/cie_1931_2deg_colour_matching_functions_1nm.csv';

export interface ColourMatchingFunctions {
  readonly xBar: Float64Array;
  readonly yBar: Float64Array;
  readonly zBar: Float64Array;
}

let cachedCmf: ColourMatchingFunctions | undefined;

/** CIE 1931 2° colour-matching functions on the canonical grid. */
export function cie1931Cmf(): ColourMatchingFunctions {
  if (cachedCmf === undefined) {
    const wl = datasetColumn(CMF_TABLE, 'wavelength_nm');
    cachedCmf = {
      xBar: resampleLinear(wl, datasetColumn(CMF_TABLE, 'x_bar')).values,
      yBar: resampleLinear(wl, datasetColumn(CMF_TABLE, 'y_bar')).values,
      zBar: resampleLinear(wl, datasetColumn(CMF_TABLE, 'z_bar')).values,
    };
  }
  return cachedCmf;
}

export interface Tristimulus {
  readonly X: number;
  readonly Y: number;
  readonly Z: number;
}

/** Tristimulus values of raw grid values (no K_m factor; Y is in the spectrum's units × nm). */
export function tristimulusOfValues(values: Float64Array): Tristimulus {
  const { xBar, yBar, zBar } = cie1931Cmf();
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (let i = 0; i < GRID_LENGTH; i++) {
    const s = values[i] as number;
    X += s * (xBar[i] as number);
    Y += s * (yBar[i] as number);
    Z += s * (zBar[i] as number);
  }
  return { X: X * GRID_STEP_NM, Y: Y * GRID_STEP_NM, Z: Z * GRID_STEP_NM };
}

export function tristimulus(s: Spectrum): Tristimulus {
  return tristimulusOfValues(s.values);
}

export interface Chromaticity {
  readonly x: number;
  readonly y: number;
}

export interface Uv1960 {
  readonly u: number;
  readonly v: number;
}

/** CIE 1931 (x, y); NaN for a spectrum with no tristimulus sum. */
export function chromaticityOf(t: Tristimulus): Chromaticity {
  const sum = t.X + t.Y + t.Z;
  return sum > 0 ? { x: t.X / sum, y: t.Y / sum } : { x: Number.NaN, y: Number.NaN };
}

export function chromaticityXy(s: Spectrum): Chromaticity {
  return chromaticityOf(tristimulus(s));
}

/** CIE 1960 UCS (u, v) from tristimulus values. */
export function uv1960Of(t: Tristimulus): Uv1960 {
  const d = t.X + 15 * t.Y + 3 * t.Z;
  return d > 0 ? { u: (4 * t.X) / d, v: (6 * t.Y) / d } : { u: Number.NaN, v: Number.NaN };
}

/** CIE 1960 (u, v) from CIE 1931 (x, y): u = 4x/(−2x+12y+3), v = 6y/(−2x+12y+3) (CIE 015:2018). */
export function xyToUv1960(c: Chromaticity): Uv1960 {
  const d = -2 * c.x + 12 * c.y + 3;
  return { u: (4 * c.x) / d, v: (6 * c.y) / d };
}

/** CIE 1931 (x, y) from CIE 1960 (u, v): x = 3u/(2u−8v+4), y = 2v/(2u−8v+4). */
export function uv1960ToXy(c: Uv1960): Chromaticity {
  const d = 2 * c.u - 8 * c.v + 4;
  return { x: (3 * c.u) / d, y: (2 * c.v) / d };
}
