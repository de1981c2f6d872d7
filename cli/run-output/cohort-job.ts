/**
 * One virtual occupant of a persona's cohort, run in a worker thread. The occupant's traits are
 * drawn inside the job (model/cohort, seeded per occupant index), so the result depends only on
 * the job and a cohort gives the same numbers for any number of workers. The persona's light at
 * the eye per strategy is prepared once per worker and persona (and age) and reused by every
 * occupant that worker runs (schedules/run/cohort-occupant.ts); each occupant then runs the
 * body-clock models and metrics for every strategy with its own intrinsic period, light
 * sensitivity and habitual sleep timing (shifted prescribed sleep, schedules/run/cohort-sleep-shift.ts).
 */
import type { OccupantOutcome } from '../../model/cohort/aggregate-cohort.js';
import type { CohortSpread, PersonaTraits } from '../../model/cohort/occupant-traits.js';
import { sampleOccupantTraits } from '../../model/cohort/sample-occupants.js';
import type { Scenario } from '../../schedules/index.js';
import type { RunInput } from '../../schedules/run/index.js';
import { prepareCohortPersona, runCohortOccupant, type CohortPersonaBase } from '../../schedules/run/cohort-occupant.js';

export interface CohortJob {
  readonly scenario: Scenario;
  readonly weather?: RunInput['weather'];
  readonly lightLogTexts?: RunInput['lightLogTexts'];
  readonly personaId: string;
  readonly seed: number;
  readonly occupantIndex: number;
  readonly spread: CohortSpread;
  /** Same for every job of one cohort run and persona: the worker's key for the prepared light. */
  readonly preparationKey: string;
}

/** Headline metrics of a cohort, per strategy (names as in results.json summaries). */
export const COHORT_METRICS = ['mean_phase_shift_h', 'mean_melatonin_suppression_pct', 'work_hours_kss_ge_7_share', 'mean_daytime_hours_ge_250_lx', 'mean_pre_sleep_mel_edi_lx', 'mean_phase_angle_dlmo_to_sleep_h', 'mean_sleep_duration_h'] as const;

export function personaTraitsOf(scenario: Scenario, personaId: string): PersonaTraits {
  const p = scenario.personas.find((x) => x.id === personaId);
  if (p === undefined) throw new Error(`no persona ${personaId}`);
  return { intrinsicPeriod_h: p.intrinsicPeriod_h, lightSensitivity: p.lightSensitivity, age_y: p.age_y };
}

/** Prepared personas kept by this worker (a few: one per persona and age of the current run). */
const prepared = new Map<string, CohortPersonaBase>();
const MAX_PREPARED = 8;

function preparedFor(job: CohortJob, age_y: number): CohortPersonaBase {
  const key = `${job.preparationKey}\u0000${age_y}`;
  let base = prepared.get(key);
  if (base === undefined) {
    const persona = job.scenario.personas.find((p) => p.id === job.personaId);
    const input: RunInput = { scenario: job.scenario, ...(job.weather !== undefined ? { weather: job.weather } : {}), ...(job.lightLogTexts !== undefined ? { lightLogTexts: job.lightLogTexts } : {}) };
    base = prepareCohortPersona(input, job.personaId, persona !== undefined && persona.age_y === age_y ? undefined : age_y);
    if (prepared.size >= MAX_PREPARED) prepared.clear();
    prepared.set(key, base);
  }
  return base;
}

export function runJob(job: CohortJob): OccupantOutcome {
  const traits = sampleOccupantTraits(personaTraitsOf(job.scenario, job.personaId), job.spread, job.seed, job.occupantIndex);
  // The scenario's own limits (schedules/schema personas-schema).
  const age_y = Math.min(110, Math.max(1, traits.age_y));
  const summaries = runCohortOccupant(preparedFor(job, age_y), {
    intrinsicPeriod_h: Math.min(25.5, Math.max(23, traits.intrinsicPeriod_h)),
    lightSensitivity: Math.min(20, Math.max(0.05, traits.lightSensitivity)),
    habitualMidSleepShift_h: traits.habitualMidSleepShift_h,
  });
  const byStrategy: Record<string, Record<string, number | null>> = {};
  for (const [id, summary] of Object.entries(summaries)) {
    const m: Record<string, number | null> = {};
    for (const k of COHORT_METRICS) m[k] = summary[k];
    byStrategy[id] = m;
  }
  return { occupantIndex: job.occupantIndex, byStrategy };
}
