// The briefing's sections, in print order. Each section starts on a new page where it reads
// better; figures and tables never break across pages (print.css). Every sentence and label a
// client reads takes its phrasing from the client words (schedules/words): names people gave
// things, plain words for changes, one citation per model, one sign for body-clock shifts.
import type { ReactNode } from 'react';
import type { BriefingDocument } from '../briefing-document.js';
import type { PersonaSummary, StrategyHeadline } from '../headlines.js';
import type { ScenarioFacts } from '../scenario-facts.js';
import type { PlainValidation, ValidationRecordSummary } from '../validation-summary.js';
import type { ReportModel } from '../report-models.js';
import type { RunBasis } from '../../../../schedules/run/run-basis.js';
import { RESULTS_CAUTIONS } from '../../../src/results/cautions.js';
import { formatNumber } from '../../../src/charts/comparison-data.js';
import { alignmentTag, directionOf, LIGHT_METHODS, measuredLightWords, PHASE_SHIFT_CONVENTION, PHASE_SHIFT_SIGN_LABEL, shiftInWords, weatherBasisSentence } from '../../../../schedules/words/index.js';
import { NOT_MODELLED, UNIT_NOTES } from '../methods-text.js';
import { TimelineDrawing } from './TimelineDrawing.js';

export { CohortSection, RangesSection } from './RangesSection.js';

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
        <dd>
          Zeitlight {doc.zeitlightVersion} (scenario file format version {facts.formatVersion})
        </dd>
      </dl>
      {doc.synthetic === true && <p className="banner">Synthetic data for a layout check — not a simulation result.</p>}
      <p className="cover-footnote">Model estimates for planning and comparing lighting options — not diagnosis or treatment.</p>
    </section>
  );
}

const percent = (v: number | null) => (v === null ? '—' : `${formatNumber(v, 0)} %`);

function HeadlineTable({ summary }: { summary: PersonaSummary }) {
  const isRec = (h: StrategyHeadline) => h === summary.recommended;
  return (
    <table className="data keep headline-table">
      <thead>
        <tr>
          <th className="strategy-col">Strategy</th>
          <th className="num">
            Body-clock shift vs baseline
            <br />
            <span className="small">({PHASE_SHIFT_SIGN_LABEL})</span>
          </th>
          <th className="num">Misalignment with work and sleep (h a day)</th>
          <th className="num">Melatonin suppression per night</th>
          <th className="num">Sleepy {summary.basis === 'work' ? 'work' : 'waking'} hours (KSS ≥ 7)</th>
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
                  {shiftInWords(h.phaseShift_h)}
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

/** Notes of the run that the briefing does not show elsewhere (measured-log gaps have their own list). */
export function otherNotes(warnings: readonly string[], basis: RunBasis | undefined): string[] {
  const files = (basis?.measured_light ?? []).map((u) => u.file);
  return warnings.filter((w) => !files.some((f) => w.startsWith(`${f} line `) && / gap from /.test(w)));
}

export function Summary({ summaries, warnings, basis, seatNotes = new Map() }: { summaries: readonly PersonaSummary[]; warnings: readonly string[]; basis?: RunBasis | undefined; seatNotes?: ReadonlyMap<string, string> }) {
  const notes = otherNotes(warnings, basis);
  return (
    <Section id="summary" title="Summary and recommendation">
      <CautionsBox />
      {summaries.map((s) => (
        <div key={s.persona.id} className="persona-summary">
          <div className="keep">
            <h3>{s.persona.name}</h3>
            <p className="recommendation">{s.sentences.recommendation}</p>
            {s.sentences.reason !== '' && <p>{s.sentences.reason}</p>}
            {seatNotes.has(s.persona.id) && <p className="seat-note">{seatNotes.get(s.persona.id)}</p>}
          </div>
          <ul className="headlines keep">
            <li>{s.sentences.phase}</li>
            <li>{s.sentences.suppression}</li>
            <li>{s.sentences.sleepiness}</li>
          </ul>
          <HeadlineTable summary={s} />
        </div>
      ))}
      {notes.length > 0 && (
        <div className="keep">
          <h4>Notes from the run</h4>
          <ul className="small">
            {notes.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </div>
      )}
    </Section>
  );
}

/** What the results rest on: the weather source and, per person, the measured-light days and filled gaps. */
export function RunBasisPart({ facts, basis, site }: { facts: ScenarioFacts; basis: RunBasis | undefined; site: { latitude_deg: number; longitude_deg: number } | null }) {
  const measured = measuredLightWords(basis);
  const names = new Map(facts.personas.map((p) => [p.id, p.name]));
  return (
    <>
      <h3>Site and weather</h3>
      <p>{facts.siteLine}</p>
      <p className={basis !== undefined && basis.weather.kind === 'weather-file' && !basis.weather.near_site ? 'warning' : undefined}>
        {basis === undefined || site === null ? facts.weatherLine : weatherBasisSentence(basis.weather, site)} Simulated period: {facts.period}.
      </p>
      {measured.length > 0 && (
        <div className="keep measured-light">
          <h3>Measured light</h3>
          {measured.map((m) => (
            <div key={m.personaId}>
              <h4>{names.get(m.personaId) ?? 'A person of the scenario'}</h4>
              <p className="small">{m.sentence}</p>
              {m.gaps.length > 0 && (
                <ul className="small">
                  {m.gaps.map((g) => (
                    <li key={g}>{g}</li>
                  ))}
                </ul>
              )}
            </div>
          ))}
        </div>
      )}
    </>
  );
}

export function Modelled({ facts, basis, site }: { facts: ScenarioFacts; basis?: RunBasis | undefined; site?: { latitude_deg: number; longitude_deg: number } | null }) {
  return (
    <Section id="modelled" title="What was modelled">
      <RunBasisPart facts={facts} basis={basis} site={site ?? null} />
      <h3>Places</h3>
      <table className="data keep places">
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
      <p className="small muted">Each person’s first week, one row a day, coloured by what they are doing.</p>
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

export function Methods({ models, rule }: { models: readonly ReportModel[]; rule: string }) {
  return (
    <Section id="methods" title="Methods and assumptions">
      <div className="keep">
        <h3>How the recommendation is chosen</h3>
        <p className="small">
          {rule} A body-clock shift counts only by whether it moves the clock toward or away from alignment with the person’s work and sleep hours; the biological night runs from the evening rise of melatonin to 2 h after the body’s temperature low.
        </p>
      </div>
      <h3>Models and published methods</h3>
      <p className="small">The figures in this briefing come from the models and methods marked “figures”; the models marked “range” are run on the same light at the eye to give the ranges across published models.</p>
      <table className="data keep small-table models">
        <thead>
          <tr>
            <th>Part</th>
            <th>Model or method</th>
            <th>Used for</th>
            <th>Published in</th>
          </tr>
        </thead>
        <tbody>
          {LIGHT_METHODS.map((m) => (
            <tr key={m.part}>
              <td>{m.part}</td>
              <td>{m.method}</td>
              <td>figures</td>
              <td>{m.reference}</td>
            </tr>
          ))}
          {models.map((m) => (
            <tr key={`${m.part}:${m.name}`}>
              <td>{m.part}</td>
              <td>{m.name}</td>
              <td>{m.use === 'figures' ? 'figures' : 'range'}</td>
              <td>{m.citation}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h3>Units and conventions</h3>
      <ul className="small keep">
        {UNIT_NOTES.map((n) => (
          <li key={n}>{n}</li>
        ))}
        <li>{PHASE_SHIFT_CONVENTION}</li>
      </ul>
    </Section>
  );
}

/** One page in plain words: what the models were tested against and how close they came (docs/validation/summary.md). */
export function Checked({ page, records }: { page: PlainValidation; records: readonly ValidationRecordSummary[] }) {
  const total = records.reduce((n, r) => n + r.checks, 0);
  return (
    <Section id="checked" title="How these numbers were checked">
      <p>
        Each model was tested against published measurements or standards. The table gives the main tests in plain words; the full technical record of all {total} checks, with every source, tolerance and result, is kept with the software’s documentation.
      </p>
      <table className="data keep small-table checked">
        <thead>
          <tr>
            <th>What was checked</th>
            <th>Against published data</th>
            <th>How close</th>
          </tr>
        </thead>
        <tbody>
          {page.checks.map((c) => (
            <tr key={c.what}>
              <td>{c.what}</td>
              <td>{c.against}</td>
              <td>{c.close}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {page.shortfalls.length > 0 && (
        <div className="keep">
          <h3>Where the models fall short</h3>
          <ul className="small">
            {page.shortfalls.map((s) => (
              <li key={s}>{s}</li>
            ))}
          </ul>
        </div>
      )}
    </Section>
  );
}

export function ClosingCautions() {
  return (
    <Section id="cautions" title="Cautions">
      <CautionsBox title="Before acting on these results" />
      <h3>What the models leave out</h3>
      <ul className="small keep">
        {NOT_MODELLED.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
      <p className="small muted">
        The numbers in this briefing are model estimates for a described scenario. They are meant for comparing lighting options with each other and with the baseline; they do not predict how any one person will respond.
      </p>
    </Section>
  );
}
