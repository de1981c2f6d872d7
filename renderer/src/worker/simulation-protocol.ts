// Messages between the page and the simulation worker.
import type { ScenarioProblem } from '../../../schedules/validation/problem.js';
import type { ResultsView } from '../results/view-model.js';
import type { ViewEnsemble } from '../results/ensemble-view.js';

export type PageToWorker = { readonly type: 'run'; readonly runId: number; readonly scenario: unknown };

export type WorkerToPage =
  | { readonly type: 'progress'; readonly runId: number; readonly fraction: number; readonly stage: string }
  | { readonly type: 'problems'; readonly runId: number; readonly problems: readonly ScenarioProblem[] }
  | { readonly type: 'results'; readonly runId: number; readonly view: ResultsView }
  /** After 'results': the ranges across the model ensemble for that run's view. */
  | { readonly type: 'ensemble'; readonly runId: number; readonly ensemble: ViewEnsemble }
  | { readonly type: 'unavailable'; readonly runId: number; readonly message: string }
  | { readonly type: 'failed'; readonly runId: number; readonly message: string };
