/**
 * Closed-eyelid spectral transmittance (adult mean, in vivo) and the melanopic EDI that reaches
 * the eye behind closed eyelids. Light at the eye of a sleeper passes the eyelids first:
 *   E_closed,λ = E_λ · T_lid(λ),   mel-EDI_closed = Σ E_λ T_lid(λ) s_mel(λ) Δλ / K_mel,v^D65
 * so a source's closed-eye melanopic EDI is its open-eye value times the eyelid's melanopic
 * transmittance for that spectrum, τ_mel,lid = mel-EDI(E·T_lid) / mel-EDI(E).
 *
 * T_lid(λ): anchor values in model/data/eyelid/closed_eyelid_transmittance_adult.csv (Ando &
 * Kripke 1996 Biol Psychiatry 39:22, blue/green 0.3 %, red 5.6 %; Robinson, Bayliss & Fielder
 * 1991 Vision Res 31:1837, 14.5 % at 700 nm), interpolated linearly in optical density
 * D = −log10 T between anchors and held beyond the first and last (the file's header says
 * where each anchor comes from). The eyelid is a red-pass filter; across the melanopic band
 * (≈ 420–600 nm) it passes about 0.3 %. Individual eyelids differ by about a factor of ten
 * (Bierman, Figueiro & Rea 2011 J Biomed Opt 16:067011: optical density range ≈ 1.0).
 */
import { datasetColumn } from '../data/datasets.js';
import { alphaOpicIrradiance_W_m2 } from './alpha-opic.js';
import { applyTransmittance, type Spectrum, type Transmittance } from './spectrum.js';
import { GRID_LENGTH, gridWavelength_nm } from './wavelength-grid.js';

export const EYELID_DATASET = 'eyelid/closed_eyelid_transmittance_adult.csv';

let cached: Transmittance | undefined;

/** Closed-eyelid transmittance on the canonical grid (linear in optical density between the anchors). */
export function eyelidTransmittance(): Transmittance {
  if (cached === undefined) {
    const wl = datasetColumn(EYELID_DATASET, 'wavelength_nm');
    const od = Array.from(datasetColumn(EYELID_DATASET, 'transmittance'), (t) => -Math.log10(t));
    const values = new Float64Array(GRID_LENGTH);
    let k = 0;
    for (let i = 0; i < GRID_LENGTH; i++) {
      const l = gridWavelength_nm(i);
      while (k + 1 < wl.length - 1 && l > (wl[k + 1] as number)) k++;
      const l0 = wl[k] as number;
      const l1 = wl[k + 1] as number;
      const f = Math.min(1, Math.max(0, (l - l0) / (l1 - l0)));
      const d = (od[k] as number) + f * ((od[k + 1] as number) - (od[k] as number));
      values[i] = 10 ** -d;
    }
    cached = { values, label: 'closed eyelid, adult mean (Ando & Kripke 1996; Robinson et al. 1991)' };
  }
  return cached;
}

/**
 * Melanopic transmittance of the closed eyelids for light of spectrum `s` (ratio of melanopic
 * EDI behind and in front of the eyelids, 0–1). Give `s` as it reaches the eye (after eyewear
 * and, for an aged observer, with the lens correction applied): the ratio is then the one that
 * turns that observer's open-eye melanopic EDI into the closed-eye value. 0 for a spectrum with no
 * melanopic content.
 */
export function eyelidMelanopicTransmittance(s: Spectrum): number {
  const open = alphaOpicIrradiance_W_m2(s, 'mel');
  if (!(open > 0)) return 0;
  return alphaOpicIrradiance_W_m2(applyTransmittance(s, eyelidTransmittance()), 'mel') / open;
}
