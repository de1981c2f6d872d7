// Factory of the hidden window the briefing is printed in: the report window options
// (briefing-pdf.ts), checked against the app's required security settings before creation,
// and the same navigation guard as the scenario windows (only the report page may load, no new
// windows, no webviews). The BrowserWindow constructor is injected.
import type { BrowserWindowConstructorOptions } from 'electron';
import { REPORT_PAGE_URL, REPORT_WINDOW_OPTIONS, type ReportWindow } from './briefing-pdf.js';
import { securityViolations } from '../security/web-preferences.js';
import { guardWebContents, type GuardedContents } from '../security/navigation-guard.js';

export interface ReportWindowLike extends ReportWindow {
  readonly webContents: ReportWindow['webContents'] & GuardedContents;
}

export function openReportWindow(create: (options: BrowserWindowConstructorOptions) => ReportWindowLike, onBlocked: (what: string) => void = () => {}): ReportWindow {
  // The report page needs no bridge, so the one permitted difference is the missing preload.
  const problems = securityViolations(REPORT_WINDOW_OPTIONS.webPreferences).filter((p) => !p.startsWith('preload'));
  if (problems.length > 0) throw new Error(`refusing an insecure report window: ${problems.join('; ')}`);
  const window = create({ ...REPORT_WINDOW_OPTIONS, webPreferences: { ...REPORT_WINDOW_OPTIONS.webPreferences } });
  guardWebContents(window.webContents, REPORT_PAGE_URL, onBlocked);
  return window;
}
