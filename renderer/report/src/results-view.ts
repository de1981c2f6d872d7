// Results of the run pipeline (results.json, "zeitlight-results" version 1) as the renderer's
// results view, for the briefing's charts, plus the pipeline's own summary (headline sentences
// and recommendation, which the briefing quotes rather than recomputes).
// Time axis: as in the app, the view keeps the run's real hours since t = 0 and carries the run's
// UTC offsets (`local_clock`, or read back from `hours.start_local` in results written before it),
// so the charts place every value at its local wall-clock time through the one mapping the app uses
// (renderer/src/charts/wall-clock.ts): a 23-hour and a 25-hour day are drawn as such.
import type { PersonaResult, RunResults, StrategyResult } from '../../../schedules/run/results-types.js';
import type { LightSourceSeries, MetricValue, ResultsView, RunView, SourceKind } from '../../src/results/view-model.js';
import type { PersonaSummary, StrategyHeadline } from './headlines.js';
import { PHASE_SHIFT_SIGN_LABEL } from '../../../schedules/words/shift-sign.js';
import { offsetsFromHourStarts, WallClock } from '../../src/charts/wall-clock.js';

export const RESULTS_FORMAT_NAME = 'zeitlight-results';

const SOURCE_LABELS: Record<string, { label: string; kind: SourceKind }> = {
  daylight: { label: 'Daylight through windows', kind: 'daylight' },
  electric: { label: 'Electric light', kind: 'electric' },
  screen: { label: 'Screens', kind: 'screen' },
  outdoor: { label: 'Outdoors', kind: 'outdoor' },
  measured: { label: 'Measured light', kind: 'measured' },
};

export function isRunResults(value: unknown): value is RunResults {
  return typeof value === 'object' && value !== null && (value as { format?: unknown }).format === RESULTS_FORMAT_NAME && Array.isArray((value as { personas?: unknown }).personas);
}

function dayNumber(date: string): number {
  const [y, m, d] = date.split('-').map(Number);
  return Date.UTC(y ?? 2000, (m ?? 1) - 1, d ?? 1) / 86_400_000;
}

/** Local hours since local midnight of the start date for an ISO local time "YYYY-MM-DDTHH:MM…". */
export function localHoursOf(local: string, startDate: string): number {
  const date = local.slice(0, 10);
  const hh = Number(local.slice(11, 13));
  const mm = Number(local.slice(14, 16));
  const ss = local.length > 17 && local[16] === ':' ? Number(local.slice(17, 19)) : 0;
  return (dayNumber(date) - dayNumber(startDate)) * 24 + hh + mm / 60 + ss / 3600;
}

function metric(id: string, label: string, unit: string, value: number | null, decimals: number, better: MetricValue['better'], increaseWord = 'more', decreaseWord = 'less'): MetricValue {
  return { id, label, unit, value, decimals, better, increaseWord, decreaseWord };
}

function metricsOf(s: StrategyResult): MetricValue[] {
  const m = s.summary;
  return [
    metric('work-kss7-share', 'Work hours at KSS ≥ 7', '%', m.work_hours_kss_ge_7_share === null ? null : m.work_hours_kss_ge_7_share * 100, 0, 'lower'),
    metric('suppression', 'Melatonin suppression per night (mean)', '%', m.mean_melatonin_suppression_pct, 0, 'lower'),
    metric('phase-shift', `Body-clock shift vs baseline, last days (${PHASE_SHIFT_SIGN_LABEL})`, 'h', m.mean_phase_shift_h, 2, 'none', 'later', 'earlier'),
    metric('misalignment', 'Misalignment with work and sleep hours (per day)', 'h', s.alignment?.misalignment_h_per_day ?? null, 1, 'lower', 'more', 'less'),
    metric('daytime-250', 'Daytime hours ≥ 250 lx melanopic EDI (per day)', 'h', m.mean_daytime_hours_ge_250_lx, 1, 'higher'),
    metric('mel-dose', 'Melanopic dose (per day)', 'lx·h', m.mean_mel_dose_lx_h, 0, 'higher'),
    metric('pre-sleep', 'Melanopic EDI before sleep (mean)', 'lx', m.mean_pre_sleep_mel_edi_lx, 1, 'lower'),
    metric('nights-10', 'Nights meeting ≤ 10 lx before sleep', `of ${m.nights_assessed}`, m.nights_pre_sleep_meeting_10_lx, 0, 'higher'),
    metric('sleep-duration', 'Sleep per night (mean)', 'h', m.mean_sleep_duration_h, 1, 'none', 'longer', 'shorter'),
    metric('sleep-timing', 'DLMO to sleep onset (mean)', 'h', m.mean_phase_angle_dlmo_to_sleep_h, 2, 'none', 'longer', 'shorter'),
  ];
}

function runOf(persona: PersonaResult, s: StrategyResult): RunView {
  const sources: LightSourceSeries[] = [];
  for (const [key, meta] of Object.entries(SOURCE_LABELS)) {
    const values = (s.hourly.mel_edi_lx as unknown as Record<string, number[] | undefined>)[key];
    if (values === undefined || !values.some((v) => v > 0)) continue;
    sources.push({ id: key, label: meta.label, kind: meta.kind, mel_edi_lx: values });
  }
  return {
    personaId: persona.id,
    strategyId: s.id,
    light: { start_h: 0, step_h: 1, sources },
    phases: s.days.map((d) => ({ day: d.index, cbtmin_h: d.cbtmin_h, dlmo_h: d.dlmo_h })),
    melatonin: { time_h: [], level: [], unsuppressed: null, unit: 'pmol/L' },
    kssHourly: s.hourly.kss,
    sleep: s.sleep_episodes.map((e) => ({ start_h: e.start.t_h, end_h: e.end.t_h, kind: 'sleep' as const })),
    metrics: metricsOf(s),
  };
}

export function viewFromResults(results: RunResults, cautions: readonly string[]): ResultsView {
  const strategies: { id: string; name: string }[] = [];
  for (const p of results.personas) for (const s of p.strategies) if (!strategies.some((x) => x.id === s.id)) strategies.push({ id: s.id, name: s.name });
  const baseline = results.personas.flatMap((p) => p.strategies).find((s) => s.is_baseline);
  strategies.sort((a, b) => (a.id === baseline?.id ? -1 : b.id === baseline?.id ? 1 : 0));
  return {
    scenarioName: results.scenario.name,
    startDate: results.scenario.start_date,
    days: results.scenario.days,
    utcOffsets: results.local_clock?.utc_offsets ?? offsetsFromHourStarts(results.hours.start_local),
    baselineId: baseline?.id ?? 'baseline',
    strategies,
    personas: results.personas.map((p) => ({ id: p.id, name: p.name })),
    runs: results.personas.flatMap((p) => p.strategies.map((s) => runOf(p, s))),
    cautions,
  };
}

/** Suppression per night (by the local date of melatonin onset) for each persona × strategy. */
export function nightlySuppression(results: RunResults): Map<string, { day: number; pct: number | null }[]> {
  const clock = new WallClock(results.local_clock?.utc_offsets ?? offsetsFromHourStarts(results.hours.start_local));
  const out = new Map<string, { day: number; pct: number | null }[]>();
  for (const p of results.personas) {
    for (const s of p.strategies) out.set(`${p.id}:${s.id}`, s.melatonin_nights.map((n) => ({ day: clock.at(n.onset.t_h).day, pct: n.suppression_pct })));
  }
  return out;
}

/** The pipeline's summary per persona: its recommendation, reason and headline sentences. */
export function summariesFromResults(results: RunResults): PersonaSummary[] {
  return results.personas.map((p) => {
    const all: StrategyHeadline[] = p.strategies.map((s) => ({
      strategy: { id: s.id, name: s.name },
      // + later, − earlier, as in results.json (the one sign convention, schedules/words/shift-sign.ts)
      phaseShift_h: s.is_baseline ? 0 : s.summary.mean_phase_shift_h,
      suppression_pct: s.summary.mean_melatonin_suppression_pct,
      sleepyShare_pct: s.summary.work_hours_kss_ge_7_share === null ? null : s.summary.work_hours_kss_ge_7_share * 100,
      // Absent in results written before the alignment figures existed.
      alignment: s.alignment ?? null,
    }));
    const baseline = all.find((h) => p.strategies.find((s) => s.id === h.strategy.id)?.is_baseline === true) ?? null;
    const recommended = all.find((h) => h.strategy.id === p.recommendation.strategy_id) ?? baseline;
    const recResult = p.strategies.find((s) => s.id === p.recommendation.strategy_id);
    const sentence = (metric: string) => recResult?.headlines.find((h) => h.metric === metric)?.sentence ?? 'Not available from these results.';
    const isBaseline = recommended === baseline;
    return {
      persona: { id: p.id, name: p.name },
      basis: 'work',
      baseline,
      recommended,
      all,
      sentences: {
        recommendation: isBaseline ? 'Recommended: keep the baseline.' : `Recommended: “${p.recommendation.strategy_name}”.`,
        reason: p.recommendation.reason,
        phase: sentence('phase_shift_h'),
        suppression: sentence('melatonin_suppression_pct'),
        sleepiness: sentence('work_hours_kss_ge_7_share'),
      },
      rule: p.recommendation.rule,
      phaseMarker: 'CBTmin',
    };
  });
}
