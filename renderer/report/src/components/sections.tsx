// The briefing's sections, in print order. Each section starts on a new page where it reads
// better; figures and tables never break across pages (print.css).
import type { ReactNode } from 'react';
import type { BriefingDocument, CohortMetricRange } from '../briefing-document.js';
import { cohortFromResults } from '../cohort-ranges.js';
import type { ResultsView, ViewEnsembleModels } from '../../../src/results/view-model.js';
import type { PersonaSummary, StrategyHeadline } from '../headlines.js';
import type { ScenarioFacts } from '../scenario-facts.js';
import type { ValidationRecordSummary } from '../validation-summary.js';
import { RESULTS_CAUTIONS } from '../../../src/results/cautions.js';
import { formatNumber } from '../../../src/charts/comparison-data.js';
import { alignmentTag, directionOf } from '../../../../schedules/run/phase-words.js';
import { EnsembleMethods } from './EnsembleMethods.js';
import { MODELS, NOT_MODELLED, UNIT_NOTES } from '../methods-text.js';
import { TimelineDrawing } from './TimelineDrawing.js';

export function Section({ id, title, children, newPage = true }: { id: string; title: string; children: ReactNode; newPage?: boolean }) {
  return (
    <section id={id} className={newPage ? 'section new-page' : 'section'}>
      <h2>{title}</h2>
      {children}
    </section>
  );
}

export function CautionsBox({ title = 'Read with care' }: { title?: string }) {
  return (
    <aside className="cautions keep">
      <strong>{title}</strong>
      <ul>
        {RESULTS_CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}

function longDate(iso: string): string {
  const [y, m, d] = iso.split('-').map(Number);
  const month = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'][(m ?? 1) - 1];
  return `${d ?? 1} ${month} ${y ?? ''}`;
}

export function Cover({ doc, facts }: { doc: BriefingDocument; facts: ScenarioFacts }) {
  return (
    <section className="cover">
      <div className="cover-band" />
      <p className="cover-kicker">Lighting and body-clock briefing</p>
      <h1>{facts.name}</h1>
      <p className="cover-client">{doc.client ?? facts.siteName}</p>
      {facts.description !== null && <p className="cover-description">{facts.description}</p>}
      <dl className="cover-facts">
        <dt>Date</dt>
        <dd>{longDate(doc.generatedOn)}</dd>
        <dt>Site</dt>
        <dd>{facts.siteName}</dd>
        <dt>Period</dt>
        <dd>{facts.period}</dd>
        <dt>Software</dt>
        <dd>Zeitlight {doc.zeitlightVersion}</dd>
        <dt>Scenario format</dt>
        <dd>zeitlight-scenario version {facts.formatVersion}</dd>
      </dl>
      {doc.synthetic === true && <p className="banner">Synthetic data for a layout check — not a simulation result.</p>}
      <p className="cover-footnote">Model estimates for planning and comparing lighting options — not diagnosis or treatment.</p>
    </section>
  );
}

/** A shift with + = earlier (advance) in words: "0.4 h earlier", "1.0 h later", "no shift". */
export function shiftWords(advance_h: number | null): string {
  if (advance_h === null) return '—';
  if (Math.abs(advance_h) < 0.05) return 'no shift';
  return `${formatNumber(Math.abs(advance_h), 1)} h ${advance_h > 0 ? 'earlier' : 'later'}`;
}
const percent = (v: number | null) => (v === null ? '—' : `${formatNumber(v, 0)} %`);

function HeadlineTable({ summary }: { summary: PersonaSummary }) {
  const isRec = (h: StrategyHeadline) => h === summary.recommended;
  return (
    <table className="data keep">
      <thead>
        <tr>
          {/* a wide first column keeps strategy names on few lines next to four number columns */}
          <th style={{ width: '34%' }}>Strategy</th>
          <th className="num">Body-clock shift vs baseline ({summary.phaseMarker})</th>
          <th className="num">Misalignment with work and sleep (h a day)</th>
          <th className="num">Melatonin suppression per night</th>
          <th className="num">{summary.basis === 'work' ? 'Work hours' : 'Waking hours'} at KSS ≥ 7</th>
        </tr>
      </thead>
      <tbody>
        {summary.all.map((h) => (
          <tr key={h.strategy.id} className={isRec(h) ? 'recommended' : undefined}>
            <td>
              {h.strategy.name}
              {isRec(h) && <span className="tag">recommended</span>}
            </td>
            <td className="num">
              {h === summary.baseline ? (
                'reference'
              ) : (
                <>
                  {shiftWords(h.phaseShift_h)}
                  <br />
                  <span className="small">{alignmentTag(directionOf(h.alignment, summary.baseline?.alignment))}</span>
                </>
              )}
            </td>
            <td className="num">{h.alignment === null ? '—' : formatNumber(h.alignment.misalignment_h_per_day, 1)}</td>
            <td className="num">{percent(h.suppression_pct)}</td>
            <td className="num">{percent(h.sleepyShare_pct)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function Summary({ summaries, warnings }: { summaries: readonly PersonaSummary[]; warnings: readonly string[] }) {
  return (
    <Section id="summary" title="Summary">
      <CautionsBox />
      {summaries.map((s) => (
        <div key={s.persona.id} className="persona-summary">
          <div className="keep">
            <h3>{s.persona.name}</h3>
            <p className="recommendation">{s.sentences.recommendation}</p>
            {s.sentences.reason !== '' && <p>{s.sentences.reason}</p>}
          </div>
          <ul className="headlines keep">
            <li>{s.sentences.phase}</li>
            <li>{s.sentences.suppression}</li>
            <li>{s.sentences.sleepiness}</li>
          </ul>
          <HeadlineTable summary={s} />
        </div>
      ))}
      <p className="small muted">How the recommendation is chosen: {summaries[0]?.rule ?? ''} A body-clock shift is judged by whether it moves the clock toward or away from alignment with the person’s work and sleep hours (misalignment: hours a day of work in the biological night, main sleep in the biological day and waking before the biological night is over; biological night from DLMO to 2 h after CBTmin).</p>
      {warnings.length > 0 && (
        <div className="keep">
          <h4>Notes from the run</h4>
          <ul className="small">
            {warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </div>
      )}
    </Section>
  );
}

export function Modelled({ facts }: { facts: ScenarioFacts }) {
  return (
    <Section id="modelled" title="What was modelled">
      <h3>Site and weather</h3>
      <p>{facts.siteLine}</p>
      <p>
        {facts.weatherLine} Simulated period: {facts.period}.
      </p>
      <h3>Places</h3>
      <table className="data keep">
        <tbody>
          {facts.places.map((p) => (
            <tr key={p.name}>
              <th scope="row">{p.name}</th>
              <td>{p.line}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h3>People and their routines</h3>
      {facts.personas.map((p) => (
        <div key={p.id} className="keep persona-facts">
          <h4>{p.name}</h4>
          <p className="small">{p.details}</p>
          <TimelineDrawing rows={p.rows} />
        </div>
      ))}
      <h3>Strategies</h3>
      <p className="small muted">Each strategy is a set of changes applied on top of the baseline (the scenario as entered).</p>
      {facts.strategies.length === 0 && <p>No strategies: only the baseline was modelled.</p>}
      {facts.strategies.map((s) => (
        <div key={s.id} className="keep strategy-facts">
          <h4>{s.name}</h4>
          {s.description !== null && <p className="small">{s.description}</p>}
          <p className="small muted">For: {s.appliesTo}</p>
          <ul className="small">
            {s.changes.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </div>
      ))}
    </Section>
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

export function CohortSection({ doc, view }: { doc: BriefingDocument; view: ResultsView }) {
  const cohort = doc.cohort ?? cohortFromResults(doc.results);
  if (cohort === undefined || cohort.ranges.length === 0) return null;
  const name = (list: readonly { id: string; name: string }[], id: string) => list.find((x) => x.id === id)?.name ?? id;
  const scale = new Map<string, { lo: number; hi: number }>();
  for (const r of cohort.ranges) {
    if (r.p05 === null || r.p95 === null) continue;
    const k = `${r.personaId}\u0000${r.label}`;
    const s = scale.get(k) ?? { lo: r.p05, hi: r.p95 };
    scale.set(k, { lo: Math.min(s.lo, r.p05), hi: Math.max(s.hi, r.p95) });
  }
  const cell = (v: number | null | undefined, r: CohortMetricRange) => (v === undefined || v === null ? '—' : `${formatNumber(v, r.decimals)} ${r.unit}`);
  return (
    <Section id="cohort" title="Cohort: ranges across virtual occupants">
      <p>
        {cohort.occupants} virtual occupants were simulated per person, each under every strategy, with their own intrinsic period, light sensitivity and habitual sleep timing drawn around the persona{cohort.seed === null ? '' : ` (seed ${cohort.seed})`}. The table gives the median, the middle half (25th to 75th percentile, the box in the band) and the middle 90 % (5th to 95th percentile, the line); bands of one person and metric share a scale.
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
    </Section>
  );
}

export function Methods({ records, runModels, ensemble }: { records: readonly ValidationRecordSummary[]; runModels: Readonly<Record<string, string>> | null; ensemble?: ViewEnsembleModels | undefined }) {
  return (
    <Section id="methods" title="Methods and assumptions">
      <h3>Models</h3>
      {runModels !== null && (
        <p className="small">
          Used in this run:{' '}
          {Object.entries(runModels)
            .map(([k, v]) => `${k.replace(/_/g, ' ')}: ${v}`)
            .join('; ')}
          .
        </p>
      )}
      <table className="data keep small-table">
        <thead>
          <tr>
            <th>What</th>
            <th>Model</th>
            <th>Reference</th>
            <th>Native units</th>
          </tr>
        </thead>
        <tbody>
          {MODELS.map((m) => (
            <tr key={m.what}>
              <td>{m.what}</td>
              <td>{m.model}</td>
              <td>{m.reference}</td>
              <td>{m.units}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <EnsembleMethods ensemble={ensemble} />
      <h3>Units and conversions</h3>
      <ul className="small keep">
        {UNIT_NOTES.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
      <h3>What the tool does not model</h3>
      <ul className="small keep">
        {NOT_MODELLED.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
      <h3>Validation summary</h3>
      <p className="small">
        Every model is checked by the test suite against outside references (published standards, papers’ numbers, handbook formulas). {records.reduce((n, r) => n + r.checks, 0)} checks are recorded in {records.length} validation records; a few from each are quoted below as written in the record.
      </p>
      {records.map((r) => (
        <div key={r.file} className="keep validation-record">
          <h4>
            {r.title} — {r.checks} checks
          </h4>
          <table className="data small-table validation">
            <thead>
              <tr>
                <th>Check</th>
                <th>Reference</th>
                <th>Result</th>
              </tr>
            </thead>
            <tbody>
              {r.examples.map((e, i) => (
                <tr key={i}>
                  <td>{e.what}</td>
                  <td>{e.source}</td>
                  <td>{e.result}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ))}
    </Section>
  );
}

export function ClosingCautions() {
  return (
    <Section id="cautions" title="Cautions" newPage={false}>
      <CautionsBox title="Before acting on these results" />
      <p className="small muted">
        The numbers in this briefing are model estimates for a described scenario. They are meant for comparing lighting options with each other and with the baseline; they do not predict how any one person will respond.
      </p>
    </Section>
  );
}
