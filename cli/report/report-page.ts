// Where the built briefing page lives (dist/report/, built by `npm run build:report`, which the
// "prepare" script runs on `npm ci`) and how its files are served to Chromium: from memory of
// the build folder through request interception, never from the network.
import { existsSync, readFileSync } from 'node:fs';
import * as path from 'node:path';
import { fileURLToPath } from 'node:url';
import { CliError } from '../cli-error.js';

/** Origin the page is served under inside the browser; requests never leave the process. */
export const REPORT_ORIGIN = 'http://zeitlight-report.invalid';

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.woff2': 'font/woff2',
  '.ttf': 'font/ttf',
};

/** The package root: the nearest folder above this module with Zeitlight's package.json. */
export function packageRoot(from = path.dirname(fileURLToPath(import.meta.url))): string {
  let dir = from;
  for (;;) {
    const manifest = path.join(dir, 'package.json');
    if (existsSync(manifest)) {
      try {
        if ((JSON.parse(readFileSync(manifest, 'utf8')) as { name?: unknown }).name === 'zeitlight') return dir;
      } catch {
        // not ours; keep looking upward
      }
    }
    const parent = path.dirname(dir);
    if (parent === dir) throw new CliError('briefing: cannot find the Zeitlight installation folder (package.json named "zeitlight")');
    dir = parent;
  }
}

export function reportPageFolder(root = packageRoot()): string {
  const folder = path.join(root, 'dist', 'report');
  if (!existsSync(path.join(folder, 'index.html'))) {
    throw new CliError(`briefing: the report page is not built (missing ${path.join(folder, 'index.html')}); run "npm run build:report"`);
  }
  return folder;
}

/** The file a request URL names inside `folder`, or null when it is not ours or escapes it. */
export function reportAsset(folder: string, url: string): { file: string; contentType: string } | null {
  if (!url.startsWith(`${REPORT_ORIGIN}/`)) return null;
  let relative: string;
  try {
    relative = decodeURIComponent(new URL(url).pathname).replace(/^\/+/, '');
  } catch {
    return null;
  }
  if (relative === '') relative = 'index.html';
  const root = path.resolve(folder);
  const file = path.resolve(root, relative);
  if (!file.startsWith(root + path.sep)) return null;
  return { file, contentType: CONTENT_TYPES[path.extname(file).toLowerCase()] ?? 'application/octet-stream' };
}
