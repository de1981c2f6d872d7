// Chart data for "Sleepiness": a day × hour grid of the Karolinska Sleepiness Scale (KSS,
// 1 = extremely alert … 9 = very sleepy, fighting sleep; Åkerstedt & Gillberg 1990). KSS ≥ 7
// ("sleepy, but no effort to keep awake") is the level commonly used as a threshold for
// impaired performance (common practice).
export const KSS_SLEEPY_THRESHOLD = 7;

export interface KssCell {
  readonly day: number;
  readonly hour: number;
  readonly kss: number | null;
  readonly sleepy: boolean;
}

export function kssGrid(kssHourly: readonly (number | null)[], days: number): KssCell[][] {
  return Array.from({ length: days }, (_, day) =>
    Array.from({ length: 24 }, (_, hour) => {
      const kss = kssHourly[day * 24 + hour] ?? null;
      return { day, hour, kss, sleepy: kss !== null && kss >= KSS_SLEEPY_THRESHOLD };
    }),
  );
}

/** Awake hours at or above the threshold. */
export function sleepyHours(kssHourly: readonly (number | null)[]): number {
  return kssHourly.filter((k) => k !== null && k >= KSS_SLEEPY_THRESHOLD).length;
}

/** Rows for a line chart of KSS over one day. */
export function kssDayRows(kssHourly: readonly (number | null)[], day: number): { hour: number; kss: number | null }[] {
  return Array.from({ length: 24 }, (_, hour) => ({ hour, kss: kssHourly[day * 24 + hour] ?? null }));
}
