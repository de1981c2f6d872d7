// Chart data for "Melatonin": one night window (18:00 local time of `day` to 12:00 the next day,
// where melatonin is secreted) with each strategy's modelled level and, if given, the level without
// light suppression. The x of each row is real hours since local midnight of `day`, so a night with
// a clock change is drawn 17 or 19 h long; `clock_h` is the wall-clock hour there.
import type { NamedItem, RunView } from '../results/view-model.js';
import { STEADY_CLOCK, type ClockTick, type WallClock } from './wall-clock.js';

export const NIGHT_WINDOW_START_H = 18;
export const NIGHT_WINDOW_END_H = 12;

export type MelatoninRow = { x_h: number; clock_h: number } & Record<string, number | null>;

export function melatoninKey(strategyId: string, unsuppressed = false): string {
  return unsuppressed ? `${strategyId}:dark` : strategyId;
}

/** The night window after local day `day`: real hours since t = 0 of its start and end. */
export function nightWindow(day: number, clock: WallClock = STEADY_CLOCK): { from_h: number; to_h: number } {
  const from_h = clock.timesOf(day, NIGHT_WINDOW_START_H)[0] ?? clock.dayStart_h(day) + NIGHT_WINDOW_START_H;
  const to_h = clock.timesOf(day + 1, NIGHT_WINDOW_END_H)[0] ?? clock.dayStart_h(day + 1) + NIGHT_WINDOW_END_H;
  return { from_h, to_h };
}

/** Axis of the night window: domain and wall-clock ticks every 3 h, x in real hours since midnight of `day`. */
export function nightAxis(day: number, clock: WallClock = STEADY_CLOCK): { domain: [number, number]; ticks: number[]; labelOf: (x_h: number) => string } {
  const { from_h, to_h } = nightWindow(day, clock);
  const start = clock.dayStart_h(day);
  const ticks: ClockTick[] = clock.ticksBetween(from_h, to_h, 3);
  return { domain: [from_h - start, to_h - start], ticks: ticks.map((k) => k.t_h - start), labelOf: (x_h: number) => clock.format(start + x_h) };
}

/** Rows every `everyMinutes` of real time through the night window after `day`. */
export function melatoninNightRows(runs: readonly RunView[], strategies: readonly NamedItem[], day: number, everyMinutes = 10, clock: WallClock = STEADY_CLOCK): MelatoninRow[] {
  const { from_h, to_h } = nightWindow(day, clock);
  const start = clock.dayStart_h(day);
  const rows: MelatoninRow[] = [];
  const step = everyMinutes / 60;
  const n = Math.round((to_h - from_h) / step);
  for (let i = 0; i <= n; i++) {
    const t = from_h + i * step;
    rows.push({ x_h: t - start, clock_h: clock.clockOf(t) } as MelatoninRow);
  }
  for (const strategy of strategies) {
    const run = runs.find((r) => r.strategyId === strategy.id);
    if (run === undefined) continue;
    const series = run.melatonin;
    for (const row of rows) {
      const t = start + row.x_h;
      row[melatoninKey(strategy.id)] = sampleAt(series.time_h, series.level, t);
      if (series.unsuppressed !== null) row[melatoninKey(strategy.id, true)] = sampleAt(series.time_h, series.unsuppressed, t);
    }
  }
  return rows;
}

/** Linear interpolation in a time series; null outside its range. */
export function sampleAt(time_h: readonly number[], values: readonly number[], t: number): number | null {
  const n = Math.min(time_h.length, values.length);
  if (n === 0) return null;
  const first = time_h[0] ?? 0;
  const last = time_h[n - 1] ?? 0;
  if (t < first || t > last) return null;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((time_h[mid] ?? 0) <= t) lo = mid;
    else hi = mid;
  }
  const t0 = time_h[lo] ?? 0;
  const t1 = time_h[hi] ?? 0;
  const v0 = values[lo] ?? 0;
  const v1 = values[hi] ?? 0;
  return t1 === t0 ? v0 : v0 + ((v1 - v0) * (t - t0)) / (t1 - t0);
}
