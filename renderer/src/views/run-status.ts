// The status line of the workspace in plain words: what the results on screen are (up to date,
// running and why, needing a run and why), with a longer reason beside it.
import type { ScenarioProblem } from '../../../schedules/validation/problem.js';
import type { ResultsState } from '../state/workspace-store.js';

export interface RunStatus {
  /** Short state: "Results up to date", "Running", "Needs fixes", "Needs a run", "Run failed". */
  readonly state: string;
  /** Why, in a sentence. */
  readonly reason: string;
  readonly tone: 'ready' | 'running' | 'failed' | 'idle';
}

export function runStatus(results: ResultsState, problems: readonly ScenarioProblem[]): RunStatus {
  const errors = problems.filter((p) => p.severity === 'error').length;
  switch (results.status) {
    case 'ready':
      return { state: 'Results up to date', reason: 'The results show the scenario as it is now.', tone: 'ready' };
    case 'running':
      return {
        state: 'Running',
        reason: results.previous === null ? `First run of this scenario (${results.stage}).` : `After your edit (${results.stage}); the results shown are from before it.`,
        tone: 'running',
      };
    case 'failed':
      return errors > 0
        ? { state: 'Needs fixes', reason: `${errors} problem${errors === 1 ? '' : 's'} in the scenario to fix before it can run (listed at the top of the page).`, tone: 'failed' }
        : { state: 'Run failed', reason: results.message, tone: 'failed' };
    case 'unavailable':
      return { state: 'Needs a run', reason: results.message, tone: 'idle' };
    case 'idle':
      return { state: 'Needs a run', reason: 'Waiting to start: the run begins once the scenario has been checked.', tone: 'idle' };
  }
}
