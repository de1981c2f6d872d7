// End-to-end harness: Debian's Chromium driven by playwright-core, headless, with a fresh
// profile and no network services; the renderer built and served by scripts/web-server.mjs.
import { mkdtemp, mkdir, rm } from 'node:fs/promises';
import { existsSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const CHROMIUM_PATH = process.env.ZEITLIGHT_CHROMIUM ?? '/usr/bin/chromium';
export const ARTIFACTS = path.resolve(import.meta.dirname, '..', 'artifacts');

export function chromiumAvailable(): boolean {
  return existsSync(CHROMIUM_PATH);
}

interface WebServer {
  url: string;
  close(): Promise<void>;
}

// The server module is plain JavaScript; its shape is declared here.
interface WebServerModule {
  buildRenderer(outDir?: string): Promise<void>;
  serveRenderer(options?: { port?: number; root?: string }): Promise<WebServer>;
}

export interface Session {
  readonly url: string;
  readonly context: BrowserContext;
  readonly page: Page;
  readonly consoleErrors: string[];
  close(): Promise<void>;
}

let built: Promise<{ server: WebServerModule; root: string }> | null = null;

/**
 * Builds the renderer once per test file into a private folder (so parallel test files and a
 * running `npm run web` never share a build), then reuses it.
 */
function builtRenderer(): Promise<{ server: WebServerModule; root: string }> {
  built ??= (async () => {
    const server = (await import(path.resolve(import.meta.dirname, '..', '..', 'scripts', 'web-server.mjs'))) as WebServerModule;
    const root = await mkdtemp(path.join(tmpdir(), 'zeitlight-renderer-'));
    process.once('exit', () => rmSync(root, { recursive: true, force: true }));
    await server.buildRenderer(root);
    return { server, root };
  })();
  return built;
}

export async function startSession(): Promise<Session> {
  const { server, root } = await builtRenderer();
  const web = await server.serveRenderer({ port: 0, root });
  const profile = await mkdtemp(path.join(tmpdir(), 'zeitlight-chromium-'));
  await mkdir(ARTIFACTS, { recursive: true });
  // A fresh profile directory per session (playwright passes it as --user-data-dir).
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    viewport: { width: 1440, height: 900 },
    acceptDownloads: true,
    deviceScaleFactor: 1,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const consoleErrors: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') consoleErrors.push(m.text());
  });
  page.on('pageerror', (e) => consoleErrors.push(e.message));
  return {
    url: web.url,
    context,
    page,
    consoleErrors,
    close: async () => {
      await context.close();
      await web.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<string> {
  const file = path.join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: false });
  return file;
}
