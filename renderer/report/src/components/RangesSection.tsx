// "Ranges across models and people": the figures of every strategy that carry a range across the
// published models of the ensemble (the view's metric ranges, from results.json `ensemble` or the
// app's ensemble run), the
// strategies whose rank changes with the model, and — when a cohort was run — the ranges across
// virtual occupants (5th, 25th, 50th, 75th and 95th percentiles).
import type { BriefingDocument, CohortMetricRange } from '../briefing-document.js';
import { cohortFromResults } from '../cohort-ranges.js';
import type { MetricValue, ResultsView } from '../../../src/results/view-model.js';
import { ensembleModelsWords } from '../../../src/results/ensemble-view.js';
import { formatNumber } from '../../../src/charts/comparison-data.js';
import { PHASE_SHIFT_SIGN_LABEL, signedShift } from '../../../../schedules/words/shift-sign.js';
import { Section } from './sections.js';

/** A value as printed in the ranges table: signed for a body-clock shift, with its unit. */
function shown(m: Pick<MetricValue, 'id' | 'unit' | 'decimals'>, v: number | null): string {
  if (v === null || !Number.isFinite(v)) return '—';
  const text = m.id === 'phase-shift' ? signedShift(v, m.decimals) : formatNumber(v, m.decimals);
  return m.unit === '%' ? `${text} %` : text;
}

function RangeCell({ m, isBaseline }: { m: MetricValue | undefined; isBaseline: boolean }) {
  if (m === undefined) return <td className="num">—</td>;
  if (m.id === 'phase-shift' && isBaseline) return <td className="num">reference</td>;
  const e = m.ensemble;
  const lo = e === undefined ? '' : shown({ ...m, unit: '' }, e.min);
  const hi = e === undefined ? '' : shown({ ...m, unit: '' }, e.max);
  return (
    <td className="num">
      {shown(m, m.value)}
      {e !== undefined && e.models > 1 && <span className="ensemble-range">{lo === hi ? 'all agree' : `${lo} to ${hi}`}</span>}
    </td>
  );
}

/** Short column headings of the figures with a range (the briefing's and the app's metric ids); the metric's own label otherwise. */
const SHORT_HEADINGS: Readonly<Record<string, string>> = {
  'work-kss7-share': 'Work hours at KSS 7 or more',
  kss7: 'Work hours at KSS 7 or more',
  suppression: 'Melatonin suppression per night',
  'phase-shift': `Body-clock shift, h (${PHASE_SHIFT_SIGN_LABEL})`,
  misalignment: 'Misalignment, h a day',
  'sleep-duration': 'Sleep per night, h',
  sleep: 'Sleep per night, h',
  'sleep-timing': 'DLMO to sleep onset, h',
};

function heading(m: MetricValue): string {
  return SHORT_HEADINGS[m.id] ?? (m.unit === '' || m.unit === '%' ? m.label : `${m.label}, ${m.unit}`);
}

function ModelRanges({ view }: { view: ResultsView }) {
  const e = view.ensemble;
  if (e === undefined) return null;
  return (
    <>
      <h3>Across published models</h3>
      <p className="small">
        The same light at the eye was run through {ensembleModelsWords(e)} (named under Methods). Each figure is the default models’ value; below it, the lowest to the highest value across the models (“all agree” when they give the same value at the digits shown). A wide range means the published models disagree for this scenario; it says nothing about how people differ.
      </p>
      {view.personas.map((p) => {
        const runs = view.runs.filter((r) => r.personaId === p.id);
        const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
        // the figures that have a range, in the order of the runs' metrics
        const columns = (runs[0]?.metrics ?? []).filter((m) => runs.some((r) => r.metrics.some((x) => x.id === m.id && x.ensemble !== undefined)));
        const sentences = e.rankings.find((r) => r.personaId === p.id)?.sentences ?? [];
        if (columns.length === 0) return null;
        return (
          <div key={p.id} className="keep model-ranges">
            <h4>{p.name}</h4>
            <table className="data small-table ranges">
              <thead>
                <tr>
                  <th className="ranges-strategy">Strategy</th>
                  {columns.map((c) => (
                    <th key={c.id} className="num">
                      {heading(c)}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {strategies.map((s) => {
                  const run = runs.find((r) => r.strategyId === s.id);
                  return (
                    <tr key={s.id}>
                      <td>{s.name}</td>
                      {columns.map((c) => (
                        <RangeCell key={c.id} m={run?.metrics.find((x) => x.id === c.id)} isBaseline={s.id === view.baselineId} />
                      ))}
                    </tr>
                  );
                })}
              </tbody>
            </table>
            {sentences.length === 0 ? (
              <p className="small">With every model the strategies keep their order under the recommendation rule.</p>
            ) : (
              <ul className="small ensemble-ranking">
                {sentences.map((t) => (
                  <li key={t}>{t}</li>
                ))}
              </ul>
            )}
          </div>
        );
      })}
    </>
  );
}

/** 5–95 % whisker, interquartile box and median tick on a scale shared by the rows of one person and metric. */
function CohortBand({ r, lo, hi }: { r: CohortMetricRange; lo: number; hi: number }) {
  const w = 120;
  const x = (v: number) => (hi > lo ? 4 + ((v - lo) / (hi - lo)) * (w - 8) : w / 2);
  if (r.p05 === null || r.p95 === null || r.median === null) return null;
  const q25 = r.q25 ?? null;
  const q75 = r.q75 ?? null;
  return (
    <svg className="cohort-band" width={w} height={12} viewBox={`0 0 ${w} 12`} role="img" aria-label={`${r.label}: 5–95 % ${formatNumber(r.p05, r.decimals)} to ${formatNumber(r.p95, r.decimals)} ${r.unit}`}>
      <line x1={x(r.p05)} x2={x(r.p95)} y1={6} y2={6} stroke="#555" strokeWidth={1} />
      {q25 !== null && q75 !== null && <rect x={x(q25)} y={2} width={Math.max(1, x(q75) - x(q25))} height={8} fill="#b9c9dd" stroke="#555" strokeWidth={0.6} />}
      <line x1={x(r.median)} x2={x(r.median)} y1={1} y2={11} stroke="#111" strokeWidth={1.6} />
    </svg>
  );
}

/** Ranges across virtual occupants, when the document carries a cohort (its own or results.json's). */
export function CohortSection({ doc, view }: { doc: BriefingDocument; view: ResultsView }) {
  const cohort = doc.cohort ?? cohortFromResults(doc.results);
  if (cohort === undefined || cohort.ranges.length === 0) return null;
  const name = (list: readonly { id: string; name: string }[], id: string) => list.find((x) => x.id === id)?.name ?? 'a strategy of the scenario';
  const scale = new Map<string, { lo: number; hi: number }>();
  for (const r of cohort.ranges) {
    if (r.p05 === null || r.p95 === null) continue;
    const k = `${r.personaId}\u0000${r.label}`;
    const s = scale.get(k) ?? { lo: r.p05, hi: r.p95 };
    scale.set(k, { lo: Math.min(s.lo, r.p05), hi: Math.max(s.hi, r.p95) });
  }
  const cell = (v: number | null | undefined, r: CohortMetricRange) => (v === undefined || v === null ? '—' : `${formatNumber(v, r.decimals)} ${r.unit}`);
  return (
    <div className="cohort">
      <h3>Across people: virtual occupants</h3>
      <p className="small">
        {cohort.occupants} virtual occupants were simulated per person, each under every strategy, with their own intrinsic period, light sensitivity and habitual sleep timing drawn around the persona{cohort.seed === null ? '' : ` (random seed ${cohort.seed}, so a rerun draws the same people)`}. The table gives the median, the middle half (25th to 75th percentile, the box in the band) and the middle 90 % (5th to 95th percentile, the line); bands of one person and metric share a scale.
      </p>
      <table className="data breakable">
        <thead>
          <tr>
            <th>Strategy</th>
            <th>Metric</th>
            <th className="num">5th pct.</th>
            <th className="num">25th</th>
            <th className="num">Median</th>
            <th className="num">75th</th>
            <th className="num">95th pct.</th>
            <th>Band</th>
          </tr>
        </thead>
        <tbody>
          {cohort.ranges.map((r, i) => {
            const s = scale.get(`${r.personaId}\u0000${r.label}`);
            const first = i === 0 || cohort.ranges[i - 1]?.personaId !== r.personaId;
            const newStrategy = first || cohort.ranges[i - 1]?.strategyId !== r.strategyId;
            return [
              first ? (
                <tr key={`p${i}`}>
                  <th colSpan={8}>{name(view.personas, r.personaId)}</th>
                </tr>
              ) : null,
              <tr key={i}>
                <td>{newStrategy ? name(view.strategies, r.strategyId) : ''}</td>
                <td>{r.label}</td>
                <td className="num">{cell(r.p05, r)}</td>
                <td className="num">{cell(r.q25, r)}</td>
                <td className="num">{cell(r.median, r)}</td>
                <td className="num">{cell(r.q75, r)}</td>
                <td className="num">{cell(r.p95, r)}</td>
                <td>{s === undefined ? null : <CohortBand r={r} lo={s.lo} hi={s.hi} />}</td>
              </tr>,
            ];
          })}
        </tbody>
      </table>
    </div>
  );
}

/** The section, when there is anything to show: model ranges (results with an ensemble) and/or cohort ranges. */
export function RangesSection({ doc, view }: { doc: BriefingDocument; view: ResultsView }) {
  const hasModels = view.ensemble !== undefined;
  const hasCohort = ((doc.cohort ?? cohortFromResults(doc.results))?.ranges.length ?? 0) > 0;
  if (!hasModels && !hasCohort) return null;
  return (
    <Section id="ranges" title="Ranges across models and people">
      <ModelRanges view={view} />
      <CohortSection doc={doc} view={view} />
    </Section>
  );
}
