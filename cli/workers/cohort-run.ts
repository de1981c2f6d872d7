/**
 * Runs a cohort on the job pool: every job yields one occupant's outcome (per-strategy headline
 * metrics); outcomes feed the convergence readout as they stream in, the pool stops at the first
 * converged checkpoint (if a stop rule is given), and the kept outcomes are summarised per
 * strategy. Checkpoints and the stop point depend only on the occupant-ordered prefix, so the
 * whole result is the same for any number of workers.
 */
import { aggregateCohort, type CohortSummary, type OccupantOutcome } from '../../model/cohort/aggregate-cohort.js';
import { CohortConvergence, type ConvergenceCheckpoint, type ConvergenceOptions } from '../../model/cohort/convergence.js';
import { runJobPool } from './job-pool.js';

export interface CohortProgress {
  /** Occupants finished (any order). */
  completed: number;
  /** Occupants that will run (shrinks when the stop rule fires). */
  total: number;
  /** Checkpoints completed by this occupant, in order (often none). */
  checkpoints: readonly ConvergenceCheckpoint[];
}

export interface CohortRunOptions<J> {
  /** One job per occupant; job i must produce the outcome with occupantIndex i. */
  jobs: readonly J[];
  jobModule: URL | string;
  exportName?: string;
  workers?: number;
  /** Stop rule; without it every job runs (checkpoints are still reported if given). */
  convergence?: ConvergenceOptions & { stopWhenConverged: boolean };
  onProgress?: (progress: CohortProgress) => void;
  /** Cancels the run (the promise rejects). */
  signal?: AbortSignal;
}

export interface CohortRun {
  outcomes: OccupantOutcome[];
  summary: CohortSummary;
  checkpoints: readonly ConvergenceCheckpoint[];
  /** Occupant count where the stop rule held, or null. */
  convergedAt: number | null;
  workers: number;
}

export async function runCohortPool<J>(options: CohortRunOptions<J>): Promise<CohortRun> {
  const tracker = options.convergence === undefined ? null : new CohortConvergence(options.convergence);
  const stopWhenConverged = options.convergence?.stopWhenConverged ?? false;
  const run = await runJobPool<J, OccupantOutcome>({
    jobs: options.jobs,
    jobModule: options.jobModule,
    ...(options.exportName === undefined ? {} : { exportName: options.exportName }),
    ...(options.workers === undefined ? {} : { workers: options.workers }),
    ...(options.signal === undefined ? {} : { signal: options.signal }),
    onResult: (event, control) => {
      if (event.result.occupantIndex !== event.index) {
        throw new Error(`job ${event.index} returned the outcome of occupant ${event.result.occupantIndex}`);
      }
      const checkpoints = tracker === null ? [] : tracker.add(event.result);
      let total = event.total;
      if (stopWhenConverged && tracker !== null && tracker.stopAt !== null && tracker.stopAt < total) {
        total = tracker.stopAt;
        control.stopAfter(total);
      }
      options.onProgress?.({ completed: Math.min(event.completed, total), total, checkpoints });
    },
  });
  return {
    outcomes: run.results,
    summary: aggregateCohort(run.results),
    checkpoints: tracker === null ? [] : tracker.checkpoints.filter((c) => c.occupants <= run.results.length),
    convergedAt: tracker?.stopAt ?? null,
    workers: run.workers,
  };
}
