// The one set of BrowserWindow web preferences every Zeitlight window uses, following the
// Electron security checklist (electronjs.org/docs/latest/tutorial/security): isolated,
// sandboxed renderer without Node, no webviews, no insecure content.
import type { WebPreferences } from 'electron';

/** The preferences that must hold for a window to count as secure (checked by tests and at startup). */
export const REQUIRED_SECURITY_SETTINGS = {
  contextIsolation: true,
  nodeIntegration: false,
  nodeIntegrationInWorker: false,
  nodeIntegrationInSubFrames: false,
  sandbox: true,
  webSecurity: true,
  allowRunningInsecureContent: false,
  webviewTag: false,
} as const satisfies WebPreferences;

export function secureWebPreferences(preloadPath: string): WebPreferences {
  return {
    preload: preloadPath,
    ...REQUIRED_SECURITY_SETTINGS,
    experimentalFeatures: false,
    navigateOnDragDrop: false,
    safeDialogs: true,
    spellcheck: false,
  };
}

/** Lists every required setting the given preferences violate (empty when secure). */
export function securityViolations(prefs: WebPreferences | undefined): string[] {
  const found: string[] = [];
  for (const [key, wanted] of Object.entries(REQUIRED_SECURITY_SETTINGS)) {
    const actual = prefs?.[key as keyof WebPreferences];
    if (actual !== wanted) found.push(`${key} must be ${String(wanted)} (is ${String(actual)})`);
  }
  if (typeof prefs?.preload !== 'string' || prefs.preload.length === 0) found.push('preload must be set');
  return found;
}
