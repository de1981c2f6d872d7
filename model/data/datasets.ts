/**
 * The one typed entry point to the product's tabulated data. Tables are embedded at build
 * time (scripts/embed-datasets.mjs), parsed on first use and cached.
 */
import { EMBEDDED_DATASETS } from './embedded.generated.js';
import { parseNumericTable, type NumericTable } from './csv-table.js';

const cache = new Map<string, NumericTable>();

/** Names of all embedded tables, e.g. `spectra/cie_illuminant_D65_1nm.csv`. */
export function datasetNames(): string[] {
  return Object.keys(EMBEDDED_DATASETS).sort();
}

/** Raw text of an embedded table (for tables with non-numeric columns). */
export function datasetText(name: string): string {
  const text = EMBEDDED_DATASETS[name];
  if (text === undefined) throw new Error(`unknown dataset "${name}"`);
  return text;
}

/** A numeric table by name, parsed once. */
export function numericDataset(name: string): NumericTable {
  let table = cache.get(name);
  if (table === undefined) {
    table = parseNumericTable(name, datasetText(name));
    cache.set(name, table);
  }
  return table;
}

/** One numeric column of a table; throws naming the table and column if absent. */
export function datasetColumn(name: string, column: string): Float64Array {
  const col = numericDataset(name).values[column];
  if (col === undefined) throw new Error(`dataset "${name}" has no column "${column}"`);
  return col;
}
