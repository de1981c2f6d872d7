/**
 * The results document of a run ("zeitlight-results", version 1). Field names are stable;
 * docs/results-format.md describes every field. Times: `*_h` are real hours since the run
 * start (local midnight of the first day); `*_local` are ISO 8601 local times with the UTC
 * offset at that moment. Light: melanopic EDI (CIE S 026) and photopic illuminance at the eye, lx.
 */
import type { CohortSummary } from '../../model/cohort/aggregate-cohort.js';
import type { AlignmentSummary } from './alignment.js';
import type { RunBasis } from './run-basis.js';
import type { UtcOffsetSpan } from './local-clock.js';

export const RESULTS_FORMAT = 'zeitlight-results';
export const RESULTS_FORMAT_VERSION = 1;

export type SourceMap<T> = { daylight: T; electric: T; screen: T; outdoor: T; measured: T };

export interface Headline {
  /** "phase_shift_h" | "melatonin_suppression_pct" | "work_hours_kss_ge_7_share". */
  readonly metric: 'phase_shift_h' | 'melatonin_suppression_pct' | 'work_hours_kss_ge_7_share';
  readonly value: number | null;
  readonly baseline: number | null;
  readonly sentence: string;
  /** The same figure under every model of the ensemble (absent when the ensemble was not run). */
  readonly ensemble?: EnsembleRange;
}

/**
 * Figures that carry an ensemble range: the headlines (phase shift, melatonin suppression, share of
 * work hours at KSS ≥ 7), the sleep-timing figures (DLMO to sleep onset, main sleep) — `summary`
 * fields — and the misalignment with work and sleep hours (`alignment.misalignment_h_per_day`).
 */
export const ENSEMBLE_METRICS = ['mean_phase_shift_h', 'mean_melatonin_suppression_pct', 'work_hours_kss_ge_7_share', 'mean_phase_angle_dlmo_to_sleep_h', 'mean_sleep_duration_h', 'misalignment_h_per_day'] as const;
export type EnsembleMetric = (typeof ENSEMBLE_METRICS)[number];

/** One model's value of a figure. `sleepiness` is null where the figure does not depend on the sleepiness model. */
export interface EnsembleValue {
  readonly pacemaker: string;
  readonly sleepiness: string | null;
  readonly value: number | null;
}

/** A figure across the ensemble: the default model's value, the lowest and highest, and every model's value. */
export interface EnsembleRange {
  readonly default: number | null;
  /** null when no model gave a value. */
  readonly min: number | null;
  readonly max: number | null;
  /** Models that gave a value. */
  readonly model_count: number;
  /** The default model first. */
  readonly models: readonly EnsembleValue[];
}

export type StrategyEnsemble = Readonly<Record<EnsembleMetric, EnsembleRange>>;

/** A strategy's rank among the persona's strategies (baseline included) under each model. */
export interface EnsembleRank {
  readonly strategy_id: string;
  readonly default_rank: number;
  readonly ranks: readonly { readonly pacemaker: string; readonly sleepiness: string; readonly rank: number }[];
  /** How the rank changes across models, in words; null when every model gives the same rank. */
  readonly sentence: string | null;
}

export interface EnsembleRanking {
  readonly rule: string;
  readonly strategies: readonly EnsembleRank[];
}

/** The models of the ensemble, named and cited. */
export interface RunEnsembleModels {
  /** The run's own pair (its values are the summary's). */
  readonly default: { readonly pacemaker: string; readonly sleepiness: string };
  /** Every pair of body-clock and sleepiness model run, the default first. */
  readonly members: readonly { readonly pacemaker: string; readonly sleepiness: string; readonly name: string }[];
  /** Each model once with its citation: the body-clock models, then the sleepiness models, the defaults first. */
  readonly models: readonly { readonly role: 'body clock' | 'sleepiness'; readonly id: string; readonly name: string; readonly source: string }[];
  readonly metrics: readonly EnsembleMetric[];
  readonly note: string;
}

export interface DayMetrics {
  readonly index: number;
  readonly date: string;
  readonly mel_dose_lx_h: number;
  readonly mel_dose_by_source_lx_h: SourceMap<number>;
  readonly daytime_hours_ge_250_lx: number;
  readonly awake_hours: number;
  readonly pre_sleep_mean_mel_edi_lx: number | null;
  readonly pre_sleep_meets_10_lx: boolean | null;
  readonly sleep_mean_mel_edi_lx: number | null;
  readonly sleep_meets_1_lx: boolean | null;
  readonly cbtmin_h: number | null;
  readonly cbtmin_local: string | null;
  readonly dlmo_h: number | null;
  readonly dlmo_local: string | null;
  readonly phase_shift_h: number | null;
  readonly phase_angle_dlmo_to_sleep_h: number | null;
  readonly melatonin_suppression_pct: number | null;
  readonly work_hours: number;
  readonly work_hours_kss_ge_7: number;
  readonly kss_mean_awake: number | null;
  readonly sleep_onset_local: string | null;
  readonly sleep_duration_h: number | null;
}

export interface StrategySummary {
  readonly mean_mel_dose_lx_h: number;
  readonly mean_daytime_hours_ge_250_lx: number;
  readonly mean_pre_sleep_mel_edi_lx: number | null;
  readonly nights_pre_sleep_meeting_10_lx: number;
  readonly nights_sleep_meeting_1_lx: number;
  readonly nights_assessed: number;
  /** Mean CBTmin shift vs the baseline over the last 7 days (h; + later, − earlier). */
  readonly mean_phase_shift_h: number | null;
  readonly mean_phase_angle_dlmo_to_sleep_h: number | null;
  readonly mean_melatonin_suppression_pct: number | null;
  readonly work_hours: number;
  readonly work_hours_kss_ge_7_share: number | null;
  readonly mean_sleep_duration_h: number | null;
}

export interface EventTime {
  readonly t_h: number;
  readonly local: string;
}

export interface StrategyResult {
  readonly id: string;
  readonly name: string;
  readonly is_baseline: boolean;
  readonly changes: readonly string[];
  readonly summary: StrategySummary;
  readonly headlines: readonly Headline[];
  readonly days: readonly DayMetrics[];
  /** Hourly means over the run's real hours (see RunResults.hours). */
  readonly hourly: {
    readonly mel_edi_lx: SourceMap<number[]> & { total: number[] };
    readonly photopic_lx: number[];
    readonly kss: (number | null)[];
  };
  readonly cbtmin: readonly EventTime[];
  readonly dlmo: readonly EventTime[];
  readonly sleep_episodes: readonly { readonly start: EventTime; readonly end: EventTime; readonly duration_h: number }[];
  readonly melatonin_nights: readonly { readonly onset: EventTime; readonly end_h: number; readonly suppression_pct: number | null }[];
  readonly solver: { readonly light_segments: number; readonly rhs_evaluations: number };
  /** Alignment of the body clock with the person's work and sleep hours, mean over the run (alignment.ts); null without a body-clock minimum. */
  readonly alignment: AlignmentSummary | null;
  /** Ranges of the headline and sleep-timing figures across the model ensemble (absent without it). */
  readonly ensemble?: StrategyEnsemble;
}

export interface Recommendation {
  readonly strategy_id: string;
  readonly strategy_name: string;
  readonly rule: string;
  readonly reason: string;
}

export interface PersonaResult {
  readonly id: string;
  readonly name: string;
  readonly age_y: number;
  readonly sleep_mode: 'habitual' | 'free';
  readonly strategies: readonly StrategyResult[];
  readonly recommendation: Recommendation;
  /** Strategy ranks under each model of the ensemble (absent without it). */
  readonly ensemble_ranking?: EnsembleRanking;
}

export interface RunResults {
  readonly format: typeof RESULTS_FORMAT;
  readonly version: typeof RESULTS_FORMAT_VERSION;
  readonly generator: { readonly name: 'zeitlight'; readonly pipeline: string };
  readonly caution: string;
  readonly scenario: {
    readonly name: string;
    readonly start_date: string;
    readonly days: number;
    readonly time_zone: string;
    readonly site_name: string | null;
    readonly latitude_deg: number;
    readonly longitude_deg: number;
    readonly weather: 'sky-model' | 'weather-file';
    readonly sky_by_day: readonly (string | null)[];
  };
  readonly models: {
    readonly pacemaker: string;
    readonly melatonin: string;
    readonly sleepiness: string;
    readonly light_input: string;
    /** What `dlmo` / `dlmo_h` mean: the dim-light melatonin onset (docs/results-format.md). */
    readonly dlmo_definition: string;
    /** What the melatonin suppression figures mean: their window (docs/results-format.md). */
    readonly melatonin_suppression_definition: string;
  };
  readonly thresholds: {
    readonly daytime_mel_edi_lx: number;
    readonly pre_sleep_mel_edi_lx: number;
    readonly pre_sleep_window_h: number;
    readonly sleep_mel_edi_lx: number;
    readonly kss_sleepy: number;
    readonly source: string;
  };
  readonly days: readonly { readonly index: number; readonly date: string; readonly weekday: string; readonly start_local: string; readonly length_h: number }[];
  /** Local start time of each real hour of the run (the hourly arrays' index). */
  readonly hours: { readonly start_local: readonly string[] };
  /**
   * The local clock of the run: the UTC offset from the start and at each clock change, so a
   * reader maps any `*_h` to local wall-clock time (a 23-hour and a 25-hour day included). Always
   * written; optional only for results written before it existed.
   */
  readonly local_clock?: { readonly utc_offsets: readonly UtcOffsetSpan[] };
  readonly personas: readonly PersonaResult[];
  readonly warnings: readonly string[];
  /** What the run rests on: the weather source (and whether a weather file is near the site) and the measured-light days and filled gaps per person (run-basis.ts). Absent in results written before it existed. */
  readonly basis?: RunBasis;
  /** Present when a cohort was run (`zeitlight run --cohort n --seed s`). */
  readonly cohort?: CohortResults;
  /** Present when the model ensemble was run (the default of `zeitlight run`; off with --no-ensemble). */
  readonly ensemble?: RunEnsembleModels;
}

export interface CohortResults {
  readonly size: number;
  readonly seed: number;
  /** Between-occupant spread used (model/cohort CohortSpread). */
  readonly spread: { readonly intrinsicPeriodSd_h: number; readonly lightSensitivitySdLn: number; readonly ageRange_y: readonly [number, number] | null; readonly habitualMidSleepSd_h: number };
  /** Summary metric names summarised per strategy. */
  readonly metrics: readonly string[];
  /** Per persona: strategy id → metric → { n, missing, median, q25, q75, iqr, p05, p95 } (null without finite values). */
  readonly personas: readonly {
    readonly id: string;
    readonly summary: CohortSummary;
    /** Occupants actually run (fewer than size when the stop rule ended the cohort early). */
    readonly occupants_run?: number;
    /** Occupant count at which the stop rule held, or null (no rule, or never settled). */
    readonly converged_at?: number | null;
  }[];
  readonly note: string;
}
