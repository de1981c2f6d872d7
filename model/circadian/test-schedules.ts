/** Schedules shared by the circadian tests (invented regular routines). */
import { lightFromSteps, type LightSeries } from './light-series.js';
import { repeatDaily, type SleepSpec } from './sleep-input.js';

/** Awake 07:00–23:00 at `lux` native lux, dark otherwise. */
export function regularDayLight(lux: number): LightSeries {
  return lightFromSteps([0, 7, 23], [0, lux, 0], 'native_lx', 24);
}

/** Sleep 23:00–07:00 for day 0 (crossing into day 1). */
export const REGULAR_SLEEP_DAY0: SleepSpec = { mode: 'prescribed', episodes: [{ start_h: 23, end_h: 31 }] };

/** Sleep 23:00–07:00 every night over days 0..days-1 (and the morning of day 0). */
export function regularSleep(days: number): SleepSpec {
  return { mode: 'prescribed', episodes: repeatDaily([{ start_h: 0, end_h: 7 }, { start_h: 23, end_h: 24 }], 0, days - 1) };
}

/** Clock hour (0–24) of a time in h since t = 0. */
export function clock_h(t_h: number): number {
  return ((t_h % 24) + 24) % 24;
}
