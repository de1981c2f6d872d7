// Report page entry. Draws the briefing from the document on the page
// (window.__ZEITLIGHT_REPORT__), or from one handed to window.__zeitlightRender later, then
// tells the printer it is ready through window.__zeitlightPrint.
import { flushSync } from 'react-dom';
import { createRoot, type Root } from 'react-dom/client';
import { checkBriefingDocument } from './briefing-document.js';
import { scenarioFacts } from './scenario-facts.js';
import { plainValidationPage, validationRecords } from './validation-records.js';
import { printSettings } from './print-settings.js';
import { BriefingReport } from './BriefingReport.js';
import { reportData } from './report-data.js';
import './print.css';

let root: Root | null = null;

function fail(message: string): void {
  const container = document.getElementById('root');
  if (container !== null) container.textContent = message;
  window.__zeitlightPrint = { status: 'failed', message, paper: 'A4', headerTemplate: '', footerTemplate: '', margins_mm: { top: 0, bottom: 0, left: 0, right: 0 } };
}

function render(input: unknown): void {
  const checked = checkBriefingDocument(input);
  if (!checked.ok) return fail(checked.message);
  const facts = scenarioFacts(checked.document.scenario);
  if (!facts.ok) return fail(facts.message);
  const container = document.getElementById('root');
  if (container === null) return fail('report page: no #root element');
  document.title = `${facts.facts.name} — lighting and body-clock briefing`;
  document.documentElement.dataset.paper = checked.document.paper;
  root ??= createRoot(container);
  try {
    const data = reportData(checked.document, facts.facts);
    if ('error' in data) return fail(data.error);
    flushSync(() => root?.render(<BriefingReport data={data} records={validationRecords()} checked={plainValidationPage()} />));
  } catch (error) {
    return fail(`report page: ${error instanceof Error ? error.message : String(error)}`);
  }
  void document.fonts.ready.then(() => {
    window.__zeitlightPrint = printSettings(facts.facts.name, checked.document.paper, checked.document.generatedOn, checked.document.zeitlightVersion);
  });
}

window.__zeitlightRender = render;
if (window.__ZEITLIGHT_REPORT__ !== undefined) render(window.__ZEITLIGHT_REPORT__);
