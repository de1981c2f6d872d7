/** Local wall-clock "HH:MM" strings to minutes after local midnight (0–1440). */

export const MINUTES_PER_DAY = 1440;

/** Minutes after midnight of a "HH:MM" clock time; "24:00" gives 1440. Returns NaN for text that is not a clock time. */
export function clockTimeToMinutes(text: string): number {
  const m = /^(\d{2}):(\d{2})$/.exec(text);
  if (m === null) return Number.NaN;
  const h = Number(m[1]);
  const min = Number(m[2]);
  if (h > 24 || min > 59 || (h === 24 && min !== 0)) return Number.NaN;
  return h * 60 + min;
}

/** "HH:MM" for minutes after midnight (wraps at 24 h; 1440 prints as "24:00"). */
export function minutesToClockTime(minutes: number): string {
  if (minutes === MINUTES_PER_DAY) return '24:00';
  const m = ((Math.round(minutes) % MINUTES_PER_DAY) + MINUTES_PER_DAY) % MINUTES_PER_DAY;
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

/**
 * Wall-clock span of a segment written as start/end clock times. An end at or before the start
 * means the segment runs past midnight into the next day (e.g. sleep 23:00–07:00 is 480 min).
 */
export function clockSpan(start: string, end: string): { start_min: number; end_min: number } {
  const s = clockTimeToMinutes(start);
  let e = clockTimeToMinutes(end);
  if (e <= s) e += MINUTES_PER_DAY;
  return { start_min: s, end_min: e };
}
