/**
 * The text layer shared by every light-series reader (measured light logs for a scenario, light
 * series for `zeitlight simulate`): delimiter judged from the header line (comma, semicolon, tab
 * or bar), rows parsed with papaparse, blank lines and lines starting with "#" skipped, each row
 * keeping its 1-based line number, and numbers read with a decimal comma when the delimiter is
 * not a comma. Messages quote rows with the file's own delimiter.
 */
import Papa from 'papaparse';

export interface CsvRow {
  readonly cells: readonly string[];
  /** 1-based line in the file. */
  readonly line: number;
}

export interface CsvTable {
  readonly delimiter: string;
  /** True when numbers may be written with a decimal comma (the delimiter is not a comma). */
  readonly decimalComma: boolean;
  /** The first row that is neither blank nor a comment. */
  readonly header: CsvRow | undefined;
  readonly body: readonly CsvRow[];
}

/**
 * The delimiter, judged from the header line (it holds no decimal commas): the most frequent of
 * semicolon, tab and bar when any occurs, else comma.
 */
export function guessDelimiter(text: string): string {
  const header = text.split(/\r?\n|\r/).find((l) => l.trim() !== '' && !l.trim().startsWith('#')) ?? '';
  let best = ',';
  let bestCount = 0;
  for (const d of [';', '\t', '|']) {
    const n = header.split(d).length - 1;
    if (n > bestCount) {
      best = d;
      bestCount = n;
    }
  }
  return best;
}

/**
 * Calls `visit` for each row that is neither blank nor a comment, in file order, without keeping
 * the rows (long logs stay small in memory); `visit` returns false to stop.
 */
export function forEachCsvRow(text: string, delimiter: string, visit: (row: CsvRow) => boolean | void): void {
  // papaparse gives one entry per record; a quoted cell may span lines, so count the newlines.
  let line = 1;
  Papa.parse<string[]>(text, {
    header: false,
    skipEmptyLines: false,
    delimiter,
    step: (result, parser) => {
      const cells = result.data;
      const start = line;
      for (const c of cells) for (let i = c.indexOf('\n'); i >= 0; i = c.indexOf('\n', i + 1)) line++;
      line++;
      const blank = cells.every((c) => c.trim() === '');
      if (blank || (cells[0] ?? '').trim().startsWith('#')) return;
      if (visit({ cells, line: start }) === false) parser.abort();
    },
  });
}

export function readCsvTable(text: string): CsvTable {
  const delimiter = guessDelimiter(text);
  const rows: CsvRow[] = [];
  forEachCsvRow(text, delimiter, (row) => {
    rows.push(row);
  });
  return { delimiter, decimalComma: delimiter !== ',', header: rows[0], body: rows.slice(1) };
}

/** Cells joined with the file's delimiter, as the user sees them in the file. */
export function rowText(cells: readonly string[], delimiter: string): string {
  return cells.map((c) => c.trim()).join(delimiter === '\t' ? '<tab>' : delimiter);
}

/** A plain decimal number (optionally signed, with exponent); NaN for anything else. */
export function readNumber(text: string | undefined, decimalComma: boolean): number {
  if (text === undefined) return Number.NaN;
  let t = text.trim();
  if (t === '') return Number.NaN;
  if (decimalComma && !t.includes('.')) t = t.replace(',', '.');
  return /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t) ? Number(t) : Number.NaN;
}
