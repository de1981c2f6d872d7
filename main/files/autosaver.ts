// Periodic recovery writes for one window: every tick, if the reported text changed since the
// last write and the document has unsaved edits, write it to the recovery store.
import type { RecoveryStore } from './recovery-store.js';

/** Interval between recovery writes, in milliseconds (at most 30 s of work can be lost). */
export const AUTOSAVE_INTERVAL_MS = 20_000;

export interface Timers {
  /** The callback's promise (if any) is ignored by real timers and awaited by test timers. */
  setInterval(callback: () => unknown, ms: number): unknown;
  clearInterval(handle: unknown): void;
  now(): Date;
}

export const realTimers: Timers = {
  setInterval: (cb, ms) => setInterval(cb, ms),
  clearInterval: (h) => clearInterval(h as ReturnType<typeof setInterval>),
  now: () => new Date(),
};

export class Autosaver {
  private pendingText: string | null = null;
  private originalPath: string | null = null;
  private handle: unknown = null;
  private writing: Promise<void> = Promise.resolve();

  constructor(
    private readonly store: RecoveryStore,
    private readonly windowKey: string,
    private readonly timers: Timers,
    private readonly intervalMs = AUTOSAVE_INTERVAL_MS,
  ) {}

  start(): void {
    if (this.handle === null) this.handle = this.timers.setInterval(() => this.flush(), this.intervalMs);
  }

  /** Records the latest state; clean documents need no recovery copy. */
  report(dirty: boolean, text: string, originalPath: string | null): void {
    this.originalPath = originalPath;
    if (dirty) {
      this.pendingText = text;
    } else {
      this.pendingText = null;
      this.writing = this.writing.then(() => this.store.discard(this.windowKey));
    }
  }

  /** Writes the pending text now (also called by the timer). */
  flush(): Promise<void> {
    const text = this.pendingText;
    if (text === null) return this.writing;
    this.pendingText = null;
    this.writing = this.writing.then(() => this.store.write(this.windowKey, this.originalPath, text, this.timers.now())).catch(() => undefined);
    return this.writing;
  }

  /** Stops the timer and removes the recovery copy (normal close or after a save). */
  async stop(): Promise<void> {
    if (this.handle !== null) this.timers.clearInterval(this.handle);
    this.handle = null;
    this.pendingText = null;
    await this.writing;
    await this.store.discard(this.windowKey);
  }
}
