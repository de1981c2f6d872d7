/**
 * Parser for the product's own numeric tables (model/data/*.csv): `#` provenance lines,
 * one header row, then numeric rows. Pure; used only on embedded, known-good text.
 */
export interface NumericTable {
  readonly name: string;
  /** Provenance lines (without the leading `# `). */
  readonly provenance: readonly string[];
  readonly columns: readonly string[];
  /** Column-major numeric values; cells that are empty parse as NaN. */
  readonly values: Readonly<Record<string, Float64Array>>;
  readonly rowCount: number;
}

export function parseNumericTable(name: string, text: string): NumericTable {
  const provenance: string[] = [];
  const rows: string[][] = [];
  let columns: string[] | undefined;
  for (const raw of text.split('\n')) {
    const line = raw.trim();
    if (line === '') continue;
    if (line.startsWith('#')) {
      provenance.push(line.replace(/^#\s?/, ''));
      continue;
    }
    const cells = line.split(',');
    if (columns === undefined) columns = cells;
    else rows.push(cells);
  }
  if (columns === undefined) throw new Error(`dataset ${name}: no header row`);
  const values: Record<string, Float64Array> = {};
  columns.forEach((col, j) => {
    const arr = new Float64Array(rows.length);
    rows.forEach((r, i) => {
      const cell = r[j];
      arr[i] = cell === undefined || cell === '' ? Number.NaN : Number(cell);
    });
    values[col] = arr;
  });
  return { name, provenance, columns, values, rowCount: rows.length };
}
