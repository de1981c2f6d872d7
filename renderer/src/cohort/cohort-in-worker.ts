// What a cohort worker does with each message: keep the validated scenario, run occupant jobs.
// Pure apart from `post`, so it is tested directly.
import type { Scenario } from '../../../schedules/schema/scenario-types.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import type { CohortWorkerToPage, PageToCohortWorker } from './cohort-protocol.js';
import { OccupantRunner } from './occupant-job.js';

export function cohortWorkerHandler(post: (message: CohortWorkerToPage) => void): (message: PageToCohortWorker) => void {
  let runner: OccupantRunner | null = null;
  let problem = 'no scenario was sent';
  return (message) => {
    if (message.type === 'init') {
      const checked = validateScenarioValue(message.scenario);
      const scenario: Scenario | null = checked.ok && checked.scenario !== undefined ? checked.scenario : null;
      runner = scenario === null ? null : new OccupantRunner(scenario);
      problem = scenario === null ? 'the scenario has problems to fix first' : '';
      return;
    }
    const { job } = message;
    try {
      if (runner === null) throw new Error(problem);
      post({ type: 'outcome', personaId: job.personaId, outcome: runner.run(job) });
    } catch (error) {
      post({ type: 'failed', personaId: job.personaId, occupantIndex: job.occupantIndex, message: error instanceof Error ? error.message : String(error) });
    }
  };
}
