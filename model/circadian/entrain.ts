/**
 * Entrained initial state: repeat day 0's light (and sleep) for as many days as needed until the
 * daily phase marker moves by less than ENTRAIN_MARKER_TOL_H and the amplitude at midnight by less
 * than ENTRAIN_AMPLITUDE_TOL (and the sleep pressure by less than ENTRAIN_PRESSURE_TOL_NM), at most ENTRAIN_MAX_DAYS days (common
 * convergence rule: 1 min and 1e-4, cap ≈ 100 days). The returned state is rebased to
 * t = 0 (local midnight of day 0).
 */
import type { LightSeries } from './light-series.js';
import type { Pacemaker } from './pacemaker.js';
import { repeatDaily, type SleepEpisode, type SleepSpec } from './sleep-input.js';
import { simulate, stateFromPacemaker, type SimState } from './simulate.js';
import type { Integrator } from '../solver/integrator.js';

export const ENTRAIN_MARKER_TOL_H = 1 / 60;
export const ENTRAIN_AMPLITUDE_TOL = 1e-4;
/** Change of the sleep pressure at midnight between days (nM); its 59 h time constant is the slowest. */
export const ENTRAIN_PRESSURE_TOL_NM = 1e-3;
export const ENTRAIN_MAX_DAYS = 100;
/** Minimum number of repeated days before convergence is tested (transients from the seed). */
export const ENTRAIN_MIN_DAYS = 5;

export interface EntrainOptions {
  readonly model: Pacemaker;
  /** Light of day 0 (only [0, 24) is used, repeated). */
  readonly light: LightSeries;
  /** Light of day 0 behind closed eyelids (only [0, 24) is used, repeated); default light × eyelid transmission. */
  readonly lightEyesClosed?: LightSeries;
  /** Sleep of day 0: prescribed episodes within [0, 24) (may run past 24 h), or free (with day 0's wake windows). */
  readonly sleep: SleepSpec;
  readonly lightSensitivity?: number;
  readonly eyelidTransmission?: number;
  readonly integrator?: Integrator;
}

export interface EntrainResult {
  readonly state: SimState;
  readonly days: number;
  readonly converged: boolean;
  /** Marker (x minimum) of the last repeated day, h after its midnight. */
  readonly lastMarker_h: number;
}

/** Episodes of day 0 wrapped onto the 24 h clock (an episode crossing midnight is split). */
export function dailySleepPattern(episodes: readonly SleepEpisode[]): SleepEpisode[] {
  const out: SleepEpisode[] = [];
  for (const e of episodes) {
    if (e.start_h >= 24) continue;
    const s = e.start_h;
    const en = Math.min(e.end_h, s + 24);
    if (en <= 24) out.push({ start_h: Math.max(0, s), end_h: en });
    else {
      out.push({ start_h: s, end_h: 24 });
      out.push({ start_h: 0, end_h: en - 24 });
    }
  }
  const merged: SleepEpisode[] = [];
  for (const e of out.sort((a, b) => a.start_h - b.start_h)) {
    const last = merged[merged.length - 1];
    if (last !== undefined && e.start_h <= last.end_h) merged[merged.length - 1] = { start_h: last.start_h, end_h: Math.max(last.end_h, e.end_h) };
    else merged.push(e);
  }
  return merged;
}

function rebase(s: SimState, by_h: number): SimState {
  return {
    ...s,
    t_h: s.t_h - by_h,
    melatonin: { ...s.melatonin, since_h: s.melatonin.since_h - by_h },
    pendingSwitches: s.pendingSwitches.map((p) => ({ t_h: p.t_h - by_h, on: p.on })),
  };
}

/** Day 0 of a sleep spec wrapped onto the 24 h clock: prescribed episodes, or a free sleeper's wake windows. */
export function daySleepSpec(sleep: SleepSpec): SleepSpec {
  if (sleep.mode === 'prescribed') return { mode: 'prescribed', episodes: dailySleepPattern(sleep.episodes) };
  return sleep.wakeWindows === undefined ? sleep : { ...sleep, wakeWindows: dailySleepPattern(sleep.wakeWindows) };
}

export function entrain(opts: EntrainOptions): EntrainResult {
  const pattern = opts.sleep.mode === 'prescribed' ? dailySleepPattern(opts.sleep.episodes) : [];
  const windows = opts.sleep.mode === 'free' && opts.sleep.wakeWindows !== undefined ? dailySleepPattern(opts.sleep.wakeWindows) : undefined;
  const sleepFor = (day: number): SleepSpec => {
    if (opts.sleep.mode === 'prescribed') return { mode: 'prescribed', episodes: repeatDaily(pattern, day, day + 1) };
    return windows === undefined ? opts.sleep : { ...opts.sleep, wakeWindows: windows.length === 0 ? [] : repeatDaily(windows, day, day + 1) };
  };
  const asleepAtMidnight = pattern.some((e) => e.start_h <= 0 && e.end_h > 0);
  let state = stateFromPacemaker(opts.model, opts.model.seedState, opts.sleep, 0, !asleepAtMidnight);
  let prevMarker = Number.NaN;
  let prevAmp = Number.NaN;
  let prevPressure = Number.NaN;
  let lastMarker = Number.NaN;
  for (let day = 0; day < ENTRAIN_MAX_DAYS; day++) {
    const run = simulate({
      model: opts.model,
      light: opts.light,
      ...(opts.lightEyesClosed === undefined ? {} : { lightEyesClosed: opts.lightEyesClosed }),
      periodicLight: true,
      sleep: sleepFor(day),
      initial: state,
      end_h: 24 * (day + 1),
      ...(opts.lightSensitivity === undefined ? {} : { lightSensitivity: opts.lightSensitivity }),
      ...(opts.eyelidTransmission === undefined ? {} : { eyelidTransmission: opts.eyelidTransmission }),
      ...(opts.integrator === undefined ? {} : { integrator: opts.integrator }),
    });
    state = run.final;
    const m = run.xmin_h[run.xmin_h.length - 1];
    const marker = m === undefined ? Number.NaN : m - 24 * day;
    const amp = opts.model.amplitude(state.y);
    const pressure = state.homeostat_nM;
    lastMarker = marker;
    if (day >= ENTRAIN_MIN_DAYS) {
      const dm = Math.abs(marker - prevMarker);
      const markerMoved = Math.min(dm, 24 - dm);
      if (markerMoved < ENTRAIN_MARKER_TOL_H && Math.abs(amp - prevAmp) < ENTRAIN_AMPLITUDE_TOL && Math.abs(pressure - prevPressure) < ENTRAIN_PRESSURE_TOL_NM) {
        return { state: rebase(state, 24 * (day + 1)), days: day + 1, converged: true, lastMarker_h: marker };
      }
    }
    prevMarker = marker;
    prevAmp = amp;
    prevPressure = pressure;
  }
  return { state: rebase(state, 24 * ENTRAIN_MAX_DAYS), days: ENTRAIN_MAX_DAYS, converged: false, lastMarker_h: lastMarker };
}
