// Compare: every metric for the baseline and each strategy, the difference versus baseline
// and a one-line reading; once the model ensemble has run, each headline value's range across
// the models beside it and, in words, any strategy whose rank changes with the model.
import type { ResultsView } from '../results/view-model.js';
import { comparisonRows, ensembleRangeText, formatMetricDifference, formatMetricValue } from '../charts/comparison-data.js';
import { useEnsembleView } from '../state/use-ensemble-view.js';
import { ensembleModelsWords } from '../results/ensemble-view.js';

export function CompareView({ view: shown, personaId, onExport }: { view: ResultsView; personaId: string; onExport: () => void }) {
  const view = useEnsembleView(shown);
  const ranking = view.ensemble?.rankings.find((r) => r.personaId === personaId)?.sentences ?? [];
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
                {row.unit !== '' && !row.clock && <span className="unit"> ({row.unit})</span>}
              </th>
              {row.cells.map((cell) => (
                <td
                  key={cell.strategyId}
                  className={`verdict-${cell.verdict}`}
                  title={cell.reading}
                  data-metric={row.metricId}
                  data-strategy={cell.strategyId}
                  data-value={cell.value ?? ''}
                  {...(cell.ensemble === undefined ? {} : { 'data-ensemble-min': cell.ensemble.min, 'data-ensemble-max': cell.ensemble.max, 'data-ensemble-models': cell.ensemble.models })}
                >
                  <span className="value">{formatMetricValue(row, cell.value)}</span>
                  {cell.difference !== null && <span className="difference">{formatMetricDifference(row, cell.difference)}</span>}
                  {cell.ensemble !== undefined && <span className="ensemble-range">{ensembleRangeText(cell.ensemble, row.decimals)}</span>}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {view.ensemble !== undefined ? (
        <div className="ensemble-note">
          <p>
            Ranges: the same light run through {ensembleModelsWords(view.ensemble)} — {view.ensemble.models.map((m, i, all) => `${m.name}${all.findIndex((x) => x.role === m.role) === i ? ' (default: the values shown)' : ''}`).join('; ')}. They show how far published models disagree for this scenario, not how people differ.
          </p>
          {ranking.length > 0 && (
            <ul className="ensemble-ranking" aria-label="Ranking across models">
              {ranking.map((sentence) => (
                <li key={sentence}>{sentence}</li>
              ))}
            </ul>
          )}
        </div>
      ) : (
        <p className="ensemble-note ensemble-pending">Ranges across the other published models follow once they have run.</p>
      )}
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
