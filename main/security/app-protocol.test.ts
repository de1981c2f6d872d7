import { describe, expect, it } from 'vitest';
import * as path from 'node:path';
import { mkdtemp, mkdir, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { appSchemeResponse, resolveAppAsset } from './app-protocol.js';
import { nodeFileSystem } from '../files/file-system.js';
import { CONTENT_SECURITY_POLICY } from './content-security-policy.js';

const DIST = path.resolve('/opt/zeitlight/renderer/dist');

describe('app scheme', () => {
  it('maps app URLs to files inside the renderer build', () => {
    expect(resolveAppAsset(DIST, 'zeitlight://app/index.html')).toBe(path.join(DIST, 'index.html'));
    expect(resolveAppAsset(DIST, 'zeitlight://app/')).toBe(path.join(DIST, 'index.html'));
    expect(resolveAppAsset(DIST, 'zeitlight://app/assets/index-1.js?x#y')).toBe(path.join(DIST, 'assets', 'index-1.js'));
  });

  it('refuses other hosts, other schemes and every way out of the build', () => {
    expect(resolveAppAsset(DIST, 'zeitlight://elsewhere/index.html')).toBeNull();
    expect(resolveAppAsset(DIST, 'file:///opt/zeitlight/renderer/dist/index.html')).toBeNull();
    expect(resolveAppAsset(DIST, 'zeitlight://app/..%2f..%2fpackage.json')).toBeNull();
    // Dot segments are removed by URL parsing itself, so this stays inside the build.
    expect(resolveAppAsset(DIST, 'zeitlight://app/%2e%2e/%2e%2e/package.json')).toBe(path.join(DIST, 'package.json'));
    expect(resolveAppAsset(DIST, 'zeitlight://app/%E0%A4%A')).toBeNull();
  });

  it('answers with the file, its type and the Content-Security-Policy, or 404', async () => {
    const dist = await mkdtemp(path.join(tmpdir(), 'zeitlight-scheme-'));
    await mkdir(path.join(dist, 'assets'));
    await writeFile(path.join(dist, 'assets', 'a.js'), 'export {}');
    const ok = await appSchemeResponse(nodeFileSystem, dist, 'zeitlight://app/assets/a.js');
    expect(ok.status).toBe(200);
    expect(ok.headers.get('content-type')).toContain('text/javascript');
    expect(ok.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
    expect(await ok.text()).toBe('export {}');
    expect((await appSchemeResponse(nodeFileSystem, dist, 'zeitlight://app/missing.js')).status).toBe(404);
  });
});
