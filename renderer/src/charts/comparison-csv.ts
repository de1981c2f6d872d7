// CSV export of the comparison table: one line per metric × strategy, with the value, the
// difference versus baseline and the reading. Quoting by papaparse (RFC 4180 style). Numbers keep
// the ASCII minus so spreadsheets read them; clock times are local "HH:MM" with their difference
// in decimal hours.
import Papa from 'papaparse';
import type { NamedItem, ResultsView } from '../results/view-model.js';
import { comparisonRows, type ComparisonRow } from './comparison-data.js';
import { formatClockValue, plainNumber } from './number-format.js';

export const COMPARISON_CSV_HEADER = ['persona', 'metric', 'unit', 'strategy', 'value', 'difference_vs_baseline', 'reading'] as const;

export function comparisonCsv(personaName: string, rows: readonly ComparisonRow[], strategies: readonly NamedItem[]): string {
  const nameOf = (id: string) => strategies.find((s) => s.id === id)?.name ?? id;
  const data = rows.flatMap((row) =>
    row.cells.map((cell) => [
      personaName,
      row.label,
      row.clock ? 'local time (difference in h)' : row.unit,
      nameOf(cell.strategyId),
      cell.value === null ? '' : row.clock ? formatClockValue(cell.value) : plainNumber(cell.value, row.decimals),
      cell.difference === null ? '' : plainNumber(cell.difference, row.decimals),
      cell.reading,
    ]),
  );
  return `${Papa.unparse({ fields: [...COMPARISON_CSV_HEADER], data }, { newline: '\n' })}\n`;
}

/** CSV of every persona's comparison, one header line. */
export function resultsComparisonCsv(view: ResultsView): string {
  const lines = view.personas.map((persona) => {
    const runs = view.runs.filter((r) => r.personaId === persona.id);
    const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
    return comparisonCsv(persona.name, comparisonRows(runs, strategies, view.baselineId), strategies).split('\n').slice(1).join('\n');
  });
  return `${COMPARISON_CSV_HEADER.join(',')}\n${lines.filter((l) => l.trim() !== '').join('')}`;
}
