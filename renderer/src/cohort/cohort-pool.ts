// Runs a cohort on a pool of workers: occupant jobs handed out one at a time to whichever
// worker is free, outcomes fed to model/cohort's convergence readout in occupant order, a stop
// when the running median and IQR of every metric change by less than the tolerance over the
// last batch (optional), and summaries over occupants 0 … k − 1 only — so the result depends on
// the seed and the occupant count, never on the number of workers or their timing.
import { aggregateCohort, type CohortSummary } from '../../../model/cohort/aggregate-cohort.js';
import type { OccupantClockSeries } from '../../../schedules/run/index.js';
import { CohortConvergence, DEFAULT_COHORT_CONVERGENCE, type ConvergenceCheckpoint, type ConvergenceOptions } from '../../../model/cohort/convergence.js';
import type { CohortSpread } from '../../../model/cohort/occupant-traits.js';
import type { CohortWorkerToPage, PageToCohortWorker } from './cohort-protocol.js';
import type { OccupantOutcomeWithSeries } from './occupant-job.js';

/** The members of a Web Worker the pool uses (tests pass fakes). */
export interface WorkerLike {
  postMessage(message: PageToCohortWorker): void;
  onmessage: ((event: { data: CohortWorkerToPage }) => void) | null;
  onerror: ((event: { message: string }) => void) | null;
  terminate(): void;
}

export interface CohortRequest {
  readonly scenario: unknown;
  readonly personaIds: readonly string[];
  /** Occupants per persona (the most; fewer when the stop rule holds first). */
  readonly size: number;
  readonly seed: number;
  readonly spread: CohortSpread;
  readonly stopRule: boolean;
}

export type StopReason = 'converged' | 'all-occupants' | 'stopped';

export interface PersonaCohort {
  readonly personaId: string;
  readonly occupants: number;
  readonly stopReason: StopReason;
  readonly summary: CohortSummary;
  readonly checkpoints: readonly ConvergenceCheckpoint[];
  /** Body clock per strategy of the summarised occupants that kept it (the first SERIES_OCCUPANTS_MAX), in occupant order. */
  readonly series: readonly Readonly<Record<string, OccupantClockSeries>>[];
}

export interface CohortProgress {
  readonly personaId: string;
  /** Occupants of this persona finished (any order). */
  readonly completed: number;
  readonly size: number;
  /** Occupants of all personas finished, and the total planned. */
  readonly overallCompleted: number;
  readonly overallTotal: number;
  readonly checkpoint: ConvergenceCheckpoint | null;
  /**
   * Every readout this outcome completed, in order: one outcome that fills a gap (an earlier
   * occupant finishing after later ones) can complete several batches at once.
   */
  readonly newCheckpoints: readonly ConvergenceCheckpoint[];
  readonly workers: number;
}

export interface CohortOutcome {
  readonly personas: readonly PersonaCohort[];
  readonly workers: number;
  readonly failures: readonly string[];
}

/** Batch and minimum size of the stop rule for a cohort of `size` (model/cohort defaults at ≥ 500). */
export function convergenceOptionsFor(size: number): ConvergenceOptions {
  const batchSize = Math.min(DEFAULT_COHORT_CONVERGENCE.batchSize, Math.max(5, Math.round(size / 10)));
  return { ...DEFAULT_COHORT_CONVERGENCE, batchSize, minOccupants: Math.min(DEFAULT_COHORT_CONVERGENCE.minOccupants ?? 200, 4 * batchSize) };
}

interface PersonaState {
  readonly personaId: string;
  readonly convergence: CohortConvergence;
  readonly outcomes: OccupantOutcomeWithSeries[];
  next: number;
  completed: number;
  /** Occupant count the summary uses once decided. */
  finalCount: number | null;
  stopReason: StopReason | null;
}

export function runCohortOnPool(
  createWorker: () => WorkerLike,
  workerCount: number,
  request: CohortRequest,
  onProgress: (progress: CohortProgress) => void,
): { readonly done: Promise<CohortOutcome>; stop(): void } {
  const workers = Math.max(1, Math.min(workerCount, request.size * request.personaIds.length));
  const personas: PersonaState[] = request.personaIds.map((personaId) => ({
    personaId,
    convergence: new CohortConvergence(convergenceOptionsFor(request.size)),
    outcomes: [],
    next: 0,
    completed: 0,
    finalCount: null,
    stopReason: null,
  }));
  const failures: string[] = [];
  const pool: WorkerLike[] = [];
  const busy = new Set<WorkerLike>();
  let overallCompleted = 0;
  const overallTotal = request.size * personas.length;
  let finish: (outcome: CohortOutcome) => void = () => {};
  let finished = false;
  const done = new Promise<CohortOutcome>((resolve) => (finish = resolve));

  const result = (): CohortOutcome => ({
    workers,
    failures,
    personas: personas.map((p) => {
      const count = p.finalCount ?? p.convergence.contiguousOccupants;
      const outcomes = p.outcomes.slice(0, count);
      const series = outcomes.flatMap((o) => (o.series === undefined ? [] : [o.series]));
      return { personaId: p.personaId, occupants: count, stopReason: p.stopReason ?? 'stopped', summary: aggregateCohort(outcomes), checkpoints: p.convergence.checkpoints.filter((c) => c.occupants <= count), series };
    }),
  });

  const end = () => {
    if (finished) return;
    finished = true;
    for (const w of pool) w.terminate();
    finish(result());
  };

  const nextJob = (): { persona: PersonaState; index: number } | null => {
    for (const p of personas) {
      if (p.finalCount !== null) continue;
      if (p.next < request.size) return { persona: p, index: p.next++ };
    }
    return null;
  };

  const dispatch = (w: WorkerLike) => {
    if (finished) return;
    const job = nextJob();
    if (job === null) {
      busy.delete(w);
      if (busy.size === 0) end();
      return;
    }
    busy.add(w);
    w.postMessage({ type: 'job', job: { personaId: job.persona.personaId, seed: request.seed, occupantIndex: job.index, spread: request.spread } });
  };

  const settle = (p: PersonaState) => {
    if (p.finalCount !== null) return;
    const stopAt = p.convergence.stopAt;
    if (request.stopRule && stopAt !== null) {
      p.finalCount = stopAt;
      p.stopReason = 'converged';
    } else if (p.convergence.contiguousOccupants >= request.size) {
      p.finalCount = request.size;
      p.stopReason = 'all-occupants';
    }
  };

  const onMessage = (w: WorkerLike, message: CohortWorkerToPage) => {
    if (finished) return;
    const p = personas.find((x) => x.personaId === message.personaId);
    if (p === undefined) return;
    let outcome: OccupantOutcomeWithSeries;
    if (message.type === 'failed') {
      failures.push(`${message.personaId}, occupant ${message.occupantIndex}: ${message.message}`);
      // A failed occupant counts with no values (missing), so later occupants still count.
      outcome = { occupantIndex: message.occupantIndex, byStrategy: {} };
    } else outcome = message.outcome;
    p.outcomes[outcome.occupantIndex] = outcome;
    p.completed += 1;
    overallCompleted += 1;
    const checkpoints = p.convergence.add(outcome);
    settle(p);
    onProgress({ personaId: p.personaId, completed: p.completed, size: request.size, overallCompleted, overallTotal, checkpoint: checkpoints[checkpoints.length - 1] ?? null, newCheckpoints: checkpoints, workers });
    dispatch(w);
  };

  for (let i = 0; i < workers; i++) {
    const w = createWorker();
    pool.push(w);
    w.onmessage = (event) => onMessage(w, event.data);
    w.onerror = (event) => {
      failures.push(`a cohort worker stopped: ${event.message}`);
      end();
    };
    w.postMessage({ type: 'init', scenario: request.scenario });
  }
  for (const w of pool) dispatch(w);
  return {
    done,
    stop: () => {
      for (const p of personas) {
        if (p.finalCount === null) {
          p.finalCount = p.convergence.contiguousOccupants;
          p.stopReason = 'stopped';
        }
      }
      end();
    },
  };
}
