// The desktop API in a plain browser (web mode): files are picked with a file input and
// written by downloading; the PDF briefing uses the browser's print dialog; the URL query
// `?open=demo` opens the built-in demo scenario.
import type { DesktopApi, InitialDocument, OpenOutcome, WriteOutcome } from '../../../types/desktop-api.js';

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
    exportPdf: async (request): Promise<WriteOutcome> => {
      window.print();
      return { status: 'written', path: request.suggestedName, displayName: request.suggestedName };
    },
    onMenuCommand: () => () => undefined,
  };
}
