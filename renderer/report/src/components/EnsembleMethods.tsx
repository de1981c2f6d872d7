// Methods page: the models of the ensemble behind the ranges, one citation per model, the defaults
// (whose values the briefing shows) first of each kind.
import type { ViewEnsembleModels } from '../../../src/results/view-model.js';
import { ensembleModelsWords } from '../../../src/results/ensemble-view.js';

export function EnsembleMethods({ ensemble }: { ensemble: ViewEnsembleModels | undefined }) {
  if (ensemble === undefined) return null;
  return (
    <div className="keep">
      <h4>Model ensemble</h4>
      <p className="small">
        The ranges beside the headline figures come from running the same light at the eye through {ensembleModelsWords(ensemble)}{ensemble.pairs > ensemble.models.filter((m) => m.role === 'body clock').length ? ' in every pairing (the sleepiness models change only the KSS figures)' : ''}; the values shown are the default models’ (first of each kind). A range shows how far published models disagree for this scenario, not how people differ.
      </p>
      <table className="data small-table ensemble-models">
        <thead>
          <tr>
            <th>Part</th>
            <th>Model</th>
            <th>Reference</th>
          </tr>
        </thead>
        <tbody>
          {ensemble.models.map((m, i) => (
            <tr key={`${m.role}:${m.name}`}>
              <td>{m.role === 'body clock' ? 'Body clock' : 'Sleepiness (KSS)'}</td>
              <td>
                {m.name}
                {ensemble.models.findIndex((x) => x.role === m.role) === i ? ' (default)' : ''}
              </td>
              <td>{m.source}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
