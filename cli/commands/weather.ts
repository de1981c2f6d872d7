/**
 * `zeitlight weather <file.epw> [--json]`: reads an EPW weather file and summarises it —
 * location, months, snow days, illuminance statistics, missing values and warnings by line — so a
 * user can check what they loaded before a run.
 */
import { EpwError, parseEpw } from '../../model/weather/epw.js';
import { summariseEpw, type EpwSummary } from '../../model/weather/epw-summary.js';
import { positionals } from '../args.js';
import { CliError } from '../cli-error.js';
import { readInputFile } from '../input-file.js';
import type { Command, CommandContext } from '../command.js';
import { formatTable, printJson } from '../output.js';

function toJson(s: EpwSummary) {
  const l = s.location;
  return {
    location: {
      city: l.city, region: l.region, country: l.country, source: l.source, wmo: l.wmo,
      latitude_deg: l.latitude_deg, longitude_deg: l.longitude_deg, time_zone_h: l.timeZone_h, elevation_m: l.elevation_m,
    },
    period: s.period,
    records: s.records,
    leap_day: s.leap_day,
    time_convention: 'hourly values in local standard time (no daylight saving); hour h covers (h-1):00 to h:00',
    months: s.months,
    snow_days: s.snow_days,
    illuminance: s.illuminance,
    missing_values: s.missing_values,
    warnings: s.warnings,
    direct_light_with_sun_down: s.direct_light_with_sun_down,
  };
}

export const weatherCommand: Command = {
  name: 'weather',
  summary: 'Summarise an EPW weather file (location, months, snow, illuminance)',
  usage: '<file.epw> [--json]',
  options: {},
  async run(ctx: CommandContext): Promise<number> {
    const [path] = positionals(ctx, ['file.epw']) as [string];
    let summary: EpwSummary;
    try {
      summary = summariseEpw(parseEpw(readInputFile(path, 'weather'), path));
    } catch (err) {
      if (err instanceof EpwError) throw new CliError(err.message);
      throw err;
    }
    if (ctx.json) {
      printJson(ctx, toJson(summary));
      return 0;
    }
    const l = summary.location;
    const il = summary.illuminance;
    const out: string[] = [
      `${path}`,
      `  ${l.city}, ${l.country} (${l.source}, WMO ${l.wmo}): ${l.latitude_deg}°, ${l.longitude_deg}°, UTC${l.timeZone_h >= 0 ? '+' : ''}${l.timeZone_h} h standard time, ${l.elevation_m} m`,
      `  ${summary.records} hourly records ${summary.period.start}–${summary.period.end}${summary.leap_day ? ' (with 29 February)' : ''}; local standard time, hour-ending`,
      `  illuminance: ${il.hours_from_file} hours from the file, ${il.hours_modelled} modelled (Perez 1990); global max ${Math.round(il.global_horizontal.max_lx)} lx, daylight mean ${Math.round(il.global_horizontal.daylight_mean_lx)} lx`,
      `  snow on the ground: ${summary.snow_days} days`,
      '',
      formatTable(
        ['month', 'hours', 'light h', 'mean °C', 'klx·h/day', 'max lx', 'snow days'],
        summary.months.map((m) => [String(m.month), String(m.hours), String(m.daylight_hours), m.mean_dry_bulb_C === null ? '—' : m.mean_dry_bulb_C.toFixed(1), m.mean_daily_global_klxh.toFixed(1), String(Math.round(m.max_global_horizontal_lx)), String(m.snow_days)]),
      ).trimEnd(),
    ];
    if (summary.warnings.count > 0) {
      out.push('', `warnings: ${summary.warnings.count}`);
      for (const w of summary.warnings.listed) out.push(`  ${w.line > 0 ? `line ${w.line}: ` : ''}${w.message}`);
    }
    if (summary.direct_light_with_sun_down.count > 0) {
      out.push('', `hours with direct light while the sun is down: ${summary.direct_light_with_sun_down.count}`);
      for (const w of summary.direct_light_with_sun_down.listed) out.push(`  line ${w.line}: ${w.message}`);
    }
    ctx.stdout(out.join('\n') + '\n');
    return 0;
  },
};
