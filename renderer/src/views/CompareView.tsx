// Compare: every metric for the baseline and each strategy, the difference versus baseline
// and a one-line reading.
import type { ResultsView } from '../results/view-model.js';
import { comparisonRows, formatNumber } from '../charts/comparison-data.js';

export function CompareView({ view, personaId, onExport }: { view: ResultsView; personaId: string; onExport: () => void }) {
  const runs = view.runs.filter((r) => r.personaId === personaId);
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const rows = comparisonRows(runs, strategies, view.baselineId);
  return (
    <div className="compare">
      <div className="chart-toolbar">
        <button type="button" className="button" onClick={onExport}>
          Export comparison as CSV
        </button>
      </div>
      <table className="data-table compare-table" aria-label="Comparison with the baseline">
        <thead>
          <tr>
            <th scope="col">Metric</th>
            {strategies.map((s) => (
              <th key={s.id} scope="col">
                {s.name}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.metricId}>
              <th scope="row">
                {row.label}
                {row.unit !== '' && <span className="unit"> ({row.unit})</span>}
              </th>
              {row.cells.map((cell) => (
                <td key={cell.strategyId} className={`verdict-${cell.verdict}`} title={cell.reading} data-metric={row.metricId} data-strategy={cell.strategyId} data-value={cell.value ?? ''}>
                  <span className="value">{formatNumber(cell.value, row.decimals)}</span>
                  {cell.difference !== null && (
                    <span className="difference">
                      {cell.difference > 0 ? '+' : cell.difference < 0 ? '−' : '±'}
                      {formatNumber(Math.abs(cell.difference), row.decimals)}
                    </span>
                  )}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <h3>Readings</h3>
      <ul className="readings">
        {rows.flatMap((row) =>
          row.cells
            .filter((c) => c.strategyId !== view.baselineId)
            .map((c) => (
              <li key={`${row.metricId}-${c.strategyId}`} className={`verdict-${c.verdict}`}>
                {c.reading}
              </li>
            )),
        )}
      </ul>
    </div>
  );
}
