/**
 * Sunrise, sun transit and sunset by the SPA's Appendix A.2 method (Reda & Andreas 2004):
 * geocentric α, δ at 0 h TT of the day before, the day and the day after, quadratic
 * interpolation, and one correction step. Sunrise/sunset are for the sun's upper limb at the
 * horizon with standard refraction (h0′ = −0.8333°). Parallax is neglected, as in the paper.
 * Departure from the paper: days start at local midnight instead of 0 h UT (see below).
 */
import { acosD, asinD, cosD, sinD, wrap180_deg } from './angles.js';
import { julianDayFromEpochMs } from './julian.js';
import { REFRACTION_AT_HORIZON_DEG, resolveObserver, SUN_RADIUS_DEG, type Observer } from './observer.js';
import { geocentricSun } from './spa-geocentric.js';
import { defaultDeltaT_s } from './delta-t.js';

export interface CalendarDate {
  readonly year: number;
  /** 1–12 */
  readonly month: number;
  /** 1–31 */
  readonly day: number;
}

export interface SunTimes {
  /** 'normal', or the sun stays up ('polar-day') or down ('polar-night') all day. */
  readonly kind: 'normal' | 'polar-day' | 'polar-night';
  /** Local clock hours (0–24) in the given UTC offset; null when the sun neither rises nor sets. */
  readonly sunrise_h: number | null;
  readonly transit_h: number;
  readonly sunset_h: number | null;
  /** The same events as UT instants (Unix epoch ms); null when absent. */
  readonly sunriseEpochMs: number | null;
  readonly transitEpochMs: number;
  readonly sunsetEpochMs: number | null;
}

const frac01 = (x: number): number => x - Math.floor(x);

/**
 * Sun times for a calendar date at an observer whose clocks run `utcOffset_h` ahead of UT
 * (e.g. −7 for Mountain Standard Time).
 */
export interface SunTimesOptions {
  readonly deltaT_s?: number;
  /**
   * 'local' (default): events of the local calendar day. 'ut': the paper's own convention (days
   * start at 0 h UT), kept to reproduce its worked example; west of Greenwich its "sunset" is then
   * the evening before the date (the example's 17:20:19 is 16 Oct local).
   */
  readonly dayStart?: 'local' | 'ut';
}

export function sunTimes(date: CalendarDate, observer: Observer, utcOffset_h: number, options: SunTimesOptions = {}): SunTimes {
  const o = resolveObserver(observer);
  if (!Number.isFinite(utcOffset_h) || Math.abs(utcOffset_h) > 18) throw new RangeError(`utcOffset_h: must be within −18…18 h, got ${utcOffset_h}`);
  // Reference instant: local midnight of the date (the paper uses 0 h UT; starting from local
  // midnight keeps every event on the local date asked for, east or west of Greenwich).
  const utStart = options.dayStart === 'ut';
  const day0Ms = Date.UTC(date.year, date.month - 1, date.day) - (utStart ? 0 : utcOffset_h * 3_600_000);
  if (!Number.isFinite(day0Ms)) throw new RangeError('date: not a valid calendar date');
  const deltaT_s = options.deltaT_s ?? defaultDeltaT_s(date.year + (date.month - 0.5) / 12);
  const jd0 = julianDayFromEpochMs(day0Ms);
  const nu = geocentricSun(jd0, deltaT_s).nu_deg; // A.2.1: ν at the given instant
  // A.2.2: α, δ one day before, at and one day after the given instant (ΔT = 0).
  const g = [geocentricSun(jd0 - 1, 0), geocentricSun(jd0, 0), geocentricSun(jd0 + 1, 0)] as const;
  const alpha = g.map((s) => s.alpha_deg);
  const delta = g.map((s) => s.delta_deg);
  const [am, a0, ap] = alpha as [number, number, number];
  const [dm, d0, dp] = delta as [number, number, number];
  const lat = o.latitude_deg;
  const lon = o.longitude_deg;
  const h0Prime = -(SUN_RADIUS_DEG + REFRACTION_AT_HORIZON_DEG); // A.2: −0.8333°

  const m0 = (a0 - lon - nu) / 360; // A.2.3 approximate transit
  const arg = (sinD(h0Prime) - sinD(lat) * sinD(d0)) / (cosD(lat) * cosD(d0)); // A.2.4
  const kind: SunTimes['kind'] = arg < -1 ? 'polar-day' : arg > 1 ? 'polar-night' : 'normal';
  const H0 = kind === 'normal' ? acosD(arg) : 0;

  // Quadratic interpolation (A.2.8); day-to-day differences unwrapped across 0°/360°.
  const aA = wrap180_deg(a0 - am);
  const aB = wrap180_deg(ap - a0);
  const dA = d0 - dm;
  const dB = dp - d0;
  const interp = (v0: number, a: number, b: number, n: number) => v0 + (n * (a + b + (b - a) * n)) / 2;

  const event = (m: number) => {
    const nuI = nu + 360.985647 * m; // A.2.6
    const n = m + deltaT_s / 86400; // A.2.7
    const alphaI = interp(a0, aA, aB, n);
    const deltaI = interp(d0, dA, dB, n);
    const hPrime = wrap180_deg(nuI + lon - alphaI); // A.2.9
    const h = asinD(sinD(lat) * sinD(deltaI) + cosD(lat) * cosD(deltaI) * cosD(hPrime)); // A.2.10
    return { hPrime, h, deltaI };
  };

  const mT = frac01(m0);
  const transit = event(mT);
  const transitFrac = mT - transit.hPrime / 360; // A.2.11
  const shift_h = utStart ? utcOffset_h : 0;
  const toLocal = (f: number) => 24 * frac01(f + shift_h / 24);
  const transit_h = toLocal(transitFrac);
  const localMidnightMs = Date.UTC(date.year, date.month - 1, date.day) - utcOffset_h * 3_600_000;
  const epochOf = (localHour: number) => localMidnightMs + localHour * 3_600_000;

  if (kind !== 'normal') {
    return { kind, sunrise_h: null, transit_h, sunset_h: null, sunriseEpochMs: null, transitEpochMs: epochOf(transit_h), sunsetEpochMs: null };
  }
  const corrected = (m: number) => {
    const e = event(m);
    return m + (e.h - h0Prime) / (360 * cosD(e.deltaI) * cosD(lat) * sinD(e.hPrime)); // A.2.12–13
  };
  const riseFrac = corrected(frac01(m0 - H0 / 360));
  const setFrac = corrected(frac01(m0 + H0 / 360));
  const sunrise_h = toLocal(riseFrac);
  const sunset_h = toLocal(setFrac);
  return {
    kind,
    sunrise_h,
    transit_h,
    sunset_h,
    sunriseEpochMs: epochOf(sunrise_h),
    transitEpochMs: epochOf(transit_h),
    sunsetEpochMs: epochOf(sunset_h),
  };
}

