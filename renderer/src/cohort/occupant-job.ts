// One virtual occupant of a persona's cohort, run inside a Web Worker through the pipeline's
// per-occupant entry (schedules/run/cohort-occupant.ts): the persona's light at the eye under
// every strategy is prepared once per worker (and per drawn age, as lens transmission differs),
// then each occupant runs only the body-clock models and metrics with its own intrinsic period,
// light sensitivity and habitual sleep timing (model/cohort, one seeded stream per occupant, so
// the result depends only on seed and occupant index — never on which worker ran it). Pure: no
// DOM, no worker API.
import type { CohortSpread, PersonaTraits } from '../../../model/cohort/occupant-traits.js';
import type { OccupantOutcome } from '../../../model/cohort/aggregate-cohort.js';
import { sampleOccupantTraits } from '../../../model/cohort/sample-occupants.js';
import type { Scenario } from '../../../schedules/schema/scenario-types.js';
import { prepareCohortPersona, runCohortOccupantWithSeries, type CohortPerson, type CohortPersonaBase, type OccupantClockSeries } from '../../../schedules/run/index.js';

export interface OccupantJob {
  readonly personaId: string;
  readonly seed: number;
  readonly occupantIndex: number;
  readonly spread: CohortSpread;
}

/** The metrics each occupant reports (strategy summaries of the results format), keyed as model/cohort's convergence tolerances. */
export const COHORT_METRICS = [
  { id: 'phaseShift_h', label: 'Body-clock shift vs baseline', unit: 'h', decimals: 2 },
  { id: 'melatoninSuppression_pct', label: 'Melatonin suppression per night', unit: '%', decimals: 1 },
  { id: 'kss7Share_pct', label: 'Work time at KSS ≥ 7', unit: '%', decimals: 1 },
  { id: 'phaseAngle_h', label: 'DLMO to sleep onset (sleep timing)', unit: 'h', decimals: 2 },
  { id: 'sleepDuration_h', label: 'Main sleep', unit: 'h', decimals: 2 },
] as const;

export type CohortMetricId = (typeof COHORT_METRICS)[number]['id'];

/**
 * Occupants whose body-clock markers and melatonin curve are kept for the cohort bands on the
 * Body clock and Melatonin charts (the first ones in order; a few MB at most).
 */
export const SERIES_OCCUPANTS_MAX = 500;

/** An occupant's outcome with, for the first SERIES_OCCUPANTS_MAX occupants, its body clock per strategy. */
export interface OccupantOutcomeWithSeries extends OccupantOutcome {
  readonly series?: Readonly<Record<string, OccupantClockSeries>>;
}

/** Scenario limits of the traits (schedules/schema/personas-schema.ts). */
const PERIOD_LIMITS_H = [23, 25.5] as const;
const SENSITIVITY_LIMITS = [0.05, 20] as const;
const AGE_LIMITS_Y = [1, 110] as const;
const clamp = (x: number, [lo, hi]: readonly [number, number]) => Math.min(hi, Math.max(lo, x));

export function personaTraitsOf(scenario: Scenario, personaId: string): PersonaTraits {
  const p = scenario.personas.find((x) => x.id === personaId);
  if (p === undefined) throw new Error(`cohort: no persona "${personaId}" in the scenario`);
  return { intrinsicPeriod_h: p.intrinsicPeriod_h, lightSensitivity: p.lightSensitivity, age_y: p.age_y };
}

/** The occupant's drawn traits, clamped to the scenario's limits. */
export function occupantPerson(scenario: Scenario, job: OccupantJob): { age_y: number; person: CohortPerson } {
  const traits = sampleOccupantTraits(personaTraitsOf(scenario, job.personaId), job.spread, job.seed, job.occupantIndex);
  return {
    age_y: clamp(traits.age_y, AGE_LIMITS_Y),
    person: { intrinsicPeriod_h: clamp(traits.intrinsicPeriod_h, PERIOD_LIMITS_H), lightSensitivity: clamp(traits.lightSensitivity, SENSITIVITY_LIMITS), habitualMidSleepShift_h: traits.habitualMidSleepShift_h },
  };
}

/** Runs occupants of one scenario, keeping each persona's prepared light (a few ages at most). */
export class OccupantRunner {
  private readonly prepared = new Map<string, CohortPersonaBase>();
  private static readonly MAX_PREPARED = 8;

  constructor(private readonly scenario: Scenario) {}

  private preparedFor(personaId: string, age_y: number): CohortPersonaBase {
    const key = `${personaId}\u0000${age_y}`;
    let base = this.prepared.get(key);
    if (base === undefined) {
      const own = this.scenario.personas.find((p) => p.id === personaId)?.age_y;
      base = prepareCohortPersona({ scenario: this.scenario }, personaId, own === age_y ? undefined : age_y);
      if (this.prepared.size >= OccupantRunner.MAX_PREPARED) this.prepared.clear();
      this.prepared.set(key, base);
    }
    return base;
  }

  run(job: OccupantJob): OccupantOutcomeWithSeries {
    const { age_y, person } = occupantPerson(this.scenario, job);
    const { summaries, series } = runCohortOccupantWithSeries(this.preparedFor(job.personaId, age_y), person);
    const byStrategy: Record<string, Record<CohortMetricId, number | null>> = {};
    for (const [id, m] of Object.entries(summaries)) {
      byStrategy[id] = {
        phaseShift_h: m.mean_phase_shift_h,
        melatoninSuppression_pct: m.mean_melatonin_suppression_pct,
        kss7Share_pct: m.work_hours_kss_ge_7_share === null ? null : m.work_hours_kss_ge_7_share * 100,
        phaseAngle_h: m.mean_phase_angle_dlmo_to_sleep_h,
        sleepDuration_h: m.mean_sleep_duration_h,
      };
    }
    return job.occupantIndex < SERIES_OCCUPANTS_MAX ? { occupantIndex: job.occupantIndex, byStrategy, series } : { occupantIndex: job.occupantIndex, byStrategy };
  }
}

export function runOccupantJob(scenario: Scenario, job: OccupantJob): OccupantOutcomeWithSeries {
  return new OccupantRunner(scenario).run(job);
}
