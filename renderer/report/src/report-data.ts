// Everything the briefing draws, gathered from a checked document: the results view, the summary
// per persona, facts of the scenario, nightly suppression, the models of the run with their
// citations, what the run rests on (weather, measured light) and the comparison of people who work
// in one room at different desks.
import type { BriefingDocument } from './briefing-document.js';
import type { ResultsView } from '../../src/results/view-model.js';
import { RESULTS_CAUTIONS } from '../../src/results/cautions.js';
import type { RunResults } from '../../../schedules/run/results-types.js';
import type { RunBasis } from '../../../schedules/run/run-basis.js';
import type { ScenarioInput } from '../../../schedules/schema/scenario-types.js';
import { seatComparisons } from '../../../schedules/words/seat-comparison.js';
import { personaSummaries, type PersonaSummary } from './headlines.js';
import { isRunResults, nightlySuppression, summariesFromResults, viewFromResults } from './results-view.js';
import type { ScenarioFacts } from './scenario-facts.js';
import { reportViewWithEnsemble } from './ensemble-report.js';
import { reportModels, type ReportModel } from './report-models.js';

export interface ReportData {
  readonly doc: BriefingDocument;
  readonly facts: ScenarioFacts;
  readonly view: ResultsView;
  readonly summaries: readonly PersonaSummary[];
  /** Suppression per night keyed "persona:strategy", when the results give nights but no curves. */
  readonly nightly: ReadonlyMap<string, readonly { day: number; pct: number | null }[]> | null;
  /** The results document when the briefing is printed from one. */
  readonly results: RunResults | null;
  /** The models named in the briefing, with their citations. */
  readonly models: readonly ReportModel[];
  /** What the run rests on (results written before it existed have none). */
  readonly basis: RunBasis | undefined;
  /** For people who work in one room at different desks: the comparison sentence, by the id of the person at the desk farther from the windows. */
  readonly seatNotes: ReadonlyMap<string, string>;
  readonly warnings: readonly string[];
}

function seatNotesOf(scenario: unknown, results: RunResults): Map<string, string> {
  const out = new Map<string, string>();
  // said once, under the recommendation for the desk farther from the windows
  for (const c of seatComparisons(scenario as ScenarioInput, results)) {
    const far = c.personaIds[c.personaIds.length - 1];
    if (far !== undefined) out.set(far, c.sentence);
  }
  return out;
}

export function reportData(doc: BriefingDocument, facts: ScenarioFacts): ReportData | { error: string } {
  if (isRunResults(doc.results)) {
    const results = doc.results;
    return {
      doc,
      facts,
      view: reportViewWithEnsemble(results, viewFromResults(results, RESULTS_CAUTIONS)),
      summaries: summariesFromResults(results),
      nightly: nightlySuppression(results),
      results,
      models: reportModels(results),
      basis: results.basis,
      seatNotes: seatNotesOf(doc.scenario, results),
      warnings: results.warnings,
    };
  }
  if (doc.view === undefined) return { error: 'briefing document: no results' };
  return { doc, facts, view: doc.view, summaries: personaSummaries(doc.view, facts.workMinutesPerHour), nightly: null, results: null, models: reportModels(null), basis: undefined, seatNotes: new Map(), warnings: [] };
}
