// Run time → local wall-clock time, the one mapping every chart and table uses. A run counts real
// hours from t = 0 (local midnight of day 0 at the site) straight through clock changes; the
// charts draw local days. From the run's UTC offsets (results.json `local_clock.utc_offsets`:
// the offset at the start and at each change) this gives, for any real time, the local day and
// wall-clock hour, and for any local day its real start and length — 23 h on the day the clocks
// go forward, 25 h on the day they go back.
//
// Charts of one day put their x axis in real hours since that day's local midnight (so a 23-hour
// day is drawn 23 h long and a 25-hour day 25 h long) and label it with wall-clock times from
// here; the skipped spring hour has no tick, the repeated autumn hour is drawn twice.
import type { UtcOffsetSpan } from '../../../schedules/run/local-clock.js';
import { formatClock } from './clock.js';

export type { UtcOffsetSpan };

/** Where a real time of the run falls on the local clock. */
export interface WallTime {
  /** Local day index (0 = the run's first day). */
  readonly day: number;
  /** Wall-clock hour of that day, [0, 24) (e.g. 21.5 = 21:30). */
  readonly clock_h: number;
  /** Real hours since that day's local midnight (the x of a one-day chart). */
  readonly x_h: number;
}

/** A tick of a time axis: its real-time position and its wall-clock label. */
export interface ClockTick {
  /** Real hours since the run start. */
  readonly t_h: number;
  readonly clock_h: number;
  readonly label: string;
}

interface Span {
  readonly from: number;
  readonly to: number;
  /** Wall-clock hours ahead of real hours since t = 0 in this span. */
  readonly shift: number;
}

export class WallClock {
  private readonly spans: readonly Span[];
  private readonly starts = new Map<number, number>();

  /** From the run's UTC offsets; none (or one) means the clock never changes in the run. */
  constructor(offsets: readonly UtcOffsetSpan[] = []) {
    const sorted = [...offsets].sort((a, b) => a.from_h - b.from_h);
    const o0 = sorted[0]?.utc_offset_min ?? 0;
    const spans: Span[] = [];
    sorted.forEach((o, i) => {
      const next = sorted[i + 1];
      spans.push({ from: i === 0 ? -Infinity : o.from_h, to: next === undefined ? Infinity : next.from_h, shift: (o.utc_offset_min - o0) / 60 });
    });
    this.spans = spans.length > 0 ? spans : [{ from: -Infinity, to: Infinity, shift: 0 }];
  }

  /** True when the run has a clock change. */
  get changes(): boolean {
    return this.spans.length > 1;
  }

  private shiftAt(t_h: number): number {
    for (const s of this.spans) if (t_h >= s.from && t_h < s.to) return s.shift;
    return 0;
  }

  /** Wall-clock hours since local midnight of day 0 at real time t (jumps at clock changes). */
  private wallOf(t_h: number): number {
    return t_h + this.shiftAt(t_h);
  }

  /**
   * Real hours since t = 0 at which local day `day` begins: the last moment the wall clock still
   * read the day before (so days tile real time, whatever the hour of the change).
   */
  dayStart_h(day: number): number {
    const cached = this.starts.get(day);
    if (cached !== undefined) return cached;
    let start = -Infinity;
    for (const s of this.spans) {
      // Within a span the wall clock reads t + shift; it is before day `day` while t < 24 day − shift.
      const end = Math.min(s.to, 24 * day - s.shift);
      if (end > s.from) start = Math.max(start, end);
    }
    this.starts.set(day, start);
    return start;
  }

  /** Real length of local day `day`, hours (24, or 23 / 25 on a day the clocks change). */
  dayLength_h(day: number): number {
    return this.dayStart_h(day + 1) - this.dayStart_h(day);
  }

  /** Local day, wall-clock hour and position in the day of real time t (hours since t = 0). */
  at(t_h: number): WallTime {
    let day = Math.floor(this.wallOf(t_h) / 24 + 1e-9);
    while (this.dayStart_h(day + 1) <= t_h + 1e-9) day += 1;
    while (this.dayStart_h(day) > t_h + 1e-9) day -= 1;
    const x_h = t_h - this.dayStart_h(day);
    const clock = this.wallOf(t_h) - 24 * day;
    return { day, clock_h: ((clock % 24) + 24) % 24, x_h };
  }

  /** Wall-clock hour at real time t. */
  clockOf(t_h: number): number {
    return this.at(t_h).clock_h;
  }

  /** "HH:MM" local time at real time t. */
  format(t_h: number): string {
    return formatClock(this.clockOf(t_h));
  }

  /** Wall-clock hour at `x_h` real hours after the local midnight that starts `day`. */
  clockAtX(day: number, x_h: number): number {
    return this.clockOf(this.dayStart_h(day) + x_h);
  }

  /**
   * Real times (hours since t = 0) at which the wall clock of local day `day` reads `clock_h`:
   * none for a time the clocks skipped, two for a time they repeated, else one. 24 is the
   * midnight that ends the day.
   */
  timesOf(day: number, clock_h: number): number[] {
    const from = this.dayStart_h(day);
    const to = this.dayStart_h(day + 1);
    if (clock_h >= 24) return [to];
    const out: number[] = [];
    for (const s of this.spans) {
      const t = 24 * day + clock_h - s.shift;
      if (t >= s.from - 1e-9 && t < s.to - 1e-9 && t >= from - 1e-9 && t < to - 1e-9) out.push(t);
    }
    return out.sort((a, b) => a - b);
  }

  /**
   * Ticks every `step_h` hours of wall-clock time between two real times: each at the real time
   * the clock shows it (a skipped time has no tick, a repeated one two).
   */
  ticksBetween(from_h: number, to_h: number, step_h = 3): ClockTick[] {
    const ticks: ClockTick[] = [];
    const first = this.at(from_h).day;
    const last = this.at(to_h).day + 1;
    for (let day = first; day <= last; day++) {
      for (let clock = 0; clock < 24 - 1e-9; clock += step_h) {
        for (const t of this.timesOf(day, clock)) {
          if (t >= from_h - 1e-9 && t <= to_h + 1e-9 && !ticks.some((k) => Math.abs(k.t_h - t) < 1e-9)) ticks.push({ t_h: t, clock_h: clock, label: formatClock(clock) });
        }
      }
    }
    return ticks.sort((a, b) => a.t_h - b.t_h);
  }

  /** Ticks of one local day, positions in real hours since its midnight (0 … its length, both ends included). */
  dayTicks(day: number, step_h = 3): { x_h: number; label: string }[] {
    const start = this.dayStart_h(day);
    const ticks = this.ticksBetween(start, this.dayStart_h(day + 1), step_h).map((k) => ({ x_h: k.t_h - start, label: k.label }));
    return ticks;
  }

  /**
   * The x axis of a one-day chart: real hours since the day's midnight from 0 to the day's length,
   * ticks at wall-clock multiples of `step_h`, labels in wall-clock time ("24:00" at the end).
   */
  dayAxis(day: number, step_h = 3): { domain: [number, number]; ticks: number[]; labelOf: (x_h: number) => string } {
    const length = this.dayLength_h(day);
    return {
      domain: [0, length],
      ticks: this.dayTicks(day, step_h).map((k) => k.x_h),
      labelOf: (x_h: number) => (x_h >= length - 1e-9 ? '24:00' : formatClock(this.clockAtX(day, x_h))),
    };
  }

  /** Clock changes within local day `day`: where (real hours since its midnight) and by how much (h, + forward). */
  changesIn(day: number): { x_h: number; by_h: number; before_h: number; after_h: number }[] {
    const from = this.dayStart_h(day);
    const to = this.dayStart_h(day + 1);
    const out: { x_h: number; by_h: number; before_h: number; after_h: number }[] = [];
    for (let i = 1; i < this.spans.length; i++) {
      const s = this.spans[i];
      const p = this.spans[i - 1];
      if (s === undefined || p === undefined || s.from < from || s.from >= to) continue;
      out.push({ x_h: s.from - from, by_h: s.shift - p.shift, before_h: this.wallOf(s.from - 1e-9) - 24 * day, after_h: this.wallOf(s.from) - 24 * day });
    }
    return out;
  }

  /** Words for a clock change between two real times, e.g. "clocks go forward one hour at 02:00", or null. */
  changeNoteBetween(from_h: number, to_h: number): string | null {
    for (let i = 1; i < this.spans.length; i++) {
      const s = this.spans[i];
      const p = this.spans[i - 1];
      if (s === undefined || p === undefined || s.from <= from_h || s.from >= to_h) continue;
      const by = s.shift - p.shift;
      const before = this.wallOf(s.from - 1e-9);
      return `clocks go ${by > 0 ? 'forward' : 'back'} ${Math.abs(by) === 1 ? 'one hour' : `${Math.abs(by)} h`} at ${formatClock(Math.round(before * 60) / 60)}`;
    }
    return null;
  }

  /** Words for a day's clock change, e.g. "23-hour day: clocks went forward at 02:00", or null. */
  changeNote(day: number): string | null {
    const c = this.changesIn(day)[0];
    if (c === undefined) return null;
    const length = Math.round(this.dayLength_h(day) * 100) / 100;
    const when = formatClock(Math.round(c.before_h * 60) / 60);
    return `${length}-hour day: clocks went ${c.by_h > 0 ? 'forward' : 'back'} ${Math.abs(c.by_h) === 1 ? 'one hour' : `${Math.abs(c.by_h)} h`} at ${when}`;
  }
}

/** The clock of a run without clock changes (24-hour days); used where results carry no offsets. */
export const STEADY_CLOCK = new WallClock();

const byOffsets = new WeakMap<readonly UtcOffsetSpan[], WallClock>();

/** The wall clock of a results view (one per offsets list, reused). */
export function wallClockOf(view: { readonly utcOffsets?: readonly UtcOffsetSpan[] }): WallClock {
  const offsets = view.utcOffsets;
  if (offsets === undefined || offsets.length < 2) return STEADY_CLOCK;
  let clock = byOffsets.get(offsets);
  if (clock === undefined) {
    clock = new WallClock(offsets);
    byOffsets.set(offsets, clock);
  }
  return clock;
}

/**
 * The UTC offsets of a run read back from local ISO times of its real hours ("…+02:00"), for
 * results written before `local_clock` existed: hour k of the run carries the offset at its start.
 */
export function offsetsFromHourStarts(startLocal: readonly string[]): UtcOffsetSpan[] {
  const spans: UtcOffsetSpan[] = [];
  startLocal.forEach((text, k) => {
    const m = /([+-])(\d{2}):?(\d{2})$/.exec(text);
    const o = m === null ? 0 : (m[1] === '-' ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3]));
    if (spans.length === 0 || spans[spans.length - 1]?.utc_offset_min !== o) spans.push({ from_h: k, utc_offset_min: o });
  });
  return spans;
}
