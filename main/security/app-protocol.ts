// The app's own URL scheme. The renderer is served from zeitlight://app/ instead of file://,
// as the Electron security checklist recommends: the page gets a real, secure origin (so CSP
// 'self', module scripts and Web Workers behave as on the web), and only files inside the
// renderer build can be reached through it.
import * as path from 'node:path';
import type { Protocol } from 'electron';
import type { FileSystem } from '../files/file-system.js';
import { CONTENT_SECURITY_POLICY } from './content-security-policy.js';

export const APP_SCHEME = 'zeitlight';
export const APP_HOST = 'app';
export const APP_PAGE_URL = `${APP_SCHEME}://${APP_HOST}/index.html`;

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.woff2': 'font/woff2',
};

/** Privileges of the scheme; must be registered before the app is ready. */
export const APP_SCHEME_PRIVILEGES = { standard: true, secure: true, supportFetchAPI: true, codeCache: true } as const;

/**
 * The file inside `rendererDist` a request URL names, or null when the URL is not ours or
 * points outside the build (after percent-decoding, so "..%2f" cannot escape).
 */
export function resolveAppAsset(rendererDist: string, requestUrl: string): string | null {
  let url: URL;
  try {
    url = new URL(requestUrl);
  } catch {
    return null;
  }
  if (url.protocol !== `${APP_SCHEME}:` || url.host !== APP_HOST) return null;
  let relative: string;
  try {
    relative = decodeURIComponent(url.pathname).replace(/^\/+/, '');
  } catch {
    return null;
  }
  if (relative === '') relative = 'index.html';
  const root = path.resolve(rendererDist);
  const file = path.resolve(root, relative);
  return file.startsWith(root + path.sep) ? file : null;
}

export function contentTypeOf(file: string): string {
  return CONTENT_TYPES[path.extname(file).toLowerCase()] ?? 'application/octet-stream';
}

/** Answers one request of the app scheme from the renderer build. */
export async function appSchemeResponse(fs: FileSystem, rendererDist: string, requestUrl: string): Promise<Response> {
  const file = resolveAppAsset(rendererDist, requestUrl);
  if (file === null) return new Response('not found', { status: 404 });
  try {
    const body = await fs.readBinary(file);
    return new Response(body, {
      status: 200,
      headers: { 'Content-Type': contentTypeOf(file), 'Content-Security-Policy': CONTENT_SECURITY_POLICY, 'X-Content-Type-Options': 'nosniff' },
    });
  } catch {
    return new Response('not found', { status: 404 });
  }
}

export function handleAppScheme(protocol: Pick<Protocol, 'handle'>, fs: FileSystem, rendererDist: string): void {
  protocol.handle(APP_SCHEME, (request) => appSchemeResponse(fs, rendererDist, request.url));
}
