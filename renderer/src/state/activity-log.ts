// A bounded, append-only record of what the workspace did: results runs finishing or failing,
// notices shown, cohort progress with its convergence readouts. States on screen come and go (a
// progress bar disappears when the work ends); this record stays, so anyone checking the app —
// the end-to-end tests first of all — reads what happened after the fact instead of racing to
// catch a transient state.

export type ActivityDetail = Readonly<Record<string, string | number | boolean | null>>;

export interface ActivityEntry {
  /** 1, 2, 3… in the order recorded. */
  readonly seq: number;
  readonly kind: string;
  readonly detail: ActivityDetail;
}

/** Entries kept; the oldest go first. */
const CAPACITY = 2000;

export class ActivityLog {
  private readonly kept: ActivityEntry[] = [];
  private next = 1;

  record(kind: string, detail: ActivityDetail = {}): void {
    this.kept.push({ seq: this.next++, kind, detail });
    if (this.kept.length > CAPACITY) this.kept.splice(0, this.kept.length - CAPACITY);
  }

  /** A copy of the kept entries, oldest first. */
  entries(): ActivityEntry[] {
    return this.kept.slice();
  }

  /** How many entries of this kind were ever kept (still in the window). */
  count(kind: string): number {
    return this.kept.reduce((n, e) => (e.kind === kind ? n + 1 : n), 0);
  }
}
