/**
 * A digest of an EPW file so a user can check what they loaded: location, months, snow days and
 * illuminance statistics. Hourly illuminance comes from the file's columns; hours where they are
 * missing are modelled from irradiance with the Perez (1990) efficacies (sun at mid-hour).
 */
import { dayOfYearUtc, extraterrestrialNormal_W_m2 } from '../daylight/extraterrestrial.js';
import { perezIlluminance } from '../daylight/perez-efficacy.js';
import { sunPositionsEvery } from '../sun/sun-track.js';
import type { EpwFile, EpwIssue, EpwLocation } from './epw.js';
import { checkDirectLightAgainstSun } from './epw-sun-check.js';
import type { EpwNumericField } from './epw-fields.js';

export interface MonthSummary {
  readonly month: number;
  readonly hours: number;
  /** Hours with global horizontal illuminance > 0. */
  readonly daylight_hours: number;
  readonly mean_dry_bulb_C: number | null;
  /** Mean daily sum of global horizontal illuminance (klx·h per day). */
  readonly mean_daily_global_klxh: number;
  readonly max_global_horizontal_lx: number;
  /** Days with snow on the ground (snow depth > 0 in any hour). */
  readonly snow_days: number;
}

export interface IlluminanceStats {
  readonly max_lx: number;
  /** Mean over hours with light. */
  readonly daylight_mean_lx: number;
  readonly daylight_median_lx: number;
  readonly daylight_p90_lx: number;
  /** Sum over the file (Mlx·h). */
  readonly sum_Mlxh: number;
}

export interface EpwSummary {
  readonly location: EpwLocation;
  readonly period: { readonly start: string; readonly end: string };
  readonly records: number;
  readonly leap_day: boolean;
  readonly months: readonly MonthSummary[];
  readonly snow_days: number;
  readonly illuminance: {
    readonly hours_from_file: number;
    readonly hours_modelled: number;
    readonly global_horizontal: IlluminanceStats;
    readonly direct_normal: IlluminanceStats;
    readonly diffuse_horizontal: IlluminanceStats;
  };
  readonly missing_values: Readonly<Partial<Record<EpwNumericField, number>>>;
  readonly warnings: { readonly count: number; readonly listed: readonly EpwIssue[] };
  readonly direct_light_with_sun_down: { readonly count: number; readonly listed: readonly EpwIssue[] };
}

function stats(values: Float64Array): IlluminanceStats {
  const lit = Array.from(values).filter((v) => v > 0).sort((a, b) => a - b);
  const sum = lit.reduce((a, b) => a + b, 0);
  const q = (p: number) => (lit.length === 0 ? 0 : (lit[Math.min(lit.length - 1, Math.floor(p * lit.length))] as number));
  return { max_lx: lit.length === 0 ? 0 : (lit[lit.length - 1] as number), daylight_mean_lx: lit.length === 0 ? 0 : sum / lit.length, daylight_median_lx: q(0.5), daylight_p90_lx: q(0.9), sum_Mlxh: sum / 1e6 };
}

export function summariseEpw(file: EpwFile): EpwSummary {
  const n = file.count;
  const v = file.values;
  const global = new Float64Array(n);
  const direct = new Float64Array(n);
  const diffuse = new Float64Array(n);
  // Sun at each record's mid-hour in a reference year (calendar years inside typical files are ignored).
  const refYear = file.hasLeapDay ? 2004 : 2001;
  const firstMid = Date.UTC(refYear, (file.month[0] ?? 1) - 1, file.day[0] ?? 1, 0, 30) - file.location.timeZone_h * 3_600_000;
  const sun = sunPositionsEvery(firstMid, 60, n, { latitude_deg: file.location.latitude_deg, longitude_deg: file.location.longitude_deg });
  let fromFile = 0;
  let modelled = 0;
  for (let i = 0; i < n; i++) {
    const g = v.globalHorizontal_lx[i] as number;
    const b = v.directNormal_lx[i] as number;
    const d = v.diffuseHorizontal_lx[i] as number;
    if ([g, b, d].every(Number.isFinite)) {
      global[i] = g;
      direct[i] = b;
      diffuse[i] = d;
      fromFile++;
      continue;
    }
    const bW = v.directNormal_Wh_m2[i] as number;
    const dW = v.diffuseHorizontal_Wh_m2[i] as number;
    if (Number.isFinite(bW) && Number.isFinite(dW)) {
      const t = firstMid + i * 3_600_000;
      const p = perezIlluminance({ zenith_deg: sun.zenith_deg[i] as number, directNormal_W_m2: bW, diffuseHorizontal_W_m2: dW, dewPoint_C: Number.isFinite(v.dewPoint_C[i] as number) ? (v.dewPoint_C[i] as number) : 10, extraterrestrial_W_m2: extraterrestrialNormal_W_m2(dayOfYearUtc(t)) });
      global[i] = Number.isFinite(g) ? g : p.globalHorizontal_lx;
      direct[i] = Number.isFinite(b) ? b : p.directNormal_lx;
      diffuse[i] = Number.isFinite(d) ? d : p.diffuseHorizontal_lx;
      modelled++;
    }
  }
  const months: MonthSummary[] = [];
  let snowDaysTotal = 0;
  for (let m = 1; m <= 12; m++) {
    let hours = 0;
    let lit = 0;
    let tSum = 0;
    let tN = 0;
    let gSum = 0;
    let gMax = 0;
    const days = new Set<number>();
    const snowDays = new Set<number>();
    for (let i = 0; i < n; i++) {
      if (file.month[i] !== m) continue;
      hours++;
      const day = file.day[i] as number;
      days.add(day);
      const g = global[i] as number;
      if (g > 0) lit++;
      gSum += g;
      gMax = Math.max(gMax, g);
      const t = v.dryBulb_C[i] as number;
      if (Number.isFinite(t)) {
        tSum += t;
        tN++;
      }
      if ((v.snowDepth_cm[i] as number) > 0) snowDays.add(day);
    }
    if (hours === 0) continue;
    snowDaysTotal += snowDays.size;
    months.push({
      month: m,
      hours,
      daylight_hours: lit,
      mean_dry_bulb_C: tN === 0 ? null : Math.round((tSum / tN) * 10) / 10,
      mean_daily_global_klxh: Math.round(gSum / days.size / 100) / 10,
      max_global_horizontal_lx: gMax,
      snow_days: snowDays.size,
    });
  }
  const missing: Partial<Record<EpwNumericField, number>> = {};
  for (const [k, c] of Object.entries(file.missingCounts) as [EpwNumericField, number][]) if (c > 0) missing[k] = c;
  const sunCheck = checkDirectLightAgainstSun(file);
  return {
    location: file.location,
    period: file.period,
    records: n,
    leap_day: file.hasLeapDay,
    months,
    snow_days: snowDaysTotal,
    illuminance: { hours_from_file: fromFile, hours_modelled: modelled, global_horizontal: stats(global), direct_normal: stats(direct), diffuse_horizontal: stats(diffuse) },
    missing_values: missing,
    warnings: { count: file.warningCount, listed: file.warnings },
    direct_light_with_sun_down: { count: sunCheck.count, listed: sunCheck.issues },
  };
}
