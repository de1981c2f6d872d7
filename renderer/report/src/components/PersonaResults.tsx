// Results of one persona: light at the eye by source with the recommendation bands (baseline and
// recommended strategy), phase by day, melatonin, KSS by hour and a KSS grid, metrics table.
import type { ResultsView } from '../../../src/results/view-model.js';
import { findRun } from '../../../src/results/view-model.js';
import { comparisonRows, formatMetricDifference, formatMetricValue, formatNumber } from '../../../src/charts/comparison-data.js';
import { kssGrid } from '../../../src/charts/kss-grid-data.js';
import { kssColour } from '../../../src/charts/palette.js';
import { bandCompliance, lightAtEyeRows, recommendationBands } from '../../../src/charts/light-at-eye-data.js';
import { formatClock, formatDayLabel } from '../../../src/charts/clock.js';
import { wallClockOf } from '../../../src/charts/wall-clock.js';
import type { PersonaSummary } from '../headlines.js';
import { lightAxisTop_lx, PrintKssChart, PrintLightChart, PrintLightCompareChart, PrintMelatoninChart, PrintPhaseChart, PrintSuppressionChart } from './print-charts.js';
import { Section } from './sections.js';

/** Bands named by the person's own sleep (a night worker's "3 h before sleep" falls in the morning). */
const BAND_WORDS = { day: 'awake (≥ 250 lx)', evening: 'last 3 h before sleep (≤ 10 lx)', night: 'asleep (≤ 1 lx)' } as const;

function ComplianceLine({ view, personaId, strategyId, day }: { view: ResultsView; personaId: string; strategyId: string; day: number }) {
  const run = findRun(view, personaId, strategyId);
  if (run === undefined) return null;
  const clock = wallClockOf(view);
  const compliance = bandCompliance(lightAtEyeRows(run.light, day, 10, clock), recommendationBands(run.sleep, day, clock));
  return (
    <p className="chart-note">
      Time meeting the recommendation:{' '}
      {compliance.map((c, i) => (
        <span key={i}>
          {i > 0 ? '; ' : ''}
          {BAND_WORDS[c.band.kind]} {formatClock(c.band.from_clock_h)}–{c.band.to_clock_h >= 24 ? '24:00' : formatClock(c.band.to_clock_h)} {Math.round(c.met * 100)} %
        </span>
      ))}
      .
    </p>
  );
}

function KssGridTable({ view, personaId, strategyId }: { view: ResultsView; personaId: string; strategyId: string }) {
  const run = findRun(view, personaId, strategyId);
  if (run === undefined) return null;
  const grid = kssGrid(run.kssHourly, view.days, wallClockOf(view));
  const name = view.strategies.find((s) => s.id === strategyId)?.name ?? strategyId;
  return (
    <figure className="chart keep">
      <figcaption className="chart-title">Sleepiness by day and hour — {name}</figcaption>
      <table className="kss-grid">
        <thead>
          <tr>
            <th />
            {Array.from({ length: 24 }, (_, h) => (
              <th key={h}>{h % 3 === 0 ? String(h).padStart(2, '0') : ''}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {grid.map((row, d) => (
            <tr key={d}>
              <th scope="row">{formatDayLabel(view.startDate, d)}</th>
              {row.map((cell) =>
                cell.parts.length === 2 ? (
                  // the hour the clocks repeat: both real hours, side by side
                  <td key={cell.hour} className="kss-repeated">
                    <div className="kss-pair">
                      {cell.parts.map((p) => (
                        <span key={p.index} className={p.sleepy ? 'kss-half kss-sleepy' : p.kss === null ? 'kss-half kss-none' : 'kss-half'} style={p.kss === null ? undefined : { background: kssColour(p.kss) }} />
                      ))}
                    </div>
                  </td>
                ) : (
                  <td key={cell.hour} className={cell.parts.length === 0 ? 'kss-skipped' : cell.sleepy ? 'kss-sleepy' : cell.kss === null ? 'kss-none' : undefined} style={cell.kss === null ? undefined : { background: kssColour(cell.kss) }} />
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="chart-note">Darker = sleepier (KSS 1 extremely alert … 9 very sleepy). Outlined: KSS ≥ 7. Grey: asleep. Local clock time{wallClockOf(view).changes ? '; crossed out: the hour skipped when the clocks go forward; split: the hour lived twice when they go back' : ''}.</p>
    </figure>
  );
}

/** "+1.2", "−0.4", or "±0" when the difference rounds to zero at the shown decimals. */
export function signedDifference(difference: number, decimals: number): string {
  const text = formatNumber(Math.abs(difference), decimals);
  if (/^0(\.0*)?$/.test(text)) return `±${text}`;
  return `${difference > 0 ? '+' : '−'}${text}`;
}

function MetricsTable({ view, personaId }: { view: ResultsView; personaId: string }) {
  const runs = view.runs.filter((r) => r.personaId === personaId);
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const rows = comparisonRows(runs, strategies, view.baselineId);
  return (
    <table className="data keep metrics">
      <thead>
        <tr>
          <th>Metric</th>
          {strategies.map((s) => (
            <th key={s.id} className="num">
              {s.name}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.metricId}>
            <td>
              {row.label}
              {row.unit === '' || row.clock ? '' : ` (${row.unit})`}
            </td>
            {row.cells.map((c) => (
              <td key={c.strategyId} className={`num verdict-${c.verdict}`} {...(c.ensemble === undefined ? {} : { 'data-ensemble-min': c.ensemble.min, 'data-ensemble-max': c.ensemble.max })}>
                {formatMetricValue(row, c.value)}
                {c.difference !== null && (
                  <span className="diff">
                    {' '}
                    ({row.clock ? formatMetricDifference(row, c.difference) : signedDifference(c.difference, row.decimals)})
                  </span>
                )}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function PersonaResults({ view, summary, day, nightly }: { view: ResultsView; summary: PersonaSummary; day: number; nightly: ReadonlyMap<string, readonly { day: number; pct: number | null }[]> | null }) {
  const personaId = summary.persona.id;
  const runs = view.runs.filter((r) => r.personaId === personaId);
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const dayLabel = formatDayLabel(view.startDate, day);
  const baseline = findRun(view, personaId, view.baselineId);
  const rec = summary.recommended;
  const recRun = rec === null || rec === summary.baseline ? undefined : findRun(view, personaId, rec.strategy.id);
  // one axis for both light charts, so they compare at a glance
  const clock = wallClockOf(view);
  const axisTop_lx = Math.max(...[baseline, recRun].map((r) => (r === undefined ? 0 : lightAxisTop_lx(lightAtEyeRows(r.light, day, 10, clock).map((x) => x.total_lx)).top)));
  return (
    <Section id={`results-${personaId}`} title={`Results: ${summary.persona.name}`}>
      {baseline !== undefined && (
        <div className="keep">
          <h3>Light at the eye</h3>
          <PrintLightChart run={baseline} day={day} clock={clock} axisTop_lx={axisTop_lx} title={`Melanopic EDI at the eye by source on ${dayLabel} — Baseline`} />
          <ComplianceLine view={view} personaId={personaId} strategyId={baseline.strategyId} day={day} />
        </div>
      )}
      {recRun !== undefined && rec !== null && (
        <div className="keep">
          <PrintLightChart run={recRun} day={day} clock={clock} axisTop_lx={axisTop_lx} title={`Melanopic EDI at the eye by source on ${dayLabel} — ${rec.strategy.name}`} />
          <ComplianceLine view={view} personaId={personaId} strategyId={recRun.strategyId} day={day} />
        </div>
      )}
      {recRun !== undefined && rec !== null && baseline !== undefined && (
        <div className="keep">
          <PrintLightCompareChart clock={clock} runs={[baseline, recRun]} names={['Baseline', rec.strategy.name]} day={day} title={`Total melanopic EDI on ${dayLabel}: baseline and ${rec.strategy.name} (log scale)`} />
        </div>
      )}
      <div className="keep">
        <h3>Body clock</h3>
        <PrintPhaseChart view={view} runs={runs} strategies={strategies} clock={clock} />
      </div>
      <div className="keep">
        <h3>Melatonin</h3>
        {runs.some((r) => r.melatonin.time_h.length > 0) ? (
          <PrintMelatoninChart runs={runs} strategies={strategies} day={day} dayLabel={dayLabel} clock={clock} />
        ) : nightly !== null ? (
          <PrintSuppressionChart view={view} strategies={strategies} nights={new Map(strategies.map((s) => [s.id, nightly.get(`${personaId}:${s.id}`) ?? []]))} />
        ) : (
          <p className="small muted">No melatonin results in this run.</p>
        )}
      </div>
      <div className="keep">
        <h3>Sleepiness</h3>
        <PrintKssChart runs={runs} strategies={strategies} day={day} dayLabel={dayLabel} clock={clock} />
      </div>
      <KssGridTable view={view} personaId={personaId} strategyId={rec?.strategy.id ?? view.baselineId} />
      <div className="keep">
        <h3>Metrics</h3>
        <p className="small muted">
          Values per strategy; in brackets the difference from the baseline.
          {view.ensemble !== undefined && ' The ranges of the headline figures across published models are given under “Ranges across models and people”.'}
        </p>
        <MetricsTable view={view} personaId={personaId} />
      </div>
    </Section>
  );
}
