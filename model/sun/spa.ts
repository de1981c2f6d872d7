/**
 * Solar position by the NREL Solar Position Algorithm (Reda & Andreas 2004, Solar Energy
 * 76(5):577–589): topocentric zenith and azimuth with refraction, stated uncertainty ±0.0003°
 * for years −2000…6000. Time is a UT instant (Unix epoch milliseconds).
 */
import { decimalYearFromEpochMs, defaultDeltaT_s } from './delta-t.js';
import { julianDayFromEpochMs } from './julian.js';
import { resolveObserver, type Observer } from './observer.js';
import { equationOfTime_min, geocentricSun, type GeocentricSun } from './spa-geocentric.js';
import { observerTerms, topocentricSun, type TopocentricSun } from './spa-topocentric.js';

export interface SolarPosition {
  /** Topocentric zenith angle, refraction-corrected (deg). */
  readonly zenith_deg: number;
  /** Azimuth from north, clockwise (deg, 0…360). */
  readonly azimuth_deg: number;
  /** Apparent (refraction-corrected) elevation (deg). */
  readonly elevation_deg: number;
  /** Elevation without refraction (deg). */
  readonly trueElevation_deg: number;
  /** Geocentric declination (deg). */
  readonly declination_deg: number;
  /** Earth–sun distance (AU). */
  readonly sunDistance_au: number;
  /** Equation of time (minutes): apparent minus mean solar time. */
  readonly equationOfTime_min: number;
}

export interface SpaOptions {
  /** ΔT = TT − UT (s); default from the Espenak–Meeus polynomial for the date. */
  readonly deltaT_s?: number;
}

/** Earliest and latest instants the SPA covers (years −2000…6000, paper §1). */
const MIN_EPOCH_MS = Date.UTC(-2000, 0, 1);
const MAX_EPOCH_MS = Date.UTC(6000, 11, 31, 23, 59, 59);

export function checkSpaTime(epochMs: number): void {
  if (!Number.isFinite(epochMs)) throw new RangeError(`time: not a valid instant (${epochMs})`);
  if (epochMs < MIN_EPOCH_MS || epochMs > MAX_EPOCH_MS) throw new RangeError('time: the solar position algorithm covers years −2000 to 6000 only');
}

export function resolveDeltaT_s(epochMs: number, options: SpaOptions): number {
  const dt = options.deltaT_s ?? defaultDeltaT_s(decimalYearFromEpochMs(epochMs));
  if (!Number.isFinite(dt) || Math.abs(dt) > 100_000) throw new RangeError(`deltaT_s: must be a finite number of seconds, got ${dt}`);
  return dt;
}

/** Every intermediate value of the algorithm (for checks against the paper's worked example). */
export function spaDetailed(epochMs: number, observer: Observer, options: SpaOptions = {}): { geocentric: GeocentricSun; topocentric: TopocentricSun } {
  checkSpaTime(epochMs);
  const o = resolveObserver(observer);
  const geocentric = geocentricSun(julianDayFromEpochMs(epochMs), resolveDeltaT_s(epochMs, options));
  return { geocentric, topocentric: topocentricSun(geocentric, o, observerTerms(o)) };
}

/** Topocentric solar position at one UT instant. */
export function solarPosition(epochMs: number, observer: Observer, options: SpaOptions = {}): SolarPosition {
  const { geocentric: g, topocentric: t } = spaDetailed(epochMs, observer, options);
  return {
    zenith_deg: t.zenith_deg,
    azimuth_deg: t.azimuth_deg,
    elevation_deg: t.elevation_deg,
    trueElevation_deg: t.e0_deg,
    declination_deg: g.delta_deg,
    sunDistance_au: g.R_au,
    equationOfTime_min: equationOfTime_min(g),
  };
}
