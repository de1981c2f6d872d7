/**
 * A line of non-overlapping intervals [start, end) carrying values; painting a new interval
 * overwrites whatever it covers (the later paint wins).
 */
export interface Painted<T> {
  start: number;
  end: number;
  value: T;
}

export class IntervalPainter<T> {
  private items: Painted<T>[] = [];

  paint(start: number, end: number, value: T): void {
    if (!(end > start)) return;
    const next: Painted<T>[] = [];
    let inserted = false;
    for (const it of this.items) {
      if (it.end <= start || it.start >= end) {
        if (!inserted && it.start >= end) {
          next.push({ start, end, value });
          inserted = true;
        }
        next.push(it);
        continue;
      }
      if (it.start < start) next.push({ start: it.start, end: start, value: it.value });
      if (!inserted) {
        next.push({ start, end, value });
        inserted = true;
      }
      if (it.end > end) next.push({ start: end, end: it.end, value: it.value });
    }
    if (!inserted) next.push({ start, end, value });
    this.items = next;
  }

  /** The painted intervals in order (copies). */
  intervals(): Painted<T>[] {
    return this.items.map((it) => ({ ...it }));
  }
}
