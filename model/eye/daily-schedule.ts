/**
 * A daily schedule: piecewise-constant values through the local clock day. Each entry holds from
 * its `fromMinute` (0–1439, minutes after local midnight) until the next entry; before the first
 * entry of the day the last entry of the previous day still holds (the schedule wraps).
 */
import { SceneInputError } from './scene-input-error.js';

export interface ScheduleEntry<T> {
  readonly fromMinute: number;
  readonly value: T;
}

export type DailySchedule<T> = readonly ScheduleEntry<T>[];

export const MINUTES_PER_DAY = 1440;

/** Expand to one value per minute of the day (length 1440), validating entries. */
export function expandDailySchedule<T>(field: string, schedule: DailySchedule<T>): T[] {
  if (schedule.length === 0) throw new SceneInputError(field, 'needs at least one entry');
  let previous = -1;
  schedule.forEach((e, i) => {
    if (!Number.isInteger(e.fromMinute) || e.fromMinute < 0 || e.fromMinute >= MINUTES_PER_DAY) {
      throw new SceneInputError(`${field}[${i}].fromMinute`, `must be an integer minute of the day 0–1439 (got ${String(e.fromMinute)})`);
    }
    if (e.fromMinute <= previous) throw new SceneInputError(`${field}[${i}].fromMinute`, 'entries must be in increasing order of fromMinute');
    previous = e.fromMinute;
  });
  const out = new Array<T>(MINUTES_PER_DAY);
  let current = (schedule[schedule.length - 1] as ScheduleEntry<T>).value;
  let next = 0;
  for (let m = 0; m < MINUTES_PER_DAY; m++) {
    while (next < schedule.length && (schedule[next] as ScheduleEntry<T>).fromMinute === m) {
      current = (schedule[next] as ScheduleEntry<T>).value;
      next++;
    }
    out[m] = current;
  }
  return out;
}

/** A schedule that holds one value all day. */
export function constantSchedule<T>(value: T): DailySchedule<T> {
  return [{ fromMinute: 0, value }];
}
