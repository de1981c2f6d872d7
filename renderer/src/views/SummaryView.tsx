// Summary: the answer first. Per person, the recommended strategy and why, the headline sentences
// in plain words, and the headline figures of every strategy (as results.json gives them, with
// their range across the model ensemble once it has run); the detail views and the editors are
// one click away in the side bar.
import type { ResultsView, RunHeadline } from '../results/view-model.js';
import { useEnsembleView } from '../state/use-ensemble-view.js';
import { headlineRangeText, headlineText } from './summary-text.js';

type HeadlineMetric = RunHeadline['metric'];

const COLUMNS: readonly { metric: HeadlineMetric; label: string; viewMetric: string }[] = [
  { metric: 'phase_shift_h', label: 'Body clock vs baseline', viewMetric: 'phase-shift' },
  { metric: 'melatonin_suppression_pct', label: 'Melatonin suppression per night', viewMetric: 'suppression' },
  { metric: 'work_hours_kss_ge_7_share', label: 'Work hours at KSS ≥ 7', viewMetric: 'kss7' },
];

export function SummaryView({ view: shown, onOpen }: { view: ResultsView; onOpen: (target: 'compare' | 'light' | 'clock' | 'people' | 'strategies') => void }) {
  const view = useEnsembleView(shown);
  return (
    <div className="summary">
      {view.personas.map((persona) => {
        const rec = view.recommendations?.find((r) => r.personaId === persona.id);
        const recName = rec === undefined ? null : (view.strategies.find((s) => s.id === rec.strategyId)?.name ?? rec.strategyId);
        const keepsBaseline = rec !== undefined && rec.strategyId === view.baselineId;
        const runs = view.runs.filter((r) => r.personaId === persona.id);
        const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
        const sentences = rec?.sentences === undefined ? (rec?.headlines ?? []) : [rec.sentences.phase, rec.sentences.suppression, rec.sentences.sleepiness];
        return (
          <article key={persona.id} className="card summary-persona" aria-label={`Summary for ${persona.name}`} data-persona={persona.id}>
            <h3>{persona.name}</h3>
            {rec === undefined ? (
              <p className="summary-recommendation">No recommendation in these results.</p>
            ) : (
              <>
                <p className="summary-recommendation" data-strategy={rec.strategyId}>
                  {keepsBaseline ? (
                    <>
                      Recommended: <strong>keep the baseline</strong>.
                    </>
                  ) : (
                    <>
                      Recommended: <strong>{recName}</strong>.
                    </>
                  )}{' '}
                  {rec.reason}
                </p>
                {sentences.length > 0 && (
                  <ul className="summary-sentences">
                    {sentences.map((s) => (
                      <li key={s}>{s}</li>
                    ))}
                  </ul>
                )}
              </>
            )}
            <table className="data-table summary-table" aria-label={`Headline figures for ${persona.name}`}>
              <thead>
                <tr>
                  <th scope="col">Strategy</th>
                  {COLUMNS.map((c) => (
                    <th key={c.metric} scope="col">
                      {c.label}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {strategies.map((s) => {
                  const run = runs.find((r) => r.strategyId === s.id);
                  const isBaseline = s.id === view.baselineId;
                  return (
                    <tr key={s.id} className={rec?.strategyId === s.id ? 'summary-recommended' : undefined}>
                      <th scope="row">
                        {s.name}
                        {rec?.strategyId === s.id && <span className="tag summary-tag">recommended</span>}
                      </th>
                      {COLUMNS.map((c) => {
                        const h = run?.headlines?.find((x) => x.metric === c.metric);
                        const ensemble = run?.metrics.find((m) => m.id === c.viewMetric)?.ensemble;
                        return (
                          <td key={c.metric} data-strategy={s.id} data-headline={c.metric} data-value={h?.value ?? ''}>
                            {headlineText(c.metric, h?.value ?? null, isBaseline)}
                            {ensemble !== undefined && !(isBaseline && c.metric === 'phase_shift_h') && (
                              <span className="ensemble-range" title="The same light run through the other published models: how far they disagree, not how people differ.">
                                {headlineRangeText(c.metric, ensemble)}
                              </span>
                            )}
                          </td>
                        );
                      })}
                    </tr>
                  );
                })}
              </tbody>
            </table>
            {rec?.rule !== undefined && <p className="small muted">How the recommendation is chosen: {rec.rule}</p>}
          </article>
        );
      })}
      <p className="summary-next">
        More:{' '}
        <button type="button" className="link-button" onClick={() => onOpen('compare')}>
          every figure side by side
        </button>
        ,{' '}
        <button type="button" className="link-button" onClick={() => onOpen('light')}>
          light at the eye
        </button>
        ,{' '}
        <button type="button" className="link-button" onClick={() => onOpen('clock')}>
          body clock
        </button>
        . Change the scenario:{' '}
        <button type="button" className="link-button" onClick={() => onOpen('people')}>
          people
        </button>
        ,{' '}
        <button type="button" className="link-button" onClick={() => onOpen('strategies')}>
          strategies
        </button>{' '}
        (results run again after each edit).
      </p>
    </div>
  );
}
