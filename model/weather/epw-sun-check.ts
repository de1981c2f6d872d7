/**
 * Plausibility of an EPW file against the sun: direct light in an hour during which the sun
 * never rises above the horizon is impossible. Sun positions come from the per-minute SPA path
 * every 30 min over a reference year (2001, or 2004 for files with 29 February); calendar years
 * inside typical-year files are ignored (their effect on the sun is < 0.2°).
 */
import { sunPositionsEvery } from '../sun/sun-track.js';
import type { EpwFile, EpwIssue } from './epw.js';
import { epwIntervalEndMs } from './epw-time.js';

/** Elevation (deg) below which the sun counts as down for the whole hour; allows for a low horizon. */
const SUN_DOWN_ELEVATION_DEG = -1;

export interface SunCheckResult {
  readonly count: number;
  /** First few offending lines. */
  readonly issues: readonly EpwIssue[];
}

/**
 * Counts records with direct light (direct normal irradiance > 0 or direct normal illuminance > 0)
 * while the sun stays below −1° elevation through the hour. `hourShift_h` moves the assumed
 * interval (0 = the EPW hour-ending convention); tests use it to show the convention matters.
 */
export function checkDirectLightAgainstSun(file: EpwFile, hourShift_h = 0): SunCheckResult {
  const refYear = file.hasLeapDay ? 2004 : 2001;
  const startMs = Date.UTC(refYear, 0, 1) - file.location.timeZone_h * 3_600_000 - 2 * 3_600_000;
  const days = file.hasLeapDay ? 366 : 365;
  const track = sunPositionsEvery(startMs, 30, (days + 1) * 48 + 8, { latitude_deg: file.location.latitude_deg, longitude_deg: file.location.longitude_deg, elevation_m: Math.max(0, file.location.elevation_m) });
  const elevationAt = (ms: number) => {
    const k = Math.round((ms - startMs) / 1_800_000);
    return track.elevation_deg[Math.max(0, Math.min(track.count - 1, k))] as number;
  };
  const issues: EpwIssue[] = [];
  let count = 0;
  for (let i = 0; i < file.count; i++) {
    const dni = file.values.directNormal_Wh_m2[i] as number;
    const dnl = file.values.directNormal_lx[i] as number;
    if (!(dni > 0) && !(dnl > 0)) continue;
    const endMs = epwIntervalEndMs(file, i, refYear) + hourShift_h * 3_600_000;
    const maxElevation = Math.max(elevationAt(endMs - 3_600_000), elevationAt(endMs - 1_800_000), elevationAt(endMs));
    if (maxElevation < SUN_DOWN_ELEVATION_DEG) {
      count++;
      if (issues.length < 20) issues.push({ line: file.line[i] as number, field: 'direct normal radiation', message: `direct light (${dni} Wh/m², ${dnl} lx) while the sun is below the horizon all hour` });
    }
  }
  return { count, issues };
}
