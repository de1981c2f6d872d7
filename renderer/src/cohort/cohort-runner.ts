// The cohort run of the workspace: settings, progress with the convergence readout, and the
// finished ranges, in a small external store (useSyncExternalStore). Workers are created by an
// injected factory (Web Workers in the app, fakes in tests).
import { populationCohortSpread } from '../../../model/cohort/occupant-traits.js';
import type { ConvergenceCheckpoint } from '../../../model/cohort/convergence.js';
import type { ScenarioInput } from '../scenario/scenario-types.js';
import { runCohortOnPool, type CohortOutcome, type WorkerLike } from './cohort-pool.js';
import type { ActivityLog } from '../state/activity-log.js';

export interface CohortSettings {
  /** Occupants per person (the most; the stop rule may end sooner). */
  readonly size: number;
  readonly seed: number;
  readonly personaIds: readonly string[];
  readonly stopRule: boolean;
  /** Ages drawn uniformly in this range (lens transmission); null keeps each persona's age. */
  readonly ageRange_y: readonly [number, number] | null;
}

export interface PersonaProgress {
  readonly completed: number;
  readonly size: number;
  readonly checkpoint: ConvergenceCheckpoint | null;
}

export type CohortState =
  | { readonly status: 'idle' }
  | { readonly status: 'running'; readonly settings: CohortSettings; readonly workers: number; readonly completed: number; readonly total: number; readonly personas: Readonly<Record<string, PersonaProgress>> }
  | { readonly status: 'done'; readonly settings: CohortSettings; readonly outcome: CohortOutcome; readonly scenario: ScenarioInput; readonly elapsed_s: number };

export const DEFAULT_COHORT_SETTINGS: Omit<CohortSettings, 'personaIds'> = { size: 200, seed: 1, stopRule: true, ageRange_y: null };

export class CohortRunner {
  private state: CohortState = { status: 'idle' };
  private readonly listeners = new Set<() => void>();
  private current: { stop(): void } | null = null;

  constructor(
    private readonly createWorker: () => WorkerLike,
    private readonly workerCount: () => number,
    private readonly now: () => number = () => performance.now(),
    /** Where progress and readouts are recorded for later reading (tests, run records). */
    private readonly activity: ActivityLog | null = null,
  ) {}

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = (): CohortState => this.state;

  private set(state: CohortState): void {
    this.state = state;
    for (const l of this.listeners) l();
  }

  start(scenario: ScenarioInput, settings: CohortSettings): Promise<CohortOutcome> {
    this.current?.stop();
    const started = this.now();
    const workers = Math.max(1, this.workerCount());
    const personas: Record<string, PersonaProgress> = Object.fromEntries(settings.personaIds.map((id) => [id, { completed: 0, size: settings.size, checkpoint: null }]));
    const total = settings.size * settings.personaIds.length;
    this.set({ status: 'running', settings, workers: Math.min(workers, total), completed: 0, total, personas });
    this.activity?.record('cohort-started', { total, workers: Math.min(workers, total), seed: settings.seed });
    const run = runCohortOnPool(this.createWorker, workers, { scenario, personaIds: settings.personaIds, size: settings.size, seed: settings.seed, spread: populationCohortSpread(settings.ageRange_y), stopRule: settings.stopRule }, (p) => {
      const s = this.state;
      if (s.status !== 'running' || this.current !== run) return;
      const before = s.personas[p.personaId];
      // every readout in order, also when one outcome completes several batches at once
      for (const checkpoint of p.newCheckpoints) {
        this.activity?.record('cohort-readout', { personaId: p.personaId, completed: p.completed, occupants: checkpoint.occupants, metrics: Object.keys(checkpoint.metrics).length, converged: checkpoint.converged });
      }
      this.set({ ...s, completed: p.overallCompleted, personas: { ...s.personas, [p.personaId]: { completed: p.completed, size: p.size, checkpoint: p.checkpoint ?? before?.checkpoint ?? null } } });
    });
    this.current = run;
    return run.done.then((outcome) => {
      if (this.current === run) {
        this.current = null;
        const elapsed_s = (this.now() - started) / 1000;
        this.activity?.record('cohort-finished', { occupants: outcome.personas.reduce((n, pc) => n + pc.occupants, 0), workers: outcome.workers, elapsed_s });
        this.set({ status: 'done', settings, outcome, scenario, elapsed_s });
      }
      return outcome;
    });
  }

  stop(): void {
    this.current?.stop();
  }
}
