/**
 * `zeitlight alphaopic <spd.csv> | --source <id>` — CIE S 026 α-opic quantities, photopic
 * illuminance, chromaticity, CCT and Duv of one spectrum. JSON keys follow the stable CLI
 * contract (architecture §4); `x`, `y`, `age_years`, `input`, `warnings`, `caution` are extra.
 */
import { CliError, UsageError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { numberOption, stringOption } from '../args.js';
import { readInputFile } from '../input-file.js';
import { formatTable, HEALTH_CAUTION, printJson } from '../output.js';
import { ALPHA_OPIC_KEYS, type AlphaOpicKey } from '../../model/photometry/action-spectra.js';
import { alphaOpicQuantities, photopicIlluminance_lx, scaleToIlluminance } from '../../model/photometry/alpha-opic.js';
import { cctDuv } from '../../model/photometry/cct-ohno.js';
import { chromaticityXy } from '../../model/photometry/colorimetry.js';
import { LENS_AGE_MAX_YEARS, LENS_AGE_MIN_YEARS, lensTransmittanceRelativeTo32, REFERENCE_OBSERVER_AGE_YEARS } from '../../model/photometry/lens-aging.js';
import { parseSpdCsv, SpdInputError } from '../../model/photometry/spd-csv.js';
import { applyTransmittance, type Spectrum } from '../../model/photometry/spectrum.js';
import { filterTransmittance } from '../../model/sources/filters.js';
import { sourceInfo, sourceSpectrum } from '../../model/sources/source-library.js';

/** Range of --illuminance, lx: from far below starlight to ten times full sunlight (about 100 klx; common practice). */
const MIN_ILLUMINANCE_LX = 1e-9;
const MAX_ILLUMINANCE_LX = 1e6;
/** Built-in spectra are relative; without --illuminance they are shown at this illuminance. */
const DEFAULT_SOURCE_ILLUMINANCE_LX = 100;
/** Beyond this |Duv| a CCT says little about the colour (CIE 015 guidance, limit 5e-2 from memory). */
const DUV_MEANINGFUL_LIMIT = 0.05;

const LABELS: Record<AlphaOpicKey, string> = { sc: 'S-cone-opic', mc: 'M-cone-opic', lc: 'L-cone-opic', rh: 'rhodopic', mel: 'melanopic' };

interface LoadedInput {
  readonly spectrum: Spectrum;
  readonly label: string;
  readonly info: Record<string, unknown>;
  readonly warnings: string[];
  readonly relative: boolean;
}

function readSpectrumFile(path: string, column: string | undefined): LoadedInput {
  const text = readInputFile(path, 'spectrum');
  try {
    const r = parseSpdCsv(text, path, column === undefined ? {} : { column });
    return {
      spectrum: r.spectrum,
      label: path,
      info: { file: path, column: r.column, rows: r.rowCount, covered_nm: [r.coveredFrom_nm, r.coveredTo_nm], resampling: r.resampling },
      warnings: [...r.warnings],
      relative: false,
    };
  } catch (err) {
    if (err instanceof SpdInputError) throw new CliError(err.message);
    throw err;
  }
}

function loadBuiltIn(id: string): LoadedInput {
  try {
    const s = sourceSpectrum(id);
    const info = sourceInfo(id);
    return { spectrum: s, label: `${id} (${info.name})`, info: { source: id, name: info.name, kind: info.kind, parametric: info.parametric, reference: info.reference }, warnings: [], relative: true };
  } catch (err) {
    if (err instanceof RangeError) throw new CliError(`--source: ${err.message}`);
    throw err;
  }
}

function fmt(v: number, digits: number): string {
  return Number.isFinite(v) ? v.toFixed(digits) : '—';
}

export const alphaopicCommand: Command = {
  name: 'alphaopic',
  summary: 'CIE S 026 α-opic quantities, CCT and Duv of a spectrum (CSV file or built-in source)',
  usage: '<spd.csv> | --source <id> [--illuminance <lx>] [--age <years>] [--filter <id>] [--column <name>] [--json]',
  options: {
    illuminance: { type: 'string' },
    age: { type: 'string' },
    source: { type: 'string' },
    filter: { type: 'string' },
    column: { type: 'string' },
  },
  async run(ctx: CommandContext): Promise<number> {
    const sourceId = stringOption(ctx, 'source');
    const column = stringOption(ctx, 'column');
    if (ctx.positionals.length > 1) throw new UsageError(`expected one spectrum file, got ${ctx.positionals.length} arguments`);
    const file = ctx.positionals[0];
    if (file !== undefined && sourceId !== undefined) throw new UsageError('give either a spectrum file or --source <id>, not both');
    if (file === undefined && sourceId === undefined) throw new UsageError('give a spectrum CSV file (wavelength_nm,<W·m⁻²·nm⁻¹>) or --source <id> (see "zeitlight sources")');
    if (sourceId !== undefined && column !== undefined) throw new UsageError('--column applies to a spectrum file, not to --source');

    const illuminance = numberOption(ctx, 'illuminance');
    if (illuminance !== undefined && !(illuminance > 0)) throw new UsageError(`--illuminance must be greater than 0 lx (got ${illuminance}); a spectrum cannot be scaled to zero or negative illuminance`);
    if (illuminance !== undefined && (illuminance > MAX_ILLUMINANCE_LX || illuminance < MIN_ILLUMINANCE_LX)) throw new UsageError(`--illuminance must be from ${MIN_ILLUMINANCE_LX} to ${MAX_ILLUMINANCE_LX} lx (got ${illuminance}); full sunlight is about 100 000 lx`);
    const age = numberOption(ctx, 'age');
    if (age !== undefined && !(age >= LENS_AGE_MIN_YEARS && age <= LENS_AGE_MAX_YEARS)) throw new UsageError(`--age must be between ${LENS_AGE_MIN_YEARS} and ${LENS_AGE_MAX_YEARS} years (got ${age})`);
    const filterId = stringOption(ctx, 'filter');

    const input = file !== undefined ? readSpectrumFile(file, column) : loadBuiltIn(sourceId as string);
    const warnings = input.warnings;
    const notes: string[] = [];
    let s = input.spectrum;
    if (filterId !== undefined) {
      try {
        s = applyTransmittance(s, filterTransmittance(filterId));
      } catch (err) {
        if (err instanceof RangeError) throw new CliError(`--filter: ${err.message}`);
        throw err;
      }
      notes.push(`filtered through "${filterId}" (parametric transmittance) before the eye`);
    }
    if (!(photopicIlluminance_lx(s) > 0)) {
      throw new CliError(`${input.label}: the spectrum has no light weighted by V(λ) within 380–780 nm (photopic illuminance 0 lx), so DER, ELR, CCT and any --illuminance scaling are undefined`);
    }
    if (illuminance !== undefined) s = scaleToIlluminance(s, illuminance);
    else if (input.relative) {
      s = scaleToIlluminance(s, DEFAULT_SOURCE_ILLUMINANCE_LX);
      notes.push(`built-in spectra are relative: shown at ${DEFAULT_SOURCE_ILLUMINANCE_LX} lx (choose with --illuminance)`);
    }

    const eye = age === undefined ? {} : { eyeTransmittance: lensTransmittanceRelativeTo32(age) };
    const q = alphaOpicQuantities(s, eye);
    const c = cctDuv(s);
    const xy = chromaticityXy(s);
    if (c.solution === 'out-of-range') warnings.push('CCT and Duv are undefined: the chromaticity lies beyond the Planckian table (1000–100 000 K)');
    else if (Math.abs(c.duv) > DUV_MEANINGFUL_LIMIT) warnings.push(`|Duv| = ${Math.abs(c.duv).toFixed(3)} > ${DUV_MEANINGFUL_LIMIT}: the light is far from white and its CCT has little meaning`);
    if (age !== undefined && age !== REFERENCE_OBSERVER_AGE_YEARS) notes.push(`α-opic quantities for a ${age}-year-old observer (lens transmittance relative to the 32-year-old CIE S 026 reference); photopic illuminance, CCT and Duv are standard-observer values`);

    const result = {
      input: input.info,
      illuminance_lx: q.illuminance_lx,
      alpha_opic: q.alpha_opic,
      cct_K: Number.isFinite(c.cct_K) ? c.cct_K : null,
      duv: Number.isFinite(c.duv) ? c.duv : null,
      x: xy.x,
      y: xy.y,
      age_years: age ?? REFERENCE_OBSERVER_AGE_YEARS,
      notes,
      warnings,
      caution: HEALTH_CAUTION,
    };
    if (ctx.json) {
      printJson(ctx, result);
      return 0;
    }
    const head = [
      `Spectrum: ${input.label}`,
      `Photopic illuminance ${fmt(q.illuminance_lx, 2)} lx   CCT ${fmt(c.cct_K, 0)} K   Duv ${fmt(c.duv, 4)}   x ${fmt(xy.x, 4)}  y ${fmt(xy.y, 4)}   observer age ${result.age_years} years`,
      '',
    ].join('\n');
    const rows = ALPHA_OPIC_KEYS.map((k) => {
      const a = q.alpha_opic[k];
      return [LABELS[k], fmt(a.irradiance_mW_m2, 4), fmt(a.edi_lx, 2), fmt(a.der, 4), fmt(a.elr_mW_lm, 4)];
    });
    ctx.stdout(head + formatTable(['α-opic quantity', 'irradiance (mW/m²)', 'EDI (lx)', 'DER', 'ELR (mW/lm)'], rows));
    for (const n of notes) ctx.stdout(`Note: ${n}\n`);
    for (const w of warnings) ctx.stdout(`Warning: ${w}\n`);
    ctx.stdout(`\n${HEALTH_CAUTION}\n`);
    return 0;
  },
};
