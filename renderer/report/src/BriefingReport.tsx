// The whole briefing for one document: cover, summary, what was modelled, results per persona,
// cohort ranges, methods and assumptions, cautions.
import type { ValidationRecordSummary } from './validation-summary.js';
import type { ReportData } from './report-data.js';
import { representativeDay } from './report-day.js';
import { findRun } from '../../src/results/view-model.js';
import { ClosingCautions, CohortSection, Cover, Methods, Modelled, Summary } from './components/sections.js';
import { PersonaResults } from './components/PersonaResults.js';

export function BriefingReport({ data, records }: { data: ReportData; records: readonly ValidationRecordSummary[] }) {
  const { doc, facts, view, summaries } = data;
  return (
    <main className={`briefing paper-${doc.paper.toLowerCase()}`}>
      <Cover doc={doc} facts={facts} />
      <Summary summaries={summaries} warnings={data.warnings} />
      <Modelled facts={facts} />
      {summaries.map((s) => {
        const base = findRun(view, s.persona.id, view.baselineId);
        const rec = s.recommended === null ? undefined : findRun(view, s.persona.id, s.recommended.strategy.id);
        const day = representativeDay(view.days, facts.workMinutesPerHour.get(`${s.persona.id}:${view.baselineId}`), base?.light, rec === base ? undefined : rec?.light);
        return <PersonaResults key={s.persona.id} view={view} summary={s} nightly={data.nightly} day={day} />;
      })}
      <CohortSection doc={doc} view={view} />
      <Methods records={records} runModels={data.runModels} ensemble={view.ensemble} />
      <ClosingCautions />
    </main>
  );
}
