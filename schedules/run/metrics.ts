/**
 * Metrics per day and per strategy from the light at the eye and the body-clock outcome.
 * Light thresholds after Brown et al. 2022, PLOS Biology 20(3):e3001571 (recommendations for
 * daytime, evening and night-time indoor light): daytime ≥ 250 lx melanopic EDI, the 3 h before
 * sleep ≤ 10 lx, the sleep environment ≤ 1 lx. KSS ≥ 7 "sleepy" (Åkerstedt & Gillberg 1990
 * scale; threshold common practice, model/circadian KSS_SLEEPY). Phase shift: strategy CBTmin
 * minus the nearest baseline CBTmin (within 12 h); phase angle: main-sleep onset minus the DLMO
 * before it. A day is the local calendar day (23 or 25 h on clock-change days).
 * Melanopic doses count the light that reaches the eye: at the open eye awake, behind the closed
 * eyelids asleep (received-light.ts); the sleep-environment figure (≤ 1 lx) is the room's light
 * at the open eye, as Brown et al. state it.
 */
import { DLMO_BEFORE_CBTMIN_H } from '../../model/circadian/body-clock.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import { alignmentSummary } from './alignment.js';
import type { BodyClockOutcome } from './body-clock-run.js';
import type { EyeSeries, LightSource } from './eye-series.js';
import { LIGHT_SOURCES } from './eye-series.js';
import { localIsoAt, type LocalClock } from './local-clock.js';
import { asleepMinutes, receivedMel } from './received-light.js';
import type { DayMetrics, EventTime, SourceMap, StrategyResult, StrategySummary } from './results-types.js';

export const DAYTIME_MEL_EDI_LX = 250;
export const PRE_SLEEP_MEL_EDI_LX = 10;
export const PRE_SLEEP_WINDOW_H = 3;
export const SLEEP_MEL_EDI_LX = 1;
export const KSS_SLEEPY = 7;
/** Sleep episodes shorter than this are naps, not the day's main sleep (h; common practice). */
export const MAIN_SLEEP_MIN_H = 3;
/** Days at the end of the run over which the phase shift is averaged. */
export const PHASE_SHIFT_LAST_DAYS = 7;

const round = (v: number, d = 3) => {
  const f = 10 ** d;
  return Math.round(v * f) / f;
};
const roundOrNull = (v: number | null | undefined, d = 3) => (v === null || v === undefined || !Number.isFinite(v) ? null : round(v, d));
const mean = (xs: readonly number[]) => (xs.length === 0 ? null : xs.reduce((a, b) => a + b, 0) / xs.length);

function meanOver(a: Float64Array, from: number, to: number): number | null {
  const s = Math.max(0, from);
  const e = Math.min(a.length, to);
  if (e <= s) return null;
  let sum = 0;
  for (let i = s; i < e; i++) sum += a[i] ?? 0;
  return sum / (e - s);
}

function hourlyMeans(a: Float64Array, hours: number): number[] {
  const out: number[] = [];
  for (let h = 0; h < hours; h++) out.push(round(meanOver(a, h * 60, (h + 1) * 60) ?? 0, 2));
  return out;
}

export interface StrategyInput {
  readonly id: string;
  readonly name: string;
  readonly changes: readonly string[];
  readonly timeline: ExposureTimeline;
  readonly clock: LocalClock;
  readonly eye: EyeSeries;
  readonly clockOutcome: BodyClockOutcome;
  readonly rhsEvaluations: number;
  /** Baseline CBTmin times (h) for the phase shift; undefined for the baseline itself. */
  readonly baselineCbtmin_h: readonly number[] | undefined;
}

export function strategyMetrics(inp: StrategyInput): Omit<StrategyResult, 'headlines'> {
  const { timeline, clock, eye, clockOutcome: bc } = inp;
  const n = timeline.total_min;
  const ev = (t_h: number): EventTime => ({ t_h: round(t_h, 4), local: localIsoAt(timeline, clock, Math.max(0, Math.min(n, Math.round(t_h * 60)))) });
  const dayOf = (t_h: number): number => {
    const m = Math.floor(t_h * 60);
    if (m < 0) return -1;
    if (m >= n) return timeline.days.length;
    return clock.dayIndex[m] ?? 0;
  };
  const asleep = asleepMinutes(bc.sleepEpisodes, n);
  const received = receivedMel(eye.mel_edi_lx, eye.melClosed_edi_lx, asleep);
  const receivedBySource = {} as SourceMap<Float64Array>;
  for (const src of LIGHT_SOURCES) receivedBySource[src] = receivedMel(eye.melBySource[src], eye.melClosedBySource[src], asleep);
  const work = new Uint8Array(n);
  for (const s of timeline.slices) if (s.activity === 'work') work.fill(1, s.start_min, s.end_min);

  const shiftOf = (t: number): number | null => {
    if (inp.baselineCbtmin_h === undefined) return 0;
    let best: number | null = null;
    for (const b of inp.baselineCbtmin_h) if (Math.abs(t - b) <= 12 && (best === null || Math.abs(t - b) < Math.abs(t - best))) best = b;
    return best === null ? null : t - best;
  };

  const days: DayMetrics[] = timeline.days.map((d) => {
    const a = d.start_min;
    const b = d.start_min + d.length_min;
    const dose = (arr: Float64Array) => {
      let s = 0;
      for (let m = a; m < b; m++) s += arr[m] ?? 0;
      return s / 60;
    };
    const bySource = {} as SourceMap<number>;
    for (const src of LIGHT_SOURCES) bySource[src as LightSource] = round(dose(receivedBySource[src]), 2);
    let bright = 0;
    let awakeMin = 0;
    let workMin = 0;
    for (let m = a; m < b; m++) {
      if (asleep[m] === 1) continue;
      awakeMin++;
      if ((eye.mel_edi_lx[m] ?? 0) >= DAYTIME_MEL_EDI_LX) bright++;
    }
    // KSS samples (0.25 h) at work minutes of this day.
    let workSamples = 0;
    let sleepySamples = 0;
    const kssAwake: number[] = [];
    bc.kssSamples.t_h.forEach((t, i) => {
      const m = Math.floor(t * 60 + 1e-6);
      if (m < a || m >= b) return;
      const k = bc.kssSamples.kss[i] ?? Number.NaN;
      if (!Number.isFinite(k)) return;
      kssAwake.push(k);
      if (work[m] === 1) {
        workSamples++;
        if (k >= KSS_SLEEPY) sleepySamples++;
      }
    });
    for (let m = a; m < b; m++) if (work[m] === 1 && asleep[m] !== 1) workMin++;
    const workHours = workMin / 60;
    const sleepyShare = workSamples > 0 ? sleepySamples / workSamples : 0;

    const main = bc.sleepEpisodes
      .filter((e) => dayOf(e.start_h) === d.index && e.end_h - e.start_h >= MAIN_SLEEP_MIN_H)
      .sort((x, y) => y.end_h - y.start_h - (x.end_h - x.start_h))[0];
    const startMin = main === undefined ? 0 : Math.round(main.start_h * 60);
    const pre = main === undefined ? null : meanOver(eye.mel_edi_lx, startMin - PRE_SLEEP_WINDOW_H * 60, startMin);
    const during = main === undefined ? null : meanOver(eye.mel_edi_lx, startMin, Math.round(main.end_h * 60));
    const cbt = bc.cbtmin_h.find((t) => dayOf(t) === d.index);
    const dlmo = bc.dlmo_h.find((t) => dayOf(t) === d.index);
    const dlmoBeforeSleep = main === undefined ? undefined : [...bc.dlmo_h].reverse().find((t) => t <= main.start_h + 6 && t > main.start_h - 18);
    // A night cut off by the end of the run is not a whole night: no suppression figure for it.
    const night = bc.nights.findIndex((nt) => dayOf(nt.onset_h) === d.index && nt.end_h < n / 60 - 1e-6);
    return {
      index: d.index,
      date: d.date,
      mel_dose_lx_h: round(dose(received), 2),
      mel_dose_by_source_lx_h: bySource,
      daytime_hours_ge_250_lx: round(bright / 60, 3),
      awake_hours: round(awakeMin / 60, 3),
      pre_sleep_mean_mel_edi_lx: roundOrNull(pre, 3),
      pre_sleep_meets_10_lx: pre === null ? null : pre <= PRE_SLEEP_MEL_EDI_LX,
      sleep_mean_mel_edi_lx: roundOrNull(during, 4),
      sleep_meets_1_lx: during === null ? null : during <= SLEEP_MEL_EDI_LX,
      cbtmin_h: roundOrNull(cbt, 4),
      cbtmin_local: cbt === undefined ? null : ev(cbt).local,
      dlmo_h: roundOrNull(dlmo, 4),
      dlmo_local: dlmo === undefined ? null : ev(dlmo).local,
      phase_shift_h: cbt === undefined ? null : roundOrNull(shiftOf(cbt), 4),
      phase_angle_dlmo_to_sleep_h: main === undefined || dlmoBeforeSleep === undefined ? null : round(main.start_h - dlmoBeforeSleep, 4),
      melatonin_suppression_pct: night < 0 ? null : roundOrNull(bc.suppression_pct[night] ?? null, 3),
      work_hours: round(workHours, 3),
      work_hours_kss_ge_7: round(workHours * sleepyShare, 3),
      kss_mean_awake: roundOrNull(mean(kssAwake), 3),
      sleep_onset_local: main === undefined ? null : ev(main.start_h).local,
      sleep_duration_h: main === undefined ? null : round(main.end_h - main.start_h, 4),
    };
  });

  const lastDays = days.slice(-PHASE_SHIFT_LAST_DAYS);
  const shifts = lastDays.flatMap((d) => (d.phase_shift_h === null ? [] : [d.phase_shift_h]));
  const supp = days.flatMap((d) => (d.melatonin_suppression_pct === null ? [] : [d.melatonin_suppression_pct]));
  const assessed = days.filter((d) => d.pre_sleep_meets_10_lx !== null);
  const workHours = days.reduce((s, d) => s + d.work_hours, 0);
  const sleepyHours = days.reduce((s, d) => s + d.work_hours_kss_ge_7, 0);
  const summary: StrategySummary = {
    mean_mel_dose_lx_h: round(mean(days.map((d) => d.mel_dose_lx_h)) ?? 0, 2),
    mean_daytime_hours_ge_250_lx: round(mean(days.map((d) => d.daytime_hours_ge_250_lx)) ?? 0, 3),
    mean_pre_sleep_mel_edi_lx: roundOrNull(mean(assessed.map((d) => d.pre_sleep_mean_mel_edi_lx ?? 0)), 3),
    nights_pre_sleep_meeting_10_lx: assessed.filter((d) => d.pre_sleep_meets_10_lx === true).length,
    nights_sleep_meeting_1_lx: assessed.filter((d) => d.sleep_meets_1_lx === true).length,
    nights_assessed: assessed.length,
    mean_phase_shift_h: roundOrNull(mean(shifts), 4),
    mean_phase_angle_dlmo_to_sleep_h: roundOrNull(mean(days.flatMap((d) => (d.phase_angle_dlmo_to_sleep_h === null ? [] : [d.phase_angle_dlmo_to_sleep_h]))), 4),
    mean_melatonin_suppression_pct: roundOrNull(mean(supp), 3),
    work_hours: round(workHours, 3),
    work_hours_kss_ge_7_share: workHours > 0 ? round(sleepyHours / workHours, 4) : null,
    mean_sleep_duration_h: roundOrNull(mean(days.flatMap((d) => (d.sleep_duration_h === null ? [] : [d.sleep_duration_h]))), 4),
  };

  // Alignment over every day of the run, like the sleepiness and suppression headlines: a roster's
  // night shifts may lie anywhere in it.
  const alignment =
    timeline.days.length === 0
      ? null
      : alignmentSummary({
          from_h: 0,
          to_h: n / 60,
          days: timeline.days.length,
          work: timeline.slices.filter((s) => s.activity === 'work').map((s) => ({ start_h: s.start_min / 60, end_h: s.end_min / 60 })),
          sleep: bc.sleepEpisodes,
          mainSleepMin_h: MAIN_SLEEP_MIN_H,
          dlmo_h: bc.dlmo_h,
          cbtmin_h: bc.cbtmin_h,
          fallbackDlmoBeforeCbtmin_h: DLMO_BEFORE_CBTMIN_H,
        });

  const hours = Math.ceil(n / 60);
  const hourlySources = {} as SourceMap<number[]>;
  for (const src of LIGHT_SOURCES) hourlySources[src] = hourlyMeans(eye.melBySource[src], hours);
  return {
    id: inp.id,
    name: inp.name,
    is_baseline: inp.baselineCbtmin_h === undefined,
    changes: inp.changes,
    summary,
    days,
    hourly: {
      mel_edi_lx: { ...hourlySources, total: hourlyMeans(eye.mel_edi_lx, hours) },
      photopic_lx: hourlyMeans(eye.photopic_lx, hours),
      kss: bc.kssHourly.slice(0, hours).map((v) => roundOrNull(v, 3)),
    },
    cbtmin: bc.cbtmin_h.filter((t) => t >= 0 && t < n / 60).map(ev),
    dlmo: bc.dlmo_h.filter((t) => t >= 0 && t < n / 60).map(ev),
    sleep_episodes: bc.sleepEpisodes.map((e) => ({ start: ev(e.start_h), end: ev(e.end_h), duration_h: round(e.end_h - e.start_h, 4) })),
    melatonin_nights: bc.nights.map((nt, i) => ({ onset: ev(nt.onset_h), end_h: round(nt.end_h, 4), suppression_pct: nt.end_h < n / 60 - 1e-6 ? roundOrNull(bc.suppression_pct[i] ?? null, 3) : null })),
    solver: { light_segments: bc.segments, rhs_evaluations: inp.rhsEvaluations },
    alignment,
  };
}
