/**
 * Spectra of the scenario's light sources and their response at the eye: photopic lux and
 * melanopic EDI per photopic lux (the melanopic DER, CIE S 026:2018), for the standard
 * observer and with the age-dependent lens correction (CIE S 026 / CIE 203:2012 via
 * model/photometry/lens-aging.ts). Spectra:
 *   electric "cct": phosphor-converted LED of that CCT (model/sources, 2200–8000 K, clamped);
 *   electric "tunable": a phosphor LED at the scheduled target CCT (the two channels' mixture is
 *     approximated by the single-CCT LED of the same CCT — documented in docs/methods/pipeline.md);
 *   "library": the source library spectrum;
 *   screens: the default three-primary display (model/sources/display.ts) with its white point
 *     moved to the Planckian locus at the screen's CCT; night mode at the night CCT;
 *   daylight: CIE D-series at the sky CCT (4000–25000 K).
 */
import { alphaOpicQuantities } from '../../model/photometry/alpha-opic.js';
import { eyelidMelanopicTransmittance } from '../../model/photometry/eyelid-transmittance.js';
import { uv1960ToXy } from '../../model/photometry/colorimetry.js';
import { planckianUv } from '../../model/photometry/cct-ohno.js';
import { lensTransmittanceRelativeTo32 } from '../../model/photometry/lens-aging.js';
import { applyTransmittance, type Spectrum } from '../../model/photometry/spectrum.js';
import { cieDaylightSpectrum, DAYLIGHT_CCT_MAX_K, DAYLIGHT_CCT_MIN_K } from '../../model/sources/cie-daylight.js';
import { defaultDisplayModel, displayWhite } from '../../model/sources/display.js';
import { PHOSPHOR_LED_CCT_MAX_K, PHOSPHOR_LED_CCT_MIN_K, phosphorLedSpectrum } from '../../model/sources/phosphor-led.js';
import { sourceSpectrum } from '../../model/sources/source-library.js';
import type { SpectrumRef } from '../schema/scenario-types.js';

/** Melanopic EDI per photopic lux, and the lens factor for a given age, of one spectrum. */
export interface MelResponse {
  /** Melanopic DER (melanopic EDI / photopic lux), reference observer. */
  readonly melDer: number;
  /** Melanopic EDI of the aged (or younger) lens relative to the 32-year reference, same spectrum. */
  readonly lensFactor: number;
  /**
   * Melanopic EDI behind closed eyelids relative to the open eye, for this observer (lens of
   * their age) and spectrum (model/photometry/eyelid-transmittance.ts).
   */
  readonly eyelidFactor: number;
}

const cache = new Map<string, MelResponse>();

function respond(key: string, age_y: number, build: () => Spectrum): MelResponse {
  const k = `${key}|${age_y}`;
  let r = cache.get(k);
  if (r === undefined) {
    const s = build();
    const ref = alphaOpicQuantities(s);
    const ev = ref.illuminance_lx;
    const mel = ref.alpha_opic.mel.edi_lx;
    const agedSpectrum = applyTransmittance(s, lensTransmittanceRelativeTo32(Math.min(100, Math.max(1, age_y))));
    const aged = alphaOpicQuantities(agedSpectrum).alpha_opic.mel.edi_lx;
    r = { melDer: ev > 0 ? mel / ev : 0, lensFactor: mel > 0 ? aged / mel : 1, eyelidFactor: eyelidMelanopicTransmittance(agedSpectrum) };
    if (cache.size < 4096) cache.set(k, r);
  }
  return r;
}

const clampLed = (cct: number) => Math.round(Math.min(PHOSPHOR_LED_CCT_MAX_K, Math.max(PHOSPHOR_LED_CCT_MIN_K, cct)) / 50) * 50;

/** Electric light: `targetCct_K` is the schedule's CCT for tunable luminaires. */
export function electricResponse(ref: SpectrumRef, targetCct_K: number | undefined, age_y: number): MelResponse {
  if (ref.kind === 'library') return respond(`lib:${ref.sourceId}`, age_y, () => sourceSpectrum(ref.sourceId));
  const cct = ref.kind === 'cct' ? ref.cct_K : (targetCct_K ?? Math.sqrt(ref.warm_K * ref.cool_K));
  const k = clampLed(ref.kind === 'tunable' ? Math.min(Math.max(cct, Math.min(ref.warm_K, ref.cool_K)), Math.max(ref.warm_K, ref.cool_K)) : cct);
  return respond(`led:${k}`, age_y, () => phosphorLedSpectrum(k));
}

function displayAt(cct_K: number): Spectrum {
  const c = Math.round(Math.min(10000, Math.max(1900, cct_K)) / 100) * 100;
  const model = { ...defaultDisplayModel(), whitePoint: uv1960ToXy(planckianUv(c)) };
  return displayWhite(model, 'normal').unitSpectrum;
}

/** A screen's white, or its night colour at `nightCct_K`. */
export function screenResponse(ref: SpectrumRef, nightCct_K: number | undefined, age_y: number): MelResponse {
  if (nightCct_K !== undefined) return respond(`screen:${Math.round(nightCct_K / 100)}`, age_y, () => displayAt(nightCct_K));
  if (ref.kind === 'library') return respond(`lib:${ref.sourceId}`, age_y, () => sourceSpectrum(ref.sourceId));
  const cct = ref.kind === 'cct' ? ref.cct_K : ref.cool_K;
  return respond(`screen:${Math.round(cct / 100)}`, age_y, () => displayAt(cct));
}

/** CIE daylight at a CCT (rounded to 250 K). */
export function daylightResponse(cct_K: number, age_y: number): MelResponse {
  const c = Math.round(Math.min(DAYLIGHT_CCT_MAX_K, Math.max(DAYLIGHT_CCT_MIN_K, Number.isFinite(cct_K) ? cct_K : 6504)) / 250) * 250;
  return respond(`day:${c}`, age_y, () => cieDaylightSpectrum(c));
}
