/**
 * CIE S 026:2018 quantities of a spectrum (all sums over 380–780 nm at 1 nm, Δλ = 1 nm):
 *   E_v        = K_m Σ E_e,λ V(λ) Δλ                 photopic illuminance (lx), K_m = 683.002 lm/W
 *   E_e,α      = Σ E_e,λ s_α(λ) Δλ                   α-opic irradiance (W/m², reported in mW/m²)
 *   K_α,v      = E_e,α / E_v                         α-opic ELR (W/lm, reported in mW/lm)
 *   DER_α      = K_α,v / K_α,v^D65                   α-opic daylight (D65) efficacy ratio
 *   EDI_α      = E_e,α / K_α,v^D65 = DER_α · E_v     α-opic equivalent daylight (D65) illuminance (lx)
 * K_α,v^D65 is computed from the same tables with the same summation rule, so that D65 gives
 * DER = 1 exactly; rounded, it equals the published constants (checked in tests).
 */
import { ALPHA_OPIC_KEYS, actionSpectra, photopicV, type AlphaOpicKey } from './action-spectra.js';
import { datasetColumn } from '../data/datasets.js';
import { resampleLinear } from './resample.js';
import { applyTransmittance, scaleSpectrum, spectrum, type Spectrum, type Transmittance } from './spectrum.js';
import { GRID_LENGTH, GRID_STEP_NM } from './wavelength-grid.js';

/** Maximum luminous efficacy of photopic vision, lm/W (CIE; 683 lm/W at 540 THz ≙ 683.002 at 555 nm). */
export const KM_LM_PER_W = 683.002;

export interface AlphaOpicQuantity {
  readonly irradiance_mW_m2: number;
  readonly edi_lx: number;
  readonly der: number;
  readonly elr_mW_lm: number;
}

export interface AlphaOpicResult {
  readonly illuminance_lx: number;
  readonly alpha_opic: Readonly<Record<AlphaOpicKey, AlphaOpicQuantity>>;
}

function weightedSum(values: Float64Array, weight: Float64Array): number {
  let s = 0;
  for (let i = 0; i < GRID_LENGTH; i++) s += (values[i] as number) * (weight[i] as number);
  return s * GRID_STEP_NM;
}

/** Photopic illuminance (lx) of a spectral irradiance (W·m⁻²·nm⁻¹); for a relative SPD, relative lux. */
export function photopicIlluminance_lx(s: Spectrum): number {
  return KM_LM_PER_W * weightedSum(s.values, photopicV());
}

/** α-opic irradiance E_e,α in W/m². */
export function alphaOpicIrradiance_W_m2(s: Spectrum, key: AlphaOpicKey): number {
  return weightedSum(s.values, actionSpectra()[key]);
}

let cachedD65Efficacy: Record<AlphaOpicKey, number> | undefined;

/** CIE standard illuminant D65 (relative, 100 at 560 nm) on the canonical grid. */
export function illuminantD65(): Spectrum {
  const t = 'spectra/cie_illuminant_D65_1nm.csv';
  return spectrum(resampleLinear(datasetColumn(t, 'wavelength_nm'), datasetColumn(t, 'D65')).values, false);
}

/** K_α,v^D65 in W/lm, computed from the tables (CIE S 026:2018 definition). */
export function d65Efficacy_W_lm(): Readonly<Record<AlphaOpicKey, number>> {
  if (cachedD65Efficacy === undefined) {
    const d65 = illuminantD65();
    const ev = photopicIlluminance_lx(d65);
    const out = {} as Record<AlphaOpicKey, number>;
    for (const k of ALPHA_OPIC_KEYS) out[k] = alphaOpicIrradiance_W_m2(d65, k) / ev;
    cachedD65Efficacy = out;
  }
  return cachedD65Efficacy;
}

export interface AlphaOpicOptions {
  /**
   * Transmittance applied at the eye before the α-opic weighting only, e.g. the observer's lens
   * relative to the 32-year-old reference observer (lens-aging.ts). Photopic illuminance stays
   * that of the standard observer; K_α,v^D65 stays the standard value (CIE S 026:2018).
   */
  readonly eyeTransmittance?: Transmittance;
}

/** All CIE S 026 quantities of a spectrum. A relative spectrum gives DER and ELR meaningfully; its lux are relative. */
export function alphaOpicQuantities(s: Spectrum, options: AlphaOpicOptions = {}): AlphaOpicResult {
  const ev = photopicIlluminance_lx(s);
  const k65 = d65Efficacy_W_lm();
  const atEye = options.eyeTransmittance === undefined ? s : applyTransmittance(s, options.eyeTransmittance);
  const out = {} as Record<AlphaOpicKey, AlphaOpicQuantity>;
  for (const k of ALPHA_OPIC_KEYS) {
    const e = alphaOpicIrradiance_W_m2(atEye, k);
    const elr = ev > 0 ? e / ev : Number.NaN;
    out[k] = {
      irradiance_mW_m2: e * 1000,
      edi_lx: e / k65[k],
      der: ev > 0 ? elr / k65[k] : Number.NaN,
      elr_mW_lm: elr * 1000,
    };
  }
  return { illuminance_lx: ev, alpha_opic: out };
}

/** The spectrum scaled to a photopic illuminance (lx); the result is absolute (W·m⁻²·nm⁻¹). */
export function scaleToIlluminance(s: Spectrum, target_lx: number): Spectrum {
  const ev = photopicIlluminance_lx(s);
  if (!(ev > 0)) throw new Error('cannot scale a spectrum with zero photopic illuminance (no power in 380–780 nm weighted by V(λ))');
  const scaled = scaleSpectrum(s, target_lx / ev);
  return { values: scaled.values, absolute: true };
}

/** Melanopic (and other α-opic) DER of a relative spectrum: α-opic EDI per photopic lux. */
export function alphaOpicDer(s: Spectrum, options: AlphaOpicOptions = {}): Readonly<Record<AlphaOpicKey, number>> {
  const q = alphaOpicQuantities(s, options).alpha_opic;
  return { sc: q.sc.der, mc: q.mc.der, lc: q.lc.der, rh: q.rh.der, mel: q.mel.der };
}
