/**
 * Pure reader of EnergyPlus weather (EPW) text (layout: EnergyPlus Auxiliary Programs, "EPW Data
 * Dictionary"). Conventions kept from the format:
 *  - data are hourly values in LOCAL STANDARD TIME (no daylight saving, whatever the
 *    HOLIDAYS/DAYLIGHT SAVINGS header says — that line only steers building schedules);
 *  - hour h (1–24) labels the interval that ENDS at h:00, so hour 1 = 00:00–01:00;
 *  - radiation is energy over that hour (Wh/m², numerically the mean W/m²), illuminance the mean
 *    over the hour (lx);
 *  - typical-year files mix source years and have 8760 rows; a file may also hold 29 February.
 * Structural faults (missing header, too few fields for the date and the light fields, bad date
 * or hour, gaps, truncation) are errors naming the line; missing-value codes, non-numeric or
 * impossible cells in a physical field are counted warnings naming the line, and the value
 * becomes NaN (missing). Files from some sources end their data lines early (no albedo or
 * precipitation fields) or add empty fields: the missing trailing fields are missing values and
 * such lines are counted in a warning.
 */
import { EPW_DATA_FIELD_COUNT, EPW_FIELDS, EPW_HEADER_LINES, type EpwNumericField } from './epw-fields.js';

export interface EpwLocation {
  readonly city: string;
  readonly region: string;
  readonly country: string;
  readonly source: string;
  readonly wmo: string;
  /** North positive (deg). */
  readonly latitude_deg: number;
  /** East positive (deg). */
  readonly longitude_deg: number;
  /** Standard time zone, hours ahead of UTC. */
  readonly timeZone_h: number;
  readonly elevation_m: number;
}

/** A problem tied to one line of the file (1-based). */
export interface EpwIssue {
  readonly line: number;
  readonly field?: string;
  readonly message: string;
}

export class EpwError extends Error {
  constructor(readonly fileName: string, readonly line: number, detail: string) {
    super(`${fileName}, line ${line}: ${detail}`);
    this.name = 'EpwError';
  }
}

export type EpwRecords = Readonly<Record<EpwNumericField, Float64Array>>;

export interface EpwFile {
  readonly fileName: string;
  readonly location: EpwLocation;
  /** Text of the DATA PERIODS header (e.g. "1/ 1 – 12/31"). */
  readonly period: { readonly start: string; readonly end: string };
  readonly count: number;
  readonly year: Int32Array;
  readonly month: Int32Array;
  readonly day: Int32Array;
  /** Hour label 1–24 (interval ending at that hour, local standard time). */
  readonly hour: Int32Array;
  /** 1-based line number of each record, for messages. */
  readonly line: Int32Array;
  readonly values: EpwRecords;
  readonly hasLeapDay: boolean;
  /** Warnings, at most `WARNING_DETAIL_LIMIT` listed per kind; `warningCount` counts them all. */
  readonly warnings: readonly EpwIssue[];
  readonly warningCount: number;
  /** Missing-value cells per field (codes, empty cells, non-numeric and impossible values). */
  readonly missingCounts: Readonly<Record<EpwNumericField, number>>;
}

const WARNING_DETAIL_LIMIT = 20;
/** Fewest fields a data line may have: through zenith luminance (field 20), the last light field. */
export const EPW_MIN_DATA_FIELDS = 20;
const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function splitCsvLine(line: string): string[] {
  // EPW header COMMENTS lines may quote commas; data lines never do. A simple quote-aware split.
  const cells: string[] = [];
  let cur = '';
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (ch === ',' && !quoted) {
      cells.push(cur);
      cur = '';
    } else cur += ch;
  }
  cells.push(cur);
  return cells;
}

function numberCell(cell: string | undefined): number {
  if (cell === undefined) return Number.NaN;
  const t = cell.trim();
  return t === '' ? Number.NaN : Number(t);
}

function parseLocation(fileName: string, cells: string[]): EpwLocation {
  if ((cells[0] ?? '').trim().toUpperCase() !== 'LOCATION') throw new EpwError(fileName, 1, 'expected the LOCATION header line; this does not look like an EPW weather file');
  const n = (i: number, field: string, lo: number, hi: number) => {
    const v = numberCell(cells[i]);
    if (!Number.isFinite(v) || v < lo || v > hi) throw new EpwError(fileName, 1, `LOCATION ${field} "${(cells[i] ?? '').trim()}" is not a number within ${lo}…${hi}`);
    return v;
  };
  const s = (i: number) => (cells[i] ?? '').trim();
  return {
    city: s(1),
    region: s(2),
    country: s(3),
    source: s(4),
    wmo: s(5),
    latitude_deg: n(6, 'latitude', -90, 90),
    longitude_deg: n(7, 'longitude', -180, 180),
    timeZone_h: n(8, 'time zone', -12, 14),
    elevation_m: n(9, 'elevation', -1000, 9000),
  };
}

/** Parses EPW text. `fileName` only labels messages. Throws EpwError on structural faults. */
export function parseEpw(text: string, fileName = 'weather file'): EpwFile {
  const lines = text.split(/\r\n|\r|\n/);
  while (lines.length > 0 && (lines[lines.length - 1] ?? '').trim() === '') lines.pop();
  if (lines.length < EPW_HEADER_LINES) throw new EpwError(fileName, lines.length, `file ends inside the ${EPW_HEADER_LINES}-line header`);
  const location = parseLocation(fileName, splitCsvLine(lines[0] ?? ''));
  const dp = splitCsvLine(lines[EPW_HEADER_LINES - 1] ?? '');
  if ((dp[0] ?? '').trim().toUpperCase() !== 'DATA PERIODS') throw new EpwError(fileName, EPW_HEADER_LINES, 'expected the DATA PERIODS header line');
  const periods = numberCell(dp[1]);
  const perHour = numberCell(dp[2]);
  if (periods !== 1) throw new EpwError(fileName, EPW_HEADER_LINES, `DATA PERIODS: ${dp[1]?.trim()} periods; only files with one data period are supported`);
  if (perHour !== 1) throw new EpwError(fileName, EPW_HEADER_LINES, `DATA PERIODS: ${dp[2]?.trim()} records per hour; only hourly files are supported`);
  const period = { start: (dp[5] ?? '').trim(), end: (dp[6] ?? '').trim() };
  const parseMd = (s: string) => {
    const m = /^(\d{1,2})\s*\/\s*(\d{1,2})$/.exec(s);
    if (m === null) throw new EpwError(fileName, EPW_HEADER_LINES, `DATA PERIODS: date "${s}" is not month/day`);
    return { month: Number(m[1]), day: Number(m[2]) };
  };
  const pStart = parseMd(period.start);
  const pEnd = parseMd(period.end);

  const dataLines = lines.length - EPW_HEADER_LINES;
  const year = new Int32Array(dataLines);
  const month = new Int32Array(dataLines);
  const day = new Int32Array(dataLines);
  const hour = new Int32Array(dataLines);
  const lineNo = new Int32Array(dataLines);
  const values = Object.fromEntries(EPW_FIELDS.map((f) => [f.key, new Float64Array(dataLines)])) as Record<EpwNumericField, Float64Array>;
  const missingCounts = Object.fromEntries(EPW_FIELDS.map((f) => [f.key, 0])) as Record<EpwNumericField, number>;
  const warnings: EpwIssue[] = [];
  const warningKinds = new Map<string, number>();
  let warningCount = 0;
  const warn = (kind: string, issue: EpwIssue) => {
    warningCount++;
    const seen = warningKinds.get(kind) ?? 0;
    warningKinds.set(kind, seen + 1);
    if (seen < WARNING_DETAIL_LIMIT) warnings.push(issue);
  };

  let hasLeapDay = false;
  let prev: { month: number; day: number; hour: number } | undefined;
  for (let i = 0; i < dataLines; i++) {
    const ln = EPW_HEADER_LINES + i + 1;
    const raw = lines[EPW_HEADER_LINES + i] ?? '';
    const cells = raw.split(',');
    if (cells.length < EPW_MIN_DATA_FIELDS) {
      throw new EpwError(fileName, ln, `expected ${EPW_DATA_FIELD_COUNT} comma-separated fields (at least ${EPW_MIN_DATA_FIELDS}, through zenith luminance), found ${cells.length}`);
    }
    if (cells.length > EPW_DATA_FIELD_COUNT) {
      if (cells.slice(EPW_DATA_FIELD_COUNT).some((c) => c.trim() !== '')) throw new EpwError(fileName, ln, `expected ${EPW_DATA_FIELD_COUNT} comma-separated fields, found ${cells.length}`);
      cells.length = EPW_DATA_FIELD_COUNT;
    } else if (cells.length < EPW_DATA_FIELD_COUNT) {
      warn('short-line', { line: ln, message: `${cells.length} of ${EPW_DATA_FIELD_COUNT} fields; fields ${cells.length + 1}–${EPW_DATA_FIELD_COUNT} taken as missing` });
    }
    const int = (col: number, label: string, lo: number, hi: number) => {
      const v = numberCell(cells[col - 1]);
      if (!Number.isInteger(v) || v < lo || v > hi) throw new EpwError(fileName, ln, `${label} "${(cells[col - 1] ?? '').trim()}" is not a whole number within ${lo}…${hi}`);
      return v;
    };
    const y = int(1, 'year', -9999, 9999);
    const m = int(2, 'month', 1, 12);
    const d = int(3, 'day', 1, DAYS_IN_MONTH[m - 1] ?? 31);
    const h = int(4, 'hour', 1, 24);
    if (m === 2 && d === 29) hasLeapDay = true;
    // Records must follow each other hour by hour.
    if (prev === undefined) {
      if (m !== pStart.month || d !== pStart.day || h !== 1) throw new EpwError(fileName, ln, `first record is ${m}/${d} hour ${h}; DATA PERIODS says the data start on ${period.start} hour 1`);
    } else {
      const expected = nextHour(prev, hasLeapDay || (m === 2 && d === 29));
      const expectedAlt = prev.month === 2 && prev.day === 28 && prev.hour === 24 ? { month: 2, day: 29, hour: 1 } : undefined;
      const same = (a: { month: number; day: number; hour: number }) => a.month === m && a.day === d && a.hour === h;
      if (!same(expected) && !(expectedAlt !== undefined && same(expectedAlt))) {
        throw new EpwError(fileName, ln, `record ${m}/${d} hour ${h} does not follow ${prev.month}/${prev.day} hour ${prev.hour} (expected ${expected.month}/${expected.day} hour ${expected.hour}); hours are missing or repeated`);
      }
    }
    prev = { month: m, day: d, hour: h };
    year[i] = y;
    month[i] = m;
    day[i] = d;
    hour[i] = h;
    lineNo[i] = ln;
    for (const f of EPW_FIELDS) {
      const cell = (cells[f.column - 1] ?? '').trim();
      const arr = values[f.key];
      if (cell === '') {
        arr[i] = Number.NaN;
        missingCounts[f.key]++;
        continue;
      }
      const v = Number(cell);
      if (!Number.isFinite(v)) {
        warn(`nonnumeric:${f.key}`, { line: ln, field: f.label, message: `${f.label} "${cell}" is not a number; treated as missing` });
        arr[i] = Number.NaN;
        missingCounts[f.key]++;
      } else if (f.isMissing(v)) {
        arr[i] = Number.NaN;
        missingCounts[f.key]++;
      } else if (v < f.min || v > f.max) {
        warn(`range:${f.key}`, { line: ln, field: f.label, message: `${f.label} ${v} is impossible (outside ${f.min}…${f.max}); treated as missing` });
        arr[i] = Number.NaN;
        missingCounts[f.key]++;
      } else arr[i] = v;
    }
  }
  if (prev === undefined) throw new EpwError(fileName, lines.length, 'no hourly data after the header');
  if (prev.month !== pEnd.month || prev.day !== pEnd.day || prev.hour !== 24) {
    throw new EpwError(fileName, lines.length, `file ends at ${prev.month}/${prev.day} hour ${prev.hour}; DATA PERIODS says the data run to ${period.end} hour 24 — the file looks truncated`);
  }
  for (const [kind, n] of warningKinds) {
    if (n > WARNING_DETAIL_LIMIT) warnings.push({ line: 0, field: kind.split(':')[1] ?? '', message: `${n - WARNING_DETAIL_LIMIT} more warnings of this kind not listed` });
  }
  return { fileName, location, period, count: dataLines, year, month, day, hour, line: lineNo, values, hasLeapDay, warnings, warningCount, missingCounts };
}

function nextHour(p: { month: number; day: number; hour: number }, leap: boolean): { month: number; day: number; hour: number } {
  if (p.hour < 24) return { month: p.month, day: p.day, hour: p.hour + 1 };
  const dim = p.month === 2 ? (leap ? 29 : 28) : (DAYS_IN_MONTH[p.month - 1] ?? 31);
  if (p.day < dim) return { month: p.month, day: p.day + 1, hour: 1 };
  return { month: p.month === 12 ? 1 : p.month + 1, day: 1, hour: 1 };
}
