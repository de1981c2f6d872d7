/**
 * The local clock at every real minute of a run: minute of local day, run-day index and UTC
 * offset. Built from the site's time-zone rules at each timeline day, so a day with a
 * daylight-saving change has 1380 or 1500 real minutes and the local minute of day jumps by
 * ±60 at the change (no minute lost or counted twice).
 */
import { utcOffsetAt_min } from '../time/local-calendar.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';

const MS_PER_MIN = 60_000;

export interface LocalClock {
  readonly total_min: number;
  /** Local minute of day (0–1439) per real minute. */
  readonly minuteOfDay: Uint16Array;
  /** Run-day index (timeline.days) per real minute. */
  readonly dayIndex: Uint16Array;
  /** UTC offset (min) per real minute. */
  readonly offset_min: Int16Array;
  /**
   * Stretches of consecutive real minutes whose local minute of day also runs on by one:
   * they break at local midnight and at clock changes. [start, end) in real minutes.
   */
  readonly chunks: readonly { readonly start: number; readonly end: number }[];
}

export function localClock(timeline: ExposureTimeline): LocalClock {
  const n = timeline.total_min;
  const minuteOfDay = new Uint16Array(n);
  const dayIndex = new Uint16Array(n);
  const offset = new Int16Array(n);
  const zone = timeline.timeZone;
  // The offset changes at most at whole quarter hours; sample it every 15 minutes.
  for (let q = 0; q < n; q += 15) {
    const o = utcOffsetAt_min(zone, timeline.runStartUtc_ms + q * MS_PER_MIN);
    offset.fill(o, q, Math.min(n, q + 15));
  }
  for (const d of timeline.days) dayIndex.fill(d.index, d.start_min, d.start_min + d.length_min);
  const o0 = offset[0] ?? 0;
  const chunks: { start: number; end: number }[] = [];
  let start = 0;
  for (let m = 0; m < n; m++) {
    // Local wall minutes since the run start's local midnight.
    const wall = m + ((offset[m] ?? o0) - o0);
    const d = dayIndex[m] ?? 0;
    const dayWallStart = d * 1440;
    minuteOfDay[m] = Math.min(1439, Math.max(0, wall - dayWallStart));
    if (m > start && (minuteOfDay[m] as number) !== (minuteOfDay[m - 1] as number) + 1) {
      chunks.push({ start, end: m });
      start = m;
    }
  }
  if (n > start) chunks.push({ start, end: n });
  return { total_min: n, minuteOfDay, dayIndex, offset_min: offset, chunks };
}

/** "YYYY-MM-DDTHH:MM+hh:mm" local time at real minute m. */
export function localIsoAt(timeline: ExposureTimeline, clock: LocalClock, m: number): string {
  const o = clock.offset_min[Math.min(m, clock.total_min - 1)] ?? 0;
  const t = new Date(timeline.runStartUtc_ms + m * MS_PER_MIN + o * MS_PER_MIN);
  const p2 = (v: number) => String(v).padStart(2, '0');
  const sign = o < 0 ? '-' : '+';
  const ao = Math.abs(o);
  return `${t.getUTCFullYear()}-${p2(t.getUTCMonth() + 1)}-${p2(t.getUTCDate())}T${p2(t.getUTCHours())}:${p2(t.getUTCMinutes())}${sign}${p2(Math.floor(ao / 60))}:${p2(ao % 60)}`;
}

/** The UTC offset in force from a real hour of the run on (results.json `local_clock.utc_offsets`). */
export interface UtcOffsetSpan {
  /** Real hours since the run start. */
  readonly from_h: number;
  /** Offset of local time from UTC, minutes (e.g. 60 for CET, 120 for CEST). */
  readonly utc_offset_min: number;
}

/**
 * The run's UTC offsets: the one at the start (from 0 h), then one entry per clock change at the
 * real hour it takes effect. With these, any real time of the run maps to its local wall-clock
 * time (renderer/src/charts/wall-clock.ts) without the time-zone rules.
 */
export function utcOffsetSpans(clock: LocalClock): UtcOffsetSpan[] {
  const spans: UtcOffsetSpan[] = [];
  let previous: number | null = null;
  for (let m = 0; m < clock.total_min; m++) {
    const o = clock.offset_min[m] ?? 0;
    if (o !== previous) spans.push({ from_h: m / 60, utc_offset_min: o });
    previous = o;
  }
  if (spans.length === 0) spans.push({ from_h: 0, utc_offset_min: 0 });
  return spans;
}
