// Strategies: named overlays on the baseline, each with the list of what it changes.
import type { ScenarioInput } from '../scenario/scenario-types.js';
import { describeChange } from '../scenario/strategy-description.js';
import { NumberField, SelectField, TextField } from '../components/fields.js';
import { useState } from 'react';
import { addChange, addStrategy, changeTargets, duplicateStrategy, newChange, NEW_CHANGE_LABELS, removeChange, removeStrategy, type NewChangeKind } from '../scenario/strategy-edits.js';
import { useController } from '../state/workspace-context.js';

function AddChangeForm({ scenario, strategyId, strategyName }: { scenario: ScenarioInput; strategyId: string; strategyName: string }) {
  const controller = useController();
  const [kind, setKind] = useState<NewChangeKind>('set-luminaire');
  const targets = changeTargets(scenario, kind);
  const [target, setTarget] = useState('');
  const chosen = targets.some((t) => t.value === target) ? target : (targets[0]?.value ?? '');
  return (
    <form
      className="inline-form"
      aria-label={`Add a change to ${strategyName}`}
      onSubmit={(e) => {
        e.preventDefault();
        const change = newChange(scenario, kind, chosen);
        if (change !== null) controller.store.edit((s) => addChange(s, strategyId, change));
      }}
    >
      <label>
        Change
        <select value={kind} onChange={(e) => setKind(e.target.value as NewChangeKind)}>
          {(Object.keys(NEW_CHANGE_LABELS) as NewChangeKind[]).map((k) => (
            <option key={k} value={k}>
              {NEW_CHANGE_LABELS[k]}
            </option>
          ))}
        </select>
      </label>
      <label>
        Where
        <select value={chosen} onChange={(e) => setTarget(e.target.value)} disabled={targets.length === 0}>
          {targets.map((t) => (
            <option key={t.value} value={t.value}>
              {t.label}
            </option>
          ))}
        </select>
      </label>
      <button type="submit" className="button button-small" disabled={targets.length === 0}>
        Add change
      </button>
    </form>
  );
}

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
      <div className="chart-toolbar">
        <button type="button" className="button" onClick={() => controller.store.edit((sc) => addStrategy(sc))} disabled={!scenario.places.some((p) => p.kind === 'room')} title="A new strategy starts with one change to a room; adjust or add changes below.">
          New strategy
        </button>
      </div>
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
                  {change.op === 'set-blinds' && (
                    <SelectField
                      label="Blinds rule"
                      path={['strategies', si, 'changes', ci, 'blinds', 'rule']}
                      value={change.blinds.rule}
                      options={[
                        { value: 'none', label: 'Never lowered' },
                        { value: 'always-down', label: 'Always down' },
                        { value: 'down-at-night', label: 'Down from dusk to dawn' },
                        { value: 'manual-sun', label: 'Lowered when sun reaches the desk' },
                        { value: 'auto-solar', label: 'Automatic, by solar irradiance' },
                      ]}
                    />
                  )}
                  <button
                    type="button"
                    className="button button-small"
                    disabled={strategy.changes.length <= 1}
                    title={strategy.changes.length <= 1 ? 'A strategy changes at least one thing; remove the strategy instead.' : 'Remove this change'}
                    aria-label={`Remove change ${ci + 1} of ${strategy.name}`}
                    onClick={() => controller.store.edit((sc) => removeChange(sc, strategy.id, ci))}
                  >
                    Remove change
                  </button>
                </li>
              ))}
            </ul>
            <AddChangeForm scenario={scenario} strategyId={strategy.id} strategyName={strategy.name} />
          </article>
        ))}
      </div>
    </section>
  );
}
