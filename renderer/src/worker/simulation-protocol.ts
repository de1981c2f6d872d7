// Messages between the page and the simulation worker.
import type { ScenarioProblem } from '../../../schedules/validation/problem.js';
import type { ResultsView } from '../results/view-model.js';

export type PageToWorker = { readonly type: 'run'; readonly runId: number; readonly scenario: unknown };

export type WorkerToPage =
  | { readonly type: 'progress'; readonly runId: number; readonly fraction: number; readonly stage: string }
  | { readonly type: 'problems'; readonly runId: number; readonly problems: readonly ScenarioProblem[] }
  | { readonly type: 'results'; readonly runId: number; readonly view: ResultsView }
  | { readonly type: 'unavailable'; readonly runId: number; readonly message: string }
  | { readonly type: 'failed'; readonly runId: number; readonly message: string };
