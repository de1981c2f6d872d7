/**
 * `zeitlight photometry <file>` — reads one luminaire photometric file (IES LM-63 2002/2019 or
 * EULUMDAT) and prints its format, symmetry, grid, stated flux, the flux integrated from the
 * candela table by the zonal-constant method, the peak intensity and the luminous opening.
 * `--json` prints one JSON document. Refusals name the file, the line and the field.
 */
import { readFileSync, statSync } from 'node:fs';
import { CliError, UsageError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { decodeText, readFailure } from '../input-file.js';
import { printJson } from '../output.js';
import { PhotometricFileError, type CandelaTable } from '../../model/photometry/candela-table.js';
import { expandCandelaTable, peakCandela } from '../../model/photometry/candela-grid.js';
import { readPhotometricFile } from '../../model/photometry/photometric-file.js';
import { zonalFlux_lm } from '../../model/photometry/zonal-flux.js';

/** Largest photometric file read, bytes (a 1°×1° full-sphere table is well under 1 MB). */
const MAX_PHOTOMETRIC_BYTES = 5_000_000;

function readText(path: string): string {
  let bytes: Uint8Array;
  try {
    if (statSync(path).isDirectory()) throw Object.assign(new Error('is a directory'), { code: 'EISDIR' });
    if (statSync(path).size > MAX_PHOTOMETRIC_BYTES) throw new CliError(`the photometric file ${path} is larger than ${MAX_PHOTOMETRIC_BYTES / 1_000_000} MB`);
    bytes = readFileSync(path);
  } catch (err) {
    if (err instanceof CliError) throw err;
    throw new CliError(`cannot read the photometric file ${path}: ${readFailure(err)}`);
  }
  const decoded = decodeText(bytes);
  if ('binaryAtLine' in decoded) throw new CliError(`the photometric file ${path}, line ${decoded.binaryAtLine}: holds binary data (a zero byte), not text`);
  return decoded.text;
}

function readTable(path: string): CandelaTable {
  const text = readText(path);
  try {
    return readPhotometricFile(text);
  } catch (err) {
    if (err instanceof PhotometricFileError) throw new CliError(`${path}, ${err.message}`);
    throw err;
  }
}

const range = (a: readonly number[]) => [a[0] as number, a[a.length - 1] as number];
const fmt = (v: number, d: number) => v.toFixed(d);

export const photometryCommand: Command = {
  name: 'photometry',
  summary: 'candela table, symmetry and luminous flux of a luminaire photometric file (IES LM-63 or EULUMDAT)',
  usage: '<file.ies|file.ldt> [--json]',
  options: {},
  async run(ctx: CommandContext): Promise<number> {
    if (ctx.positionals.length !== 1) throw new UsageError(`expected one photometric file (IES LM-63 .ies or EULUMDAT .ldt), got ${ctx.positionals.length} arguments`);
    const file = ctx.positionals[0] as string;
    const t = readTable(file);
    const grid = expandCandelaTable(t);
    const flux = zonalFlux_lm(grid);
    const peak = peakCandela(grid);
    const stated = t.statedFlux_lm;
    const result = {
      file,
      format: t.format,
      edition: t.edition,
      photometry_type: t.photometryType,
      symmetry: t.symmetry,
      flux_lm: flux,
      flux_table_lm: flux,
      flux_method: 'zonal-constant',
      stated_flux_lm: stated ?? null,
      flux_difference_percent: stated === undefined ? null : (flux / stated - 1) * 100,
      absolute_photometry: t.absolutePhotometry,
      grid: {
        stored: { horizontal: t.horizontal_deg.length, vertical: t.vertical_deg.length },
        expanded: { horizontal: grid.horizontal_deg.length, vertical: grid.vertical_deg.length },
        horizontal_range_deg: range(grid.horizontal_deg),
        vertical_range_deg: range(grid.vertical_deg),
      },
      peak: { candela_cd: peak.candela_cd, horizontal_deg: peak.horizontal_deg, vertical_deg: peak.vertical_deg },
      dimensions_m: { width: t.opening.width_m, length: t.opening.length_m, height: t.opening.height_m },
      multiplier: t.multiplier,
      ballast_factor: t.ballastFactor,
      lamps: { count: t.lamps.count, lumens_per_lamp: t.lamps.lumensPerLamp ?? null, description: t.lamps.description, watts: t.lamps.watts },
      tilt: t.tilt === undefined ? null : { geometry: t.tilt.geometry, angles_deg: t.tilt.angles_deg, factors: t.tilt.factors },
    };
    if (ctx.json) {
      printJson(ctx, result);
      return 0;
    }
    const axes = t.photometryType === 'C' ? ['C', 'γ'] : ['H', 'V'];
    const rows = [
      ['format', `${t.edition}, type ${t.photometryType} photometry`],
      ['symmetry', t.symmetry],
      ['grid (stored)', `${t.horizontal_deg.length} ${axes[0]} × ${t.vertical_deg.length} ${axes[1]}`],
      ['grid (expanded)', `${axes[0]} ${result.grid.horizontal_range_deg.join('–')}° (${grid.horizontal_deg.length}) × ${axes[1]} ${result.grid.vertical_range_deg.join('–')}° (${grid.vertical_deg.length})`],
      ['stated flux', stated === undefined ? 'none (absolute photometry)' : `${fmt(stated, 1)} lm`],
      ['flux from the table (zonal)', `${fmt(flux, 1)} lm${stated === undefined ? '' : ` (${fmt((flux / stated - 1) * 100, 2)} %)`}`],
      ['peak intensity', `${fmt(peak.candela_cd, 1)} cd at ${axes[0]} ${peak.horizontal_deg}°, ${axes[1]} ${peak.vertical_deg}°`],
      ['luminous opening', `width ${fmt(t.opening.width_m, 3)} m, length ${fmt(t.opening.length_m, 3)} m, height ${fmt(t.opening.height_m, 3)} m`],
      ['lamps', `${t.lamps.count}${t.lamps.lumensPerLamp === undefined ? '' : ` × ${fmt(t.lamps.lumensPerLamp, 1)} lm`}, ${fmt(t.lamps.watts, 1)} W`],
    ];
    const width = Math.max(...rows.map((r) => (r[0] as string).length));
    ctx.stdout(`Photometric file: ${file}\n${rows.map(([k, v]) => `  ${(k as string).padEnd(width)}  ${v as string}`).join('\n')}\n`);
    return 0;
  },
};
