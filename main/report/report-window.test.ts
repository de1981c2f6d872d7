import { describe, expect, it } from 'vitest';
import type { BrowserWindowConstructorOptions } from 'electron';
import { openReportWindow, type ReportWindowLike } from './report-window.js';
import { REPORT_PAGE_URL } from './briefing-pdf.js';
import { REQUIRED_SECURITY_SETTINGS } from '../security/web-preferences.js';

function fakeCreate() {
  const made: { options: BrowserWindowConstructorOptions; listeners: Map<string, (event: { preventDefault(): void }, url: string) => void>; openHandler: ((d: { url: string }) => { action: string }) | null }[] = [];
  const create = (options: BrowserWindowConstructorOptions): ReportWindowLike => {
    const entry = { options, listeners: new Map<string, (event: { preventDefault(): void }, url: string) => void>(), openHandler: null as ((d: { url: string }) => { action: string }) | null };
    made.push(entry);
    return {
      loadURL: async () => {},
      destroy: () => {},
      webContents: {
        on: (event: string, listener: (event: { preventDefault(): void }, url: string) => void) => entry.listeners.set(event, listener),
        setWindowOpenHandler: (h: (d: { url: string }) => { action: string }) => (entry.openHandler = h),
        executeJavaScript: async () => null,
        printToPDF: async () => Buffer.from(''),
      } as unknown as ReportWindowLike['webContents'],
    };
  };
  return { create, made };
}

describe('hidden briefing window', () => {
  it('is created hidden with every required security setting of the app windows (Electron security checklist)', () => {
    const { create, made } = fakeCreate();
    openReportWindow(create);
    expect(made).toHaveLength(1);
    expect(made[0]?.options.show).toBe(false);
    expect(made[0]?.options.webPreferences).toMatchObject(REQUIRED_SECURITY_SETTINGS);
    expect(made[0]?.options.webPreferences?.preload).toBeUndefined();
  });

  it('blocks navigation away from the report page and every new window', () => {
    const { create, made } = fakeCreate();
    const blocked: string[] = [];
    openReportWindow(create, (w) => blocked.push(w));
    const w = made[0]!;
    let prevented = 0;
    w.listeners.get('will-navigate')?.({ preventDefault: () => (prevented += 1) }, 'https://example.com/');
    w.listeners.get('will-navigate')?.({ preventDefault: () => (prevented += 1) }, `${REPORT_PAGE_URL}#page-2`);
    expect(prevented).toBe(1);
    expect(w.openHandler?.({ url: 'https://example.com/' })).toEqual({ action: 'deny' });
    expect(blocked).toEqual(['navigation to https://example.com/', 'new window for https://example.com/']);
  });
});
