/**
 * `zeitlight sun --lat <deg> --lon <deg> --time <ISO 8601 with offset> [...]`: topocentric,
 * refraction-corrected solar position (NREL SPA) with the day's sunrise, solar noon and sunset
 * in the offset of the given time.
 */
import { DateTime } from 'luxon';
import { sunTimes } from '../../model/sun/sunrise-sunset.js';
import { solarPosition } from '../../model/sun/spa.js';
import { numberOption, requiredNumberOption, stringOption, positionals } from '../args.js';
import { UsageError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { printJson } from '../output.js';

const OFFSET_AT_END = /(Z|[+-]\d{2}(:?\d{2})?)$/i;

/** Parses an ISO 8601 date-time that states its UTC offset; names the option on failure. */
export function parseTimeWithOffset(text: string): DateTime {
  const timePart = text.includes('T') ? text.slice(text.indexOf('T')) : '';
  if (timePart === '' || !OFFSET_AT_END.test(timePart)) {
    throw new UsageError(`--time: "${text}" needs a date, a time and a UTC offset, e.g. 2025-06-21T12:00:00+02:00 or 2025-06-21T10:00Z`);
  }
  const dt = DateTime.fromISO(text, { setZone: true });
  if (!dt.isValid) throw new UsageError(`--time: "${text}" is not a valid ISO 8601 date-time (${dt.invalidExplanation ?? dt.invalidReason ?? 'invalid'})`);
  return dt;
}

const round6 = (x: number) => Math.round(x * 1e6) / 1e6;

function checked<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof RangeError) {
      const map: Record<string, string> = {
        latitude_deg: '--lat',
        longitude_deg: '--lon',
        elevation_m: '--elevation-m',
        pressure_hPa: '--pressure-hPa',
        temperature_C: '--temperature-C',
        deltaT_s: '--delta-t-s',
        time: '--time',
      };
      const field = err.message.split(':')[0] ?? '';
      throw new UsageError(`${map[field] ?? field}:${err.message.slice(field.length + 1)}`);
    }
    throw err;
  }
}

export const sunCommand: Command = {
  name: 'sun',
  summary: 'Topocentric solar position (NREL SPA), with sunrise and sunset',
  usage: '--lat <deg> --lon <deg> --time <ISO 8601 with offset> [--elevation-m <m>] [--pressure-hPa <hPa>] [--temperature-C <°C>] [--delta-t-s <s>] [--json]',
  options: {
    lat: { type: 'string' },
    lon: { type: 'string' },
    time: { type: 'string' },
    'elevation-m': { type: 'string' },
    'pressure-hPa': { type: 'string' },
    'temperature-C': { type: 'string' },
    'delta-t-s': { type: 'string' },
  },
  async run(ctx: CommandContext): Promise<number> {
    positionals(ctx, []);
    const lat = requiredNumberOption(ctx, 'lat');
    const lon = requiredNumberOption(ctx, 'lon');
    const timeText = stringOption(ctx, 'time');
    if (timeText === undefined) throw new UsageError('--time is required (ISO 8601 with a UTC offset)');
    const time = parseTimeWithOffset(timeText);
    const observer = {
      latitude_deg: lat,
      longitude_deg: lon,
      elevation_m: numberOption(ctx, 'elevation-m'),
      pressure_hPa: numberOption(ctx, 'pressure-hPa'),
      temperature_C: numberOption(ctx, 'temperature-C'),
    };
    const deltaT_s = numberOption(ctx, 'delta-t-s');
    const spaOptions = deltaT_s === undefined ? {} : { deltaT_s };
    const p = checked(() => solarPosition(time.toMillis(), observer, spaOptions));
    const offset_h = time.offset / 60;
    const times = checked(() => sunTimes({ year: time.year, month: time.month, day: time.day }, observer, offset_h, spaOptions));
    const iso = (ms: number | null) =>
      ms === null ? null : DateTime.fromMillis(Math.round(ms / 1000) * 1000, { zone: time.zone }).toISO({ suppressMilliseconds: true });
    const result = {
      zenith_deg: round6(p.zenith_deg),
      azimuth_deg: round6(p.azimuth_deg),
      elevation_deg: round6(p.elevation_deg),
      sunrise: iso(times.sunriseEpochMs),
      solar_noon: iso(times.transitEpochMs),
      sunset: iso(times.sunsetEpochMs),
      day_kind: times.kind,
    };
    if (ctx.json) {
      printJson(ctx, result);
      return 0;
    }
    const lines = [
      `Sun at ${lat}°, ${lon}° on ${time.toISO({ suppressMilliseconds: true })} (topocentric, refraction-corrected)`,
      `  zenith     ${result.zenith_deg.toFixed(4)}°`,
      `  azimuth    ${result.azimuth_deg.toFixed(4)}° (clockwise from north)`,
      `  elevation  ${result.elevation_deg.toFixed(4)}°`,
      times.kind === 'normal'
        ? `  sunrise ${result.sunrise}   solar noon ${result.solar_noon}   sunset ${result.sunset}`
        : `  ${times.kind === 'polar-day' ? 'the sun does not set this day' : 'the sun does not rise this day'}; solar noon ${result.solar_noon}`,
    ];
    ctx.stdout(lines.join('\n') + '\n');
    return 0;
  },
};
