// Chart data for "Sleepiness": a day × hour grid of the Karolinska Sleepiness Scale (KSS,
// 1 = extremely alert … 9 = very sleepy, fighting sleep; Åkerstedt & Gillberg 1990). KSS ≥ 7
// ("sleepy, but no effort to keep awake") is the level commonly used as a threshold for
// impaired performance (common practice).
// The KSS series holds one value per real hour of the run; the grid lays them out by local
// wall-clock hour (wall-clock.ts): on the day the clocks go forward the skipped hour has no value,
// on the day they go back the repeated hour holds two.
import { STEADY_CLOCK, type WallClock } from './wall-clock.js';

export const KSS_SLEEPY_THRESHOLD = 7;

/** One real hour in a grid cell. */
export interface KssPart {
  readonly kss: number | null;
  readonly sleepy: boolean;
  /** Index of the real hour in the KSS series. */
  readonly index: number;
}

export interface KssCell {
  readonly day: number;
  /** Wall-clock hour 0–23. */
  readonly hour: number;
  /** The first (usually the only) real hour at this wall-clock hour. */
  readonly kss: number | null;
  readonly sleepy: boolean;
  /** Real hours starting at this wall-clock hour: none when the clocks skipped it, two when they repeated it. */
  readonly parts: readonly KssPart[];
}

const part = (kssHourly: readonly (number | null)[], index: number): KssPart => {
  const kss = kssHourly[index] ?? null;
  return { kss, sleepy: kss !== null && kss >= KSS_SLEEPY_THRESHOLD, index };
};

export function kssGrid(kssHourly: readonly (number | null)[], days: number, clock: WallClock = STEADY_CLOCK): KssCell[][] {
  return Array.from({ length: days }, (_, day) =>
    Array.from({ length: 24 }, (_, hour) => {
      const parts = clock.timesOf(day, hour).map((t) => part(kssHourly, Math.round(t)));
      const first = parts[0];
      return { day, hour, kss: first?.kss ?? null, sleepy: parts.some((p) => p.sleepy), parts };
    }),
  );
}

/** Awake hours at or above the threshold. */
export function sleepyHours(kssHourly: readonly (number | null)[]): number {
  return kssHourly.filter((k) => k !== null && k >= KSS_SLEEPY_THRESHOLD).length;
}

/** Rows for a line chart of KSS over one local day: one per real hour, x in real hours since its midnight. */
export function kssDayRows(kssHourly: readonly (number | null)[], day: number, clock: WallClock = STEADY_CLOCK): { x_h: number; clock_h: number; kss: number | null }[] {
  const start = clock.dayStart_h(day);
  const hours = Math.round(clock.dayLength_h(day));
  return Array.from({ length: hours }, (_, k) => {
    const t = start + k;
    return { x_h: k, clock_h: clock.clockOf(t), kss: kssHourly[Math.round(t)] ?? null };
  });
}
