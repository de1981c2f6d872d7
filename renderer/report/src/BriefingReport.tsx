// The whole briefing for one document: cover, summary, what was modelled, results per persona,
// cohort ranges, methods and assumptions, cautions.
import type { BriefingDocument } from './briefing-document.js';
import type { ScenarioFacts } from './scenario-facts.js';
import type { ValidationRecordSummary } from './validation-summary.js';
import { personaSummaries } from './headlines.js';
import { representativeDay } from './report-day.js';
import { ClosingCautions, CohortSection, Cover, Methods, Modelled, Summary } from './components/sections.js';
import { PersonaResults } from './components/PersonaResults.js';

export function BriefingReport({ doc, facts, records }: { doc: BriefingDocument; facts: ScenarioFacts; records: readonly ValidationRecordSummary[] }) {
  const view = doc.view;
  const summaries = personaSummaries(view, facts.workMinutesPerHour);
  return (
    <main className={`briefing paper-${doc.paper.toLowerCase()}`}>
      <Cover doc={doc} facts={facts} />
      <Summary summaries={summaries} />
      <Modelled facts={facts} />
      {summaries.map((s) => (
        <PersonaResults key={s.persona.id} view={view} summary={s} day={representativeDay(view.days, facts.workMinutesPerHour.get(`${s.persona.id}:${view.baselineId}`))} />
      ))}
      <CohortSection doc={doc} view={view} />
      <Methods records={records} />
      <ClosingCautions />
    </main>
  );
}
