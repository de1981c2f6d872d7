// Chart data for "Melatonin": one night window (18:00 of `day` to 12:00 the next day, where
// melatonin is secreted) with each strategy's modelled level and, if given, the level without
// light suppression.
import type { NamedItem, RunView } from '../results/view-model.js';

export const NIGHT_WINDOW_START_H = 18;
export const NIGHT_WINDOW_LENGTH_H = 18;

export type MelatoninRow = { hour: number } & Record<string, number | null>;

export function melatoninKey(strategyId: string, unsuppressed = false): string {
  return unsuppressed ? `${strategyId}:dark` : strategyId;
}

/** Rows with `hour` as clock hours 18..36 (values over 24 are the next morning). */
export function melatoninNightRows(runs: readonly RunView[], strategies: readonly NamedItem[], day: number, everyMinutes = 10): MelatoninRow[] {
  const from = day * 24 + NIGHT_WINDOW_START_H;
  const rows: MelatoninRow[] = [];
  const step = everyMinutes / 60;
  for (let t = from; t <= from + NIGHT_WINDOW_LENGTH_H + 1e-9; t += step) rows.push({ hour: t - day * 24 } as MelatoninRow);
  for (const strategy of strategies) {
    const run = runs.find((r) => r.strategyId === strategy.id);
    if (run === undefined) continue;
    const series = run.melatonin;
    for (const row of rows) {
      const t = day * 24 + row.hour;
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
