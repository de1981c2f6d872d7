/**
 * Outdoor daylight over the run, one sample per real minute from the run start: the daylight
 * series (model/daylight — from the weather file's text, or from a sky condition per local day
 * drawn from the scenario's seasonal mix), the per-minute conditions the room model reads, and
 * the vertical illuminance at the eye of a person outdoors (Perez sky, gaze averaged over all
 * horizontal directions, model/daylight/outdoor-eye.ts) with the ground reflectance of the site.
 */
import { daylightFromEpw, daylightFromSkyConditions, outdoorEyeSeries, parseEpw, type DaylightSeries, type SkyCondition } from '../../model/daylight/index.js';
import { outdoorConditionsFromDaylightSeries, type OutdoorConditions } from '../../model/eye/index.js';
import type { Scenario } from '../schema/scenario-types.js';
import { utcOffsetAt_min } from '../time/local-calendar.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import { dateOfDay } from '../timeline/wall-state.js';
import type { LocalClock } from './local-clock.js';
import { RunInputError } from './run-input-error.js';
import { skyConditionForDay } from './sky-days.js';

export interface OutdoorLight {
  readonly series: DaylightSeries;
  readonly conditions: OutdoorConditions;
  /** Vertical eye illuminance outdoors in the open (lx). */
  readonly outdoorEye_lx: Float64Array;
  /** Sky condition of each run day (sky-model weather), or null for a weather file. */
  readonly skyByDay: readonly (SkyCondition | null)[];
  /** Weather-file hours filled from a neighbour. */
  readonly filledHours: number;
}

export interface WeatherText {
  readonly fileName: string;
  readonly text: string;
}

/** Standard-time offset of the zone (h): the smaller of its January and July offsets. */
function standardOffset_h(zone: string, year: number): number {
  return Math.min(utcOffsetAt_min(zone, Date.UTC(year, 0, 15)), utcOffsetAt_min(zone, Date.UTC(year, 6, 15))) / 60;
}

export function outdoorLight(scenario: Scenario, timeline: ExposureTimeline, clock: LocalClock, weather: WeatherText | undefined): OutdoorLight {
  const site = scenario.site;
  const window = { startEpochMs: timeline.runStartUtc_ms, step_min: 1, count: timeline.total_min };
  let series: DaylightSeries;
  let skyByDay: (SkyCondition | null)[];
  let filledHours = 0;
  if (site.weather.kind === 'file') {
    if (weather === undefined) throw new RunInputError('site.weather.file', `the weather file ${site.weather.file} was not supplied`);
    try {
      const r = daylightFromEpw(parseEpw(weather.text, weather.fileName), window);
      series = r.series;
      filledHours = r.filledHours;
    } catch (err) {
      throw new RunInputError('site.weather.file', `${weather.fileName}: ${err instanceof Error ? err.message : String(err)}`);
    }
    skyByDay = timeline.days.map(() => null);
  } else {
    const w = site.weather;
    const conditions = timeline.days.map((d) => skyConditionForDay(w, d.date));
    // One more day either side: the series' days start at local standard midnight.
    const before = skyConditionForDay(w, dateOfDay(scenario.run.startDate, -1));
    series = daylightFromSkyConditions({
      ...window,
      site: { latitude_deg: site.latitude_deg, longitude_deg: site.longitude_deg, elevation_m: site.elevation_m },
      utcOffset_h: standardOffset_h(site.timeZone, Number(scenario.run.startDate.slice(0, 4))),
      conditions: conditions.length > 0 ? conditions : [before],
    });
    skyByDay = conditions;
  }
  const month = new Uint8Array(timeline.total_min);
  for (const d of timeline.days) month.fill(Number(d.date.slice(5, 7)), d.start_min, d.start_min + d.length_min);
  void clock;
  const snowMonths = new Set(site.ground.snow.months);
  const eye = outdoorEyeSeries(series, { gazeAzimuth_deg: 'all-directions', groundReflectance: site.ground.reflectance });
  const conditions = outdoorConditionsFromDaylightSeries(series, month, eye.total_lx);
  // Snow cover from the month list when the weather has no snow depth.
  const snowOnGround = conditions.snowOnGround ?? new Uint8Array(timeline.total_min);
  if (site.weather.kind === 'sky-model' || !site.weather.snowFromFile) for (let i = 0; i < month.length; i++) snowOnGround[i] = snowMonths.has(month[i] as number) ? 1 : 0;
  return { series, conditions: { ...conditions, snowOnGround }, outdoorEye_lx: eye.total_lx, skyByDay, filledHours };
}
