/**
 * Measured light logs (CSV from wearable light loggers) → timed samples of photopic
 * illuminance and/or melanopic EDI at the eye, with gaps detected and reported.
 * The text is read by csv-table.ts (delimiter detected: comma, semicolon, tab or bar; decimal
 * commas accepted when the delimiter is not a comma). Lines starting with "#" are comments.
 * Raw channels become lux and melanopic EDI through the user's linear calibration
 * (value = Σ kᵢ·channelᵢ).
 */
import type { FillRule, TimestampFormat } from '../schema/light-log-schema.js';
import type { LightLogSpec } from '../schema/scenario-types.js';
import { forEachCsvRow, guessDelimiter, readNumber, type CsvRow } from './csv-table.js';
import { describeGap } from './gap-notes.js';
import { detectTimestampFormat, timestampReader } from './timestamp.js';

export interface LogSample {
  readonly utc_ms: number;
  readonly photopic_lx: number | null;
  readonly melanopicEdi_lx: number | null;
}

export interface LogGap {
  readonly start_ms: number;
  readonly end_ms: number;
  readonly duration_min: number;
  readonly reason: 'no-data' | 'not-worn';
  /** 1-based line of the reading the gap follows (for a not-worn stretch, its first line). */
  readonly line: number;
}

export interface LogProblem {
  readonly severity: 'error' | 'warning';
  /** 1-based line in the file, when the problem is on one line. */
  readonly line: number | null;
  readonly column: string | null;
  readonly message: string;
  readonly fix: string;
}

export interface ImportedLightLog {
  readonly samples: readonly LogSample[];
  /** Usual spacing of the samples (median), seconds. */
  readonly interval_s: number;
  readonly gaps: readonly LogGap[];
  readonly fill: FillRule;
  readonly timestampColumn: string;
  readonly valueColumns: readonly string[];
  readonly timestampFormat: Exclude<TimestampFormat, 'auto'>;
  readonly start_ms: number;
  /** End of the last sample's interval. */
  readonly end_ms: number;
}

export interface LightLogImport {
  readonly ok: boolean;
  readonly log: ImportedLightLog | undefined;
  readonly problems: readonly LogProblem[];
}

export type LightLogOptions = Pick<LightLogSpec, 'quantity' | 'timestampColumn' | 'timestampFormat' | 'fill' | 'maxGap_min' | 'wornColumn'> & {
  /** IANA zone for timestamps without an offset. */
  readonly timeZone: string;
};

/**
 * Readings above this (lx, photopic or melanopic EDI) are not light at an eye: direct sunlight
 * gives about 100–130 klx (common practice); such a row is skipped as unreadable.
 */
export const MAX_READING_LX = 200_000;

/** Rows worse than this share make the file "not a light log". */
const MAX_BAD_ROW_SHARE = 0.5;
const MAX_LISTED_ROW_PROBLEMS = 20;

function findColumn(header: readonly string[], wanted: string | undefined, patterns: readonly RegExp[]): number {
  if (wanted !== undefined) return header.findIndex((h) => h.trim().toLowerCase() === wanted.trim().toLowerCase());
  for (const re of patterns) {
    const i = header.findIndex((h) => re.test(h.trim()));
    if (i >= 0) return i;
  }
  return -1;
}

function isNotWorn(text: string | undefined): boolean {
  const t = (text ?? '').trim().toLowerCase();
  return t === '0' || t === 'false' || t === 'no' || t === 'n' || t === 'off';
}

function median(values: number[]): number {
  const v = [...values].sort((a, b) => a - b);
  const mid = v.length >> 1;
  return v.length === 0 ? Number.NaN : v.length % 2 === 1 ? (v[mid] ?? Number.NaN) : ((v[mid - 1] ?? 0) + (v[mid] ?? 0)) / 2;
}

function fail(problems: LogProblem[], message: string, fix: string, line: number | null = null, column: string | null = null): LightLogImport {
  problems.push({ severity: 'error', line, column, message, fix });
  return { ok: false, log: undefined, problems };
}

/** Growable column of numbers (typed storage: a long log keeps 8 bytes per reading and column). */
class NumberColumn {
  private data = new Float64Array(1024);
  length = 0;
  push(v: number): void {
    if (this.length === this.data.length) {
      const bigger = new Float64Array(this.data.length * 2);
      bigger.set(this.data);
      this.data = bigger;
    }
    this.data[this.length++] = v;
  }
  at(i: number): number {
    return this.data[i] ?? Number.NaN;
  }
}

interface Columns {
  readonly header: readonly string[];
  readonly headerLine: number;
  readonly tsCol: number;
  readonly valueCols: readonly { name: string; index: number }[];
  readonly wornCol: number;
}

/** The timestamp, value and worn columns named in the options or found by their names; errors go into `problems`. */
function findColumns(headerRow: CsvRow, options: LightLogOptions, problems: LogProblem[]): Columns | undefined {
  const header = headerRow.cells.map((h) => h.trim());
  const tsCol = findColumn(header, options.timestampColumn, [/^(date[ _-]?)?time(stamp)?$/i, /time|date/i]);
  if (tsCol < 0) {
    fail(problems, options.timestampColumn !== undefined ? `there is no column "${options.timestampColumn}"` : 'no timestamp column found', `Name the timestamp column in the light log's "timestampColumn"; the columns are: ${header.join(', ')}.`, headerRow.line);
    return undefined;
  }
  const q = options.quantity;
  const valueCols: { name: string; index: number }[] = [];
  const need = (name: string | undefined, patterns: readonly RegExp[], what: string): number => {
    const i = findColumn(header, name, patterns);
    if (i < 0) problems.push({ severity: 'error', line: headerRow.line, column: name ?? null, message: name !== undefined ? `there is no column "${name}"` : `no ${what} column found`, fix: `Give the column name in quantity.column; the columns are: ${header.join(', ')}.` });
    else valueCols.push({ name: header[i] ?? '', index: i });
    return i;
  };
  if (q.kind === 'photopic-lux') need(q.column, [/^(lux|lx|illuminance|photopic|e_?v)\b/i, /lux|illuminance/i], 'lux');
  else if (q.kind === 'melanopic-edi') need(q.column, [/^(m-?edi|mel(anopic)?[ _-]?edi)/i, /mel/i], 'melanopic EDI');
  else for (const c of q.columns) need(c, [], `channel ${c}`);
  const wornCol = options.wornColumn !== undefined ? need(options.wornColumn, [], 'worn') : -1;
  if (wornCol >= 0) valueCols.pop();
  if (problems.some((p) => p.severity === 'error')) return undefined;
  return { header, headerLine: headerRow.line, tsCol, valueCols, wornCol };
}

/** Rows looked at to tell the timestamp format when it is "auto". */
const FORMAT_SAMPLE_ROWS = 200;

export function importLightLog(text: string, options: LightLogOptions): LightLogImport {
  const problems: LogProblem[] = [];
  const delimiter = guessDelimiter(text);
  const decimalComma = delimiter !== ',';
  const q = options.quantity;

  let cols: Columns | undefined;
  let headerSeen = false;
  let bodyRows = 0;
  let read: ((text: string) => number | undefined) | undefined;
  let format: Exclude<TimestampFormat, 'auto'> | undefined = options.timestampFormat === 'auto' ? undefined : options.timestampFormat;
  const pending: CsvRow[] = [];
  // Readings, in file order.
  const utc = new NumberColumn();
  const lux = new NumberColumn();
  const mel = new NumberColumn();
  const worn = new NumberColumn();
  const lineOf = new NumberColumn();
  let bad = 0;
  let firstBadLine: number | undefined;
  let firstBodyLine: number | undefined;
  let lastBodyLine = 0;
  const rowProblem = (line: number, column: string | null, message: string, fix: string): void => {
    bad++;
    firstBadLine ??= line;
    if (bad <= MAX_LISTED_ROW_PROBLEMS) problems.push({ severity: 'warning', line, column, message, fix });
  };

  const takeRow = (c: Columns, readTime: (text: string) => number | undefined, fmt: string, r: CsvRow): void => {
    const tsText = r.cells[c.tsCol] ?? '';
    const t = readTime(tsText);
    if (t === undefined) {
      rowProblem(r.line, c.header[c.tsCol] ?? null, `timestamp "${tsText.trim().slice(0, 40)}" cannot be read as ${fmt}`, 'The line is skipped; fix or delete it.');
      return;
    }
    let badIndex = -1;
    const values = c.valueCols.map((col, k) => {
      const v = readNumber(r.cells[col.index], decimalComma);
      if (badIndex < 0 && (!Number.isFinite(v) || v < 0)) badIndex = k;
      return v;
    });
    if (badIndex >= 0) {
      const col = c.valueCols[badIndex];
      rowProblem(r.line, col?.name ?? null, `"${(col === undefined ? '' : (r.cells[col.index] ?? '')).trim().slice(0, 20)}" is not a light reading (a number ≥ 0)`, 'The line is skipped and counted as a gap.');
      return;
    }
    let l = Number.NaN;
    let m = Number.NaN;
    if (q.kind === 'photopic-lux') l = values[0] ?? Number.NaN;
    else if (q.kind === 'melanopic-edi') m = values[0] ?? Number.NaN;
    else {
      const dot = (k: readonly number[]) => Math.max(0, values.reduce((acc, v, i) => acc + v * (k[i] ?? 0), 0));
      l = dot(q.calibration.photopic_lx);
      m = dot(q.calibration.melanopicEdi_lx);
    }
    const level = Math.max(Number.isNaN(l) ? 0 : l, Number.isNaN(m) ? 0 : m);
    if (!(level <= MAX_READING_LX)) {
      const col = q.kind === 'channels' ? null : (c.valueCols[0]?.name ?? null);
      rowProblem(r.line, col, `${Number.isFinite(level) ? Math.round(level) : 'an endless'} lx${q.kind === 'channels' ? ' (after the calibration)' : ''} is brighter than any light at an eye (direct sunlight is about 100 000 lx; at most ${MAX_READING_LX} lx are read)`, q.kind === 'channels' ? 'The line is skipped; check the calibration coefficients.' : 'The line is skipped; check the unit of the column.');
      return;
    }
    utc.push(t);
    lux.push(l);
    mel.push(m);
    worn.push(c.wornCol < 0 || !isNotWorn(r.cells[c.wornCol]) ? 1 : 0);
    lineOf.push(r.line);
  };

  /** Decides the format from the rows held back, then reads them. */
  const settleFormat = (c: Columns): boolean => {
    if (format === undefined) {
      const detected = detectTimestampFormat(pending.slice(0, FORMAT_SAMPLE_ROWS).map((r) => r.cells[c.tsCol] ?? ''));
      if (detected.format === undefined) {
        const line = detected.at !== undefined ? (pending[detected.at]?.line ?? null) : null;
        fail(problems, `cannot tell the timestamp format of column "${c.header[c.tsCol] ?? ''}": ${detected.note ?? ''}${line !== null ? ` (line ${line})` : ''}`, 'Set "timestampFormat" to iso, epoch-s, epoch-ms, ymd, dmy or mdy.', line, c.header[c.tsCol] ?? null);
        return false;
      }
      format = detected.format;
      if (detected.note !== undefined) problems.push({ severity: 'warning', line: null, column: c.header[c.tsCol] ?? null, message: detected.note, fix: 'Set "timestampFormat" to "mdy" if the file writes the month first.' });
    }
    read = timestampReader(format, options.timeZone);
    for (const r of pending) takeRow(c, read, format, r);
    pending.length = 0;
    return true;
  };

  let failed = false;
  forEachCsvRow(text, delimiter, (row) => {
    if (!headerSeen) {
      headerSeen = true;
      cols = findColumns(row, options, problems);
      if (cols === undefined) return false;
      return true;
    }
    bodyRows++;
    firstBodyLine ??= row.line;
    lastBodyLine = row.line;
    if (cols === undefined) return false;
    if (read === undefined) {
      pending.push(row);
      if (pending.length >= FORMAT_SAMPLE_ROWS && !settleFormat(cols)) {
        failed = true;
        return false;
      }
      return true;
    }
    takeRow(cols, read, format ?? 'iso', row);
    return true;
  });
  if (!headerSeen) return fail(problems, 'the file is empty', 'Export the log again as CSV with a header line.');
  if (cols === undefined || failed) return { ok: false, log: undefined, problems };
  if (bodyRows === 0) return fail(problems, 'the file has a header but no readings', 'Export the log again with its readings.', cols.headerLine);
  if (read === undefined && !settleFormat(cols)) return { ok: false, log: undefined, problems };
  const c = cols;
  const header = c.header;
  const tsCol = c.tsCol;

  if (bad > MAX_LISTED_ROW_PROBLEMS) problems.push({ severity: 'warning', line: null, column: null, message: `${bad - MAX_LISTED_ROW_PROBLEMS} more unreadable line(s) not listed`, fix: 'Check the export settings of the logger software.' });
  const n = utc.length;
  if (n < 2 || bad > MAX_BAD_ROW_SHARE * bodyRows) {
    const lines = firstBodyLine === lastBodyLine ? `line ${lastBodyLine}` : `lines ${firstBodyLine ?? 0}–${lastBodyLine}`;
    return fail(problems, `only ${n} of ${bodyRows} lines (${lines}) hold a readable time and light value${firstBadLine !== undefined ? `; the first that does not is line ${firstBadLine}` : ''}`, 'Check that this is a light-logger CSV and that the timestamp format and columns are right.', firstBadLine ?? firstBodyLine ?? null);
  }

  // Order, duplicates: an index of readings by time (stable, so the first of equal times stays first).
  let order = Array.from({ length: n }, (_, i) => i);
  let outOfOrder = false;
  for (let i = 1; i < n; i++) if (utc.at(i) < utc.at(i - 1)) outOfOrder = true;
  if (outOfOrder) {
    order.sort((a, b) => utc.at(a) - utc.at(b) || a - b);
    problems.push({ severity: 'warning', line: null, column: header[tsCol] ?? null, message: 'the timestamps are not in order (a clock change in a log without offsets, or merged files)', fix: 'The readings were sorted by time; check the time zone or use timestamps with an offset.' });
  }
  const before = order.length;
  order = order.filter((k, i) => i === 0 || utc.at(k) !== utc.at(order[i - 1] ?? k));
  if (order.length < before) problems.push({ severity: 'warning', line: null, column: header[tsCol] ?? null, message: `${before - order.length} reading(s) repeat an earlier timestamp`, fix: 'Only the first reading at each time is kept.' });

  const diffs: number[] = [];
  for (let i = 1; i < order.length; i++) diffs.push(utc.at(order[i] ?? 0) - utc.at(order[i - 1] ?? 0));
  const interval_ms = median(diffs);
  const maxGap_ms = options.maxGap_min !== undefined ? options.maxGap_min * 60_000 : 3 * interval_ms;

  const gaps: LogGap[] = [];
  const samples: LogSample[] = [];
  const orNull = (v: number) => (Number.isNaN(v) ? null : v);
  let notWorn: { start_ms: number; line: number } | undefined;
  for (let i = 0; i < order.length; i++) {
    const k = order[i] ?? 0;
    const t = utc.at(k);
    const isWorn = worn.at(k) === 1;
    if (!isWorn) {
      notWorn ??= { start_ms: t, line: lineOf.at(k) };
    } else {
      if (notWorn !== undefined) {
        gaps.push({ start_ms: notWorn.start_ms, end_ms: t, duration_min: (t - notWorn.start_ms) / 60_000, reason: 'not-worn', line: notWorn.line });
        notWorn = undefined;
      }
      samples.push({ utc_ms: t, photopic_lx: orNull(lux.at(k)), melanopicEdi_lx: orNull(mel.at(k)) });
    }
    const next = order[i + 1];
    if (next !== undefined && utc.at(next) - t > maxGap_ms && isWorn) {
      gaps.push({ start_ms: t + interval_ms, end_ms: utc.at(next), duration_min: (utc.at(next) - t - interval_ms) / 60_000, reason: 'no-data', line: lineOf.at(k) });
    }
  }
  const lastT = utc.at(order[order.length - 1] ?? 0);
  if (notWorn !== undefined) gaps.push({ start_ms: notWorn.start_ms, end_ms: lastT + interval_ms, duration_min: (lastT + interval_ms - notWorn.start_ms) / 60_000, reason: 'not-worn', line: notWorn.line });
  if (samples.length === 0) return fail(problems, `column "${header[c.wornCol] ?? ''}" marks the logger as not worn on every line (lines ${firstBodyLine ?? 0}–${lastBodyLine})`, 'Check the worn column, or leave "wornColumn" out.', firstBodyLine ?? null, header[c.wornCol] ?? null);
  // Every gap is reported with its start, end and how the run fills it.
  for (const g of gaps) {
    problems.push({ severity: 'warning', line: g.line, column: null, message: describeGap(g, options.fill, options.timeZone), fix: 'Check the logger for that time, or choose another "fill" rule for the log (model, dark, hold or linear).' });
  }
  const first = samples[0];
  return {
    ok: true,
    problems,
    log: {
      samples,
      interval_s: interval_ms / 1000,
      gaps,
      fill: options.fill,
      timestampColumn: header[tsCol] ?? '',
      valueColumns: c.valueCols.map((col) => col.name),
      timestampFormat: format ?? 'iso',
      start_ms: first?.utc_ms ?? 0,
      end_ms: lastT + interval_ms,
    },
  };
}
