/**
 * Property-based checks of the scenario format (fast-check): random valid scenarios validate and
 * expand into a timeline that covers every real minute exactly once; random corruptions of them,
 * and arbitrary JSON, are refused with a message and a fix and never crash.
 * External reference for day lengths: IANA tz rules via luxon, cross-checked against
 * Date arithmetic on the UTC instants of successive local midnights.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DateTime } from 'luxon';
import { validateScenarioValue } from '../../schedules/validation/validate-scenario.js';
import { expandScenario } from '../../schedules/timeline/expand-scenario.js';
import { scenarioArb } from './scenario-arbitraries.js';

describe('random valid scenarios', () => {
  it('validate without errors and expand into contiguous timelines of the right length', () => {
    fc.assert(
      fc.property(scenarioArb, (input) => {
        const v = validateScenarioValue(input);
        expect(v.problems.filter((p) => p.severity === 'error')).toEqual([]);
        const scenario = v.scenario;
        if (scenario === undefined) throw new Error('no scenario');
        const ex = expandScenario(scenario);
        expect(ex.timelines).toHaveLength(3);
        // Independent length: luxon's own local midnights, first day and the day after the last.
        const zone = scenario.site.timeZone;
        const a = DateTime.fromISO(scenario.run.startDate, { zone }).startOf('day');
        const b = a.plus({ days: scenario.run.days }).startOf('day');
        const expected_min = Math.round(b.diff(a, 'minutes').minutes);
        for (const t of ex.timelines) {
          expect(t.total_min).toBe(expected_min);
          let prev = 0;
          for (const s of t.slices) {
            expect(s.start_min).toBe(prev);
            expect(s.end_min).toBeGreaterThan(s.start_min);
            prev = s.end_min;
          }
          expect(prev).toBe(t.total_min);
          expect(t.days.reduce((acc, d) => acc + d.length_min, 0)).toBe(t.total_min);
        }
      }),
      { numRuns: 120 },
    );
  });
});

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

function allPaths(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  const out: (string | number)[][] = [prefix];
  if (Array.isArray(value)) value.forEach((v, i) => out.push(...allPaths(v, [...prefix, i])));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) out.push(...allPaths(v, [...prefix, k]));
  return out;
}

function mutate(doc: Json, path: (string | number)[], action: 'delete' | 'replace', replacement: Json): Json {
  if (path.length === 0) return action === 'delete' ? null : replacement;
  const copy = structuredClone(doc);
  let node: Json = copy;
  for (const key of path.slice(0, -1)) node = (node as Record<string | number, Json>)[key] as Json;
  const last = path[path.length - 1] as string | number;
  if (action === 'delete') {
    if (Array.isArray(node)) node.splice(Number(last), 1);
    else delete (node as Record<string, Json>)[last];
  } else (node as Record<string | number, Json>)[last] = replacement;
  return copy;
}

describe('corrupted scenarios', () => {
  it('are refused with messages and fixes, or accepted and expandable — never a crash', () => {
    fc.assert(
      fc.property(scenarioArb, fc.nat(), fc.constantFrom('delete' as const, 'replace' as const), fc.jsonValue(), (input, pick, action, replacement) => {
        const doc = JSON.parse(JSON.stringify(input)) as Json;
        const paths = allPaths(doc);
        const path = paths[pick % paths.length] ?? [];
        const bad = mutate(doc, path, action, replacement as Json);
        const v = validateScenarioValue(bad);
        if (!v.ok) {
          expect(v.problems.length).toBeGreaterThan(0);
          for (const p of v.problems) {
            expect(p.message.length).toBeGreaterThan(0);
            expect(p.fix.length).toBeGreaterThan(0);
          }
        } else if (v.scenario !== undefined) {
          expandScenario(v.scenario);
        }
      }),
      { numRuns: 300 },
    );
  });
  it('arbitrary JSON is refused with a message', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        const v = validateScenarioValue(value);
        expect(v.ok).toBe(false);
        expect(v.problems[0]?.fix.length).toBeGreaterThan(0);
      }),
      { numRuns: 300 },
    );
  });
});
