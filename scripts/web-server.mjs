// Web mode: builds the renderer and serves it on 127.0.0.1 (port from PORT, else a free one),
// with the same Content-Security-Policy as the desktop app. Prints the URL.
//   npm run web            build, then serve
//   node scripts/web-server.mjs --no-build   serve an existing renderer/dist
import { createServer } from 'node:http';
import { readFile, stat } from 'node:fs/promises';
import { fileURLToPath, pathToFileURL, URL } from 'node:url';
import * as path from 'node:path';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const RENDERER_DIST = path.join(repoRoot, 'renderer', 'dist');

const TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.woff2': 'font/woff2',
  '.map': 'application/json; charset=utf-8',
};

/** Reads the policy from the built page's meta tag so server and desktop app cannot differ. */
async function contentSecurityPolicy(root) {
  const html = await readFile(path.join(root, 'index.html'), 'utf8');
  const match = /http-equiv="Content-Security-Policy" content="([^"]+)"/.exec(html);
  if (match === null) throw new Error(`${root}/index.html has no Content-Security-Policy meta tag`);
  return `${match[1]}; frame-ancestors 'none'`;
}

/** Builds the renderer into `outDir` (default renderer/dist). */
export async function buildRenderer(outDir = RENDERER_DIST) {
  const { build } = await import('vite');
  await build({ configFile: path.join(repoRoot, 'vite.config.ts'), logLevel: 'warn', build: { outDir, emptyOutDir: true } });
}

/** Serves `root` on 127.0.0.1; resolves to { url, close }. */
export async function serveRenderer({ port = 0, root = RENDERER_DIST } = {}) {
  const csp = await contentSecurityPolicy(root);
  const server = createServer(async (request, response) => {
    try {
      const url = new URL(request.url ?? '/', 'http://127.0.0.1');
      const relative = decodeURIComponent(url.pathname).replace(/^\/+/, '') || 'index.html';
      const file = path.resolve(root, relative);
      if (file !== root && !file.startsWith(root + path.sep)) {
        response.writeHead(403).end('forbidden');
        return;
      }
      const info = await stat(file).catch(() => null);
      const target = info?.isFile() === true ? file : path.join(root, 'index.html');
      const body = await readFile(target);
      response.writeHead(200, {
        'Content-Type': TYPES[path.extname(target)] ?? 'application/octet-stream',
        'Content-Security-Policy': csp,
        'X-Content-Type-Options': 'nosniff',
        'Referrer-Policy': 'no-referrer',
        'Cache-Control': 'no-store',
      });
      response.end(request.method === 'HEAD' ? undefined : body);
    } catch (error) {
      response.writeHead(500).end(String(error));
    }
  });
  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', resolve);
  });
  const address = server.address();
  const actualPort = typeof address === 'object' && address !== null ? address.port : port;
  return {
    url: `http://127.0.0.1:${actualPort}/`,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const skipBuild = process.argv.includes('--no-build');
  const port = process.env.PORT !== undefined && process.env.PORT !== '' ? Number(process.env.PORT) : 0;
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    console.error(`PORT must be a whole number from 0 to 65535 (got "${process.env.PORT}")`);
    process.exit(2);
  }
  if (!skipBuild) await buildRenderer();
  const { url } = await serveRenderer({ port });
  console.log(`Zeitlight web mode: ${url}`);
  console.log(`Demo scenario:      ${url}?open=demo`);
}
