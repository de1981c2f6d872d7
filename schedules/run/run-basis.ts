/**
 * What a run rests on, for results.json (`basis`) and the texts people read:
 *  - the weather source; for a weather file, the place the file was recorded for and whether it
 *    is near the site. Daylight from a weather file follows the sun at the file's own position
 *    (model/daylight/daylight-from-epw.ts), so a file for a far place or another time zone gives
 *    another place's daylight: the run warns when the file's position is more than
 *    WEATHER_SITE_TOLERANCE_DEG from the site in latitude or longitude, or when its standard time
 *    zone differs from the site's;
 *  - for each person whose light comes partly from a measured log: the days with measured light
 *    (hours per local day) and every gap of the log inside the run with how it was filled.
 */
import { DateTime } from 'luxon';
import type { FillRule } from '../schema/light-log-schema.js';
import type { Scenario } from '../schema/scenario-types.js';
import type { ImportedLightLog } from '../lightlog/import-light-log.js';
import type { MinuteLightSeries } from '../lightlog/log-to-minutes.js';
import { FILL_RULE_WORDS } from '../lightlog/gap-notes.js';
import { utcOffsetAt_min } from '../time/local-calendar.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';

/** A weather file counts as far from the site beyond this difference in latitude or longitude (deg; our planning judgement: about 100 km north–south). */
export const WEATHER_SITE_TOLERANCE_DEG = 1;

export interface WeatherFileBasis {
  readonly kind: 'weather-file';
  readonly file: string;
  /** The place the file names in its header. */
  readonly place: string;
  readonly latitude_deg: number;
  readonly longitude_deg: number;
  /** The file's standard time zone, hours ahead of UTC. */
  readonly time_zone_h: number;
  /** The site's standard time zone, hours ahead of UTC. */
  readonly site_time_zone_h: number;
  /** Largest of the latitude and longitude differences to the site (deg). */
  readonly offset_deg: number;
  readonly near_site: boolean;
}

export type WeatherBasis = { readonly kind: 'sky-model'; readonly seed: number } | WeatherFileBasis;

export interface MeasuredLightGap {
  readonly start_local: string;
  readonly end_local: string;
  readonly duration_min: number;
  readonly reason: 'no readings' | 'logger not worn';
  readonly fill_rule: FillRule;
  /** What the run put into the gap, in words. */
  readonly filled_with: string;
}

export interface MeasuredLightUse {
  readonly persona_id: string;
  readonly log_id: string;
  readonly file: string;
  /** Local days with measured light at the eye (readings or filled gaps) and the hours of it. */
  readonly days: readonly { readonly date: string; readonly measured_h: number }[];
  /** Gaps of the log that fall inside the run. */
  readonly gaps: readonly MeasuredLightGap[];
}

export interface RunBasis {
  readonly weather: WeatherBasis;
  readonly measured_light: readonly MeasuredLightUse[];
}

/** Standard-time offset of a zone (h): the smaller of its January and July offsets. */
export function standardOffset_h(zone: string, year: number): number {
  return Math.min(utcOffsetAt_min(zone, Date.UTC(year, 0, 15)), utcOffsetAt_min(zone, Date.UTC(year, 6, 15))) / 60;
}

export interface WeatherFileLocation {
  readonly city: string;
  readonly country: string;
  readonly latitude_deg: number;
  readonly longitude_deg: number;
  readonly timeZone_h: number;
}

/** The weather basis of a run; `location` is the weather file's header when the site uses one. */
export function weatherBasis(scenario: Scenario, fileName: string | null, location: WeatherFileLocation | null): WeatherBasis {
  const w = scenario.site.weather;
  if (w.kind === 'sky-model') return { kind: 'sky-model', seed: w.seed };
  const site = scenario.site;
  const siteZone = standardOffset_h(site.timeZone, Number(scenario.run.startDate.slice(0, 4)));
  if (location === null) return { kind: 'weather-file', file: fileName ?? w.file, place: '', latitude_deg: site.latitude_deg, longitude_deg: site.longitude_deg, time_zone_h: siteZone, site_time_zone_h: siteZone, offset_deg: 0, near_site: true };
  const dLat = Math.abs(location.latitude_deg - site.latitude_deg);
  const dLon = Math.abs(((location.longitude_deg - site.longitude_deg + 540) % 360) - 180);
  const offset = Math.max(dLat, dLon);
  const place = [location.city, location.country].filter((x) => x !== '' && x !== '-').join(', ');
  return {
    kind: 'weather-file',
    file: fileName ?? w.file,
    place,
    latitude_deg: location.latitude_deg,
    longitude_deg: location.longitude_deg,
    time_zone_h: location.timeZone_h,
    site_time_zone_h: siteZone,
    offset_deg: Math.round(offset * 100) / 100,
    near_site: offset <= WEATHER_SITE_TOLERANCE_DEG && Math.abs(location.timeZone_h - siteZone) < 1e-9,
  };
}

const degrees = (lat: number, lon: number) => `${Math.abs(lat).toFixed(2)}° ${lat >= 0 ? 'N' : 'S'}, ${Math.abs(lon).toFixed(2)}° ${lon >= 0 ? 'E' : 'W'}`;

/** "UTC+1", "UTC−5", "UTC+5:30". */
export function utcOffsetWords(h: number): string {
  const sign = h < 0 ? '−' : '+';
  const a = Math.abs(h);
  const hh = Math.floor(a + 1e-9);
  const mm = Math.round((a - hh) * 60);
  return `UTC${sign}${hh}${mm === 0 ? '' : `:${String(mm).padStart(2, '0')}`}`;
}

/** The warning for a weather file far from the site or in another time zone; null when it is near. */
export function weatherSiteWarning(basis: WeatherBasis, site: { readonly latitude_deg: number; readonly longitude_deg: number }): string | null {
  if (basis.kind !== 'weather-file' || basis.near_site) return null;
  const far = basis.offset_deg > WEATHER_SITE_TOLERANCE_DEG;
  const zone = Math.abs(basis.time_zone_h - basis.site_time_zone_h) >= 1e-9;
  const what = [far ? `${basis.offset_deg.toFixed(1)}° away from the site (${degrees(site.latitude_deg, site.longitude_deg)})` : '', zone ? `in another time zone (${utcOffsetWords(basis.time_zone_h)} against the site's ${utcOffsetWords(basis.site_time_zone_h)})` : '']
    .filter((x) => x !== '')
    .join(' and ');
  const where = basis.place === '' ? '' : ` (${basis.place})`;
  return `The weather file ${basis.file} was recorded for a place${where} at ${degrees(basis.latitude_deg, basis.longitude_deg)}, ${what}: the daylight in these results follows that place's sun and skies, not the site's. Use a weather file for a place within ${WEATHER_SITE_TOLERANCE_DEG}° of the site and in its time zone.`;
}

const localIso = (utc_ms: number, zone: string) => {
  const t = DateTime.fromMillis(utc_ms, { zone });
  return t.isValid ? t.toFormat("yyyy-MM-dd'T'HH:mm") : new Date(utc_ms).toISOString().slice(0, 16);
};

export interface LogInRun {
  readonly id: string;
  readonly file: string;
  readonly log: ImportedLightLog;
  readonly minutes: MinuteLightSeries;
}

/**
 * Measured-light days and gaps for each person whose baseline timeline takes light from a log.
 * `timelines` are the baseline timelines (one per person); minutes count where the person's
 * timeline names the log and the log gives the light (reading or filled gap).
 */
export function measuredLightUses(timelines: readonly ExposureTimeline[], logs: readonly LogInRun[]): MeasuredLightUse[] {
  const out: MeasuredLightUse[] = [];
  for (const t of timelines) {
    for (const l of logs) {
      const perDay = new Map<number, number>();
      let k = 0;
      for (const s of t.slices) {
        if (s.measuredLogId !== l.id) continue;
        for (let m = s.start_min; m < s.end_min; m++) {
          if (l.minutes.measured[m] !== 1) continue;
          // slices and minutes run forward, so the day only ever moves on
          while (k < t.days.length - 1 && m >= (t.days[k]?.start_min ?? 0) + (t.days[k]?.length_min ?? 0)) k++;
          const day = t.days[k];
          if (day !== undefined && m >= day.start_min) perDay.set(day.index, (perDay.get(day.index) ?? 0) + 1);
        }
      }
      if (perDay.size === 0) continue;
      const runEnd_ms = t.runStartUtc_ms + t.total_min * 60_000;
      const gaps = l.log.gaps
        .filter((g) => g.end_ms > t.runStartUtc_ms && g.start_ms < runEnd_ms)
        .map((g): MeasuredLightGap => ({
          start_local: localIso(g.start_ms, t.timeZone),
          end_local: localIso(g.end_ms, t.timeZone),
          duration_min: Math.round(g.duration_min),
          reason: g.reason === 'not-worn' ? 'logger not worn' : 'no readings',
          fill_rule: l.log.fill,
          filled_with: FILL_RULE_WORDS[l.log.fill],
        }));
      const days = t.days.filter((d) => perDay.has(d.index)).map((d) => ({ date: d.date, measured_h: Math.round(((perDay.get(d.index) ?? 0) / 60) * 100) / 100 }));
      out.push({ persona_id: t.personaId, log_id: l.id, file: l.file, days, gaps });
    }
  }
  return out;
}
