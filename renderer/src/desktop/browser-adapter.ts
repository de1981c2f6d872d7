// The desktop API in a plain browser (web mode): files are picked with a file input and
// written by downloading; the briefing opens on the built report page in a new tab with the
// browser's print dialog (save as PDF there), or, when pop-ups are blocked, is downloaded as
// its JSON document; the URL query `?open=demo` opens the built-in demo scenario.
import type { BriefingRequest, DesktopApi, ExportProgress, InitialDocument, OpenOutcome, WriteOutcome } from '../../../types/desktop-api.js';

/** What the report page offers its opener (renderer/report/src/main.tsx). */
interface ReportPageWindow {
  __zeitlightRender?: (document: unknown) => void;
  __zeitlightPrint?: { status: 'ready' | 'failed'; message: string };
  print(): void;
  setTimeout(callback: () => void, ms: number): number;
}

const REPORT_PAGE_TIMEOUT_MS = 60_000;

function waitFor<T>(read: () => T | undefined, timeout_ms: number): Promise<T | undefined> {
  const started = Date.now();
  return new Promise((resolve) => {
    const tick = () => {
      let value: T | undefined;
      try {
        value = read();
      } catch {
        value = undefined;
      }
      if (value !== undefined) resolve(value);
      else if (Date.now() - started > timeout_ms) resolve(undefined);
      else setTimeout(tick, 100);
    };
    tick();
  });
}

/** Opens the report page in a new tab, draws the briefing there and opens its print dialog. */
async function printOnReportPage(briefing: BriefingRequest, suggestedName: string, progress: (p: ExportProgress) => void): Promise<WriteOutcome> {
  progress({ fraction: 0.05, stage: 'Opening the report page' });
  const popup = window.open(new URL('report/index.html', document.baseURI).href, '_blank') as unknown as ReportPageWindow | null;
  if (popup === null) {
    const name = suggestedName.replace(/\.pdf$/i, '.briefing.json');
    download(name, `${JSON.stringify(briefing, null, 2)}\n`, 'application/json');
    return { status: 'written', path: name, displayName: `${name} (pop-ups are blocked: the briefing document was downloaded; print it with "zeitlight" or allow pop-ups)` };
  }
  const render = await waitFor(() => popup.__zeitlightRender, REPORT_PAGE_TIMEOUT_MS);
  if (render === undefined) return { status: 'failed', message: 'Briefing: the report page did not load in time.' };
  progress({ fraction: 0.35, stage: 'Drawing charts' });
  render(briefing);
  const settings = await waitFor(() => popup.__zeitlightPrint, REPORT_PAGE_TIMEOUT_MS);
  if (settings === undefined) return { status: 'failed', message: 'Briefing: the report page did not finish drawing in time.' };
  if (settings.status !== 'ready') return { status: 'failed', message: `Briefing: ${settings.message}` };
  progress({ fraction: 0.9, stage: 'Opening the print dialog' });
  popup.setTimeout(() => popup.print(), 50);
  progress({ fraction: 1, stage: 'Done' });
  return { status: 'written', path: suggestedName, displayName: 'the briefing (print dialog in the new tab)' };
}

function download(fileName: string, text: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

function pickFile(): Promise<File | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = '.zeitlight,.json,application/json';
    input.style.display = 'none';
    input.addEventListener('change', () => {
      resolve(input.files?.[0] ?? null);
      input.remove();
    });
    input.addEventListener('cancel', () => {
      resolve(null);
      input.remove();
    });
    document.body.appendChild(input);
    input.click();
  });
}

export function initialDocumentFromQuery(search: string): InitialDocument {
  return new URLSearchParams(search).get('open') === 'demo' ? { kind: 'demo' } : { kind: 'empty' };
}

export function createBrowserAdapter(location: { search: string }): DesktopApi {
  let currentName = 'Untitled.zeitlight';
  const progressListeners = new Set<(p: ExportProgress) => void>();
  const progress = (p: ExportProgress) => {
    for (const l of progressListeners) l(p);
  };
  return {
    platform: 'web',
    initialDocument: async () => initialDocumentFromQuery(location.search),
    open: async (): Promise<OpenOutcome> => {
      const file = await pickFile();
      if (file === null) return { status: 'cancelled' };
      try {
        const text = await file.text();
        currentName = file.name;
        return { status: 'opened-here', document: { path: null, displayName: file.name, text } };
      } catch (error) {
        return { status: 'failed', message: `${file.name}: ${error instanceof Error ? error.message : String(error)}` };
      }
    },
    save: async (request): Promise<WriteOutcome> => {
      let name = currentName;
      if (request.mode === 'save-as') {
        const answer = window.prompt('Save scenario as', currentName);
        if (answer === null || answer.trim() === '') return { status: 'cancelled' };
        name = /\.(zeitlight|json)$/i.test(answer.trim()) ? answer.trim() : `${answer.trim()}.zeitlight`;
      }
      currentName = name;
      download(name, request.text, 'application/json');
      return { status: 'written', path: name, displayName: name };
    },
    reportEdit: async () => undefined,
    exportCsv: async (request): Promise<WriteOutcome> => {
      download(request.suggestedName, request.csvText, 'text/csv');
      return { status: 'written', path: request.suggestedName, displayName: request.suggestedName };
    },
    exportPdf: (request) => printOnReportPage(request.briefing, request.suggestedName, progress),
    onExportProgress: (listener) => {
      progressListeners.add(listener);
      return () => progressListeners.delete(listener);
    },
    onMenuCommand: () => () => undefined,
  };
}
