/**
 * `zeitlight run --cohort n --seed s` through the built launcher (needs `npm run build`): the
 * cohort section is identical with one, two and four worker threads (results depend on the seed
 * and the occupant index only), and the per-strategy ranges are ordered (p05 ≤ q25 ≤ median ≤
 * q75 ≤ p95, definition of quantiles).
 */
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { PROJECT_ROOT, runZeitlight } from '../helpers/run-cli.js';
import { DEMO_SCENARIO } from '../../schedules/index.js';
import type { RunResults } from '../../schedules/run/index.js';

const built = existsSync(join(PROJECT_ROOT, 'dist', 'cli', 'run-output', 'cohort-job.js'));

describe.skipIf(!built)('cohort runs from the command line', () => {
  test('same seed gives the same cohort with 1, 2 and 4 workers', () => {
    const dir = mkdtempSync(join(tmpdir(), 'zeitlight-cohort-'));
    const file = join(dir, 'scenario.json');
    writeFileSync(file, JSON.stringify({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 2 }, personas: DEMO_SCENARIO.personas.slice(1), strategies: (DEMO_SCENARIO.strategies ?? []).filter((s) => s.personas?.includes('desk-worker')), rosters: [] }));
    const read = (workers: number): NonNullable<RunResults['cohort']> => {
      const out = join(dir, `out${workers}`);
      const r = runZeitlight(['run', file, '--out', out, '--cohort', '5', '--seed', '11', '--workers', String(workers)]);
      expect(r.stderr).not.toMatch(/error/i);
      expect(r.status).toBe(0);
      const results = JSON.parse(readFileSync(join(out, 'results.json'), 'utf8')) as RunResults;
      if (results.cohort === undefined) throw new Error('no cohort section');
      return results.cohort;
    };
    const one = read(1);
    const two = read(2);
    const four = read(4);
    expect(two).toEqual(one);
    expect(four).toEqual(one);
    expect(one.size).toBe(5);
    const base = one.personas[0]?.summary.strategies['baseline']?.['mean_phase_angle_dlmo_to_sleep_h'];
    expect(base?.n).toBe(5);
    if (base) expect([base.p05, base.q25, base.median, base.q75, base.p95]).toEqual([...[base.p05, base.q25, base.median, base.q75, base.p95]].sort((a, b) => a - b));
  }, 240_000);

  test('--cohort without --seed is refused with a usage message', () => {
    const r = runZeitlight(['run', 'x.json', '--out', join(tmpdir(), 'zl-none'), '--cohort', '3']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--cohort needs --seed/);
  });
});
