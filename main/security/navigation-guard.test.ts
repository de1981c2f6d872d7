import { describe, expect, it } from 'vitest';
import { guardSession, guardWebContents, isAppPage, type GuardedContents, type GuardedSession } from './navigation-guard.js';

const APP = 'zeitlight://app/index.html';

function fakeContents() {
  const listeners = new Map<string, (event: { preventDefault(): void }, url?: string) => void>();
  let openHandler: ((d: { url: string }) => { action: string }) | null = null;
  const contents = {
    on: (name: string, l: (event: { preventDefault(): void }, url?: string) => void) => void listeners.set(name, l),
    setWindowOpenHandler: (h: (d: { url: string }) => { action: string }) => void (openHandler = h),
  } as unknown as GuardedContents;
  const fire = (name: string, url?: string) => {
    let prevented = false;
    listeners.get(name)?.({ preventDefault: () => (prevented = true) }, url);
    return prevented;
  };
  return { contents, fire, open: (url: string) => openHandler?.({ url }) };
}

describe('navigation blocking', () => {
  it('recognises the app page regardless of query or hash', () => {
    expect(isAppPage(`${APP}?open=demo#compare`, APP)).toBe(true);
    expect(isAppPage('file:///etc/passwd', APP)).toBe(false);
    expect(isAppPage('zeitlight://other/index.html', APP)).toBe(false);
    expect(isAppPage('not a url', APP)).toBe(false);
  });

  it('prevents navigation and redirects away from the app page, allows reloads of it', () => {
    const { contents, fire } = fakeContents();
    const blocked: string[] = [];
    guardWebContents(contents, APP, (w) => blocked.push(w));
    expect(fire('will-navigate', 'https://example.com/')).toBe(true);
    expect(fire('will-navigate', 'file:///home/user/other.html')).toBe(true);
    expect(fire('will-navigate', 'zeitlight://app/other.html')).toBe(true);
    expect(fire('will-redirect', 'http://127.0.0.1:1/')).toBe(true);
    expect(fire('will-navigate', `${APP}?open=demo`)).toBe(false);
    expect(blocked).toHaveLength(4);
  });

  it('denies every new window and every webview', () => {
    const { contents, fire, open } = fakeContents();
    guardWebContents(contents, APP);
    expect(open('https://example.com/')).toEqual({ action: 'deny' });
    expect(open(APP)).toEqual({ action: 'deny' });
    expect(fire('will-attach-webview')).toBe(true);
  });

  it('denies permission requests and cancels remote requests while letting local files load', () => {
    const hooks: Record<string, (...a: unknown[]) => unknown> = {};
    const session = {
      setPermissionRequestHandler: (h: (...a: unknown[]) => unknown) => void (hooks.permission = h),
      setPermissionCheckHandler: (h: (...a: unknown[]) => unknown) => void (hooks.check = h),
      webRequest: { onBeforeRequest: (h: (...a: unknown[]) => unknown) => void (hooks.request = h) },
    } as unknown as GuardedSession;
    guardSession(session);
    let granted: boolean | null = null;
    hooks.permission!(null, 'geolocation', (g: boolean) => (granted = g));
    expect(granted).toBe(false);
    expect(hooks.check!()).toBe(false);
    const decide = (url: string) => {
      let cancel: boolean | null = null;
      hooks.request!({ url }, (r: { cancel: boolean }) => (cancel = r.cancel));
      return cancel;
    };
    expect(decide('https://fonts.example.com/a.woff2')).toBe(true);
    expect(decide('http://127.0.0.1:8080/')).toBe(true);
    expect(decide('wss://example.com/')).toBe(true);
    expect(decide(`${APP}`)).toBe(false);
    expect(decide('blob:zeitlight://app/abc')).toBe(false);
    expect(decide('zeitlight://app/assets/index.js')).toBe(false);
    expect(decide('file:///etc/passwd')).toBe(true);
  });
});
