// The status line at the foot of the side bar.
import type { ScenarioProblem } from '../../../schedules/validation/problem.js';
import type { ResultsState } from '../state/workspace-store.js';
import { runStatus } from './run-status.js';

export function RunStatusLine({ results, problems }: { results: ResultsState; problems: readonly ScenarioProblem[] }) {
  const status = runStatus(results, problems);
  return (
    <div className="run-status" role="status" aria-label="Results status">
      <span className={`run-state run-${status.tone}`}>{status.state}</span>
      <span className="run-reason">{status.reason}</span>
    </div>
  );
}
