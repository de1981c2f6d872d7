// "HH:MM" clock times ↔ minutes after midnight (0..1440), as the scenario format writes them.

export const MINUTES_PER_DAY = 1440;
/** Grid the timeline snaps to when moving or resizing with mouse or keyboard. */
export const SNAP_MIN = 15;

export function minutesOf(clock: string): number {
  const [h, m] = clock.split(':').map(Number);
  return (h ?? 0) * 60 + (m ?? 0);
}

export function clockOf(minutes: number): string {
  const m = Math.max(0, Math.min(MINUTES_PER_DAY, Math.round(minutes)));
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

export function snap(minutes: number, grid = SNAP_MIN): number {
  return Math.round(minutes / grid) * grid;
}

/** Length of a segment in minutes; an end at or before the start runs past midnight. */
export function durationMin(start: string, end: string): number {
  const a = minutesOf(start);
  const b = minutesOf(end);
  return b > a ? b - a : b + MINUTES_PER_DAY - a;
}
