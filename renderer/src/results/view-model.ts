// What the results views draw. These types are the renderer's own; results-adapter.ts is the
// one module that fills them from the run pipeline's results, so a change of the results
// format touches that file only. Times are hours since t = 0 (local midnight of day 0 at the
// site, counted in real hours through clock changes), as in the CLI contract.
import type { UtcOffsetSpan } from '../../../schedules/run/local-clock.js';
import type { AlignmentSummary } from '../../../schedules/run/alignment.js';

export type SourceKind = 'daylight' | 'electric' | 'screen' | 'outdoor' | 'measured' | 'other';

export interface LightSourceSeries {
  readonly id: string;
  readonly label: string;
  readonly kind: SourceKind;
  /** Melanopic EDI at the eye from this source, lx, one value per step. */
  readonly mel_edi_lx: readonly number[];
}

export interface LightSeries {
  readonly start_h: number;
  readonly step_h: number;
  readonly sources: readonly LightSourceSeries[];
}

export interface DayPhase {
  readonly day: number;
  /** Core-body-temperature minimum, hours since t = 0; null when not found that day. */
  readonly cbtmin_h: number | null;
  /** Dim-light melatonin onset, hours since t = 0; null when not found that day. */
  readonly dlmo_h: number | null;
}

export interface MelatoninSeries {
  readonly time_h: readonly number[];
  /** Modelled melatonin with light suppression, in the model's unit (see `unit`). */
  readonly level: readonly number[];
  /** The same without light suppression (what darkness would give), when available. */
  readonly unsuppressed: readonly number[] | null;
  readonly unit: string;
}

export interface Episode {
  readonly start_h: number;
  readonly end_h: number;
  readonly kind: 'sleep' | 'nap';
}

export interface MetricValue {
  readonly id: string;
  readonly label: string;
  readonly unit: string;
  readonly value: number | null;
  readonly decimals: number;
  /** Which direction is the favourable one, if any. */
  readonly better: 'higher' | 'lower' | 'none';
  /** The value is a local clock time in hours (24 and over: after midnight), shown as hh:mm; differences in h and min. */
  readonly clock?: boolean;
  /** Words for an increase and a decrease, e.g. "later" / "earlier" for a clock time. */
  readonly increaseWord: string;
  readonly decreaseWord: string;
  /** Appended to the comparison reading of this strategy, e.g. whether a body-clock shift moves toward alignment (schedules/run/phase-words.ts). */
  readonly note?: string;
  /** The same figure across the model ensemble, in the metric's unit, once the ensemble has run. */
  readonly ensemble?: MetricEnsemble;
}

export interface MetricEnsemble {
  readonly min: number;
  readonly max: number;
  /** Models that gave a value. */
  readonly models: number;
}

/** The model ensemble behind the ranges: the models (defaults first, cited) and rank changes in words. */
export interface ViewEnsembleModels {
  /** Each model once: the body-clock models, then the sleepiness (KSS) models. */
  readonly models: readonly { readonly role: 'body clock' | 'sleepiness'; readonly name: string; readonly source: string }[];
  /** The model combinations run (body-clock × sleepiness model). */
  readonly pairs: number;
  /** Per persona, each strategy whose rank changes with the model, in words. */
  readonly rankings: readonly { readonly personaId: string; readonly sentences: readonly string[] }[];
}

export interface RunView {
  readonly personaId: string;
  readonly strategyId: string;
  readonly light: LightSeries;
  readonly phases: readonly DayPhase[];
  readonly melatonin: MelatoninSeries;
  /** KSS per hour since t = 0 (null while asleep or not modelled). */
  readonly kssHourly: readonly (number | null)[];
  readonly sleep: readonly Episode[];
  readonly metrics: readonly MetricValue[];
  /** The run's headline figures as results.json gives them (`headlines`: value, baseline, sentence per metric); absent in synthetic views. */
  readonly headlines?: readonly RunHeadline[];
  /** Alignment of the body clock with the person's work and sleep hours (results.json `alignment`); absent in synthetic views. */
  readonly alignment?: AlignmentSummary | null;
}

/** A headline of results.json: phase shift (h, + later), melatonin suppression (%), share of work hours at KSS ≥ 7 (0–1). */
export interface RunHeadline {
  readonly metric: 'phase_shift_h' | 'melatonin_suppression_pct' | 'work_hours_kss_ge_7_share';
  readonly value: number | null;
  readonly baseline: number | null;
  readonly sentence: string;
}

export interface NamedItem {
  readonly id: string;
  readonly name: string;
}

export interface ResultsView {
  readonly scenarioName: string;
  /** Local date of day 0, "YYYY-MM-DD". */
  readonly startDate: string;
  readonly days: number;
  /**
   * The run's UTC offsets from the start and at each clock change (results.json
   * `local_clock.utc_offsets`); charts map run time to wall-clock time through them
   * (charts/wall-clock.ts). Absent: no clock change (24-hour days).
   */
  readonly utcOffsets?: readonly UtcOffsetSpan[];
  readonly baselineId: string;
  /** Baseline first, then the strategies in scenario order. */
  readonly strategies: readonly NamedItem[];
  readonly personas: readonly NamedItem[];
  readonly runs: readonly RunView[];
  readonly cautions: readonly string[];
  /** The pipeline's recommended strategy per persona, with its reason and headline sentences (absent in synthetic views). */
  readonly recommendations?: readonly Recommendation[];
  /** Present once the model ensemble has run; the ranges are on the metrics. */
  readonly ensemble?: ViewEnsembleModels;
}

export interface Recommendation {
  readonly personaId: string;
  readonly strategyId: string;
  readonly reason: string;
  readonly headlines: readonly string[];
  /** The rule the pipeline recommended by, in words. */
  readonly rule?: string;
  /** The recommended strategy's headline sentences by topic. */
  readonly sentences?: { readonly phase: string; readonly suppression: string; readonly sleepiness: string };
}

export function findRun(view: ResultsView, personaId: string, strategyId: string): RunView | undefined {
  return view.runs.find((r) => r.personaId === personaId && r.strategyId === strategyId);
}
