// One virtual occupant of a persona's cohort, run inside a Web Worker: the persona's intrinsic
// period, light sensitivity and age replaced by the occupant's draw (model/cohort, one seeded
// stream per occupant, so the result depends only on seed and occupant index — never on which
// worker ran it), the pipeline run for that persona under the baseline and every strategy, and
// the cohort metrics returned per strategy. Pure: no DOM, no worker API.
import type { CohortSpread, PersonaTraits } from '../../../model/cohort/occupant-traits.js';
import type { OccupantOutcome } from '../../../model/cohort/aggregate-cohort.js';
import { sampleOccupantTraits } from '../../../model/cohort/sample-occupants.js';
import type { Scenario } from '../../../schedules/schema/scenario-types.js';
import { runScenario, type StrategyResult } from '../../../schedules/run/index.js';
import { clockHoursOfLocal } from '../results/results-adapter.js';

export interface OccupantJob {
  readonly personaId: string;
  readonly seed: number;
  readonly occupantIndex: number;
  readonly spread: CohortSpread;
}

/** The metrics each occupant reports, keyed as model/cohort's convergence tolerances. */
export const COHORT_METRICS = [
  { id: 'phaseShift_h', label: 'Body-clock shift vs baseline', unit: 'h', decimals: 2 },
  { id: 'melatoninSuppression_pct', label: 'Melatonin suppression per night', unit: '%', decimals: 1 },
  { id: 'kss7Share_pct', label: 'Work time at KSS ≥ 7', unit: '%', decimals: 1 },
  { id: 'sleepOnset_h', label: 'Sleep onset (mean local clock, last 7 days)', unit: 'h', decimals: 2 },
  { id: 'dlmo_h', label: 'DLMO (last day, local clock)', unit: 'h', decimals: 2 },
] as const;

export type CohortMetricId = (typeof COHORT_METRICS)[number]['id'];

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

/** Mean local clock time of sleep onset over the last `days` days that have one (evening onsets keep their order past midnight). */
function meanSleepOnset_h(s: StrategyResult, days = 7): number | null {
  const values = s.days
    .slice(-days)
    .map((d) => clockHoursOfLocal(d.sleep_onset_local))
    .filter((v): v is number => v !== null);
  return values.length === 0 ? null : values.reduce((a, b) => a + b, 0) / values.length;
}

function lastDlmo_h(s: StrategyResult): number | null {
  for (let i = s.days.length - 1; i >= 0; i--) {
    const h = clockHoursOfLocal(s.days[i]?.dlmo_local ?? null);
    if (h !== null) return h;
  }
  return null;
}

export function occupantScenario(scenario: Scenario, job: OccupantJob): Scenario {
  const traits = sampleOccupantTraits(personaTraitsOf(scenario, job.personaId), job.spread, job.seed, job.occupantIndex);
  return {
    ...scenario,
    personas: scenario.personas.map((p) =>
      p.id === job.personaId
        ? { ...p, intrinsicPeriod_h: clamp(traits.intrinsicPeriod_h, PERIOD_LIMITS_H), lightSensitivity: clamp(traits.lightSensitivity, SENSITIVITY_LIMITS), age_y: clamp(traits.age_y, AGE_LIMITS_Y) }
        : p,
    ),
  };
}

export function runOccupantJob(scenario: Scenario, job: OccupantJob): OccupantOutcome {
  const out = runScenario({ scenario: occupantScenario(scenario, job), personaIds: [job.personaId] });
  const persona = out.results.personas.find((p) => p.id === job.personaId);
  const byStrategy: Record<string, Record<CohortMetricId, number | null>> = {};
  for (const s of persona?.strategies ?? []) {
    const m = s.summary;
    byStrategy[s.id] = {
      phaseShift_h: m.mean_phase_shift_h,
      melatoninSuppression_pct: m.mean_melatonin_suppression_pct,
      kss7Share_pct: m.work_hours_kss_ge_7_share === null ? null : m.work_hours_kss_ge_7_share * 100,
      sleepOnset_h: meanSleepOnset_h(s),
      dlmo_h: lastDlmo_h(s),
    };
  }
  return { occupantIndex: job.occupantIndex, byStrategy };
}
