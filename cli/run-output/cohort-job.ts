/**
 * One virtual occupant of a persona's cohort, run in a worker thread: the persona's traits
 * replaced by the occupant's (intrinsic period, light sensitivity, age — model/cohort, seeded per
 * occupant), the whole pipeline run for that persona under every strategy, and the headline
 * metrics returned per strategy. The result depends only on the job, so a cohort gives the same
 * numbers for any number of workers. The habitual mid-sleep shift the cohort also draws is not
 * applied yet (the routine's sleep stays as written).
 */
import type { OccupantOutcome } from '../../model/cohort/aggregate-cohort.js';
import type { CohortSpread, PersonaTraits } from '../../model/cohort/occupant-traits.js';
import { sampleOccupantTraits } from '../../model/cohort/sample-occupants.js';
import type { Scenario } from '../../schedules/index.js';
import { runScenario, type RunInput } from '../../schedules/run/index.js';

export interface CohortJob {
  readonly scenario: Scenario;
  readonly weather?: RunInput['weather'];
  readonly lightLogTexts?: RunInput['lightLogTexts'];
  readonly personaId: string;
  readonly seed: number;
  readonly occupantIndex: number;
  readonly spread: CohortSpread;
}

/** Headline metrics of a cohort, per strategy (names as in results.json summaries). */
export const COHORT_METRICS = ['mean_phase_shift_h', 'mean_melatonin_suppression_pct', 'work_hours_kss_ge_7_share', 'mean_daytime_hours_ge_250_lx', 'mean_pre_sleep_mel_edi_lx', 'mean_phase_angle_dlmo_to_sleep_h'] as const;

export function personaTraitsOf(scenario: Scenario, personaId: string): PersonaTraits {
  const p = scenario.personas.find((x) => x.id === personaId);
  if (p === undefined) throw new Error(`no persona ${personaId}`);
  return { intrinsicPeriod_h: p.intrinsicPeriod_h, lightSensitivity: p.lightSensitivity, age_y: p.age_y };
}

export function runJob(job: CohortJob): OccupantOutcome {
  const traits = sampleOccupantTraits(personaTraitsOf(job.scenario, job.personaId), job.spread, job.seed, job.occupantIndex);
  const scenario: Scenario = {
    ...job.scenario,
    personas: job.scenario.personas.map((p) =>
      p.id === job.personaId ? { ...p, intrinsicPeriod_h: Math.min(25.5, Math.max(23, traits.intrinsicPeriod_h)), lightSensitivity: Math.min(20, Math.max(0.05, traits.lightSensitivity)), age_y: Math.min(100, Math.max(1, traits.age_y)) } : p,
    ),
  };
  const out = runScenario({ scenario, personaIds: [job.personaId], ...(job.weather !== undefined ? { weather: job.weather } : {}), ...(job.lightLogTexts !== undefined ? { lightLogTexts: job.lightLogTexts } : {}) });
  const persona = out.results.personas[0];
  const byStrategy: Record<string, Record<string, number | null>> = {};
  for (const s of persona?.strategies ?? []) {
    const m: Record<string, number | null> = {};
    for (const k of COHORT_METRICS) m[k] = s.summary[k];
    byStrategy[s.id] = m;
  }
  return { occupantIndex: job.occupantIndex, byStrategy };
}
