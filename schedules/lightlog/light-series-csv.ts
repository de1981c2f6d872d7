/**
 * A light series for one person from a CSV file (`zeitlight simulate`), read with the same reader
 * as measured light logs (csv-table.ts, import-light-log.ts), in either of two forms:
 *   hours:      header `hour,lux` (photopic lux of the model's calibration source, its native
 *               input) or `hour,mel_edi_lx` (melanopic EDI at the eye); hours since t = 0 (local
 *               midnight of day 0), strictly increasing, the first at 0; each value holds until
 *               the next row (the last to the end);
 *   time stamps: a logger export (any timestamp form import-light-log.ts reads, a lux or a
 *               melanopic EDI column); t = 0 is local midnight of the first reading's day; each
 *               reading holds until the next one, so gaps are filled by the "hold" rule and each is
 *               reported.
 * Any delimiter (comma, semicolon, tab, bar) and decimal commas with a non-comma delimiter.
 * Unreadable rows are skipped and listed with their line, as for light logs; the file is refused
 * when most rows are unreadable, and on errors of form (header, first hour, order), naming the
 * line. Messages quote rows with the file's own delimiter.
 */
import { DateTime, FixedOffsetZone } from 'luxon';
import { readCsvTable, readNumber, rowText, type CsvTable } from './csv-table.js';
import { importLightLog, MAX_READING_LX, type LogProblem } from './import-light-log.js';

export type SeriesUnit = 'native_lx' | 'mel_edi_lx';

export interface LightSeriesCsv {
  readonly form: 'hours' | 'timestamps';
  readonly unit: SeriesUnit;
  /** Step starts, h since t = 0, strictly increasing, the first at 0. */
  readonly start_h: readonly number[];
  /** Level of each step (lx in `unit`). */
  readonly level: readonly number[];
  /** Local time of t = 0 (time-stamp form only), e.g. "2026-03-23T00:00+01:00". */
  readonly start_local: string | null;
  /** Skipped rows, gaps and other notes, each naming the file and line. */
  readonly warnings: readonly string[];
}

export class LightSeriesCsvError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'LightSeriesCsvError';
  }
}

const MAX_LISTED = 20;
const UNITS: Readonly<Record<string, SeriesUnit>> = { lux: 'native_lx', mel_edi_lx: 'mel_edi_lx' };

function problemText(file: string, p: LogProblem): string {
  return `${file}${p.line !== null ? `, line ${p.line}` : ''}${p.column !== null ? `, column "${p.column}"` : ''}: ${p.message}`;
}

function readHours(table: CsvTable, file: string): LightSeriesCsv {
  const { header, body, delimiter, decimalComma } = table;
  if (header === undefined) throw new LightSeriesCsvError(`${file}: the file is empty`);
  const names = header.cells.map((c) => c.trim().toLowerCase());
  const unit = names.length === 2 ? UNITS[names[1] ?? ''] : undefined;
  if (unit === undefined) {
    throw new LightSeriesCsvError(`${file}, line ${header.line}: header must be "${rowText(['hour', 'lux'], delimiter)}" or "${rowText(['hour', 'mel_edi_lx'], delimiter)}" (got "${rowText(header.cells, delimiter)}"), or name a timestamp column and a lux or melanopic EDI column`);
  }
  const valueName = header.cells[1]?.trim() ?? '';
  const start_h: number[] = [];
  const level: number[] = [];
  const skipped: string[] = [];
  let previous: { hour: number; line: number } | undefined;
  for (const r of body) {
    if (r.cells.length !== 2) {
      skipped.push(`${file}, line ${r.line}: expected 2 values (${rowText(header.cells, delimiter)}), found ${r.cells.length} in "${rowText(r.cells, delimiter).slice(0, 60)}"; the line is skipped`);
      continue;
    }
    const hour = readNumber(r.cells[0], decimalComma);
    const value = readNumber(r.cells[1], decimalComma);
    if (!Number.isFinite(hour)) {
      skipped.push(`${file}, line ${r.line}: hour "${(r.cells[0] ?? '').trim().slice(0, 20)}" is not a number; the line is skipped`);
      continue;
    }
    if (!Number.isFinite(value) || value < 0) {
      skipped.push(`${file}, line ${r.line}: ${valueName} "${(r.cells[1] ?? '').trim().slice(0, 20)}" is not a light level (a number ≥ 0); the line is skipped`);
      continue;
    }
    if (value > MAX_READING_LX) {
      skipped.push(`${file}, line ${r.line}: ${valueName} ${value} is brighter than any light at an eye (at most ${MAX_READING_LX} lx are read); the line is skipped`);
      continue;
    }
    if (previous === undefined && hour !== 0) throw new LightSeriesCsvError(`${file}, line ${r.line}: the first hour must be 0 (local midnight of day 0), got ${hour}`);
    if (previous !== undefined && !(hour > previous.hour)) throw new LightSeriesCsvError(`${file}, line ${r.line}: hour ${hour} is not after the previous row (hour ${previous.hour}, line ${previous.line})`);
    previous = { hour, line: r.line };
    if (level.length > 0 && level[level.length - 1] === value) continue; // the same level holds on
    start_h.push(hour);
    level.push(value);
  }
  const readable = body.length - skipped.length;
  if (body.length === 0) throw new LightSeriesCsvError(`${file}, line ${header.line}: no readings after the header`);
  if (readable === 0 || skipped.length > readable) {
    const listed = skipped.slice(0, 3).join('; ');
    throw new LightSeriesCsvError(`${file}: only ${readable} of ${body.length} data line(s) hold a readable hour and light level${listed !== '' ? ` (${listed}${skipped.length > 3 ? '; …' : ''})` : ''}`);
  }
  return { form: 'hours', unit, start_h, level, start_local: null, warnings: listed(skipped) };
}

function listed(notes: readonly string[]): string[] {
  return notes.length <= MAX_LISTED ? [...notes] : [...notes.slice(0, MAX_LISTED), `… and ${notes.length - MAX_LISTED} more line(s) skipped`];
}

/** The zone of t = 0: the given IANA zone, else the offset written in the first time stamp, else UTC. */
function startZone(firstStamp: string, timeZone: string | undefined): string | FixedOffsetZone {
  if (timeZone !== undefined) return timeZone;
  const m = /([+-])(\d{2}):?(\d{2})$/.exec(firstStamp.trim());
  if (m !== null) return FixedOffsetZone.instance((m[1] === '-' ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3])));
  return 'UTC';
}

function readTimestamps(table: CsvTable, text: string, file: string, timeZone: string | undefined): LightSeriesCsv {
  const names = (table.header?.cells ?? []).map((c) => c.trim());
  const melanopic = names.some((n) => /^(m-?edi|mel(anopic)?[ _-]?edi)/i.test(n)) && !names.some((n) => /^(lux|lx|illuminance|photopic)\b/i.test(n));
  const r = importLightLog(text, { quantity: { kind: melanopic ? 'melanopic-edi' : 'photopic-lux' }, timestampFormat: 'auto', fill: 'hold', timeZone: timeZone ?? 'UTC' });
  const log = r.log;
  if (log === undefined) {
    const first = r.problems.find((p) => p.severity === 'error') ?? r.problems[0];
    const detail = first !== undefined ? problemText(file, first) : `${file}: cannot be read`;
    throw new LightSeriesCsvError(`${detail}${first?.fix !== undefined ? ` — ${first.fix}` : ''} (or give hours since midnight with the header "${rowText(['hour', 'lux'], table.delimiter)}")`);
  }
  const tsIndex = names.findIndex((n) => n === log.timestampColumn);
  const firstStamp = table.body.find((row) => (row.cells[tsIndex] ?? '').trim() !== '')?.cells[tsIndex] ?? '';
  const zone = startZone(firstStamp, timeZone);
  const first = log.samples[0];
  if (first === undefined) throw new LightSeriesCsvError(`${file}: no readings`);
  const t0 = DateTime.fromMillis(first.utc_ms, { zone }).startOf('day');
  if (!t0.isValid) throw new LightSeriesCsvError(`${file}: cannot place the first reading in time zone ${String(timeZone)}`);
  const start_h: number[] = [0];
  const level: number[] = [0];
  const notes: string[] = [];
  if (first.utc_ms > t0.toMillis()) notes.push(`${file}: the first reading is at ${DateTime.fromMillis(first.utc_ms, { zone }).toFormat('yyyy-MM-dd HH:mm')}; from midnight until then the light is taken as 0 lx`);
  for (const s of log.samples) {
    const v = (melanopic ? s.melanopicEdi_lx : s.photopic_lx) ?? 0;
    const t_h = (s.utc_ms - t0.toMillis()) / 3_600_000;
    if (t_h === 0) level[0] = v;
    else if (level[level.length - 1] !== v) {
      start_h.push(t_h);
      level.push(v);
    }
  }
  return {
    form: 'timestamps',
    unit: melanopic ? 'mel_edi_lx' : 'native_lx',
    start_h,
    level,
    start_local: t0.toFormat("yyyy-MM-dd'T'HH:mmZZ"),
    warnings: [...notes, ...listed(r.problems.filter((p) => p.severity === 'warning').map((p) => problemText(file, p)))],
  };
}

/**
 * Reads a light series file. `timeZone` (IANA) places time stamps without an offset and t = 0;
 * without it, the offset of the first time stamp, else UTC.
 */
export function readLightSeriesCsv(text: string, file: string, options: { readonly timeZone?: string } = {}): LightSeriesCsv {
  const table = readCsvTable(text);
  if (table.header === undefined) throw new LightSeriesCsvError(`${file}: the file is empty; expected a header such as "hour,lux" or "timestamp,lux"`);
  const first = (table.header.cells[0] ?? '').trim().toLowerCase();
  return first === 'hour' ? readHours(table, file) : readTimestamps(table, text, file, options.timeZone);
}
