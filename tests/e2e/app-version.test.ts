// The version the workspace prints on the briefing cover is the package's version.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { APP_VERSION } from '../../renderer/src/briefing/app-version.js';

describe('workspace version', () => {
  it('equals the version in package.json', () => {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string };
    expect(APP_VERSION).toBe(pkg.version);
  });
});
