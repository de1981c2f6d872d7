// The one bridge between the run pipeline and the results views: runs a validated scenario
// through schedules/run (pure, so it runs in the Web Worker) and maps its results to the
// renderer's ResultsView. When the results format changes, only this file changes.
import type { Scenario } from '../../../schedules/schema/scenario-types.js';
import { PHASE_SHIFT_SIGN_LABEL } from '../../../schedules/words/shift-sign.js';
import { runScenario, RunInputError, RUN_CAUTION, type RunOutput, type StrategyResult, type TimelineLight } from '../../../schedules/run/index.js';
import { alignmentClause, shortPersonName } from '../../../schedules/run/phase-words.js';
import type { LightSourceSeries, MetricValue, ResultsView, RunView, SourceKind } from './view-model.js';
import { viewEnsembleFromResults, withViewEnsemble } from './ensemble-view.js';

export type PipelineOutcome =
  | { readonly status: 'ready'; readonly view: ResultsView; /** The pipeline's output, for the model ensemble that runs after it. */ readonly run?: RunOutput }
  | { readonly status: 'unavailable'; readonly message: string }
  | { readonly status: 'failed'; readonly message: string };

export type ProgressReport = (fraction: number, stage: string) => void;

export const PIPELINE_NOT_CONNECTED = 'Results will appear here once the simulation engine is connected to the workspace.';

/** Light at the eye is handed to the charts as 10-minute means (a day of one-minute values per source and run would make the worker message large). */
export const VIEW_LIGHT_STEP_MIN = 10;

const SOURCE_LABELS: Readonly<Record<Exclude<SourceKind, 'other'>, string>> = {
  daylight: 'Daylight through windows',
  electric: 'Electric lighting',
  screen: 'Screens',
  outdoor: 'Outdoor daylight and street light',
  measured: 'Measured light log',
};

function means(values: Float64Array, step: number): number[] {
  const out: number[] = [];
  for (let a = 0; a < values.length; a += step) {
    const b = Math.min(values.length, a + step);
    let s = 0;
    for (let i = a; i < b; i++) s += values[i] ?? 0;
    out.push(Math.round((s / (b - a)) * 100) / 100);
  }
  return out;
}

function metric(id: string, label: string, unit: string, value: number | null, decimals: number, better: MetricValue['better'], increaseWord = 'more', decreaseWord = 'less'): MetricValue {
  return { id, label, unit, value, decimals, better, increaseWord, decreaseWord };
}

/** Local clock time of a "*_local" ISO time as hours; times before noon count after midnight (24 + h), so evening markers keep their order. */
export function clockHoursOfLocal(local: string | null): number | null {
  const m = local === null ? null : /T(\d{2}):(\d{2})/.exec(local);
  if (m === null) return null;
  const h = Number(m[1]) + Number(m[2]) / 60;
  return h < 12 ? h + 24 : h;
}

/** The last day of the run on which the marker was found, as local clock hours. */
function lastDayClock(days: readonly { readonly dlmo_local: string | null; readonly cbtmin_local: string | null }[], key: 'dlmo_local' | 'cbtmin_local', wrapBeforeNoon: boolean): number | null {
  for (let i = days.length - 1; i >= 0; i--) {
    const h = clockHoursOfLocal(days[i]?.[key] ?? null);
    if (h !== null) return wrapBeforeNoon ? h : h >= 24 ? h - 24 : h;
  }
  return null;
}

function metricsOf(s: StrategyResult): MetricValue[] {
  const m = s.summary;
  return [
    { ...metric('dlmo', 'DLMO (last day, local clock)', 'h', lastDayClock(s.days, 'dlmo_local', true), 2, 'none', 'later', 'earlier'), clock: true },
    { ...metric('cbtmin', 'CBTmin (last day, local clock)', 'h', lastDayClock(s.days, 'cbtmin_local', false), 2, 'none', 'later', 'earlier'), clock: true },
    metric('phase-shift', `Body-clock shift vs baseline, last 7 days (${PHASE_SHIFT_SIGN_LABEL})`, 'h', m.mean_phase_shift_h, 2, 'none', 'later', 'earlier'),
    metric('misalignment', 'Misalignment with work and sleep hours (mean per day)', 'h', s.alignment?.misalignment_h_per_day ?? null, 1, 'lower', 'more', 'less'),
    metric('day-above-250', 'Daytime hours ≥ 250 lx mEDI (mean per day)', 'h', m.mean_daytime_hours_ge_250_lx, 1, 'higher', 'more', 'fewer'),
    metric('pre-sleep', 'Light in the 3 h before sleep (mean mEDI)', 'lx', m.mean_pre_sleep_mel_edi_lx, 1, 'lower'),
    metric('suppression', 'Melatonin suppression per night', '%', m.mean_melatonin_suppression_pct, 1, 'lower'),
    metric('kss7', 'Work time at KSS ≥ 7', '%', m.work_hours_kss_ge_7_share === null ? null : m.work_hours_kss_ge_7_share * 100, 0, 'lower'),
    metric('dose', 'Melanopic dose (mean per day)', 'lx·h', m.mean_mel_dose_lx_h, 0, 'none'),
    metric('sleep', 'Main sleep (mean)', 'h', m.mean_sleep_duration_h, 1, 'none', 'longer', 'shorter'),
    metric('sleep-timing', 'DLMO to sleep onset (mean)', 'h', m.mean_phase_angle_dlmo_to_sleep_h, 2, 'none', 'longer', 'shorter'),
  ];
}

/** Metrics whose comparison reading is a body-clock shift: they say whether it moves toward alignment. */
const PHASE_METRIC_IDS: readonly string[] = ['dlmo', 'cbtmin', 'phase-shift'];

function runView(tl: TimelineLight, s: StrategyResult, phaseNote?: string): RunView {
  const sources: LightSourceSeries[] = (Object.keys(SOURCE_LABELS) as (keyof typeof SOURCE_LABELS)[])
    .filter((k) => k !== 'measured' || tl.eye.melBySource.measured.some((v) => v > 0))
    .map((k) => ({ id: k, label: SOURCE_LABELS[k], kind: k, mel_edi_lx: means(tl.eye.melBySource[k], VIEW_LIGHT_STEP_MIN) }));
  const n = Math.min(tl.melatonin.t_h.length, tl.melatonin.plasma_pmol_L.length, tl.melatonin.dim_pmol_L.length);
  return {
    personaId: tl.personaId,
    strategyId: tl.strategyId,
    light: { start_h: 0, step_h: VIEW_LIGHT_STEP_MIN / 60, sources },
    phases: s.days.map((d) => ({ day: d.index, cbtmin_h: d.cbtmin_h, dlmo_h: d.dlmo_h })),
    melatonin: { time_h: tl.melatonin.t_h.slice(0, n), level: tl.melatonin.plasma_pmol_L.slice(0, n), unsuppressed: tl.melatonin.dim_pmol_L.slice(0, n), unit: 'pmol/L' },
    kssHourly: s.hourly.kss,
    sleep: s.sleep_episodes.map((e) => ({ start_h: e.start.t_h, end_h: e.end.t_h, kind: e.duration_h < 3 ? 'nap' : 'sleep' })),
    headlines: s.headlines.map((h) => ({ metric: h.metric, value: h.value, baseline: h.baseline, sentence: h.sentence })),
    metrics: metricsOf(s).map((m) => (phaseNote !== undefined && PHASE_METRIC_IDS.includes(m.id) ? { ...m, note: phaseNote } : m)),
    alignment: s.alignment,
  };
}

/** The recommended strategy's headline sentences by topic. */
function recommendedSentences(s: StrategyResult | undefined): { phase: string; suppression: string; sleepiness: string } {
  const of = (metric: string) => s?.headlines.find((h) => h.metric === metric)?.sentence ?? 'Not available from these results.';
  return { phase: of('phase_shift_h'), suppression: of('melatonin_suppression_pct'), sleepiness: of('work_hours_kss_ge_7_share') };
}

/** Maps a pipeline run to the results views' model. */
export function viewFromRun(out: RunOutput, scenario: Scenario): ResultsView {
  const r = out.results;
  const runs: RunView[] = [];
  for (const p of r.personas) {
    for (const s of p.strategies) {
      const tl = out.light.find((l) => l.personaId === p.id && l.strategyId === s.id);
      const base = p.strategies.find((x) => x.is_baseline);
      if (tl !== undefined) runs.push(runView(tl, s, s.is_baseline ? undefined : alignmentClause(shortPersonName(p.name), s.alignment, base?.alignment)));
    }
  }
  const view: ResultsView = {
    scenarioName: r.scenario.name,
    startDate: r.scenario.start_date,
    days: r.scenario.days,
    ...(r.local_clock === undefined ? {} : { utcOffsets: r.local_clock.utc_offsets }),
    baselineId: 'baseline',
    strategies: [{ id: 'baseline', name: 'Baseline' }, ...scenario.strategies.map((s) => ({ id: s.id, name: s.name }))],
    personas: r.personas.map((p) => ({ id: p.id, name: p.name })),
    runs,
    cautions: [RUN_CAUTION, ...r.warnings],
    recommendations: r.personas.map((p) => ({
      personaId: p.id,
      strategyId: p.recommendation.strategy_id,
      reason: p.recommendation.reason,
      headlines: p.strategies.find((s) => s.id === p.recommendation.strategy_id)?.headlines.map((h) => h.sentence) ?? [],
      rule: p.recommendation.rule,
      sentences: recommendedSentences(p.strategies.find((s) => s.id === p.recommendation.strategy_id)),
    })),
  };
  const ensemble = viewEnsembleFromResults(r);
  return ensemble === null ? view : withViewEnsemble(view, ensemble);
}

export async function runScenarioForView(scenario: Scenario, onProgress: ProgressReport): Promise<PipelineOutcome> {
  onProgress(0, `Preparing ${scenario.personas.length} people × ${1 + scenario.strategies.length} strategies`);
  if (scenario.site.weather.kind === 'file' || scenario.personas.some((p) => p.measuredLight.length > 0)) {
    return { status: 'unavailable', message: 'This scenario reads a weather file or a measured light log; run it with "zeitlight run" for now — the workspace runs scenarios without external files.' };
  }
  try {
    const out = runScenario({ scenario, onProgress });
    return { status: 'ready', view: viewFromRun(out, scenario), run: out };
  } catch (err) {
    const message = err instanceof RunInputError ? err.message : `The run failed: ${err instanceof Error ? err.message : String(err)}`;
    return { status: 'failed', message };
  }
}
