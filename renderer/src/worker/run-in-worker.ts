// What the worker does with one run request: validate the scenario with the scenario format's
// own checks, then run it through the results adapter. Pure apart from `post`, so it is tested
// directly.
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { runScenarioForView } from '../results/results-adapter.js';
import type { PageToWorker, WorkerToPage } from './simulation-protocol.js';

export async function handleRunRequest(request: PageToWorker, post: (message: WorkerToPage) => void): Promise<void> {
  const { runId } = request;
  try {
    const validation = validateScenarioValue(request.scenario);
    post({ type: 'problems', runId, problems: validation.problems });
    if (!validation.ok || validation.scenario === undefined) return;
    const outcome = await runScenarioForView(validation.scenario, (fraction, stage) => post({ type: 'progress', runId, fraction, stage }));
    if (outcome.status === 'ready') post({ type: 'results', runId, view: outcome.view });
    else if (outcome.status === 'unavailable') post({ type: 'unavailable', runId, message: outcome.message });
    else post({ type: 'failed', runId, message: outcome.message });
  } catch (error) {
    post({ type: 'failed', runId, message: error instanceof Error ? error.message : String(error) });
  }
}
