/**
 * Daylight per time step from a parsed EPW file. EPW values are hourly means (hour-ending, local
 * standard time). Following common practice (interpolate clear-sky ratios, not
 * raw W/m² across sunrise), each hour gets ratios k = (file value)/(clear-sky mean over the same
 * hour) for direct normal and diffuse horizontal, in lux and in W/m²; k is interpolated linearly
 * between hour midpoints and multiplied by the clear-sky value at each step. Sunrise and sunset
 * thus follow the sun, not the hour grid. Illuminance comes from the file's columns when present,
 * otherwise from irradiance with the Perez (1990) efficacies. A missing hour borrows the ratio of
 * its neighbour (or 1, clear, if both are missing) and is counted.
 */
import { sunPositionsEvery } from '../sun/sun-track.js';
import type { EpwFile } from '../weather/epw.js';
import { EPW_HEADER_LINES } from '../weather/epw-fields.js';
import { epwDayIndex, epwRecordIndexAt } from '../weather/epw-time.js';
import { clearSkyIrradiance } from './clear-sky.js';
import { cloudGlobalFactor } from './decomposition.js';
import { dayOfYearUtc, extraterrestrialNormal_W_m2 } from './extraterrestrial.js';
import { perezIlluminance } from './perez-efficacy.js';
import { allocateSeries, finishSample, type DaylightSeries, type SampleWindow } from './daylight-series.js';

const H = 3_600_000;
/** Caps on the ratios to clear sky (our guard against near-zero clear-sky means at sunrise). */
const MAX_DIRECT_RATIO = 1.6;
const MAX_DIFFUSE_RATIO = 12;

export interface EpwDaylightOptions {
  /** Linke turbidity of the clear-sky reference shape; default 3. */
  readonly linkeTurbidity?: number;
}

export interface EpwDaylightResult {
  readonly series: DaylightSeries;
  /** Hours whose values were missing and were filled from a neighbour. */
  readonly filledHours: number;
}

interface HourRatios {
  readonly bLx: number;
  readonly dLx: number;
  readonly bW: number;
  readonly dW: number;
  readonly recordIndex: number;
  readonly missing: boolean;
}

export function daylightFromEpw(file: EpwFile, window: SampleWindow, options: EpwDaylightOptions = {}): EpwDaylightResult {
  const tl = options.linkeTurbidity ?? 3;
  const site = { latitude_deg: file.location.latitude_deg, longitude_deg: file.location.longitude_deg, elevation_m: Math.max(0, file.location.elevation_m) };
  const tzMs = file.location.timeZone_h * H;
  const dayIndex = epwDayIndex(file);
  const sun = sunPositionsEvery(window.startEpochMs, window.step_min, window.count, site);
  // Clear-sky reference track every 10 min covering every hour touched, ±1 h.
  const endOfHour = (t: number) => Math.ceil((t + tzMs) / H) * H - tzMs; // UT end of the (hour-ending) interval containing t
  const firstHourEnd = endOfHour(window.startEpochMs) - 4 * H;
  const lastMs = window.startEpochMs + Math.max(0, window.count - 1) * window.step_min * 60_000;
  const refStart = firstHourEnd - H + 5 * 60_000; // sub-samples at :05, :15, … :55 of each hour
  const refCount = Math.round((endOfHour(lastMs) + 4 * H - firstHourEnd) / (10 * 60_000)) + 6;
  const ref = sunPositionsEvery(refStart, 10, refCount, site);

  const clearAt = (zenith: number, t: number, dew: number) => {
    const i0 = extraterrestrialNormal_W_m2(dayOfYearUtc(t));
    const irr = clearSkyIrradiance(zenith, { linkeTurbidity: tl, altitude_m: site.elevation_m, extraterrestrial_W_m2: i0 });
    const lx = perezIlluminance({ zenith_deg: zenith, directNormal_W_m2: irr.directNormal_W_m2, diffuseHorizontal_W_m2: irr.diffuseHorizontal_W_m2, dewPoint_C: dew, extraterrestrial_W_m2: i0 });
    return { bW: irr.directNormal_W_m2, dW: irr.diffuseHorizontal_W_m2, bLx: lx.directNormal_lx, dLx: lx.diffuseHorizontal_lx };
  };

  const cache = new Map<number, HourRatios>();
  let filledHours = 0;
  const rawRatios = (hourEnd: number): HourRatios => {
    const hit = cache.get(hourEnd);
    if (hit !== undefined) return hit;
    const r = epwRecordIndexAt(file, dayIndex, hourEnd);
    if (r < 0) {
      const d = new Date(hourEnd - 1 + tzMs);
      throw new RangeError(`${file.fileName}, line ${EPW_HEADER_LINES}: the weather file's DATA PERIODS (${file.period.start} – ${file.period.end}) hold no data for ${d.getUTCMonth() + 1}/${d.getUTCDate()}, which the time span needs`);
    }
    const v = file.values;
    const dew = Number.isFinite(v.dewPoint_C[r] as number) ? (v.dewPoint_C[r] as number) : 10;
    // Clear-sky means over the hour from six sub-samples.
    const k0 = Math.round((hourEnd - H + 5 * 60_000 - refStart) / (10 * 60_000));
    const mean = { bW: 0, dW: 0, bLx: 0, dLx: 0 };
    let midZenith = 90;
    for (let j = 0; j < 6; j++) {
      const z = ref.zenith_deg[k0 + j] as number;
      if (j === 3) midZenith = z;
      const c = clearAt(z, hourEnd - H + (5 + 10 * j) * 60_000, dew);
      mean.bW += c.bW / 6;
      mean.dW += c.dW / 6;
      mean.bLx += c.bLx / 6;
      mean.dLx += c.dLx / 6;
    }
    let bW = v.directNormal_Wh_m2[r] as number;
    let dW = v.diffuseHorizontal_Wh_m2[r] as number;
    let bLx = v.directNormal_lx[r] as number;
    let dLx = v.diffuseHorizontal_lx[r] as number;
    if ((!Number.isFinite(bLx) || !Number.isFinite(dLx)) && Number.isFinite(bW) && Number.isFinite(dW)) {
      const p = perezIlluminance({ zenith_deg: midZenith, directNormal_W_m2: bW, diffuseHorizontal_W_m2: dW, dewPoint_C: dew, extraterrestrial_W_m2: extraterrestrialNormal_W_m2(dayOfYearUtc(hourEnd)) });
      if (!Number.isFinite(bLx)) bLx = p.directNormal_lx;
      if (!Number.isFinite(dLx)) dLx = p.diffuseHorizontal_lx;
    }
    const missing = ![bW, dW, bLx, dLx].every(Number.isFinite);
    if (missing) {
      bW = Number.NaN;
      dW = Number.NaN;
    }
    const ratio = (x: number, c: number, cap: number) => (!Number.isFinite(x) ? Number.NaN : c > 1e-6 ? Math.min(cap, x / c) : 0);
    const out: HourRatios = {
      bW: ratio(bW, mean.bW, MAX_DIRECT_RATIO),
      dW: ratio(dW, mean.dW, MAX_DIFFUSE_RATIO),
      bLx: ratio(bLx, mean.bLx, MAX_DIRECT_RATIO),
      dLx: ratio(dLx, mean.dLx, MAX_DIFFUSE_RATIO),
      recordIndex: r,
      missing,
    };
    cache.set(hourEnd, out);
    return out;
  };
  const filled = new Set<number>();
  const ratios = (hourEnd: number): HourRatios => {
    const r = rawRatios(hourEnd);
    if (!r.missing) return r;
    if (!filled.has(hourEnd)) {
      filled.add(hourEnd);
      filledHours++;
    }
    for (const alt of [hourEnd - H, hourEnd + H, hourEnd - 2 * H, hourEnd + 2 * H]) {
      const a = rawRatios(alt);
      if (!a.missing) return { ...a, recordIndex: r.recordIndex, missing: true };
    }
    return { bW: 1, dW: 1, bLx: 1, dLx: 1, recordIndex: r.recordIndex, missing: true };
  };

  const s = allocateSeries('weather-file', window, sun);
  for (let i = 0; i < window.count; i++) {
    const t = window.startEpochMs + i * window.step_min * 60_000;
    const hEnd = endOfHour(t);
    const mid = hEnd - H / 2;
    const here = ratios(hEnd);
    const other = ratios(t >= mid ? hEnd + H : hEnd - H);
    const w = Math.abs(t - mid) / H;
    const lerp = (a: number, b: number) => (1 - w) * a + w * b;
    const r = here.recordIndex;
    const v = file.values;
    const dew = Number.isFinite(v.dewPoint_C[r] as number) ? (v.dewPoint_C[r] as number) : 10;
    const c = clearAt(sun.zenith_deg[i] as number, t, dew);
    s.directNormal_W_m2[i] = lerp(here.bW, other.bW) * c.bW;
    s.diffuseHorizontal_W_m2[i] = lerp(here.dW, other.dW) * c.dW;
    const cosZ = Math.max(0, Math.cos(((sun.zenith_deg[i] as number) * Math.PI) / 180));
    s.globalHorizontal_W_m2[i] = (s.directNormal_W_m2[i] as number) * cosZ + (s.diffuseHorizontal_W_m2[i] as number);
    s.directNormal_lx[i] = lerp(here.bLx, other.bLx) * c.bLx;
    s.diffuseHorizontal_lx[i] = lerp(here.dLx, other.dLx) * c.dLx;
    s.snowDepth_cm[i] = v.snowDepth_cm[r] as number;
    s.daysSinceSnowfall[i] = v.daysSinceSnowfall[r] as number;
    const cover = v.totalSkyCover_tenths[r] as number;
    finishSample(s, i, Number.isFinite(cover) ? cloudGlobalFactor(cover * 0.8) : 1, undefined);
  }
  return { series: s, filledHours };
}
