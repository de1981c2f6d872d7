// The web-mode server: loopback only, the app's Content-Security-Policy on every response,
// nothing served from outside the renderer build.
import { describe, expect, it } from 'vitest';
import { mkdtemp, writeFile, mkdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { request } from 'node:http';

interface WebServerModule {
  serveRenderer(options: { port?: number; root?: string }): Promise<{ url: string; close(): Promise<void> }>;
}

function get(url: string): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: string }> {
  return new Promise((resolve, reject) => {
    // Raw path, so the client does not normalise "..".
    const u = new URL(url);
    const req = request({ host: u.hostname, port: u.port, path: url.slice(url.indexOf('/', 8)), method: 'GET' }, (res) => {
      let body = '';
      res.on('data', (c: Buffer) => (body += c.toString('utf8')));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

describe('web-mode server', () => {
  it('serves the build with the policy header, falls back to the page, and refuses paths outside the build', async () => {
    const root = await mkdtemp(path.join(tmpdir(), 'zeitlight-web-'));
    await mkdir(path.join(root, 'dist', 'assets'), { recursive: true });
    const dist = path.join(root, 'dist');
    await writeFile(path.join(dist, 'index.html'), `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; script-src 'self'" /><p>page</p>`);
    await writeFile(path.join(dist, 'assets', 'app.js'), 'console.log(1)');
    await writeFile(path.join(root, 'secret.txt'), 'secret');
    const server = (await import(path.resolve(import.meta.dirname, '..', '..', 'scripts', 'web-server.mjs'))) as WebServerModule;
    const web = await server.serveRenderer({ port: 0, root: dist });
    try {
      expect(web.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
      const js = await get(`${web.url}assets/app.js`);
      expect(js.status).toBe(200);
      expect(js.headers['content-type']).toContain('text/javascript');
      expect(js.headers['content-security-policy']).toBe("default-src 'none'; script-src 'self'; frame-ancestors 'none'");
      const fallback = await get(`${web.url}?open=demo`);
      expect(fallback.body).toContain('<p>page</p>');
      const escape = await get(`${web.url}..%2fsecret.txt`);
      expect(escape.status).toBe(403);
      expect(escape.body).not.toContain('secret');
    } finally {
      await web.close();
    }
  });
});
