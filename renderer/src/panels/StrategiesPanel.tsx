// Strategies: named overlays on the baseline, each with the list of what it changes.
import type { ScenarioInput } from '../scenario/scenario-types.js';
import { describeChange } from '../scenario/strategy-description.js';
import { NumberField, TextField } from '../components/fields.js';
import { duplicateStrategy, removeStrategy } from '../scenario/strategy-edits.js';
import { useController } from '../state/workspace-context.js';

export function StrategiesPanel({ scenario }: { scenario: ScenarioInput }) {
  const controller = useController();
  const strategies = scenario.strategies ?? [];
  const personName = (id: string) => scenario.personas.find((p) => p.id === id)?.name ?? id;
  return (
    <section className="panel" aria-labelledby="strategies-title">
      <header className="panel-header">
        <h2 id="strategies-title">Strategies</h2>
        <p className="panel-lead">Each strategy is compared with the baseline: the scenario as written.</p>
      </header>
      {strategies.length === 0 && <p className="empty">No strategies yet; results show the baseline only.</p>}
      <div className="card-list">
        {strategies.map((strategy, si) => (
          <article key={strategy.id} className="card" aria-label={strategy.name}>
            <header className="card-header">
              <h3>{strategy.name}</h3>
              <code className="id">{strategy.id}</code>
              <span className="card-actions">
                <button type="button" className="button button-small" onClick={() => controller.store.edit((sc) => duplicateStrategy(sc, strategy.id))}>
                  Duplicate
                </button>
                <button type="button" className="button button-small" onClick={() => controller.store.edit((sc) => removeStrategy(sc, strategy.id))}>
                  Remove
                </button>
              </span>
            </header>
            {strategy.description !== undefined && <p className="muted">{strategy.description}</p>}
            <p className="small">For: {strategy.personas === undefined ? 'everyone' : strategy.personas.map(personName).join(', ')}</p>
            <TextField label="Name" path={['strategies', si, 'name']} value={strategy.name} wide />
            <h4>What changes versus the baseline</h4>
            <ul className="change-list">
              {strategy.changes.map((change, ci) => (
                <li key={ci}>
                  <span>{describeChange(scenario, change)}</span>
                  {change.op === 'set-luminaire' && change.eyeIlluminance_lx !== undefined && (
                    <NumberField label="Illuminance at the eye" path={['strategies', si, 'changes', ci, 'eyeIlluminance_lx']} value={change.eyeIlluminance_lx} unit="lx" min={0} step={10} />
                  )}
                  {change.op === 'add-luminaire' && (
                    <NumberField label="Illuminance at the eye" path={['strategies', si, 'changes', ci, 'luminaire', 'eyeIlluminance_lx']} value={change.luminaire.eyeIlluminance_lx} unit="lx" min={0} step={10} />
                  )}
                </li>
              ))}
            </ul>
          </article>
        ))}
      </div>
    </section>
  );
}
