import { describe, expect, it } from 'vitest';
import { printBriefingPdf, REPORT_PAGE_URL, REPORT_WINDOW_OPTIONS, type ReportWindow } from './briefing-pdf.js';
import { securityViolations } from '../security/web-preferences.js';

function fakeWindow(settingsAfterPolls: number, settings: unknown) {
  const calls: string[] = [];
  let polls = 0;
  let printOptions: unknown = null;
  let destroyed = false;
  const window: ReportWindow = {
    loadURL: async (url) => {
      calls.push(`load ${url}`);
    },
    destroy: () => {
      destroyed = true;
    },
    webContents: {
      executeJavaScript: async (code: string) => {
        if (code.startsWith('window.__zeitlightRender(')) {
          calls.push('render');
          return true;
        }
        polls += 1;
        return polls > settingsAfterPolls ? settings : null;
      },
      printToPDF: async (options) => {
        printOptions = options;
        return Buffer.from('%PDF-1.7 test');
      },
    } as ReportWindow['webContents'],
  };
  return { window, calls, printOptions: () => printOptions as Record<string, unknown>, destroyed: () => destroyed };
}

const READY = { status: 'ready', message: '', paper: 'Letter', headerTemplate: '<div>h</div>', footerTemplate: '<div>f</div>', margins_mm: { top: 25.4, bottom: 12.7, left: 16, right: 16 } };

describe('briefing PDF in the desktop app', () => {
  it('draws in a hidden window with the app’s required security settings and no preload (Electron security checklist)', () => {
    expect(REPORT_WINDOW_OPTIONS.show).toBe(false);
    // every required setting holds; the one difference: no preload, as the page needs no bridge
    expect(securityViolations(REPORT_WINDOW_OPTIONS.webPreferences)).toEqual(['preload must be set']);
  });

  it('loads the report page, hands it the document, waits for the drawing and prints with its header, footer and paper', async () => {
    const fake = fakeWindow(2, READY);
    const stages: number[] = [];
    const pdf = await printBriefingPdf(fake.window, { kind: 'zeitlight-briefing' }, (f) => stages.push(f), { sleep: async () => {} });
    expect(Buffer.from(pdf).toString('latin1').startsWith('%PDF')).toBe(true);
    expect(fake.calls).toEqual([`load ${REPORT_PAGE_URL}`, 'render']);
    const o = fake.printOptions();
    expect(o.pageSize).toBe('Letter');
    expect(o.displayHeaderFooter).toBe(true);
    expect(o.headerTemplate).toBe('<div>h</div>');
    // Electron's printToPDF margins are in inches (25.4 mm per inch, by definition of the inch)
    expect(o.margins).toEqual({ top: 1, bottom: 0.5, left: 16 / 25.4, right: 16 / 25.4 });
    expect(stages[stages.length - 1]).toBe(1);
    expect(stages).toEqual([...stages].sort((a, b) => a - b));
    expect(fake.destroyed()).toBe(true);
  });

  it('reports the page’s own message when the document cannot be drawn, and closes the window', async () => {
    const fake = fakeWindow(0, { ...READY, status: 'failed', message: 'briefing document: field "paper" must be "A4" or "Letter"' });
    await expect(printBriefingPdf(fake.window, {}, undefined, { sleep: async () => {} })).rejects.toThrow(/field "paper"/);
    expect(fake.destroyed()).toBe(true);
  });

  it('gives up with a clear message when the page never finishes', async () => {
    const fake = fakeWindow(Number.POSITIVE_INFINITY, READY);
    await expect(printBriefingPdf(fake.window, {}, undefined, { timeout_ms: 0, sleep: async () => {} })).rejects.toThrow(/did not finish drawing/);
    expect(fake.destroyed()).toBe(true);
  });
});
