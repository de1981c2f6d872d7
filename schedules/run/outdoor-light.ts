/**
 * Outdoor daylight over the run, one sample per real minute from the run start: the daylight
 * series (model/daylight — from the weather file's text, or from a sky condition per local day
 * drawn from the scenario's seasonal mix), the per-minute conditions the room model reads, and
 * the vertical illuminance at the eye of a person outdoors (Perez sky, gaze averaged over all
 * horizontal directions, model/daylight/outdoor-eye.ts) with the ground reflectance of the site.
 */
import { daylightFromEpw, daylightFromSkyConditions, groundReflectanceWithSnow, outdoorEyeIlluminance, parseEpw, type DaylightSeries, type EpwLocation, type SkyCondition } from '../../model/daylight/index.js';
import { outdoorConditionsFromDaylightSeries, type OutdoorConditions } from '../../model/eye/index.js';
import type { Scenario } from '../schema/scenario-types.js';
import { utcOffsetAt_min } from '../time/local-calendar.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import { RunInputError } from './run-input-error.js';
import { skyConditionForDay } from './sky-days.js';

export interface OutdoorLight {
  /** Identifies site, weather and period (for caches). */
  readonly key: string;
  readonly series: DaylightSeries;
  readonly conditions: OutdoorConditions;
  /** Vertical eye illuminance outdoors in the open (lx). */
  readonly outdoorEye_lx: Float64Array;
  /** Sky condition of each run day (sky-model weather), or null for a weather file. */
  readonly skyByDay: readonly (SkyCondition | null)[];
  /** Weather-file hours filled from a neighbour. */
  readonly filledHours: number;
  /** The place a weather file was recorded for (its header); null for generated skies. */
  readonly weatherLocation: EpwLocation | null;
}

export interface WeatherText {
  readonly fileName: string;
  readonly text: string;
}

/** Standard-time offset of the zone (h): the smaller of its January and July offsets. */
function standardOffset_h(zone: string, year: number): number {
  return Math.min(utcOffsetAt_min(zone, Date.UTC(year, 0, 15)), utcOffsetAt_min(zone, Date.UTC(year, 6, 15))) / 60;
}

/**
 * `needsOutdoorEye` marks the minutes at which someone is outdoors or in a vehicle; the outdoor
 * eye illuminance is computed there only (0 elsewhere) — all minutes when absent.
 */
/** FNV-1a 32-bit hash of a text (cache keys only). */
function textHash(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return (h >>> 0).toString(16);
}

interface CachedDaylight {
  readonly base: Omit<OutdoorLight, 'outdoorEye_lx'>;
  /** Outdoor eye illuminance, NaN where not computed yet. */
  readonly eye_lx: Float64Array;
  readonly month: Uint8Array;
}
const daylightCache = new Map<string, CachedDaylight>();

/** Forget cached outdoor daylight (benchmarks measure runs without it). */
export function clearOutdoorCache(): void {
  daylightCache.clear();
}

export function outdoorLight(scenario: Scenario, timeline: ExposureTimeline, weather: WeatherText | undefined, needsOutdoorEye?: Uint8Array): OutdoorLight {
  const site = scenario.site;
  const key = JSON.stringify([site, timeline.runStartUtc_ms, timeline.total_min, weather === undefined ? null : [weather.fileName, weather.text.length, textHash(weather.text)]]);
  let cached = daylightCache.get(key);
  if (cached === undefined) {
    cached = computeDaylight(scenario, timeline, weather, key);
    if (daylightCache.size >= 4) daylightCache.clear();
    daylightCache.set(key, cached);
  }
  const { base, eye_lx, month } = cached;
  const series = base.series;
  const snowMonths = new Set(site.ground.snow.months);
  const out = new Float64Array(timeline.total_min);
  for (let i = 0; i < out.length; i++) {
    if (needsOutdoorEye !== undefined && needsOutdoorEye[i] !== 1) continue;
    if (!((series.diffuseHorizontal_lx[i] ?? 0) > 0 || (series.directNormal_lx[i] ?? 0) > 0)) continue;
    if (Number.isNaN(eye_lx[i])) {
      eye_lx[i] = outdoorEyeIlluminance({
        sunZenith_deg: series.sun.zenith_deg[i] as number,
        sunAzimuth_deg: series.sun.azimuth_deg[i] as number,
        directNormal_lx: series.directNormal_lx[i] as number,
        diffuseHorizontal_lx: series.diffuseHorizontal_lx[i] as number,
        globalHorizontal_lx: series.globalHorizontal_lx[i] as number,
        groundReflectance: snowMonths.has(month[i] as number) && site.weather.kind === 'sky-model' ? site.ground.snow.reflectance : groundReflectanceWithSnow(site.ground.reflectance, series.snowDepth_cm[i] as number, series.daysSinceSnowfall[i] as number),
        gazeAzimuth_deg: 'all-directions',
        gazeTilt_deg: 90,
        skyModel: 'perez',
        clearness: series.clearness[i] as number,
        brightness: series.brightness[i] as number,
      }).total_lx;
    }
    out[i] = eye_lx[i] as number;
  }
  return { ...base, outdoorEye_lx: out };
}

function computeDaylight(scenario: Scenario, timeline: ExposureTimeline, weather: WeatherText | undefined, key: string): CachedDaylight {
  const site = scenario.site;
  const window = { startEpochMs: timeline.runStartUtc_ms, step_min: 1, count: timeline.total_min };
  let series: DaylightSeries;
  let skyByDay: (SkyCondition | null)[];
  let filledHours = 0;
  let weatherLocation: EpwLocation | null = null;
  if (site.weather.kind === 'file') {
    if (weather === undefined) throw new RunInputError('site.weather.file', `the weather file ${site.weather.file} was not supplied`);
    try {
      const file = parseEpw(weather.text, weather.fileName);
      weatherLocation = file.location;
      const r = daylightFromEpw(file, window);
      series = r.series;
      filledHours = r.filledHours;
    } catch (err) {
      throw new RunInputError('site.weather.file', `${weather.fileName}: ${err instanceof Error ? err.message : String(err)}`);
    }
    skyByDay = timeline.days.map(() => null);
  } else {
    const w = site.weather;
    // One condition per run day; the series counts its days from local standard midnight.
    const conditions = timeline.days.map((d) => skyConditionForDay(w, d.date));
    series = daylightFromSkyConditions({
      ...window,
      site: { latitude_deg: site.latitude_deg, longitude_deg: site.longitude_deg, elevation_m: site.elevation_m },
      utcOffset_h: standardOffset_h(site.timeZone, Number(scenario.run.startDate.slice(0, 4))),
      conditions: conditions.length > 0 ? conditions : [skyConditionForDay(w, scenario.run.startDate)],
    });
    skyByDay = conditions;
  }
  const snowMonths = new Set(site.ground.snow.months);
  const month = new Uint8Array(timeline.total_min);
  for (const d of timeline.days) month.fill(Number(d.date.slice(5, 7)), d.start_min, d.start_min + d.length_min);
  const raw = outdoorConditionsFromDaylightSeries(series, month);
  // Perez ε can run to several hundred when the diffuse part is tiny at a low sun; the room
  // model accepts ≤ 100, and every ε above 6.2 falls in Perez's clearest bin (Perez et al. 1990).
  const conditions = raw.perezEpsilon === undefined ? raw : { ...raw, perezEpsilon: raw.perezEpsilon.map((e) => Math.min(100, e)) };
  // Snow cover from the month list when the weather has no snow depth.
  const snowOnGround = conditions.snowOnGround ?? new Uint8Array(timeline.total_min);
  if (site.weather.kind === 'sky-model' || !site.weather.snowFromFile) for (let i = 0; i < month.length; i++) snowOnGround[i] = snowMonths.has(month[i] as number) ? 1 : 0;
  return { base: { key, series, conditions: { ...conditions, snowOnGround }, skyByDay, filledHours, weatherLocation }, eye_lx: new Float64Array(timeline.total_min).fill(Number.NaN), month };
}
