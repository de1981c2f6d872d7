import { describe, expect, it } from 'vitest';
import { demoPart } from '../../../schedules/demo/demo-part.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import type { Scenario } from '../../../schedules/schema/scenario-types.js';
import { populationCohortSpread, zeroCohortSpread } from '../../../model/cohort/occupant-traits.js';
import { runScenario } from '../../../schedules/run/index.js';
import { cohortWorkerHandler } from './cohort-in-worker.js';
import type { CohortWorkerToPage } from './cohort-protocol.js';
import { occupantPerson, OccupantRunner, runOccupantJob } from './occupant-job.js';

function deskScenario(): Scenario {
  const small = demoPart(['desk-worker'], ['office-tunable-white']);
  const checked = validateScenarioValue(small);
  if (!checked.ok || checked.scenario === undefined) throw new Error('demo subset invalid');
  return checked.scenario;
}

describe('a virtual occupant', () => {
  it('with zero spread is the persona itself: same numbers as the single-person run', () => {
    const scenario = deskScenario();
    const outcome = runOccupantJob(scenario, { personaId: 'desk-worker', seed: 3, occupantIndex: 5, spread: zeroCohortSpread() });
    const single = runScenario({ scenario, personaIds: ['desk-worker'] }).results.personas[0]!;
    const tunable = single.strategies.find((s) => s.id === 'office-tunable-white')!;
    expect(outcome.byStrategy['office-tunable-white']?.phaseShift_h).toBe(tunable.summary.mean_phase_shift_h);
    expect(outcome.byStrategy['office-tunable-white']?.melatoninSuppression_pct).toBe(tunable.summary.mean_melatonin_suppression_pct);
    expect(outcome.byStrategy['office-tunable-white']?.sleepDuration_h).toBe(tunable.summary.mean_sleep_duration_h);
    expect(outcome.byStrategy['office-tunable-white']?.phaseAngle_h).toBe(tunable.summary.mean_phase_angle_dlmo_to_sleep_h);
    expect(Object.keys(outcome.byStrategy).sort()).toEqual(['baseline', 'office-tunable-white']);
  }, 120_000);

  it('varies intrinsic period, light sensitivity and sleep timing within the scenario limits, the same for the same seed and index', () => {
    const scenario = deskScenario();
    const spread = populationCohortSpread(null);
    const a = occupantPerson(scenario, { personaId: 'desk-worker', seed: 11, occupantIndex: 2, spread });
    const b = occupantPerson(scenario, { personaId: 'desk-worker', seed: 11, occupantIndex: 2, spread });
    const c = occupantPerson(scenario, { personaId: 'desk-worker', seed: 11, occupantIndex: 3, spread });
    expect(a).toEqual(b);
    expect(a.person.intrinsicPeriod_h).not.toBe(c.person.intrinsicPeriod_h);
    expect(a.person.habitualMidSleepShift_h).not.toBe(c.person.habitualMidSleepShift_h);
    for (const p of [a.person, c.person]) {
      expect(p.intrinsicPeriod_h).toBeGreaterThanOrEqual(23);
      expect(p.intrinsicPeriod_h).toBeLessThanOrEqual(25.5);
      expect(p.lightSensitivity).toBeGreaterThanOrEqual(0.05);
      expect(p.lightSensitivity).toBeLessThanOrEqual(20);
    }
  });

  it('gives the same outcome from a runner that prepared the person before (cached light) as from a fresh one', () => {
    const scenario = deskScenario();
    const spread = populationCohortSpread(null);
    const runner = new OccupantRunner(scenario);
    runner.run({ personaId: 'desk-worker', seed: 5, occupantIndex: 0, spread });
    const again = runner.run({ personaId: 'desk-worker', seed: 5, occupantIndex: 1, spread });
    expect(again).toEqual(runOccupantJob(scenario, { personaId: 'desk-worker', seed: 5, occupantIndex: 1, spread }));
  }, 120_000);

  it('in the worker: a scenario with problems answers each job with a failure naming it', () => {
    const posted: CohortWorkerToPage[] = [];
    const handle = cohortWorkerHandler((m) => posted.push(m));
    handle({ type: 'init', scenario: { format: 'zeitlight-scenario' } });
    handle({ type: 'job', job: { personaId: 'x', seed: 1, occupantIndex: 0, spread: zeroCohortSpread() } });
    expect(posted).toEqual([{ type: 'failed', personaId: 'x', occupantIndex: 0, message: 'the scenario has problems to fix first' }]);
  });
});
