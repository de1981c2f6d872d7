// The JSON document a briefing is printed from. The desktop app and the command line both put
// it on the page as `window.__ZEITLIGHT_REPORT__` (or hand it to `window.__zeitlightRender`)
// before printing; the page reads nothing else.
import type { ResultsView } from '../../src/results/view-model.js';

export const BRIEFING_DOCUMENT_KIND = 'zeitlight-briefing';

export type PaperSize = 'A4' | 'Letter';

/** Ranges of one metric across the virtual occupants of a cohort run. */
export interface CohortMetricRange {
  readonly personaId: string;
  readonly strategyId: string;
  readonly label: string;
  readonly unit: string;
  readonly decimals: number;
  readonly p05: number | null;
  /** Quartiles (the interquartile band), when known. */
  readonly q25?: number | null;
  readonly median: number | null;
  readonly q75?: number | null;
  readonly p95: number | null;
}

export interface CohortSummary {
  readonly occupants: number;
  readonly seed: number | null;
  readonly ranges: readonly CohortMetricRange[];
}

export interface BriefingDocument {
  readonly kind: typeof BRIEFING_DOCUMENT_KIND;
  readonly paper: PaperSize;
  /** Local date the briefing was made, "YYYY-MM-DD" (fixed by the caller so reprints match). */
  readonly generatedOn: string;
  readonly zeitlightVersion: string;
  /** Client or site name as entered by the consultant; the site name is used when absent. */
  readonly client?: string;
  /** The scenario as in its file (validated again on the page; defaults filled there). */
  readonly scenario: unknown;
  /** Results of the run pipeline (results.json, "zeitlight-results"); preferred when present. */
  readonly results?: unknown;
  /** Results already in the renderer's view model (the app, layout checks). */
  readonly view?: ResultsView;
  readonly cohort?: CohortSummary;
  /** True when the results are a layout check, not a simulation (shown as a banner). */
  readonly synthetic?: boolean;
}

declare global {
  interface Window {
    __ZEITLIGHT_REPORT__?: unknown;
    __zeitlightRender?: (document: unknown) => void;
    /** Set by the page once a document is drawn: what the printer should use. */
    __zeitlightPrint?: PrintSettings;
  }
}

/** What the page tells the printer (Chromium header/footer templates and paper). */
export interface PrintSettings {
  readonly status: 'ready' | 'failed';
  readonly message: string;
  readonly paper: PaperSize;
  readonly headerTemplate: string;
  readonly footerTemplate: string;
  readonly margins_mm: { readonly top: number; readonly bottom: number; readonly left: number; readonly right: number };
  /** Document information the printer writes into the PDF (schedules/report/pdf-info.ts). */
  readonly info?: { readonly title: string; readonly subject: string; readonly creator: string; readonly producer: string };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Checks the shape of an injected document; returns a message naming the first bad field. */
export function checkBriefingDocument(value: unknown): { ok: true; document: BriefingDocument } | { ok: false; message: string } {
  if (!isRecord(value)) return { ok: false, message: 'briefing document: expected a JSON object' };
  if (value.kind !== BRIEFING_DOCUMENT_KIND) return { ok: false, message: `briefing document: field "kind" must be "${BRIEFING_DOCUMENT_KIND}"` };
  if (value.paper !== 'A4' && value.paper !== 'Letter') return { ok: false, message: 'briefing document: field "paper" must be "A4" or "Letter"' };
  if (typeof value.generatedOn !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(value.generatedOn)) return { ok: false, message: 'briefing document: field "generatedOn" must be a date "YYYY-MM-DD"' };
  if (typeof value.zeitlightVersion !== 'string') return { ok: false, message: 'briefing document: field "zeitlightVersion" must be text' };
  if (isRecord(value.results)) {
    if (value.results.format !== 'zeitlight-results' || !Array.isArray(value.results.personas)) return { ok: false, message: 'briefing document: field "results" must be a results document (format "zeitlight-results")' };
    return { ok: true, document: value as unknown as BriefingDocument };
  }
  const view = value.view;
  if (!isRecord(view)) return { ok: false, message: 'briefing document: needs "results" (results.json) or "view"' };
  for (const key of ['strategies', 'personas', 'runs'] as const) {
    if (!Array.isArray(view[key])) return { ok: false, message: `briefing document: field "view.${key}" must be a list` };
  }
  if (typeof view.baselineId !== 'string' || typeof view.days !== 'number' || typeof view.startDate !== 'string') return { ok: false, message: 'briefing document: fields "view.baselineId", "view.days" and "view.startDate" are required' };
  return { ok: true, document: value as unknown as BriefingDocument };
}
