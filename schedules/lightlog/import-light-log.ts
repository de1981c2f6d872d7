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
import { readCsvTable, readNumber } from './csv-table.js';
import { describeGap } from './gap-notes.js';
import { detectTimestampFormat, parseTimestamp } from './timestamp.js';

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

export function importLightLog(text: string, options: LightLogOptions): LightLogImport {
  const problems: LogProblem[] = [];
  const { decimalComma, header: headerRow, body } = readCsvTable(text);
  if (headerRow === undefined) return fail(problems, 'the file is empty', 'Export the log again as CSV with a header line.');
  const header = headerRow.cells.map((h) => h.trim());
  if (body.length === 0) return fail(problems, 'the file has a header but no readings', 'Export the log again with its readings.', headerRow.line);

  const tsCol = findColumn(header, options.timestampColumn, [/^(date[ _-]?)?time(stamp)?$/i, /time|date/i]);
  if (tsCol < 0) {
    return fail(problems, options.timestampColumn !== undefined ? `there is no column "${options.timestampColumn}"` : 'no timestamp column found', `Name the timestamp column in the light log's "timestampColumn"; the columns are: ${header.join(', ')}.`, headerRow.line);
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
  if (problems.some((p) => p.severity === 'error')) return { ok: false, log: undefined, problems };

  // Timestamp format.
  let format: Exclude<TimestampFormat, 'auto'>;
  if (options.timestampFormat === 'auto') {
    const detected = detectTimestampFormat(body.slice(0, 200).map((r) => r.cells[tsCol] ?? ''));
    if (detected.format === undefined) return fail(problems, `cannot tell the timestamp format: ${detected.note ?? ''}`, 'Set "timestampFormat" to iso, epoch-s, epoch-ms, ymd, dmy or mdy.', null, header[tsCol] ?? null);
    format = detected.format;
    if (detected.note !== undefined) problems.push({ severity: 'warning', line: null, column: header[tsCol] ?? null, message: detected.note, fix: 'Set "timestampFormat" to "mdy" if the file writes the month first.' });
  } else format = options.timestampFormat;

  const raw: { utc_ms: number; photopic_lx: number | null; melanopicEdi_lx: number | null; worn: boolean; line: number }[] = [];
  let bad = 0;
  const rowProblem = (line: number, column: string | null, message: string, fix: string): void => {
    bad++;
    if (bad <= MAX_LISTED_ROW_PROBLEMS) problems.push({ severity: 'warning', line, column, message, fix });
  };
  for (const r of body) {
    const tsText = r.cells[tsCol] ?? '';
    const t = parseTimestamp(tsText, format, options.timeZone);
    if (t === undefined) {
      rowProblem(r.line, header[tsCol] ?? null, `timestamp "${tsText.slice(0, 40)}" cannot be read as ${format}`, 'The line is skipped; fix or delete it.');
      continue;
    }
    const values = valueCols.map((c) => readNumber(r.cells[c.index], decimalComma));
    const badIndex = values.findIndex((v) => !Number.isFinite(v) || v < 0);
    if (badIndex >= 0) {
      const col = valueCols[badIndex];
      rowProblem(r.line, col?.name ?? null, `"${(col === undefined ? '' : (r.cells[col.index] ?? '')).slice(0, 20)}" is not a light reading (a number ≥ 0)`, 'The line is skipped and counted as a gap.');
      continue;
    }
    let lux: number | null = null;
    let mel: number | null = null;
    if (q.kind === 'photopic-lux') lux = values[0] ?? null;
    else if (q.kind === 'melanopic-edi') mel = values[0] ?? null;
    else {
      const dot = (k: readonly number[]) => Math.max(0, values.reduce((acc, v, i) => acc + v * (k[i] ?? 0), 0));
      lux = dot(q.calibration.photopic_lx);
      mel = dot(q.calibration.melanopicEdi_lx);
    }
    raw.push({ utc_ms: t, photopic_lx: lux, melanopicEdi_lx: mel, worn: wornCol < 0 || !isNotWorn(r.cells[wornCol]), line: r.line });
  }
  if (bad > MAX_LISTED_ROW_PROBLEMS) problems.push({ severity: 'warning', line: null, column: null, message: `${bad - MAX_LISTED_ROW_PROBLEMS} more unreadable line(s) not listed`, fix: 'Check the export settings of the logger software.' });
  if (raw.length < 2 || bad > MAX_BAD_ROW_SHARE * body.length) {
    return fail(problems, `only ${raw.length} of ${body.length} lines hold a readable time and light value`, 'Check that this is a light-logger CSV and that the timestamp format and columns are right.');
  }

  // Order, duplicates.
  let outOfOrder = false;
  for (let i = 1; i < raw.length; i++) if ((raw[i]?.utc_ms ?? 0) < (raw[i - 1]?.utc_ms ?? 0)) outOfOrder = true;
  if (outOfOrder) {
    raw.sort((a, b) => a.utc_ms - b.utc_ms);
    problems.push({ severity: 'warning', line: null, column: header[tsCol] ?? null, message: 'the timestamps are not in order (a clock change in a log without offsets, or merged files)', fix: 'The readings were sorted by time; check the time zone or use timestamps with an offset.' });
  }
  const unique = raw.filter((s, i) => i === 0 || s.utc_ms !== raw[i - 1]?.utc_ms);
  if (unique.length < raw.length) problems.push({ severity: 'warning', line: null, column: header[tsCol] ?? null, message: `${raw.length - unique.length} reading(s) repeat an earlier timestamp`, fix: 'Only the first reading at each time is kept.' });

  const diffs: number[] = [];
  for (let i = 1; i < unique.length; i++) diffs.push((unique[i]?.utc_ms ?? 0) - (unique[i - 1]?.utc_ms ?? 0));
  const interval_ms = median(diffs);
  const maxGap_ms = options.maxGap_min !== undefined ? options.maxGap_min * 60_000 : 3 * interval_ms;

  const gaps: LogGap[] = [];
  const samples: LogSample[] = [];
  let notWorn: { start_ms: number; line: number } | undefined;
  for (let i = 0; i < unique.length; i++) {
    const s = unique[i];
    if (s === undefined) continue;
    if (!s.worn) {
      notWorn ??= { start_ms: s.utc_ms, line: s.line };
    } else {
      if (notWorn !== undefined) {
        gaps.push({ start_ms: notWorn.start_ms, end_ms: s.utc_ms, duration_min: (s.utc_ms - notWorn.start_ms) / 60_000, reason: 'not-worn', line: notWorn.line });
        notWorn = undefined;
      }
      samples.push({ utc_ms: s.utc_ms, photopic_lx: s.photopic_lx, melanopicEdi_lx: s.melanopicEdi_lx });
    }
    const next = unique[i + 1];
    if (next !== undefined && next.utc_ms - s.utc_ms > maxGap_ms && s.worn) {
      gaps.push({ start_ms: s.utc_ms + interval_ms, end_ms: next.utc_ms, duration_min: (next.utc_ms - s.utc_ms - interval_ms) / 60_000, reason: 'no-data', line: s.line });
    }
  }
  const last = unique[unique.length - 1];
  if (notWorn !== undefined && last !== undefined) gaps.push({ start_ms: notWorn.start_ms, end_ms: last.utc_ms + interval_ms, duration_min: (last.utc_ms + interval_ms - notWorn.start_ms) / 60_000, reason: 'not-worn', line: notWorn.line });
  if (samples.length === 0) return fail(problems, 'the logger was never marked as worn', 'Check the worn column, or leave "wornColumn" out.');
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
      valueColumns: valueCols.map((c) => c.name),
      timestampFormat: format,
      start_ms: first?.utc_ms ?? 0,
      end_ms: (last?.utc_ms ?? 0) + interval_ms,
    },
  };
}
