// The briefing document the workspace hands to the report page (desktop: main prints it with
// printToPDF; web mode: the report page opens with the browser's print dialog). Same document
// kind the command line prints (renderer/report/src/briefing-document.ts).
import type { BriefingRequest } from '../../../types/desktop-api.js';
import { APP_VERSION } from './app-version.js';
import type { ResultsView } from '../results/view-model.js';
import type { ScenarioInput } from '../scenario/scenario-types.js';
import type { CohortSummary } from '../../report/src/briefing-document.js';

/** Local date "YYYY-MM-DD" of `now`. */
export function localDate(now: Date): string {
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
}

export function briefingRequest(scenario: ScenarioInput, view: ResultsView, options: { now: Date; paper?: 'A4' | 'Letter'; cohort?: CohortSummary | null }): BriefingRequest {
  return {
    kind: 'zeitlight-briefing',
    paper: options.paper ?? 'A4',
    generatedOn: localDate(options.now),
    zeitlightVersion: APP_VERSION,
    // Plain JSON copies: what crosses the bridge is data only.
    scenario: JSON.parse(JSON.stringify(scenario)) as Record<string, unknown>,
    view: JSON.parse(JSON.stringify(view)) as Record<string, unknown>,
    ...(options.cohort === undefined || options.cohort === null ? {} : { cohort: JSON.parse(JSON.stringify(options.cohort)) as Record<string, unknown> }),
  };
}
