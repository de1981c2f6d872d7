import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runZeitlight } from '../helpers/run-cli.js';

// Runs the built launcher (npm run build first) as a user would.
describe('zeitlight simulate through the launcher', () => {
  it('prints one JSON document with the contract keys and exits 0', () => {
    const fix = join(import.meta.dirname, 'fixtures');
    const r = runZeitlight(['simulate', join(fix, 'regular-day-medi.csv'), '--days', '2', '--sleep', join(fix, 'sleep-23-07.csv'), '--json']);
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(Object.keys(doc).slice(0, 6)).toEqual(['model', 'xmin_h', 'cbtmin_h', 'dlmo_h', 'melatonin_suppression_pct', 'kss_hourly']);
  });

  it('exits non-zero with the line named on stderr for bad input', () => {
    const r = runZeitlight(['simulate', join(import.meta.dirname, 'fixtures', 'README.md'), '--days', '1', '--json']);
    expect(r.status).not.toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/README\.md, line \d+/);
  });
});
