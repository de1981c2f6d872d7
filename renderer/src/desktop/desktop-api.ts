// The desktop API for this page: the preload's object in the Electron app, the browser
// adapter in web mode.
import type { DesktopApi } from '../../../types/desktop-api.js';
import { createBrowserAdapter } from './browser-adapter.js';

declare global {
  interface Window {
    readonly zeitlight?: DesktopApi;
  }
}

let api: DesktopApi | null = null;

export function desktopApi(): DesktopApi {
  api ??= window.zeitlight ?? createBrowserAdapter(window.location);
  return api;
}
