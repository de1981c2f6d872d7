// Decides when the page asks the worker for a run: after edits settle (debounce), never two
// at once (a newer request replaces a running one), and whether the progress bar should show
// (only when a run has lasted longer than PROGRESS_DELAY_MS). Time and the worker are injected.

export const RERUN_DEBOUNCE_MS = 400;
export const PROGRESS_DELAY_MS = 300;

export interface SchedulerClock {
  setTimeout(callback: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
}

export interface RunTarget {
  /** Starts a run; a run still going must be abandoned (the worker restarted). */
  start(runId: number, scenario: unknown): void;
  cancel(): void;
}

export class RunScheduler {
  private debounce: unknown = null;
  private progressTimer: unknown = null;
  private running: number | null = null;
  private nextId = 1;
  progressVisible = false;

  constructor(
    private readonly clock: SchedulerClock,
    private readonly target: RunTarget,
    private readonly onProgressVisibility: (visible: boolean) => void,
  ) {}

  /** Call after every edit; the run starts once edits pause for RERUN_DEBOUNCE_MS. */
  requestRun(scenario: unknown, immediately = false): void {
    if (this.debounce !== null) this.clock.clearTimeout(this.debounce);
    this.debounce = null;
    if (immediately) this.startNow(scenario);
    else this.debounce = this.clock.setTimeout(() => this.startNow(scenario), RERUN_DEBOUNCE_MS);
  }

  /** True when a message belongs to the current run. */
  isCurrent(runId: number): boolean {
    return this.running === runId;
  }

  /** Call when the current run ends (results, unavailable or failure). */
  finished(runId: number): void {
    if (this.running !== runId) return;
    this.running = null;
    this.setProgress(false);
    if (this.progressTimer !== null) this.clock.clearTimeout(this.progressTimer);
    this.progressTimer = null;
  }

  private startNow(scenario: unknown): void {
    this.debounce = null;
    if (this.running !== null) this.target.cancel();
    const runId = this.nextId++;
    this.running = runId;
    if (this.progressTimer !== null) this.clock.clearTimeout(this.progressTimer);
    this.progressTimer = this.clock.setTimeout(() => {
      if (this.running === runId) this.setProgress(true);
    }, PROGRESS_DELAY_MS);
    this.target.start(runId, scenario);
  }

  private setProgress(visible: boolean): void {
    if (this.progressVisible === visible) return;
    this.progressVisible = visible;
    this.onProgressVisibility(visible);
  }
}
