import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PROJECT_ROOT, runZeitlight } from './helpers/run-cli.js';
import { VERSION } from '../cli/version.js';

describe('zeitlight launcher', () => {
  it('reports the same version as package.json', () => {
    const pkg = JSON.parse(readFileSync(join(PROJECT_ROOT, 'package.json'), 'utf8')) as { version: string };
    expect(VERSION).toBe(pkg.version);
    const r = runZeitlight(['--version']);
    expect(r.status).toBe(0);
    expect(r.stdout.trim()).toBe(pkg.version);
  });

  it('lists every command in help', () => {
    const r = runZeitlight(['help']);
    expect(r.status).toBe(0);
    for (const name of ['demo', 'run', 'validate', 'alphaopic', 'sources', 'sun', 'weather', 'simulate', 'models']) {
      expect(r.stdout).toContain(`zeitlight ${name}`);
    }
  });

  it('refuses an unknown command with a usage exit code and a message on stderr', () => {
    const r = runZeitlight(['frobnicate', '--json']);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('unknown command "frobnicate"');
  });

  it('refuses an unknown option naming it', () => {
    const r = runZeitlight(['sources', '--bogus']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('--bogus');
  });
});
