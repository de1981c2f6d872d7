/** Sense checks of the site and run settings: time zone, its fit to the longitude, sky-mix shares, dates. */
import type { Scenario } from '../../schema/scenario-types.js';
import { isValidTimeZone, parseIsoDate, utcOffsetAt_min } from '../../time/local-calendar.js';
import { problem, type ScenarioProblem } from '../problem.js';
import { didYouMean, knownTimeZones } from '../suggest.js';

/** Sky shares may be written to two decimals; allow their rounding. */
const SHARE_SUM_TOLERANCE = 0.011;
/**
 * Standard (winter) clock offset far from longitude/15 h suggests a sign slip (west longitudes are
 * negative). Civil zones stray up to ~3 h from solar time (e.g. western China) — common practice.
 */
const MAX_ZONE_LONGITUDE_MISMATCH_H = 3;

export function siteChecks(s: Scenario): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  if (parseIsoDate(s.run.startDate) === undefined) out.push(problem('error', ['run', 'startDate'], `${s.run.startDate} is not a real date`, 'Write an existing calendar date "YYYY-MM-DD".'));
  const site = s.site;
  if (!isValidTimeZone(site.timeZone)) {
    out.push(problem('error', ['site', 'timeZone'], `"${site.timeZone}" is not a known IANA time zone`, didYouMean(site.timeZone, knownTimeZones()) + 'Use a name from the IANA time-zone database such as "Europe/Berlin" or "America/New_York" (not an abbreviation like "CET").'));
  } else {
    const year = Number(s.run.startDate.slice(0, 4)) || 2026;
    const jan = utcOffsetAt_min(site.timeZone, Date.UTC(year, 0, 15));
    const jul = utcOffsetAt_min(site.timeZone, Date.UTC(year, 6, 15));
    const standard_h = Math.min(jan, jul) / 60;
    const solar_h = site.longitude_deg / 15;
    if (Math.abs(standard_h - solar_h) > MAX_ZONE_LONGITUDE_MISMATCH_H) {
      out.push(
        problem(
          'warning',
          ['site', 'longitude_deg'],
          `longitude ${site.longitude_deg}° is ${Math.abs(standard_h - solar_h).toFixed(1)} h of solar time away from the clock of ${site.timeZone} (UTC${standard_h >= 0 ? '+' : ''}${standard_h})`,
          'Check the sign of the longitude (east positive, west negative) and the time zone.',
        ),
      );
    }
  }
  if (site.weather.kind === 'sky-model') {
    const seen = new Map<number, number>();
    site.weather.seasons.forEach((season, i) => {
      const sum = season.clear + season.intermediate + season.overcast;
      if (Math.abs(sum - 1) > SHARE_SUM_TOLERANCE) {
        out.push(problem('error', ['site', 'weather', 'seasons', i], `the sky shares add up to ${sum.toFixed(3)}, not 1`, 'Make clear + intermediate + overcast equal 1.'));
      }
      for (const m of season.months) {
        const prev = seen.get(m);
        if (prev !== undefined) out.push(problem('error', ['site', 'weather', 'seasons', i, 'months'], `month ${m} is also in season ${prev + 1}`, 'List each month in one season only.'));
        else seen.set(m, i);
      }
    });
    const missing = [...Array(12).keys()].map((k) => k + 1).filter((m) => !seen.has(m));
    if (missing.length > 0) out.push(problem('error', ['site', 'weather', 'seasons'], `months ${missing.join(', ')} have no sky mix`, 'Add those months to a season.'));
  } else if (site.weather.snowFromFile && site.ground.snow.months.length > 0) {
    out.push(problem('warning', ['site', 'ground', 'snow', 'months'], 'snow months are ignored because snow cover comes from the weather file', 'Remove the months, or set weather.snowFromFile to false.'));
  }
  s.rosters.forEach((r, i) => {
    if (parseIsoDate(r.anchorDate) === undefined) out.push(problem('error', ['rosters', i, 'anchorDate'], `${r.anchorDate} is not a real date`, 'Write an existing calendar date "YYYY-MM-DD".'));
  });
  s.lightLogs.forEach((l, i) => {
    if (l.timeZone !== undefined && !isValidTimeZone(l.timeZone)) out.push(problem('error', ['lightLogs', i, 'timeZone'], `"${l.timeZone}" is not a known IANA time zone`, 'Use a name such as "Europe/London", or leave it out to use the site time zone.'));
    if (l.quantity.kind === 'channels') {
      const n = l.quantity.columns.length;
      const cal = l.quantity.calibration;
      if (cal.photopic_lx.length !== n) out.push(problem('error', ['lightLogs', i, 'quantity', 'calibration', 'photopic_lx'], `${cal.photopic_lx.length} coefficient(s) for ${n} channel(s)`, 'Give one coefficient per channel column, in the same order.'));
      if (cal.melanopicEdi_lx.length !== n) out.push(problem('error', ['lightLogs', i, 'quantity', 'calibration', 'melanopicEdi_lx'], `${cal.melanopicEdi_lx.length} coefficient(s) for ${n} channel(s)`, 'Give one coefficient per channel column, in the same order.'));
    }
  });
  return out;
}
