// Blocks everything a scenario window should never do: navigate away from the app page,
// open new windows, attach webviews, ask for permissions or fetch remote content.
import type { Session, WebContents } from 'electron';

/** The parts of WebContents the guard uses (lets tests pass a small fake). */
export type GuardedContents = Pick<WebContents, 'on' | 'setWindowOpenHandler'>;
export type GuardedSession = {
  setPermissionRequestHandler: Session['setPermissionRequestHandler'];
  setPermissionCheckHandler: Session['setPermissionCheckHandler'];
  webRequest: Pick<Session['webRequest'], 'onBeforeRequest'>;
};

/** True when `target` is the app page itself (same file, query and hash ignored). */
export function isAppPage(target: string, appPageUrl: string): boolean {
  try {
    const a = new URL(target);
    const b = new URL(appPageUrl);
    return a.protocol === b.protocol && a.host === b.host && a.pathname === b.pathname;
  } catch {
    return false;
  }
}

/** URL schemes the renderer may load from: the app scheme, devtools and in-memory blobs/data. */
export function isLocalResource(url: string): boolean {
  return /^(zeitlight|devtools|blob|data):/i.test(url);
}

export function guardWebContents(contents: GuardedContents, appPageUrl: string, onBlocked: (what: string) => void = () => {}): void {
  contents.on('will-navigate', (event, url) => {
    if (!isAppPage(url, appPageUrl)) {
      event.preventDefault();
      onBlocked(`navigation to ${url}`);
    }
  });
  contents.on('will-redirect', (event, url) => {
    if (!isAppPage(url, appPageUrl)) {
      event.preventDefault();
      onBlocked(`redirect to ${url}`);
    }
  });
  contents.on('will-attach-webview', (event) => {
    event.preventDefault();
    onBlocked('webview');
  });
  contents.setWindowOpenHandler(({ url }) => {
    onBlocked(`new window for ${url}`);
    return { action: 'deny' };
  });
}

export function guardSession(session: GuardedSession, onBlocked: (what: string) => void = () => {}): void {
  session.setPermissionRequestHandler((_contents, permission, callback) => {
    onBlocked(`permission ${permission}`);
    callback(false);
  });
  session.setPermissionCheckHandler(() => false);
  session.webRequest.onBeforeRequest((details, callback) => {
    const allowed = isLocalResource(details.url);
    if (!allowed) onBlocked(`request to ${details.url}`);
    callback({ cancel: !allowed });
  });
}
