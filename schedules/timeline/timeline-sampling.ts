/** Reading an exposure timeline minute by minute, and the local clock at any minute. */
import { utcToWallTime } from '../time/local-calendar.js';
import type { ExposureSlice, ExposureTimeline, TimelineDay } from './exposure-types.js';

const MS_PER_MIN = 60_000;

/** The slice holding real minute `minute` (0 ≤ minute < total_min); binary search. */
export function sliceAtMinute(timeline: ExposureTimeline, minute: number): ExposureSlice | undefined {
  const s = timeline.slices;
  let lo = 0;
  let hi = s.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const x = s[mid];
    if (x === undefined) return undefined;
    if (minute < x.start_min) hi = mid - 1;
    else if (minute >= x.end_min) lo = mid + 1;
    else return x;
  }
  return undefined;
}

/** The run day holding real minute `minute`. */
export function dayAtMinute(timeline: ExposureTimeline, minute: number): TimelineDay | undefined {
  return timeline.days.find((d) => minute >= d.start_min && minute < d.start_min + d.length_min);
}

/** UTC instant (ms) of the start of real minute `minute`. */
export function utcAtMinute(timeline: ExposureTimeline, minute: number): number {
  return timeline.runStartUtc_ms + minute * MS_PER_MIN;
}

/** Local date, minute after local midnight and ISO weekday (1 = Monday) at real minute `minute`. */
export function wallClockAtMinute(timeline: ExposureTimeline, minute: number): { date: string; minuteOfDay: number; weekday: number } {
  return utcToWallTime(timeline.timeZone, utcAtMinute(timeline, minute));
}

/** Calls `visit` once for every real minute of the run, in order, with its slice. */
export function forEachMinute(timeline: ExposureTimeline, visit: (minute: number, slice: ExposureSlice) => void): void {
  for (const slice of timeline.slices) for (let m = slice.start_min; m < slice.end_min; m++) visit(m, slice);
}

/** For each real minute of the run, the index of its slice in `timeline.slices` (for vectorised pipelines). */
export function sliceIndexPerMinute(timeline: ExposureTimeline): Int32Array {
  const out = new Int32Array(timeline.total_min);
  timeline.slices.forEach((s, i) => out.fill(i, s.start_min, s.end_min));
  return out;
}
