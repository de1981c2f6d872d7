/**
 * Electric lighting at the eye.
 *
 * Eye illuminance of a luminaire group at full output is given directly (lx on the vertical eye
 * plane) or as a horizontal desk illuminance times an eye/desk ratio. The default ratio 0.5 is the
 * uniform-ceiling result (vertical plane sees half the cosine-weighted hemisphere of a uniformly
 * luminous ceiling: πL/2 vs πL), and lies in the 0.3–0.6 range quoted as common practice for
 * ceiling-recessed office luminaires (from memory).
 *
 * Output is proportional to the scheduled level (LED output ∝ drive level,
 * from memory). Tunable white mixes a warm and a cool channel; the cool channel's share f of
 * photopic lux is the one the source library's tunable-white mix finds for the scheduled CCT
 * (model/sources/tunable-white.ts: tristimulus values add, Ohno 2014 CCT), and every α-opic EDI
 * is the lux-weighted sum of the channels' responses (exact, linear).
 *
 * Daylight-linked dimming (closed loop on the desk, common practice): the level is lowered so that
 * daylight + electric light on the desk meets the target, never below `minimumLevel` while the
 * schedule has the lights on:  level = min(scheduled, max(minimum, (E_target − E_daylight,desk)/E_desk,full)).
 */
import type { Spectrum, Transmittance } from '../photometry/spectrum.js';
import { tunableWhiteMix } from '../sources/tunable-white.js';
import { expandDailySchedule, type DailySchedule } from './daily-schedule.js';
import { SceneInputError, requireFraction, requireNonNegative, requirePositive } from './scene-input-error.js';
import { sourceResponse, type SourceResponse } from './source-response.js';

export interface LuminaireSetting {
  /** Output fraction 0–1 (0 = off). */
  readonly level: number;
  /** Target CCT for tunable white (K); ignored for a single-channel luminaire. */
  readonly cct_K?: number;
}

export interface LuminaireSpec {
  readonly name: string;
  /** Source spectrum of a single-channel luminaire (relative or absolute). */
  readonly spectrum?: Spectrum;
  /** Warm and cool channel spectra of a tunable-white luminaire. */
  readonly tunable?: { readonly warm: Spectrum; readonly cool: Spectrum };
  /** Photopic illuminance on the vertical eye plane at full output (lx). */
  readonly eyeAtFullOutput_lx?: number;
  /** Horizontal desk illuminance at full output (lx); the eye gets eyeToDeskRatio × this. */
  readonly deskAtFullOutput_lx?: number;
  /** Eye (vertical) / desk (horizontal) illuminance ratio; default 0.5. */
  readonly eyeToDeskRatio?: number;
  readonly schedule: DailySchedule<LuminaireSetting>;
  readonly daylightDimming?: { readonly deskTarget_lx: number; readonly minimumLevel?: number };
}

export const DEFAULT_EYE_TO_DESK_RATIO = 0.5;

export interface PreparedLuminaire {
  readonly name: string;
  readonly eyeFull_lx: number;
  readonly deskFull_lx: number;
  /** Scheduled level and cool-channel lux share per minute of the day (length 1440). */
  readonly level: Float64Array;
  readonly coolShare: Float64Array;
  readonly dimming: { readonly target_lx: number; readonly minimum: number } | undefined;
  /** Channel responses [warm/single, cool] without and with eyewear. */
  readonly responses: readonly [readonly SourceResponse[], readonly SourceResponse[]];
}

/** Cool-channel share of photopic lux that gives the mix the target CCT; throws RangeError outside the channels' range. */
export function coolShareForCct(warm: Spectrum, cool: Spectrum, target_K: number): number {
  return tunableWhiteMix(warm, cool, target_K, 1).coolFraction;
}

export function prepareLuminaire(field: string, spec: LuminaireSpec, eyewear: Transmittance | undefined): PreparedLuminaire {
  const single = spec.spectrum;
  const tunable = spec.tunable;
  if ((single === undefined) === (tunable === undefined)) throw new SceneInputError(`${field}`, 'needs exactly one of spectrum or tunable');
  const ratio = spec.eyeToDeskRatio ?? DEFAULT_EYE_TO_DESK_RATIO;
  requirePositive(`${field}.eyeToDeskRatio`, ratio);
  let eyeFull: number;
  let deskFull: number;
  if (spec.eyeAtFullOutput_lx !== undefined) {
    eyeFull = requireNonNegative(`${field}.eyeAtFullOutput_lx`, spec.eyeAtFullOutput_lx);
    deskFull = spec.deskAtFullOutput_lx !== undefined ? requireNonNegative(`${field}.deskAtFullOutput_lx`, spec.deskAtFullOutput_lx) : eyeFull / ratio;
  } else if (spec.deskAtFullOutput_lx !== undefined) {
    deskFull = requireNonNegative(`${field}.deskAtFullOutput_lx`, spec.deskAtFullOutput_lx);
    eyeFull = deskFull * ratio;
  } else throw new SceneInputError(`${field}.eyeAtFullOutput_lx`, 'give eyeAtFullOutput_lx or deskAtFullOutput_lx');
  spec.schedule.forEach((e, i) => {
    requireFraction(`${field}.schedule[${i}].value.level`, e.value.level);
    if (e.value.cct_K !== undefined) requirePositive(`${field}.schedule[${i}].value.cct_K`, e.value.cct_K);
  });
  const settings = expandDailySchedule(`${field}.schedule`, spec.schedule);
  const shareByCct = new Map<number, number>();
  if (tunable !== undefined) {
    spec.schedule.forEach((e, i) => {
      const cct = e.value.cct_K;
      if (cct === undefined || shareByCct.has(cct)) return;
      try {
        shareByCct.set(cct, coolShareForCct(tunable.warm, tunable.cool, cct));
      } catch (err) {
        throw new SceneInputError(`${field}.schedule[${i}].value.cct_K`, err instanceof Error ? err.message : String(err));
      }
    });
  }
  const level = new Float64Array(settings.length);
  const coolShare = new Float64Array(settings.length);
  settings.forEach((s, m) => {
    level[m] = s.level;
    // Tunable white without a CCT setting: equal lux from both channels.
    coolShare[m] = tunable === undefined ? 0 : s.cct_K !== undefined ? (shareByCct.get(s.cct_K) as number) : 0.5;
  });
  let dimming: PreparedLuminaire['dimming'];
  if (spec.daylightDimming !== undefined) {
    const target = requireNonNegative(`${field}.daylightDimming.deskTarget_lx`, spec.daylightDimming.deskTarget_lx);
    const minimum = requireFraction(`${field}.daylightDimming.minimumLevel`, spec.daylightDimming.minimumLevel ?? 0.1);
    dimming = { target_lx: target, minimum };
  }
  const channels = tunable !== undefined ? [tunable.warm, tunable.cool] : [single as Spectrum];
  const plain = channels.map((s) => sourceResponse(s, []));
  const filtered = eyewear !== undefined ? channels.map((s) => sourceResponse(s, [eyewear])) : plain;
  return { name: spec.name, eyeFull_lx: eyeFull, deskFull_lx: deskFull, level, coolShare, dimming, responses: [plain, filtered] };
}

/** Effective output level this minute, after daylight-linked dimming. */
export function luminaireLevel(l: PreparedLuminaire, minuteOfDay: number, daylightDesk_lx: number): number {
  const scheduled = l.level[minuteOfDay] as number;
  if (scheduled <= 0 || l.dimming === undefined || !(l.deskFull_lx > 0)) return scheduled;
  const needed = (l.dimming.target_lx - daylightDesk_lx) / l.deskFull_lx;
  return Math.min(scheduled, Math.max(l.dimming.minimum, needed));
}
