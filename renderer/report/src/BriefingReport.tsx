// The whole briefing for one document, in the order a client reads it: cover; summary and
// recommendation; what was modelled (and what the results rest on); results per person; ranges
// across models and people; methods and assumptions; how the numbers were checked; cautions.
import type { PlainValidation, ValidationRecordSummary } from './validation-summary.js';
import type { ReportData } from './report-data.js';
import { representativeDay } from './report-day.js';
import { findRun } from '../../src/results/view-model.js';
import { Checked, ClosingCautions, Cover, Methods, Modelled, RangesSection, Summary } from './components/sections.js';
import { PersonaResults } from './components/PersonaResults.js';

export function BriefingReport({ data, records, checked }: { data: ReportData; records: readonly ValidationRecordSummary[]; checked: PlainValidation }) {
  const { doc, facts, view, summaries } = data;
  const site = data.results === null ? null : { latitude_deg: data.results.scenario.latitude_deg, longitude_deg: data.results.scenario.longitude_deg };
  return (
    <main className={`briefing paper-${doc.paper.toLowerCase()}`}>
      <Cover doc={doc} facts={facts} />
      <Summary summaries={summaries} warnings={data.warnings} basis={data.basis} seatNotes={data.seatNotes} />
      <Modelled facts={facts} basis={data.basis} site={site} />
      {summaries.map((s) => {
        const base = findRun(view, s.persona.id, view.baselineId);
        const rec = s.recommended === null ? undefined : findRun(view, s.persona.id, s.recommended.strategy.id);
        const day = representativeDay(view.days, facts.workMinutesPerHour.get(`${s.persona.id}:${view.baselineId}`), base?.light, rec === base ? undefined : rec?.light);
        return <PersonaResults key={s.persona.id} view={view} summary={s} nightly={data.nightly} day={day} />;
      })}
      <RangesSection doc={doc} view={view} />
      <Methods models={data.models} rule={summaries[0]?.rule ?? ''} />
      <Checked page={checked} records={records} />
      <ClosingCautions />
    </main>
  );
}
