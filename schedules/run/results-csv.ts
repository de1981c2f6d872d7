/**
 * CSV views of a run (pure text, so the app can export the same files):
 *  exposure.csv — light at the eye every EXPOSURE_STEP_MIN real minutes per persona × strategy:
 *    interval start in UTC and local time (with offset), place, activity, asleep (the body-clock
 *    run's sleep — prescribed or predicted — at the interval start), photopic lux
 *    and melanopic EDI at the open eye in total and per source (means over the interval), then the
 *    minutes of the interval spent behind closed eyelids and the mean melanopic EDI that reached
 *    the eye (behind the eyelids while asleep; received-light.ts). Rows follow real time,
 *    so a clock change shows as a local-time jump with no lost or repeated interval.
 *  summary.csv — one row per persona × strategy with the summary metrics; beside each figure that
 *    has an ensemble range, its lowest and highest value across the models and the model count
 *    (empty without the ensemble); then the alignment figures (alignment.ts; empty when not assessed).
 */
import Papa from 'papaparse';
import { ALIGNMENT_FIELDS } from './alignment.js';
import { LIGHT_SOURCES } from './eye-series.js';
import { ENSEMBLE_METRICS, type EnsembleMetric, type RunResults, type StrategyResult, type StrategySummary } from './results-types.js';
import type { TimelineLight } from './run-scenario.js';
import { localIsoAt, type LocalClock } from './local-clock.js';
import { asleepMinutes, receivedMel } from './received-light.js';

export const EXPOSURE_STEP_MIN = 10;

const r2 = (v: number) => Math.round(v * 100) / 100;

export function exposureCsv(light: readonly TimelineLight[], clock: LocalClock): string {
  const header = ['persona_id', 'strategy_id', 'utc', 'local_time', 'day_index', 'place', 'activity', 'asleep', 'photopic_lx', 'mel_edi_lx', ...LIGHT_SOURCES.map((s) => `mel_${s}_lx`), 'eyes_closed_min', 'mel_edi_received_lx'];
  const rows: (string | number)[][] = [];
  for (const tl of light) {
    const { timeline, eye } = tl;
    const closedEyes = asleepMinutes(tl.sleepEpisodes, timeline.total_min);
    const received = receivedMel(eye.mel_edi_lx, eye.melClosed_edi_lx, closedEyes);
    let k = 0;
    for (let a = 0; a < timeline.total_min; a += EXPOSURE_STEP_MIN) {
      const b = Math.min(timeline.total_min, a + EXPOSURE_STEP_MIN);
      while (k < timeline.slices.length - 1 && (timeline.slices[k]?.end_min ?? 0) <= a) k++;
      const s = timeline.slices[k];
      const meanOf = (arr: Float64Array) => {
        let t = 0;
        for (let m = a; m < b; m++) t += arr[m] ?? 0;
        return r2(t / (b - a));
      };
      rows.push([
        tl.personaId,
        tl.strategyId,
        new Date(timeline.runStartUtc_ms + a * 60_000).toISOString().slice(0, 16) + 'Z',
        localIsoAt(timeline, clock, a),
        clock.dayIndex[a] ?? 0,
        s?.placeId ?? '',
        s?.activity ?? '',
        tl.sleepEpisodes.some((e) => a / 60 >= e.start_h - 1e-9 && a / 60 < e.end_h - 1e-9) ? 1 : 0,
        meanOf(eye.photopic_lx),
        meanOf(eye.mel_edi_lx),
        ...LIGHT_SOURCES.map((src) => meanOf(eye.melBySource[src])),
        closedEyes.subarray(a, b).reduce((n, v) => n + v, 0),
        meanOf(received),
      ]);
    }
  }
  return Papa.unparse({ fields: header, data: rows }, { newline: '\n' }) + '\n';
}

/** Summary columns in order; each ensemble figure is followed by its range across the models (ensemble.ts). */
const SUMMARY_FIELDS = [
  'mean_mel_dose_lx_h', 'mean_daytime_hours_ge_250_lx', 'mean_pre_sleep_mel_edi_lx', 'nights_pre_sleep_meeting_10_lx', 'nights_sleep_meeting_1_lx', 'nights_assessed',
  'mean_phase_shift_h', 'mean_phase_angle_dlmo_to_sleep_h', 'mean_melatonin_suppression_pct', 'work_hours', 'work_hours_kss_ge_7_share', 'mean_sleep_duration_h',
] as const satisfies readonly (keyof StrategySummary)[];

const isEnsembleMetric = (f: string): f is EnsembleMetric => (ENSEMBLE_METRICS as readonly string[]).includes(f);

const withRangeColumns = (f: string): string[] => (isEnsembleMetric(f) ? [f, `${f}_ensemble_min`, `${f}_ensemble_max`, `${f}_ensemble_models`] : [f]);

/** A figure's value followed, for an ensemble figure, by its range across the models and the model count. */
function withRange(s: StrategyResult, f: string, value: number | null): (number | null)[] {
  if (!isEnsembleMetric(f)) return [value];
  const e = s.ensemble?.[f];
  return [value, e?.min ?? null, e?.max ?? null, e === undefined ? null : e.model_count];
}

export function summaryCsv(results: RunResults): string {
  const header = ['persona_id', 'strategy_id', 'strategy_name', 'recommended', ...SUMMARY_FIELDS.flatMap(withRangeColumns), ...ALIGNMENT_FIELDS.flatMap(withRangeColumns)];
  const rows: (string | number | null)[][] = [];
  for (const p of results.personas) {
    for (const s of p.strategies) {
      const cells = SUMMARY_FIELDS.flatMap((f) => withRange(s, f, s.summary[f]));
      const alignment = ALIGNMENT_FIELDS.flatMap((f) => withRange(s, f, s.alignment?.[f] ?? null));
      rows.push([p.id, s.id, s.name, p.recommendation.strategy_id === s.id ? 1 : 0, ...cells, ...alignment].map((v) => (v === null ? '' : v)));
    }
  }
  return Papa.unparse({ fields: header, data: rows }, { newline: '\n' }) + '\n';
}
