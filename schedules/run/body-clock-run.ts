/**
 * The body-clock models for one persona under one strategy (model/circadian): pacemaker
 * (default DEFAULT_PACEMAKER_ID of model/circadian/registry.ts), St Hilaire 2007 melatonin and
 * suppression, Postnova 2018 sleep pressure and KSS. Light input: melanopic EDI at the eye,
 * merged into segments (light-segments.ts), at the open eye while awake and behind the closed
 * eyelids while asleep (eye-series.ts computes both per source). Sleep: the timeline's prescribed
 * sleep ("asleep" slices), or free (model-predicted) for personas with free sleep, held awake
 * during work and travel (the timeline's "awake" slices; product rule, like an alarm).
 * Initial state: entrained to the persona's baseline day 0 (light and sleep repeated), shared
 * by every strategy of that persona so that phase shifts compare like with like.
 * Times in real hours since the run start (local midnight of day 0).
 */
import { hourlyKss } from '../../model/circadian/body-clock.js';
import { dlmoTimes, nightlySuppression } from '../../model/circadian/melatonin-nights.js';
import { daySleepSpec, entrain } from '../../model/circadian/entrain.js';
import type { LightSeries } from '../../model/circadian/light-series.js';
import type { MelatoninNight } from '../../model/circadian/melatonin-pass.js';
import type { Pacemaker } from '../../model/circadian/pacemaker.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID, type PacemakerId } from '../../model/circadian/registry.js';
import { normalisedEpisodes, type SleepEpisode, type SleepSpec } from '../../model/circadian/sleep-input.js';
import { simulate, type SimState, type SimulationRun } from '../../model/circadian/simulate.js';
import type { Persona } from '../schema/scenario-types.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import { DEFAULT_SEGMENT_REL_TOL, dyadicHours, mergedLightSeries } from './light-segments.js';

/**
 * Absolute merging tolerance for light behind closed eyelids (lx): the open-eye tolerance (1 lx)
 * times ≈ 1 %, so that the few lux that pass the eyelids (≈ 0.3 % of the open-eye value) are not
 * averaged away.
 */
export const CLOSED_EYE_SEGMENT_ABS_TOL_LX = 0.01;

export interface BodyClockOutcome {
  readonly cbtmin_h: number[];
  /** Dim-light melatonin onset per night (10 pg/mL of the curve without suppression; model/circadian/melatonin-nights.ts). */
  readonly dlmo_h: number[];
  readonly nights: MelatoninNight[];
  /** Suppression per night over the awake hours of the dim-light biological night (%), null where the night is cut off by the end of the run. */
  readonly suppression_pct: (number | null)[];
  readonly sleepEpisodes: SleepEpisode[];
  /** KSS samples (every 0.25 h; NaN asleep). */
  readonly kssSamples: { readonly t_h: number[]; readonly kss: number[] };
  /** Mean KSS per real hour of the run while awake; null asleep. */
  readonly kssHourly: (number | null)[];
  readonly segments: number;
}

/** Prescribed sleep episodes (h) of a timeline: its "asleep" slices, touching ones joined. */
export function prescribedSleep(timeline: ExposureTimeline): SleepEpisode[] {
  const eps = timeline.slices.filter((s) => s.sleep === 'asleep').map((s) => ({ start_h: dyadicHours(s.start_min), end_h: dyadicHours(s.end_min) }));
  return eps.length === 0 ? [] : normalisedEpisodes(eps);
}

/** Spans (h) in which a free sleeper is held awake: the timeline's "awake" slices (work and travel), touching ones joined. */
export function wakeWindows(timeline: ExposureTimeline): SleepEpisode[] {
  const eps = timeline.slices.filter((s) => s.sleep === 'awake').map((s) => ({ start_h: dyadicHours(s.start_min), end_h: dyadicHours(s.end_min) }));
  return eps.length === 0 ? [] : normalisedEpisodes(eps, 'wake window');
}

export function sleepSpecFor(persona: Persona, timeline: ExposureTimeline): SleepSpec {
  if (persona.sleep.mode === 'free') return { mode: 'free', wakeWindows: wakeWindows(timeline) };
  return { mode: 'prescribed', episodes: prescribedSleep(timeline) };
}

export function pacemakerFor(persona: Persona, modelId: PacemakerId = DEFAULT_PACEMAKER_ID): Pacemaker {
  return createPacemaker(modelId, { tau_h: persona.intrinsicPeriod_h, lightSensitivity: persona.lightSensitivity });
}

const entrainCache = new Map<string, SimState>();

/** Forget cached entrained states (benchmarks measure runs without them). */
export function clearEntrainCache(): void {
  entrainCache.clear();
}

/** The first 24 h of a light series as a cache key. */
function dayKey(light: LightSeries | undefined): unknown {
  if (light === undefined) return null;
  let k = 0;
  while (k < light.start_h.length && (light.start_h[k] ?? 0) < 24) k++;
  return [Array.from(light.start_h.subarray(0, k)), Array.from(light.level.subarray(0, k)), light.level[k] ?? null];
}

/**
 * Entrained state from the first 24 h of light (open eyes, and closed eyelids when given) and
 * sleep, repeated (cached by model, person and that day).
 */
export function entrainedStart(model: Pacemaker, light: LightSeries, sleep: SleepSpec, lightEyesClosed?: LightSeries): SimState {
  const daySleep = daySleepSpec(sleep);
  const key = JSON.stringify([model.id, model.tau_h, model.lightSensitivity, daySleep, dayKey(light), dayKey(lightEyesClosed)]);
  let state = entrainCache.get(key);
  if (state === undefined) {
    state = entrain({ model, light, sleep: daySleep, ...(lightEyesClosed === undefined ? {} : { lightEyesClosed }) }).state;
    if (entrainCache.size >= 64) entrainCache.clear();
    entrainCache.set(key, state);
  }
  return state;
}

/** Segments of the light behind closed eyelids: the same merging, with an absolute tolerance scaled to its lower levels. */
export function closedEyeLightSeries(melClosed_lx: ArrayLike<number>): LightSeries {
  return mergedLightSeries(melClosed_lx, DEFAULT_SEGMENT_REL_TOL, CLOSED_EYE_SEGMENT_ABS_TOL_LX);
}

/**
 * Body-clock run over the timeline. `melClosed_lx` is the per-minute light behind closed eyelids
 * (eye-series.ts); without it the model's default eyelid transmission scales `mel_lx` in sleep.
 */
export function runBodyClockFor(model: Pacemaker, mel_lx: Float64Array, sleep: SleepSpec, initial: SimState | undefined, total_min: number, melClosed_lx?: Float64Array): { outcome: BodyClockOutcome; run: SimulationRun; light: LightSeries } {
  const light = mergedLightSeries(mel_lx);
  const lightEyesClosed = melClosed_lx === undefined ? undefined : closedEyeLightSeries(melClosed_lx);
  const init = initial ?? entrainedStart(model, light, sleep, lightEyesClosed);
  const end_h = total_min / 60;
  const run = simulate({ model, light, ...(lightEyesClosed === undefined ? {} : { lightEyesClosed }), sleep, initial: init, end_h });
  const hours = Math.ceil(end_h - 1e-9);
  return {
    outcome: {
      cbtmin_h: run.cbtmin_h,
      dlmo_h: dlmoTimes(run.nights),
      nights: run.nights,
      suppression_pct: nightlySuppression(run.nights),
      sleepEpisodes: run.sleepEpisodes,
      kssSamples: { t_h: run.samples.t_h, kss: run.samples.kss },
      kssHourly: hourlyKss(run, hours),
      segments: light.start_h.length,
    },
    run,
    light,
  };
}
