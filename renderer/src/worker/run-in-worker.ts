// What the worker does with one run request: validate the scenario with the scenario format's
// own checks, run it through the results adapter and post the results, then run the model
// ensemble and post its ranges (dropped when a newer request has come in meanwhile). Pure apart
// from `post`, so it is tested directly.
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { runScenarioForView } from '../results/results-adapter.js';
import type { PageToWorker, WorkerToPage } from './simulation-protocol.js';
import { ensembleInPieces, yieldToMessages } from './ensemble-in-worker.js';

/** The newest run request seen; an ensemble still running for an older one stops. */
let newestRunId = -Infinity;

export async function handleRunRequest(request: PageToWorker, post: (message: WorkerToPage) => void, pause: () => Promise<void> = yieldToMessages): Promise<void> {
  const { runId } = request;
  newestRunId = runId;
  try {
    const validation = validateScenarioValue(request.scenario);
    post({ type: 'problems', runId, problems: validation.problems });
    if (!validation.ok || validation.scenario === undefined) return;
    const outcome = await runScenarioForView(validation.scenario, (fraction, stage) => post({ type: 'progress', runId, fraction, stage }));
    if (outcome.status === 'ready') {
      post({ type: 'results', runId, view: outcome.view });
      if (outcome.run !== undefined) {
        const ensemble = await ensembleInPieces(outcome.run, () => newestRunId === runId, pause).catch(() => null);
        if (ensemble !== null && newestRunId === runId) post({ type: 'ensemble', runId, ensemble });
      }
    } else if (outcome.status === 'unavailable') post({ type: 'unavailable', runId, message: outcome.message });
    else post({ type: 'failed', runId, message: outcome.message });
  } catch (error) {
    post({ type: 'failed', runId, message: error instanceof Error ? error.message : String(error) });
  }
}
