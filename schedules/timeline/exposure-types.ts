/**
 * The expanded scenario: for each persona × strategy, a continuous exposure timeline in real
 * minutes from the run start (local midnight of the first day), made of slices during which
 * the person's situation does not change. Sampling it minute by minute gives the per-minute
 * exposure series; the light models turn each minute into light at the eye.
 */
import type { Activity, Gaze, Posture } from '../schema/personas-schema.js';
import type { Weekday } from '../schema/primitives.js';
import type { Scenario } from '../schema/scenario-types.js';

/** asleep: prescribed sleep, eyes closed; awake: must be awake; free: the sleep model decides. */
export type SleepState = 'asleep' | 'awake' | 'free';
export type DayKind = 'day' | 'evening' | 'night' | 'rest';
export type CommuteDirection = 'to-work' | 'from-work';
export type SliceOrigin = 'default' | 'routine' | 'roster' | 'strategy';

/** What the person is doing and where — everything the light models need besides the clock. */
export interface ExposureState {
  readonly placeId: string;
  readonly activity: Activity;
  readonly posture: Posture;
  readonly gaze: Gaze;
  readonly gazeAzimuth_deg: number | null;
  /** A screen in the room or one of the persona's devices; null when none is in use. */
  readonly screenId: string | null;
  /** Fraction of the screen's stated luminance. */
  readonly screenBrightness: number;
  readonly eyewearId: string | null;
  readonly sleep: SleepState;
  /** Roster day kind this stretch belongs to (a night shift's journey home is "night"); null without a roster. */
  readonly shiftKind: DayKind | null;
  readonly commute: CommuteDirection | null;
  readonly origin: SliceOrigin;
  /** When set, a measured light log replaces the modelled light at the eye. */
  readonly measuredLogId: string | null;
}

export interface ExposureSlice extends ExposureState {
  /** Real minutes since the run start, [start_min, end_min). */
  readonly start_min: number;
  readonly end_min: number;
}

export interface TimelineDay {
  readonly index: number;
  /** Local date "YYYY-MM-DD" at the site. */
  readonly date: string;
  readonly weekday: Weekday;
  /** Real minutes from the run start to this local midnight. */
  readonly start_min: number;
  /** 1440, or 1380 / 1500 on the days clocks change. */
  readonly length_min: number;
  readonly utcStart_ms: number;
  /** Roster day kind, or null without a roster. */
  readonly dayKind: DayKind | null;
}

export interface ExposureTimeline {
  readonly personaId: string;
  /** "baseline" or a strategy identifier. */
  readonly strategyId: string;
  readonly timeZone: string;
  readonly runStartUtc_ms: number;
  readonly total_min: number;
  readonly days: readonly TimelineDay[];
  /** Contiguous, ordered slices covering [0, total_min) exactly. */
  readonly slices: readonly ExposureSlice[];
}

export interface StrategyVariant {
  readonly id: string;
  readonly name: string;
  /** Plain-language list of what this strategy changes relative to the baseline. */
  readonly changes: readonly string[];
  /** The scenario with this strategy's place, luminaire and screen changes applied. */
  readonly scenario: Scenario;
  readonly personaIds: readonly string[];
}

export interface ExpandedScenario {
  readonly baseline: Scenario;
  /** The baseline first (id "baseline"), then each strategy. */
  readonly variants: readonly StrategyVariant[];
  /** One per persona × variant the variant applies to. */
  readonly timelines: readonly ExposureTimeline[];
}

export const BASELINE_ID = 'baseline';
