/**
 * Parsing and validation of a user's spectral CSV (pure: takes text, never reads files).
 * Format: one header row naming the columns, then rows `wavelength_nm,<value>[,...]`;
 * wavelengths in nm, strictly increasing, any step and range; values are spectral irradiance
 * in W·m⁻²·nm⁻¹ (or relative, when the caller scales to an illuminance). Lines starting with
 * `#` and blank lines are ignored. Small negative values (spectrometer noise in dark parts of the
 * range, down to NEGATIVE_NOISE_SHARE of the peak) are set to 0 and counted in a warning; a
 * larger negative value is refused. Comma, semicolon or tab separated; with semicolon or tab
 * separators a decimal comma is accepted. Every problem is reported with the file label, the
 * line number and the column, and nothing is returned for bad input.
 */
import Papa from 'papaparse';
import { resampleToGrid } from './resample.js';
import { spectrum, type Spectrum } from './spectrum.js';
import { GRID_END_NM, GRID_START_NM } from './wavelength-grid.js';

export class SpdInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SpdInputError';
  }
}

export interface SpdCsvOptions {
  /** Name of the value column; default: the second column. */
  readonly column?: string;
}

export interface SpdCsvResult {
  /** Spectral irradiance on the canonical grid (absolute), zero outside the data range. */
  readonly spectrum: Spectrum;
  readonly column: string;
  readonly rowCount: number;
  readonly coveredFrom_nm: number;
  readonly coveredTo_nm: number;
  readonly resampling: 'linear' | 'bin-mean';
  readonly warnings: readonly string[];
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Negative readings down to this share of the spectrum's peak are taken as measurement noise and
 * set to 0 (dark-current noise of array spectrometers is of this order in the dark ends of the
 * range; common practice, the threshold is our choice). Larger negative values mean a wrong file,
 * column or baseline.
 */
export const NEGATIVE_NOISE_SHARE = 0.02;

/**
 * Largest value accepted, W·m⁻²·nm⁻¹ (or counts of a relative spectrum). Sunlight at the ground
 * peaks near 2 W·m⁻²·nm⁻¹; raw spectrometer counts stay below 10⁷. A larger value is a unit or
 * column mistake, and would overflow the integrals.
 */
export const MAX_SPECTRAL_VALUE = 1e9;
/** Smallest peak value accepted: below it, integrals and scaling lose all precision (a unit mistake). */
export const MIN_SPECTRAL_PEAK = 1e-30;

function parseCell(raw: string, decimalComma: boolean): number {
  const text = decimalComma ? raw.replace(',', '.') : raw;
  return NUMBER.test(text) ? Number(text) : Number.NaN;
}

function detectDelimiter(line: string): ',' | ';' | '\t' {
  if (line.includes('\t')) return '\t';
  if (line.includes(';') && !line.includes(',')) return ';';
  if (line.includes(';') && line.split(';').length > line.split(',').length) return ';';
  return ',';
}

/** Sets small negative values to 0 in place; calls `refuse` for the first large one. */
function clipNoise(
  values: number[],
  lines: readonly number[],
  wavelengths: readonly number[],
  refuse: (line: number, value: number, limit: number) => never,
): { count: number; lowest: number; at_nm: number; line: number } | null {
  const peak = Math.max(0, ...values);
  const limit = -NEGATIVE_NOISE_SHARE * peak;
  let count = 0;
  let lowest = 0;
  let at = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    if (v >= 0) continue;
    if (v < limit || peak === 0) refuse(lines[i] as number, v, Number(limit.toPrecision(3)));
    count++;
    if (v < lowest) [lowest, at] = [v, i];
    values[i] = 0;
  }
  return count === 0 ? null : { count, lowest, at_nm: wavelengths[at] as number, line: lines[at] as number };
}

export function parseSpdCsv(text: string, fileLabel: string, options: SpdCsvOptions = {}): SpdCsvResult {
  const fail = (where: string, what: string): never => {
    throw new SpdInputError(`${fileLabel}${where}: ${what}`);
  };
  const body = text.replace(/^\uFEFF/, '');
  const lines = body.split(/\r\n|\n|\r/);
  const headerIndex = lines.findIndex((l) => l.trim() !== '' && !l.trim().startsWith('#'));
  if (headerIndex < 0) fail('', 'the file is empty (no header row and no data)');
  const delimiter = detectDelimiter(lines[headerIndex] as string);
  const decimalComma = delimiter !== ',';

  const warnings: string[] = [];
  const wavelengths: number[] = [];
  const values: number[] = [];
  const lineOf: number[] = [];
  let header: string[] | undefined;
  let valueIndex = 1;
  let valueName = '';
  let previousLine = 0;

  lines.forEach((line, index) => {
    const lineNo = index + 1;
    const trimmed = line.trim();
    if (trimmed === '' || trimmed.startsWith('#')) return;
    const parsed = Papa.parse<string[]>(line, { delimiter, header: false });
    const cells = (parsed.data[0] ?? []).map((c) => c.trim());
    if (header === undefined) {
      if (Number.isFinite(parseCell(cells[0] ?? '', decimalComma))) {
        fail(`, line ${lineNo}`, 'missing header row: the first line must name the columns, e.g. "wavelength_nm,irradiance_W_m2_nm"');
      }
      if (cells.length < 2) fail(`, line ${lineNo}`, `the header names ${cells.length} column; expected a wavelength column and a value column, e.g. "wavelength_nm,irradiance_W_m2_nm"`);
      header = cells;
      if (options.column !== undefined) {
        valueIndex = cells.indexOf(options.column);
        if (valueIndex < 1) fail(`, line ${lineNo}`, `no value column named "${options.column}"; the header has ${cells.map((c) => `"${c}"`).join(', ')}`);
      } else if (cells.length > 2) {
        warnings.push(`${fileLabel}: using column "${cells[1]}"; ${cells.length - 2} other value column(s) ignored (choose one with --column)`);
      }
      valueName = cells[valueIndex] as string;
      return;
    }
    if (cells.length <= valueIndex) fail(`, line ${lineNo}`, `expected at least ${valueIndex + 1} cells, found ${cells.length}`);
    const w = parseCell(cells[0] as string, decimalComma);
    if (!Number.isFinite(w)) fail(`, line ${lineNo}, column "${header[0]}"`, `"${cells[0]}" is not a number`);
    const v = parseCell(cells[valueIndex] as string, decimalComma);
    if (!Number.isFinite(v)) fail(`, line ${lineNo}, column "${valueName}"`, `"${cells[valueIndex]}" is not a number`);
    const prev = wavelengths[wavelengths.length - 1];
    if (Math.abs(v) > MAX_SPECTRAL_VALUE) fail(`, line ${lineNo}, column "${valueName}"`, `value ${v} is beyond any light source (sunlight peaks near 2 W·m⁻²·nm⁻¹); check the unit and the column`);
    if (prev !== undefined && w === prev) fail(`, line ${lineNo}`, `wavelength ${w} nm repeats line ${previousLine}; each wavelength may appear once`);
    if (prev !== undefined && w < prev) fail(`, line ${lineNo}`, `wavelength ${w} nm comes after ${prev} nm (line ${previousLine}); wavelengths must increase from row to row`);
    if (w <= 0) fail(`, line ${lineNo}, column "${header[0]}"`, `wavelength ${w} nm must be positive`);
    wavelengths.push(w);
    values.push(v);
    lineOf.push(lineNo);
    previousLine = lineNo;
  });

  if (header === undefined) fail('', 'the file is empty (no header row and no data)');
  if (wavelengths.length < 2) fail(`, line ${headerIndex + 1}`, `needs at least two data rows after this header, found ${wavelengths.length}`);
  const peakAt = values.reduce((best, v, i) => (v > (values[best] ?? 0) ? i : best), 0);
  const peak = values[peakAt] ?? 0;
  if (peak > 0 && peak < MIN_SPECTRAL_PEAK) fail(`, line ${lineOf[peakAt] ?? 0}, column "${valueName}"`, `the largest value is ${peak}, too small to compute with; check the unit and the column`);
  const clipped = clipNoise(values, lineOf, wavelengths, (line, v, limit) =>
    fail(`, line ${line}, column "${valueName}"`, `negative value ${v}; spectral irradiance cannot be negative, and this is more than measurement noise (below ${limit}, ${NEGATIVE_NOISE_SHARE * 100} % of the peak)`),
  );
  if (clipped !== null) {
    warnings.push(`${fileLabel}: ${clipped.count} negative value(s) down to ${clipped.lowest} (at ${clipped.at_nm} nm, line ${clipped.line}) taken as measurement noise and set to 0`);
  }
  const from = wavelengths[0] as number;
  const to = wavelengths[wavelengths.length - 1] as number;
  if (to < GRID_START_NM || from > GRID_END_NM) {
    fail(`, lines ${lineOf[0] ?? 0}–${lineOf[lineOf.length - 1] ?? 0}, column "${header?.[0] ?? ''}"`, `the data cover ${from}–${to} nm, which does not overlap ${GRID_START_NM}–${GRID_END_NM} nm; is the first column the wavelength in nm?`);
  }
  if (from > GRID_START_NM || to < GRID_END_NM) {
    const a = Math.max(from, GRID_START_NM);
    const b = Math.min(to, GRID_END_NM);
    warnings.push(
      `${fileLabel}: the data cover ${from}–${to} nm, not the whole ${GRID_START_NM}–${GRID_END_NM} nm range of CIE S 026; ` +
        `spectral irradiance outside ${a}–${b} nm was assumed to be zero`,
    );
  }
  const r = resampleToGrid(wavelengths, values);
  return {
    spectrum: spectrum(r.values, true),
    column: valueName,
    rowCount: wavelengths.length,
    coveredFrom_nm: from,
    coveredTo_nm: to,
    resampling: r.method,
    warnings,
  };
}
