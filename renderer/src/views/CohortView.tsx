// Cohort: virtual occupants per person, run on every core in Web Workers, with a progress bar,
// the running median / IQR readout and its stop rule while they run, and ranges (median, IQR,
// 5–95 %) per strategy once done.
import { useState, useSyncExternalStore } from 'react';
import { useController, useWorkspace } from '../state/workspace-context.js';
import type { ResultsView } from '../results/view-model.js';
import type { ScenarioInput } from '../scenario/scenario-types.js';
import { Cautions } from './ResultsFrame.js';
import { CohortRangeChart } from './CohortRangeChart.js';
import { DEFAULT_COHORT_SETTINGS } from '../cohort/cohort-runner.js';
import { rangeRows } from '../cohort/cohort-ranges.js';
import { COHORT_METRICS } from '../cohort/occupant-job.js';
import { convergenceOptionsFor } from '../cohort/cohort-pool.js';
import { formatNumber } from '../charts/comparison-data.js';
import { metricKey, type ConvergenceCheckpoint } from '../../../model/cohort/convergence.js';

const READOUT_METRICS = ['phaseShift_h', 'melatoninSuppression_pct', 'kss7Share_pct', 'phaseAngle_h'] as const;
const metricInfo = (id: string) => COHORT_METRICS.find((m) => m.id === id);

function strategiesOf(view: ResultsView | null, scenario: ScenarioInput, personaId: string) {
  const names = [{ id: 'baseline', name: 'Baseline' }, ...(scenario.strategies ?? []).map((s) => ({ id: s.id, name: s.name }))];
  if (view === null) return names;
  const ran = new Set(view.runs.filter((r) => r.personaId === personaId).map((r) => r.strategyId));
  return names.filter((s) => ran.size === 0 || ran.has(s.id));
}

/** One person's place in the readout: occupants finished and the latest checkpoint. */
interface ReadoutRow {
  readonly personaId: string;
  readonly completed: number;
  readonly checkpoint: ConvergenceCheckpoint | null;
}

/** The running convergence readout while a cohort runs, and its last state once it has finished. */
function Readout({ rows: people, size, scenario }: { rows: readonly ReadoutRow[]; size: number; scenario: ScenarioInput }) {
  const options = convergenceOptionsFor(size);
  return (
    <div className="cohort-readout">
      {people.map(({ personaId: pid, completed, checkpoint }) => {
        const name = scenario.personas.find((x) => x.id === pid)?.name ?? pid;
        const cp = checkpoint;
        const rows = cp === null ? [] : Object.entries(cp.metrics).filter(([key]) => READOUT_METRICS.some((m) => key.endsWith(`/${m}`)));
        return (
          <table key={pid} className="data-table readout-table" aria-label={`Convergence for ${name}`}>
            <caption>
              {name}: {completed} of {size} occupants{cp === null ? '' : ` — readout after ${cp.occupants} in order${cp.converged ? ', settled' : ''}`}
            </caption>
            {rows.length > 0 && (
              <>
                <thead>
                  <tr>
                    <th scope="col">Strategy / metric</th>
                    <th scope="col">Running median</th>
                    <th scope="col">Running IQR</th>
                    <th scope="col">Change over the last batch (median / IQR)</th>
                  </tr>
                </thead>
                <tbody>
                  {rows.map(([key, r]) => {
                    const [strategyId, metricId] = key.split('/') as [string, string];
                    const info = metricInfo(metricId);
                    const d = info?.decimals ?? 2;
                    const strategyName = strategyId === 'baseline' ? 'Baseline' : ((scenario.strategies ?? []).find((s) => s.id === strategyId)?.name ?? strategyId);
                    const tol = options.tolerance[metricKey(strategyId, metricId)] ?? options.tolerance[metricId] ?? options.tolerance.default;
                    const within = r.medianChange !== null && r.iqrChange !== null && r.medianChange <= tol && r.iqrChange <= tol;
                    return (
                      <tr key={key} className={within ? 'readout-settled' : 'readout-changing'}>
                        <th scope="row">
                          {strategyName} — {info?.label ?? metricId}
                        </th>
                        <td>
                          {formatNumber(r.median, d)} {info?.unit}
                        </td>
                        <td>
                          {formatNumber(r.iqr, d)} {info?.unit}
                        </td>
                        <td>
                          {formatNumber(r.medianChange, d)} / {formatNumber(r.iqrChange, d)} {within ? '✓' : ''} (tolerance {tol} {info?.unit})
                        </td>
                      </tr>
                    );
                  })}
                </tbody>
              </>
            )}
          </table>
        );
      })}
    </div>
  );
}

function stopText(reason: string, occupants: number): string {
  if (reason === 'converged') return `stopped at ${occupants} occupants: the running median and IQR of every metric changed less than the tolerance over the last batch`;
  if (reason === 'stopped') return `stopped by hand; summary of the first ${occupants} occupants`;
  return `all ${occupants} occupants`;
}

export function CohortView({ scenario }: { scenario: ScenarioInput }) {
  const controller = useController();
  const workspace = useWorkspace();
  const cohort = useSyncExternalStore(controller.cohort.subscribe, controller.cohort.getSnapshot);
  const [persona, setPersona] = useState<string>('all');
  const [size, setSize] = useState(DEFAULT_COHORT_SETTINGS.size);
  const [seed, setSeed] = useState(DEFAULT_COHORT_SETTINGS.seed);
  const [stopRule, setStopRule] = useState(DEFAULT_COHORT_SETTINGS.stopRule);
  const [ageRange, setAgeRange] = useState<'persona' | 'adults'>('persona');
  const view = controller.shownView();
  const problems = workspace.problems.some((p) => p.severity === 'error');
  const running = cohort.status === 'running';
  const validSize = Number.isInteger(size) && size >= 5 && size <= 5000;
  const validSeed = Number.isInteger(seed) && seed >= 0 && seed <= 0xffffffff;
  const start = () => {
    const personaIds = persona === 'all' ? scenario.personas.map((p) => p.id) : [persona];
    void controller.cohort.start(scenario, { size, seed, personaIds, stopRule, ageRange_y: ageRange === 'adults' ? [18, 70] : null });
  };
  return (
    <section className="panel" aria-labelledby="cohort-title">
      <header className="panel-header">
        <h2 id="cohort-title">Cohort</h2>
        <p className="panel-lead">
          Virtual occupants around each person: intrinsic period, light sensitivity and habitual sleep timing drawn from published between-person spreads (seeded, the same for any number of workers), each run through the whole simulation under every strategy. Results are ranges, not one number.
        </p>
      </header>
      <Cautions />
      <form
        className="inline-form cohort-form"
        aria-label="Cohort settings"
        onSubmit={(e) => {
          e.preventDefault();
          if (!running) start();
        }}
      >
        <label>
          Person
          <select value={persona} onChange={(e) => setPersona(e.target.value)} disabled={running}>
            <option value="all">Everyone</option>
            {scenario.personas.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        <label>
          Occupants per person
          <input type="number" min={5} max={5000} step={1} value={Number.isFinite(size) ? size : ''} onChange={(e) => setSize(Number(e.target.value))} disabled={running} aria-invalid={!validSize} />
        </label>
        <label>
          Seed
          <input type="number" min={0} step={1} value={Number.isFinite(seed) ? seed : ''} onChange={(e) => setSeed(Number(e.target.value))} disabled={running} aria-invalid={!validSeed} />
        </label>
        <label>
          Age
          <select value={ageRange} onChange={(e) => setAgeRange(e.target.value === 'adults' ? 'adults' : 'persona')} disabled={running}>
            <option value="persona">Each person&apos;s own age</option>
            <option value="adults">Drawn between 18 and 70 years</option>
          </select>
        </label>
        <label className="checkbox">
          <input type="checkbox" checked={stopRule} onChange={(e) => setStopRule(e.target.checked)} disabled={running} />
          Stop when the ranges settle
        </label>
        {running ? (
          <button type="button" className="button" onClick={() => controller.cohort.stop()}>
            Stop
          </button>
        ) : (
          <button type="submit" className="button button-primary" disabled={problems || !validSize || !validSeed}>
            Run cohort
          </button>
        )}
      </form>
      {problems && <p className="empty empty-error">Fix the problems listed above before running a cohort.</p>}
      {cohort.status === 'running' && (
        <div className="cohort-progress">
          <div className="progress" role="progressbar" aria-label="Cohort progress" aria-valuemin={0} aria-valuemax={cohort.total} aria-valuenow={cohort.completed}>
            <span style={{ width: `${Math.max(2, (100 * cohort.completed) / Math.max(1, cohort.total))}%` }} />
          </div>
          <p className="small" role="status">
            {cohort.completed} of at most {cohort.total} occupants on {cohort.workers} worker{cohort.workers === 1 ? '' : 's'}
            {cohort.settings.stopRule ? ` — stops early once the running median and IQR change less than the tolerance over a batch of ${convergenceOptionsFor(cohort.settings.size).batchSize}` : ''}
          </p>
          <Readout rows={cohort.settings.personaIds.map((id) => ({ personaId: id, completed: cohort.personas[id]?.completed ?? 0, checkpoint: cohort.personas[id]?.checkpoint ?? null }))} size={cohort.settings.size} scenario={scenario} />
        </div>
      )}
      {cohort.status === 'done' && (
        <div className="cohort-results">
          {cohort.scenario !== scenario && (
            <p className="banner banner-warning" role="note">
              The scenario has changed since this cohort ran; run it again for current ranges.
            </p>
          )}
          <p className="small" role="status">
            Cohort finished: seed {cohort.settings.seed}, {cohort.outcome.workers} worker{cohort.outcome.workers === 1 ? '' : 's'}, {cohort.elapsed_s.toFixed(1)} s.
            {cohort.outcome.failures.length > 0 && ` ${cohort.outcome.failures.length} occupant runs failed (counted as missing): ${cohort.outcome.failures[0]}`}
          </p>
          {cohort.outcome.personas.map((pc) => {
            const name = scenario.personas.find((p) => p.id === pc.personaId)?.name ?? pc.personaId;
            const strategies = strategiesOf(view, scenario, pc.personaId);
            const rows = rangeRows(pc, strategies);
            return (
              <article key={pc.personaId} className="card cohort-persona" aria-label={`Cohort of ${name}`}>
                <h3>{name}</h3>
                <p className="small">{stopText(pc.stopReason, pc.occupants)}.</p>
                <table className="data-table cohort-table" aria-label={`Cohort ranges for ${name}`}>
                  <thead>
                    <tr>
                      <th scope="col">Metric</th>
                      <th scope="col">Strategy</th>
                      <th scope="col">Median</th>
                      <th scope="col">Interquartile range</th>
                      <th scope="col">5–95 %</th>
                    </tr>
                  </thead>
                  <tbody>
                    {rows.map((r) => (
                      <tr key={`${r.metricId}-${r.strategyId}`} data-metric={r.metricId} data-strategy={r.strategyId} data-median={r.median ?? ''} data-n={r.n}>
                        <th scope="row">
                          {r.label} <span className="unit">({r.unit})</span>
                        </th>
                        <td>{r.strategyName}</td>
                        <td>{formatNumber(r.median, r.decimals)}</td>
                        <td>
                          {formatNumber(r.q25, r.decimals)} – {formatNumber(r.q75, r.decimals)}
                        </td>
                        <td>
                          {formatNumber(r.p05, r.decimals)} – {formatNumber(r.p95, r.decimals)}
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
                <div className="cohort-charts">
                  {COHORT_METRICS.map((m) => (
                    <CohortRangeChart key={m.id} title={m.label} rows={rows.filter((r) => r.metricId === m.id)} />
                  ))}
                </div>
              </article>
            );
          })}
          <details className="cohort-final-readout">
            <summary>How the ranges settled: the convergence readout at the end of the run</summary>
            <Readout rows={cohort.outcome.personas.map((pc) => ({ personaId: pc.personaId, completed: pc.occupants, checkpoint: pc.checkpoints.at(-1) ?? null }))} size={cohort.settings.size} scenario={scenario} />
          </details>
        </div>
      )}
      {cohort.status === 'idle' && <p className="empty">Choose the number of occupants and run the cohort. It runs on {typeof navigator === 'undefined' ? 'every' : (navigator.hardwareConcurrency ?? 'every')} cores; editing stays possible meanwhile.</p>}
    </section>
  );
}
