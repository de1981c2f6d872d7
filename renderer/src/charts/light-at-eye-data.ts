// Chart data for "Light at the eye": melanopic EDI stacked by source for one day, and the
// recommendation bands of Brown et al. 2022, "Recommendations for daytime, evening, and
// nighttime indoor light exposure to best support physiology, sleep, and wakefulness in
// healthy adults", PLOS Biology 20(3):e3001571:
//   daytime: at least 250 lx melanopic EDI at the eye;
//   evening, starting at least 3 h before bedtime: at most 10 lx;
//   sleep environment (night): at most 1 lx.
import type { Episode, LightSeries } from '../results/view-model.js';

export type LightRow = { clock_h: number; total_lx: number } & Record<string, number>;

/** Rows of one day (clock hours 0..24), one per `everyMinutes` (values averaged within). */
export function lightAtEyeRows(light: LightSeries, day: number, everyMinutes = 5): LightRow[] {
  const stepsPerRow = Math.max(1, Math.round(everyMinutes / 60 / light.step_h));
  const firstStep = Math.ceil((day * 24 - light.start_h) / light.step_h - 1e-9);
  const stepsPerDay = Math.round(24 / light.step_h);
  const rows: LightRow[] = [];
  for (let s = 0; s < stepsPerDay; s += stepsPerRow) {
    const row = { clock_h: s * light.step_h, total_lx: 0 } as LightRow;
    for (const source of light.sources) {
      let sum = 0;
      let n = 0;
      for (let k = 0; k < stepsPerRow; k++) {
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
  /** Clock hours within the drawn day, from < to, in [0, 24]. */
  readonly from_h: number;
  readonly to_h: number;
  readonly limit_lx: number;
  readonly rule: 'at least' | 'at most';
}

export const RECOMMENDED_DAY_MIN_LX = 250;
export const RECOMMENDED_EVENING_MAX_LX = 10;
export const RECOMMENDED_NIGHT_MAX_LX = 1;
export const EVENING_BEFORE_SLEEP_H = 3;

/**
 * Bands for one day from the person's main sleep episodes: night while asleep, evening in the
 * 3 h before each sleep, day otherwise. Naps count as daytime. Hours since t = 0 in, clock
 * hours of `day` out.
 */
export function recommendationBands(sleep: readonly Episode[], day: number): RecommendationBand[] {
  const dayStart = day * 24;
  const dayEnd = dayStart + 24;
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
  const bands: RecommendationBand[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const from = points[i] ?? dayStart;
    const to = points[i + 1] ?? dayEnd;
    const kind = kindAt((from + to) / 2);
    const last = bands[bands.length - 1];
    if (last !== undefined && last.kind === kind) {
      bands[bands.length - 1] = { ...last, to_h: to - dayStart };
      continue;
    }
    bands.push(bandOf(kind, from - dayStart, to - dayStart));
  }
  return bands;
}

function bandOf(kind: BandKind, from_h: number, to_h: number): RecommendationBand {
  if (kind === 'day') return { kind, from_h, to_h, limit_lx: RECOMMENDED_DAY_MIN_LX, rule: 'at least' };
  if (kind === 'evening') return { kind, from_h, to_h, limit_lx: RECOMMENDED_EVENING_MAX_LX, rule: 'at most' };
  return { kind, from_h, to_h, limit_lx: RECOMMENDED_NIGHT_MAX_LX, rule: 'at most' };
}

/** Share of each band's time (in the given rows) that meets its recommendation, 0..1. */
export function bandCompliance(rows: readonly LightRow[], bands: readonly RecommendationBand[]): { band: RecommendationBand; met: number }[] {
  return bands.map((band) => {
    const inside = rows.filter((r) => r.clock_h >= band.from_h && r.clock_h < band.to_h);
    if (inside.length === 0) return { band, met: 1 };
    const ok = inside.filter((r) => (band.rule === 'at least' ? r.total_lx >= band.limit_lx : r.total_lx <= band.limit_lx)).length;
    return { band, met: ok / inside.length };
  });
}
