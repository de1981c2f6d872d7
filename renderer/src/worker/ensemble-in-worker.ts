// The model ensemble in the simulation worker, after the default model's results are on screen:
// one job (persona × body-clock model) at a time, pausing between jobs so that a newer run request
// is taken at once; the ensemble of a superseded run is dropped.
import { assembleEnsemble, planEnsemble, runEnsembleJob, type EnsembleJobResult, type RunOutput } from '../../../schedules/run/index.js';
import { viewEnsembleFromResults, type ViewEnsemble } from '../results/ensemble-view.js';

/** Lets queued messages in (a macrotask, so a new run request is handled before the next job). */
export const yieldToMessages = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

/** The ensemble's ranges for the view, or null when `stillWanted` turned false on the way. */
export async function ensembleInPieces(out: RunOutput, stillWanted: () => boolean, pause: () => Promise<void> = yieldToMessages): Promise<ViewEnsemble | null> {
  const plan = planEnsemble(out);
  const done: EnsembleJobResult[] = [];
  for (const job of plan.jobs) {
    await pause();
    if (!stillWanted()) return null;
    done.push(runEnsembleJob(plan, job));
  }
  return viewEnsembleFromResults(assembleEnsemble(plan, done));
}
