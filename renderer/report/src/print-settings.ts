// Header and footer for Chromium's PDF printer (Electron printToPDF and headless Chromium use the
// same templates): scenario name at the top, "page N of M" at the bottom. Chromium fills the
// elements with classes pageNumber / totalPages; templates carry their own styles.
import type { PaperSize, PrintSettings } from './briefing-document.js';

export function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

const TEMPLATE_STYLE = "font-family:'DejaVu Sans',sans-serif;font-size:7.5pt;color:#6b7685;width:100%;margin:0 16mm;display:flex;justify-content:space-between;";

/** The PDF's document information: title and subject name the scenario, the product is the creator. */
export function documentInfo(scenarioName: string, zeitlightVersion: string): NonNullable<PrintSettings['info']> {
  return { title: `${scenarioName} — lighting and body-clock briefing`, subject: scenarioName, creator: `Zeitlight ${zeitlightVersion}`, producer: `Zeitlight ${zeitlightVersion} (printed with Chromium)` };
}

export function printSettings(scenarioName: string, paper: PaperSize, generatedOn: string, zeitlightVersion = ''): PrintSettings {
  return {
    info: documentInfo(scenarioName, zeitlightVersion),
    status: 'ready',
    message: '',
    paper,
    headerTemplate: `<div style="${TEMPLATE_STYLE}border-bottom:0.5pt solid #dfe3e8;padding-bottom:2mm;"><span style="overflow:hidden;text-overflow:ellipsis;white-space:nowrap;max-width:75%;">${escapeHtml(scenarioName)}</span><span>Zeitlight briefing</span></div>`,
    footerTemplate: `<div style="${TEMPLATE_STYLE}"><span>${escapeHtml(generatedOn)} · Model estimates, not diagnosis or treatment</span><span>Page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`,
    margins_mm: { top: 18, bottom: 16, left: 16, right: 16 },
  };
}
