/**
 * Three kinds of light that change every minute, as users bring them (invented, seeded, for the
 * body-clock accuracy tests and the benchmark; not data of any real person):
 *
 * - `measured-log`: an office week as a wearable light logger records it — home, commute, desk,
 *   lunch outside, evening screen — with minute-to-minute noise (log-normal, σ = 0.35) and a few
 *   brief spikes and drop-outs;
 * - `cloudy-daylight`: a desk by a window on days of broken cloud — daylight following the sun's
 *   height (a clear-sky shape over 06:00–20:00) times a cloud factor that wanders every minute,
 *   over a warm electric background;
 * - `night-shift`: three 12-hour nights (19:00–07:00) at ward light with 15-minute breaks in a
 *   bright staff room every two hours, a sunny walk home and a day sleep 08:30–15:30, then days off.
 *
 * Values are melanopic EDI at the eye (lx), one per minute from t = 0 (local midnight of day 0),
 * with the sleep episodes of each case (light during sleep is 0 here: these cases test the
 * integrator, not the eyelids).
 */
import { Xoshiro128StarStar } from '../cohort/xoshiro128starstar.js';
import type { SleepEpisode } from './sleep-input.js';

export type PerMinuteLightKind = 'measured-log' | 'cloudy-daylight' | 'night-shift';

export const PER_MINUTE_LIGHT_KINDS: readonly PerMinuteLightKind[] = ['measured-log', 'cloudy-daylight', 'night-shift'];

export interface PerMinuteLightCase {
  readonly kind: PerMinuteLightKind;
  readonly days: number;
  /** Melanopic EDI at the eye, lx, one value per minute. */
  readonly mel_edi_lx: Float64Array;
  readonly sleep: readonly SleepEpisode[];
}

/** Standard normal draw (Box–Muller) from two uniform draws. */
function gaussian(rng: Xoshiro128StarStar): number {
  const u = Math.max(1e-12, rng.nextFloat64());
  const v = rng.nextFloat64();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}

function regularSleep(days: number): SleepEpisode[] {
  const out: SleepEpisode[] = [{ start_h: 0, end_h: 7 }];
  for (let d = 0; d < days; d++) out.push({ start_h: 24 * d + 23, end_h: 24 * d + 31 });
  return out;
}

function measuredLog(days: number, rng: Xoshiro128StarStar): PerMinuteLightCase {
  const out = new Float64Array(days * 1440);
  for (let d = 0; d < days; d++) {
    const workday = d % 7 < 5;
    for (let m = 0; m < 1440; m++) {
      const h = m / 60;
      let v = 0;
      if (h >= 7 && h < 23) v = 40;
      if (workday && h >= 7.75 && h < 8.5) v = 1800;
      if (workday && h >= 8.5 && h < 17.5) v = 180;
      if (workday && h >= 12.5 && h < 13) v = 3500;
      if (!workday && h >= 10.5 && h < 13) v = 2500;
      if (h >= 21 && h < 23) v = 15;
      if (v > 0) {
        v *= Math.exp(0.35 * gaussian(rng));
        const r = rng.nextFloat64();
        if (r < 0.002) v *= 20; // brief spike (a glance at a bright window)
        else if (r < 0.004) v = 0; // sensor covered by a sleeve
      }
      out[d * 1440 + m] = v;
    }
  }
  return { kind: 'measured-log', days, mel_edi_lx: out, sleep: regularSleep(days) };
}

function cloudyDaylight(days: number, rng: Xoshiro128StarStar): PerMinuteLightCase {
  const out = new Float64Array(days * 1440);
  let cloud = 0.5;
  for (let d = 0; d < days; d++) {
    for (let m = 0; m < 1440; m++) {
      const h = m / 60;
      cloud = Math.min(1, Math.max(0.05, cloud + 0.04 * gaussian(rng)));
      let v = 0;
      if (h >= 7 && h < 23) v = 60;
      if (h > 6 && h < 20) v += 1500 * Math.sin((Math.PI * (h - 6)) / 14) * cloud;
      out[d * 1440 + m] = v;
    }
  }
  return { kind: 'cloudy-daylight', days, mel_edi_lx: out, sleep: regularSleep(days) };
}

function nightShift(days: number, rng: Xoshiro128StarStar): PerMinuteLightCase {
  const out = new Float64Array(days * 1440);
  const sleep: SleepEpisode[] = [{ start_h: 0, end_h: 7 }];
  const nights = 3;
  for (let d = 0; d < days; d++) {
    const nightStart = d < nights; // works 19:00 on days 0..2, sleeps 08:30–15:30 on days 1..3
    const afterNight = d >= 1 && d <= nights;
    for (let m = 0; m < 1440; m++) {
      const h = m / 60;
      let v = 0;
      if (h >= 7 && h < 23) v = 50;
      if (afterNight && h < 7) v = 120 * Math.exp(0.1 * gaussian(rng));
      if (afterNight && h >= 7 && h < 7.5) v = 2000 * Math.exp(0.2 * gaussian(rng));
      if (afterNight && h >= 8.5 && h < 15.5) v = 0;
      if (nightStart && h >= 19) v = 120 * Math.exp(0.1 * gaussian(rng));
      const inNight = (nightStart && h >= 19) || (afterNight && h < 7);
      const sinceStart = h >= 19 ? h - 19 : h + 5;
      if (inNight && sinceStart % 2 >= 1.75) v = 900 * Math.exp(0.2 * gaussian(rng));
      out[d * 1440 + m] = v;
    }
    if (afterNight) sleep.push({ start_h: 24 * d + 8.5, end_h: 24 * d + 15.5 });
    if (d >= nights) sleep.push({ start_h: 24 * d + 23, end_h: 24 * d + 31 });
  }
  return { kind: 'night-shift', days, mel_edi_lx: out, sleep };
}

/** The case of this kind over `days` days, the same for the same seed. */
export function perMinuteLightCase(kind: PerMinuteLightKind, days: number, seed = 1): PerMinuteLightCase {
  const rng = new Xoshiro128StarStar([seed >>> 0 || 1, 0x9e3779b9, 0x7f4a7c15, 0x2545f491]);
  switch (kind) {
    case 'measured-log':
      return measuredLog(days, rng);
    case 'cloudy-daylight':
      return cloudyDaylight(days, rng);
    case 'night-shift':
      return nightShift(days, rng);
  }
}
