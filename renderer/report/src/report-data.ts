// Everything the briefing draws, gathered from a checked document: the results view, the summary
// per persona, facts of the scenario, nightly suppression and the models of the run (with the
// ranges across the model ensemble when the results carry them).
import type { BriefingDocument } from './briefing-document.js';
import type { ResultsView } from '../../src/results/view-model.js';
import { RESULTS_CAUTIONS } from '../../src/results/cautions.js';
import { personaSummaries, type PersonaSummary } from './headlines.js';
import { isRunResults, nightlySuppression, summariesFromResults, viewFromResults } from './results-view.js';
import type { ScenarioFacts } from './scenario-facts.js';
import { reportViewWithEnsemble } from './ensemble-report.js';

export interface ReportData {
  readonly doc: BriefingDocument;
  readonly facts: ScenarioFacts;
  readonly view: ResultsView;
  readonly summaries: readonly PersonaSummary[];
  /** Suppression per night keyed "persona:strategy", when the results give nights but no curves. */
  readonly nightly: ReadonlyMap<string, readonly { day: number; pct: number | null }[]> | null;
  /** Models named by the run, e.g. { pacemaker: "jfk99-x7" }. */
  readonly runModels: Readonly<Record<string, string>> | null;
  readonly warnings: readonly string[];
}

export function reportData(doc: BriefingDocument, facts: ScenarioFacts): ReportData | { error: string } {
  if (isRunResults(doc.results)) {
    const results = doc.results;
    return { doc, facts, view: reportViewWithEnsemble(results, viewFromResults(results, RESULTS_CAUTIONS)), summaries: summariesFromResults(results), nightly: nightlySuppression(results), runModels: { ...results.models }, warnings: results.warnings };
  }
  if (doc.view === undefined) return { error: 'briefing document: no results' };
  return { doc, facts, view: doc.view, summaries: personaSummaries(doc.view, facts.workMinutesPerHour), nightly: null, runModels: null, warnings: [] };
}
