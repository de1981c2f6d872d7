import { describe, expect, it } from 'vitest';
import * as path from 'node:path';
import { mkdtempSync, writeFileSync, chmodSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { REPORT_ORIGIN, packageRoot, reportAsset } from './report-page.js';
import { chromiumExecutable } from './chromium-path.js';

describe('report page files', () => {
  it('maps request URLs of the report origin into the build folder and nowhere else', () => {
    const folder = path.resolve('/srv/report');
    expect(reportAsset(folder, `${REPORT_ORIGIN}/index.html`)?.file).toBe(path.join(folder, 'index.html'));
    expect(reportAsset(folder, `${REPORT_ORIGIN}/assets/x.js`)?.contentType).toMatch(/javascript/);
    expect(reportAsset(folder, `${REPORT_ORIGIN}/..%2f..%2fetc/passwd`)).toBeNull();
    expect(reportAsset(folder, 'https://example.com/index.html')).toBeNull();
  });

  it('finds the installation folder by its package.json', () => {
    expect(path.basename(path.join(packageRoot(), 'package.json'))).toBe('package.json');
  });
});

describe('Chromium location', () => {
  it('prefers the option, then ZEITLIGHT_CHROMIUM, and explains how to get one when missing', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'zl-chromium-'));
    const fake = path.join(dir, 'chromium');
    writeFileSync(fake, '#!/bin/sh\n');
    chmodSync(fake, 0o755);
    expect(chromiumExecutable(fake, {})).toBe(fake);
    expect(chromiumExecutable(undefined, { ZEITLIGHT_CHROMIUM: fake })).toBe(fake);
    expect(() => chromiumExecutable(undefined, { ZEITLIGHT_CHROMIUM: path.join(dir, 'none') })).toThrow(/ZEITLIGHT_CHROMIUM.*apt-get install chromium/);
  });
});
