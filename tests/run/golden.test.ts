/**
 * Golden run of the built-in demo: the summary numbers of every persona × strategy, the
 * recommendations and the first days' phase markers are compared with the stored fixture
 * tests/run/fixtures/demo-golden.json (how it was made: tests/run/README.md). The pipeline has
 * no random draws beyond the seeded sky (same seed, same days), so a rerun gives identical
 * numbers; the tolerances below only absorb floating-point differences between machines and
 * Node versions. Reference: our own earlier run (regression check), not an outside source.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import type { RunResults } from '../../schedules/run/index.js';
import { demoRun, demoScenario, run } from './demo-run.js';

const FIXTURE = join(import.meta.dirname, 'fixtures', 'demo-golden.json');

/** Tolerances: phase markers and shifts 0.02 h (72 s); % suppression 0.5 points; shares 0.005; doses and hours 0.5 %. */
export const TOL = { time_h: 0.02, pct: 0.5, share: 0.005, relative: 0.005 };

export function goldenView(r: RunResults) {
  return {
    sky_by_day: r.scenario.sky_by_day,
    personas: r.personas.map((p) => ({
      id: p.id,
      recommended: p.recommendation.strategy_id,
      strategies: p.strategies.map((s) => ({
        id: s.id,
        summary: s.summary,
        cbtmin_h: s.cbtmin.slice(0, 14).map((e) => e.t_h),
        sleep_h: s.sleep_episodes.slice(0, 14).map((e) => [e.start.t_h, e.end.t_h]),
      })),
    })),
  };
}

type View = ReturnType<typeof goldenView>;

function close(actual: unknown, expected: unknown, path: string, tol: number): void {
  if (typeof expected === 'number' && typeof actual === 'number') {
    expect(Math.abs(actual - expected), `${path}: ${actual} vs ${expected}`).toBeLessThanOrEqual(tol);
  } else expect(actual, path).toEqual(expected);
}

function tolFor(key: string, value: number): number {
  if (key.includes('_lx') || key.includes('hours') || key.startsWith('nights')) return Math.max(1e-9, Math.abs(value) * TOL.relative);
  if (key.endsWith('_h')) return TOL.time_h;
  if (key.endsWith('_pct')) return TOL.pct;
  if (key.endsWith('_share')) return TOL.share;
  return Math.max(1e-9, Math.abs(value) * TOL.relative);
}

describe('golden run of the demo scenario', () => {
  const view = goldenView(demoRun().results);
  if (process.env['UPDATE_GOLDEN'] === '1') writeFileSync(FIXTURE, JSON.stringify(view, null, 1) + '\n');
  const golden = JSON.parse(readFileSync(FIXTURE, 'utf8')) as View;

  test('sky days, personas, strategies and recommendations match the fixture', () => {
    expect(view.sky_by_day).toEqual(golden.sky_by_day);
    expect(view.personas.map((p) => [p.id, p.recommended, p.strategies.map((s) => s.id)])).toEqual(golden.personas.map((p) => [p.id, p.recommended, p.strategies.map((s) => s.id)]));
  });

  test('summary numbers, CBTmin times and sleep times match the fixture within the stated tolerances', () => {
    view.personas.forEach((p, i) => {
      const gp = golden.personas[i];
      p.strategies.forEach((s, j) => {
        const gs = gp?.strategies[j];
        for (const [k, v] of Object.entries(s.summary)) close(v, (gs?.summary as Record<string, unknown> | undefined)?.[k], `${p.id}/${s.id}/${k}`, typeof v === 'number' ? tolFor(k, v) : 0);
        s.cbtmin_h.forEach((t, k) => close(t, gs?.cbtmin_h[k], `${p.id}/${s.id}/cbtmin[${k}]`, TOL.time_h));
        s.sleep_h.forEach((e, k) => close(e[0], gs?.sleep_h[k]?.[0], `${p.id}/${s.id}/sleep[${k}]`, TOL.time_h));
      });
    });
  });

  test('a second run of the same scenario gives the identical results document', () => {
    const again = run({ scenario: demoScenario() }).results;
    expect(JSON.stringify(again)).toBe(JSON.stringify(demoRun().results));
  });
});
