// The client briefing as PDF in the desktop app: the report page (renderer/report/, built into
// renderer/dist/report/ and served by the app's own scheme) is loaded in a hidden, sandboxed
// window, handed the briefing document, and printed with Electron's webContents.printToPDF using
// the header/footer templates the page provides — the same page and templates the command line
// prints through headless Chromium. Electron is injected (no runtime import), as elsewhere in main.
import type { WebContents } from 'electron';
import { APP_SCHEME, APP_HOST } from '../security/app-protocol.js';
import { setPdfInfo, type PdfInfo } from '../../schedules/report/pdf-info.js';

export const REPORT_PAGE_URL = `${APP_SCHEME}://${APP_HOST}/report/index.html`;

/** The members of a hidden BrowserWindow the export uses. */
export interface ReportWindow {
  readonly webContents: Pick<WebContents, 'executeJavaScript' | 'printToPDF'>;
  loadURL(url: string): Promise<void>;
  destroy(): void;
}

export type ExportProgress = (fraction: number, stage: string) => void;

interface PagePrintSettings {
  status: 'ready' | 'failed';
  message: string;
  paper: 'A4' | 'Letter';
  headerTemplate: string;
  footerTemplate: string;
  margins_mm: { top: number; bottom: number; left: number; right: number };
  info?: PdfInfo;
}

/** Options for the hidden window that draws the briefing (no preload: the page needs no bridge). */
export const REPORT_WINDOW_OPTIONS = {
  show: false,
  width: 900,
  height: 1200,
  webPreferences: { contextIsolation: true, nodeIntegration: false, nodeIntegrationInWorker: false, nodeIntegrationInSubFrames: false, sandbox: true, webSecurity: true, allowRunningInsecureContent: false, webviewTag: false, javascript: true, spellcheck: false },
} as const;

const MM_PER_INCH = 25.4;

function isSettings(value: unknown): value is PagePrintSettings {
  return typeof value === 'object' && value !== null && ((value as { status?: unknown }).status === 'ready' || (value as { status?: unknown }).status === 'failed');
}

async function waitForSettings(window: ReportWindow, timeout_ms: number, sleep: (ms: number) => Promise<void>): Promise<PagePrintSettings> {
  const started = Date.now();
  for (;;) {
    const value: unknown = await window.webContents.executeJavaScript('window.__zeitlightPrint ?? null', true);
    if (isSettings(value)) return value;
    if (Date.now() - started > timeout_ms) throw new Error('the report page did not finish drawing in time');
    await sleep(100);
  }
}

/**
 * Draws `briefingDocument` (the same JSON document the command line uses) on the report page in
 * `window` and returns the PDF bytes. The window is destroyed afterwards in every case.
 */
export async function printBriefingPdf(
  window: ReportWindow,
  briefingDocument: unknown,
  onProgress: ExportProgress = () => {},
  options: { pageUrl?: string; timeout_ms?: number; sleep?: (ms: number) => Promise<void> } = {},
): Promise<Uint8Array> {
  const sleep = options.sleep ?? ((ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms)));
  try {
    onProgress(0.05, 'Opening the report page');
    await window.loadURL(options.pageUrl ?? REPORT_PAGE_URL);
    onProgress(0.25, 'Drawing charts');
    // JSON text is a valid JavaScript expression; the page checks the document itself.
    await window.webContents.executeJavaScript(`window.__zeitlightRender(${JSON.stringify(briefingDocument)}); true`, true);
    const settings = await waitForSettings(window, options.timeout_ms ?? 60_000, sleep);
    if (settings.status !== 'ready') throw new Error(settings.message);
    onProgress(0.7, 'Printing to PDF');
    const inches = (mm: number) => mm / MM_PER_INCH;
    const pdf = await window.webContents.printToPDF({
      pageSize: settings.paper,
      printBackground: true,
      displayHeaderFooter: true,
      headerTemplate: settings.headerTemplate,
      footerTemplate: settings.footerTemplate,
      margins: { top: inches(settings.margins_mm.top), bottom: inches(settings.margins_mm.bottom), left: inches(settings.margins_mm.left), right: inches(settings.margins_mm.right) },
      generateTaggedPDF: true,
      generateDocumentOutline: true,
    });
    onProgress(1, 'Done');
    // printToPDF names the browser as the creator: the page's document information replaces it.
    return settings.info === undefined ? new Uint8Array(pdf) : setPdfInfo(new Uint8Array(pdf), settings.info);
  } finally {
    window.destroy();
  }
}
