/**
 * What a virtual occupant inherits from a persona and how far the cohort lets it vary.
 * How each trait enters the pipeline:
 *  - intrinsicPeriod_h: the oscillator's τ (model/circadian), hours.
 *  - lightSensitivity: the pacemaker's PersonParams.lightSensitivity and the melatonin pass's
 *    lightSensitivity — a multiplier on the native light input before Process L, I_eff = m · I
 *    (same meaning as the persona field of the scenario). Equivalent to dividing that person's
 *    ED50 by m. The cohort draws m around the persona's own value.
 *  - age_y: lens transmission in the light-at-the-eye step.
 *  - habitualMidSleepShift_h: moves every prescribed sleep episode (week routine or roster-placed;
 *    positive = later), duration kept except where it would reach work or commute, which stays
 *    awake; free (model-predicted) sleep is not shifted (schedules/run/cohort-sleep-shift.ts,
 *    docs/methods/cohort.md §2.4).
 */
import { HABITUAL_MID_SLEEP_SD_H, INTRINSIC_PERIOD_SD_H, LIGHT_SENSITIVITY_SD_LN } from './population-spread.js';

/** The persona's own values: the centre of its cohort. */
export interface PersonaTraits {
  intrinsicPeriod_h: number;
  /** 1 = typical; > 1 more sensitive to light. */
  lightSensitivity: number;
  age_y: number;
}

/** Between-occupant spread of a cohort. All zero / null = every occupant is the persona. */
export interface CohortSpread {
  intrinsicPeriodSd_h: number;
  /** SD of ln(light sensitivity multiplier). */
  lightSensitivitySdLn: number;
  /** Ages drawn uniformly in [min, max]; null keeps the persona's age. */
  ageRange_y: readonly [number, number] | null;
  habitualMidSleepSd_h: number;
}

export interface OccupantTraits {
  occupantIndex: number;
  intrinsicPeriod_h: number;
  lightSensitivity: number;
  age_y: number;
  habitualMidSleepShift_h: number;
}

/** Published between-person spreads (population-spread.ts); age stays the persona's unless a range is given. */
export function populationCohortSpread(ageRange_y: readonly [number, number] | null = null): CohortSpread {
  return {
    intrinsicPeriodSd_h: INTRINSIC_PERIOD_SD_H,
    lightSensitivitySdLn: LIGHT_SENSITIVITY_SD_LN,
    ageRange_y,
    habitualMidSleepSd_h: HABITUAL_MID_SLEEP_SD_H,
  };
}

/** No spread: every occupant equals the persona. */
export function zeroCohortSpread(): CohortSpread {
  return { intrinsicPeriodSd_h: 0, lightSensitivitySdLn: 0, ageRange_y: null, habitualMidSleepSd_h: 0 };
}

/** The occupant as the circadian pacemakers take a person (model/circadian PersonParams). */
export function pacemakerPersonOf(traits: OccupantTraits): { tau_h: number; lightSensitivity: number } {
  return { tau_h: traits.intrinsicPeriod_h, lightSensitivity: traits.lightSensitivity };
}
