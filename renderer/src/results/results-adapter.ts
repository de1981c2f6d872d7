// The one bridge between the run pipeline and the results views: runs a validated scenario
// and maps the pipeline's results to the renderer's ResultsView. When the results format
// changes, only this file changes.
//
// The run pipeline ("scenario → exposures → model → results") is not part of schedules/ yet;
// until it is, this reports that results are unavailable. Wiring it in:
//   1. import the pipeline entry from schedules/ (it must be pure: it runs in a Web Worker);
//   2. pass `onProgress` through so the progress bar moves;
//   3. map its results (per persona × strategy: light at the eye per source, CBTmin/DLMO per
//      day, melatonin, KSS per hour, sleep episodes, metrics) to ResultsView below.
import type { Scenario } from '../../../schedules/schema/scenario-types.js';
import type { ResultsView } from './view-model.js';

export type PipelineOutcome =
  | { readonly status: 'ready'; readonly view: ResultsView }
  | { readonly status: 'unavailable'; readonly message: string }
  | { readonly status: 'failed'; readonly message: string };

export type ProgressReport = (fraction: number, stage: string) => void;

export const PIPELINE_NOT_CONNECTED = 'Results will appear here once the simulation engine is connected to the workspace.';

export async function runScenarioForView(scenario: Scenario, onProgress: ProgressReport): Promise<PipelineOutcome> {
  onProgress(0, `Preparing ${scenario.personas.length} people × ${1 + scenario.strategies.length} strategies`);
  return { status: 'unavailable', message: PIPELINE_NOT_CONNECTED };
}
