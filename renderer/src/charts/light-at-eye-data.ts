// Chart data for "Light at the eye": melanopic EDI stacked by source for one day, and the
// recommendation bands of Brown et al. 2022, "Recommendations for daytime, evening, and
// nighttime indoor light exposure to best support physiology, sleep, and wakefulness in
// healthy adults", PLOS Biology 20(3):e3001571:
//   daytime: at least 250 lx melanopic EDI at the eye;
//   evening, starting at least 3 h before bedtime: at most 10 lx;
//   sleep environment (night): at most 1 lx.
import type { Episode, LightSeries } from '../results/view-model.js';
import { STEADY_CLOCK, type WallClock } from './wall-clock.js';

/**
 * One row of a day's light: `x_h` real hours since the day's local midnight (the chart's x),
 * `clock_h` the wall-clock hour there (what the axis and the tooltip show), the total and each
 * source (`[source id]`), lx.
 */
export type LightRow = { x_h: number; clock_h: number; total_lx: number } & Record<string, number>;

/**
 * Rows of one local day, one per `everyMinutes` of real time (values averaged within), from its
 * midnight to the next: 23 h of rows on the day the clocks go forward, 25 h on the day they go back.
 */
export function lightAtEyeRows(light: LightSeries, day: number, everyMinutes = 5, clock: WallClock = STEADY_CLOCK): LightRow[] {
  const stepsPerRow = Math.max(1, Math.round(everyMinutes / 60 / light.step_h));
  const dayStart = clock.dayStart_h(day);
  const firstStep = Math.ceil((dayStart - light.start_h) / light.step_h - 1e-9);
  const stepsPerDay = Math.round(clock.dayLength_h(day) / light.step_h);
  const rows: LightRow[] = [];
  for (let s = 0; s < stepsPerDay; s += stepsPerRow) {
    const x_h = s * light.step_h;
    const row = { x_h, clock_h: clock.clockAtX(day, x_h), total_lx: 0 } as LightRow;
    for (const source of light.sources) {
      let sum = 0;
      let n = 0;
      for (let k = 0; k < stepsPerRow && s + k < stepsPerDay; k++) {
        const v = source.mel_edi_lx[firstStep + s + k];
        if (v !== undefined) {
          sum += v;
          n += 1;
        }
      }
      const mean = n > 0 ? sum / n : 0;
      row[source.id] = mean;
      row.total_lx += mean;
    }
    rows.push(row);
  }
  return rows;
}

export type BandKind = 'day' | 'evening' | 'night';

export interface RecommendationBand {
  readonly kind: BandKind;
  /** Real hours since the drawn day's local midnight, from < to, within the day's length. */
  readonly from_h: number;
  readonly to_h: number;
  /** Wall-clock hours at from_h and to_h (24 for the midnight that ends the day). */
  readonly from_clock_h: number;
  readonly to_clock_h: number;
  readonly limit_lx: number;
  readonly rule: 'at least' | 'at most';
}

export const RECOMMENDED_DAY_MIN_LX = 250;
export const RECOMMENDED_EVENING_MAX_LX = 10;
export const RECOMMENDED_NIGHT_MAX_LX = 1;
export const EVENING_BEFORE_SLEEP_H = 3;

/**
 * Bands for one local day from the person's main sleep episodes: night while asleep, evening in
 * the 3 h before each sleep, day otherwise. Naps count as daytime. Hours since t = 0 in; real
 * hours since the day's midnight out, with their wall-clock hours.
 */
export function recommendationBands(sleep: readonly Episode[], day: number, clock: WallClock = STEADY_CLOCK): RecommendationBand[] {
  const dayStart = clock.dayStart_h(day);
  const dayEnd = clock.dayStart_h(day + 1);
  const kindAt = (t: number): BandKind => {
    for (const e of sleep) {
      if (e.kind !== 'sleep') continue;
      if (t >= e.start_h && t < e.end_h) return 'night';
    }
    for (const e of sleep) {
      if (e.kind !== 'sleep') continue;
      if (t >= e.start_h - EVENING_BEFORE_SLEEP_H && t < e.start_h) return 'evening';
    }
    return 'day';
  };
  // Change points within the day: edges of every sleep and evening window.
  const cuts = new Set<number>([dayStart, dayEnd]);
  for (const e of sleep) {
    if (e.kind !== 'sleep') continue;
    for (const t of [e.start_h - EVENING_BEFORE_SLEEP_H, e.start_h, e.end_h]) if (t > dayStart && t < dayEnd) cuts.add(t);
  }
  const points = [...cuts].sort((a, b) => a - b);
  const spans: { kind: BandKind; from: number; to: number }[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const from = points[i] ?? dayStart;
    const to = points[i + 1] ?? dayEnd;
    const kind = kindAt((from + to) / 2);
    const last = spans[spans.length - 1];
    if (last !== undefined && last.kind === kind) last.to = to;
    else spans.push({ kind, from, to });
  }
  return spans.map((b) => bandOf(b.kind, b.from - dayStart, b.to - dayStart, clock.clockOf(b.from), b.to >= dayEnd ? 24 : clock.clockOf(b.to)));
}

function bandOf(kind: BandKind, from_h: number, to_h: number, from_clock_h: number, to_clock_h: number): RecommendationBand {
  const at = { kind, from_h, to_h, from_clock_h, to_clock_h };
  if (kind === 'day') return { ...at, limit_lx: RECOMMENDED_DAY_MIN_LX, rule: 'at least' };
  if (kind === 'evening') return { ...at, limit_lx: RECOMMENDED_EVENING_MAX_LX, rule: 'at most' };
  return { ...at, limit_lx: RECOMMENDED_NIGHT_MAX_LX, rule: 'at most' };
}

/** Share of each band's time (in the given rows) that meets its recommendation, 0..1. */
export function bandCompliance(rows: readonly LightRow[], bands: readonly RecommendationBand[]): { band: RecommendationBand; met: number }[] {
  return bands.map((band) => {
    const inside = rows.filter((r) => r.x_h >= band.from_h - 1e-9 && r.x_h < band.to_h - 1e-9);
    if (inside.length === 0) return { band, met: 1 };
    const ok = inside.filter((r) => (band.rule === 'at least' ? r.total_lx >= band.limit_lx : r.total_lx <= band.limit_lx)).length;
    return { band, met: ok / inside.length };
  });
}
