/**
 * A luminaire's schedule laid out once per weekday as 1440 output fractions and target CCTs,
 * with the same reading as schedules/timeline/exposure-context.ts `luminaireOutputAt`: an entry
 * past midnight keeps the weekday filter of the day it started; later entries win where they
 * overlap.
 */
import { WEEKDAYS, type Weekday } from '../schema/primitives.js';
import type { Luminaire } from '../schema/scenario-types.js';
import { clockSpan } from '../time/clock-time.js';

export interface LuminaireWeek {
  readonly level: Readonly<Record<Weekday, Float32Array>>;
  /** Target CCT (K) per minute, NaN where the schedule gives none. */
  readonly cct_K: Readonly<Record<Weekday, Float32Array>>;
}

const cache = new WeakMap<Luminaire, LuminaireWeek>();

export function luminaireWeek(l: Luminaire): LuminaireWeek {
  const hit = cache.get(l);
  if (hit !== undefined) return hit;
  const level = {} as Record<Weekday, Float32Array>;
  const cct = {} as Record<Weekday, Float32Array>;
  for (const d of WEEKDAYS) {
    level[d] = new Float32Array(1440);
    cct[d] = new Float32Array(1440).fill(Number.NaN);
  }
  for (const e of l.schedule) {
    const { start_min, end_min } = clockSpan(e.start, e.end);
    WEEKDAYS.forEach((d, k) => {
      if (e.days !== undefined && !e.days.includes(d)) return;
      const next = WEEKDAYS[(k + 1) % 7] as Weekday;
      const paint = (day: Weekday, a: number, b: number) => {
        level[day].fill(e.level, a, b);
        cct[day].fill(e.cct_K ?? Number.NaN, a, b);
      };
      paint(d, start_min, Math.min(end_min, 1440));
      if (end_min > 1440) paint(next, 0, end_min - 1440);
    });
  }
  const out = { level, cct_K: cct };
  cache.set(l, out);
  return out;
}
