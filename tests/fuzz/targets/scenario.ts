/**
 * Scenario files: valid generated scenarios (run through `zeitlight run`), and the same
 * scenarios corrupted in structure (fields removed or replaced by wrong types, extreme numbers,
 * "NaN"/"Infinity" texts, deep nesting, unknown and duplicate ids) or in the text (byte-order
 * marks, UTF-16, truncation, bare NaN/Infinity tokens, duplicate keys, stray characters), and
 * arbitrary JSON — through `zeitlight validate` and `zeitlight run`.
 */
import fc from 'fast-check';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { scenarioArb } from '../../schedules/scenario-arbitraries.js';
import { validateScenarioText } from '../../../schedules/validation/validate-scenario.js';
import { personStrategyDays } from '../../../schedules/validation/sense/limit-checks.js';
import { callCli } from '../cli-call.js';
import { crashFindings, refusalFindings, type Finding } from '../findings.js';
import { encodeText, textCorruptionArb, type TextCorruption, applyTextCorruption } from '../text-corruption.js';
import { count, type FuzzTarget } from '../target.js';

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

/** Values that break a field: wrong types, extremes, texts that look like numbers, deep nesting. */
const hardValueArb: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(null, true, false, '', 'NaN', 'Infinity', '-Infinity', '1e999', 0, -0, -1, 1e308, -1e308, 5e-324, 2 ** 53 + 2, 1e21, [], {}, [[]], 'x'.repeat(10_000), '\u0000', '💡', 'Europe/Nowhere', '2026-02-30', '25:00', '24:00', '-1:00'),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
  fc.string({ maxLength: 30 }),
  fc.integer({ min: 1, max: 3000 }).map((depth): Json => JSON.parse('['.repeat(depth) + ']'.repeat(depth)) as Json),
  fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json>,
);

type StructuralChange =
  | { kind: 'none' }
  | { kind: 'delete'; pick: number }
  | { kind: 'replace'; pick: number; value: Json }
  | { kind: 'duplicate-id'; list: 'places' | 'personas' | 'strategies' | 'rosters' }
  | { kind: 'unknown-reference'; pick: number }
  | { kind: 'deep-text'; depth: number };

const structuralArb: fc.Arbitrary<StructuralChange> = fc.oneof(
  { weight: 1, arbitrary: fc.constant<StructuralChange>({ kind: 'none' }) },
  { weight: 3, arbitrary: fc.nat().map((pick): StructuralChange => ({ kind: 'delete', pick })) },
  { weight: 6, arbitrary: fc.record({ pick: fc.nat(), value: hardValueArb }).map((r): StructuralChange => ({ kind: 'replace', ...r })) },
  { weight: 1, arbitrary: fc.constantFrom('places', 'personas', 'strategies', 'rosters').map((list): StructuralChange => ({ kind: 'duplicate-id', list: list as 'places' })) },
  { weight: 1, arbitrary: fc.nat().map((pick): StructuralChange => ({ kind: 'unknown-reference', pick })) },
  { weight: 1, arbitrary: fc.constantFrom(100, 20_000, 200_000).map((depth): StructuralChange => ({ kind: 'deep-text', depth })) },
);

export interface ScenarioCase {
  readonly doc: Json;
  readonly change: StructuralChange;
  readonly text: TextCorruption;
  readonly command: 'validate' | 'validate-json' | 'run';
}

function allPaths(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  const out: (string | number)[][] = [prefix];
  if (Array.isArray(value)) value.forEach((v, i) => out.push(...allPaths(v, [...prefix, i])));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) out.push(...allPaths(v, [...prefix, k]));
  return out;
}

function parentAndKey(doc: Json, path: (string | number)[]): [Record<string | number, Json> | Json[], string | number] | undefined {
  let node: Json = doc;
  for (const key of path.slice(0, -1)) node = (node as Record<string | number, Json>)[key] as Json;
  const last = path[path.length - 1];
  return last === undefined || node === null || typeof node !== 'object' ? undefined : [node, last];
}

function applyStructural(input: Json, change: StructuralChange): Json {
  const doc = structuredClone(input);
  const paths = allPaths(doc).slice(1);
  switch (change.kind) {
    case 'none':
    case 'deep-text':
      return doc;
    case 'delete':
    case 'replace': {
      const target = parentAndKey(doc, paths[change.pick % paths.length] ?? []);
      if (target === undefined) return change.kind === 'replace' ? change.value : doc;
      const [parent, key] = target;
      if (change.kind === 'delete') {
        if (Array.isArray(parent)) parent.splice(Number(key), 1);
        else delete parent[key];
      } else (parent as Record<string | number, Json>)[key] = change.value;
      return doc;
    }
    case 'duplicate-id': {
      const list = (doc as Record<string, Json>)[change.list];
      if (Array.isArray(list) && list.length > 0) list.push(structuredClone(list[0] ?? null));
      return doc;
    }
    case 'unknown-reference': {
      // Renames one text that is also an id somewhere, so a reference points nowhere.
      const texts = paths.filter((p) => {
        const t = parentAndKey(doc, p);
        return t !== undefined && typeof (t[0] as Record<string | number, Json>)[t[1]] === 'string';
      });
      const p = texts[change.pick % Math.max(1, texts.length)];
      const t = p === undefined ? undefined : parentAndKey(doc, p);
      if (t !== undefined) (t[0] as Record<string | number, Json>)[t[1]] = `${String((t[0] as Record<string | number, Json>)[t[1]])}-missing`;
      return doc;
    }
  }
}

/** Scenarios small enough to run in a fraction of a second: 1–2 days. */
const smallScenarioArb = scenarioArb.map((s) => JSON.parse(JSON.stringify({ ...s, run: { ...s.run, days: Math.min(s.run.days, 2) } })) as Json);

/** Values at the edges of what the format allows, set on a valid scenario (it stays valid). */
const EDGES: readonly ((d: Record<string, Record<string, unknown>>) => void)[] = [
  (d) => Object.assign(d.site ?? {}, { latitude_deg: 89.99 }),
  (d) => Object.assign(d.site ?? {}, { latitude_deg: -89.99, longitude_deg: 179.99 }),
  (d) => Object.assign(d.site ?? {}, { latitude_deg: 78.2, longitude_deg: 15.6, timeZone: 'Arctic/Longyearbyen' }),
  (d) => Object.assign(d.site ?? {}, { elevation_m: 9000 }),
  (d) => Object.assign(d.site ?? {}, { elevation_m: -500 }),
  (d) => Object.assign(d.run ?? {}, { startDate: '2028-02-29' }),
  (d) => Object.assign(d.run ?? {}, { startDate: '2026-12-31' }),
  (d) => Object.assign(d.run ?? {}, { startDate: '2026-03-29' }),
  (d) => Object.assign((d.personas as unknown as Record<string, unknown>[])[0] ?? {}, { age_y: 1 }),
  (d) => Object.assign((d.personas as unknown as Record<string, unknown>[])[0] ?? {}, { age_y: 110, intrinsicPeriod_h: 25.5, lightSensitivity: 20 }),
  (d) => Object.assign((d.personas as unknown as Record<string, unknown>[])[0] ?? {}, { intrinsicPeriod_h: 23, lightSensitivity: 0.05 }),
  (d) => {
    for (const p of d.places as unknown as Record<string, unknown>[]) for (const l of (p.luminaires as Record<string, unknown>[] | undefined) ?? []) l.eyeIlluminance_lx = 100_000;
  },
  (d) => {
    for (const p of d.places as unknown as Record<string, unknown>[]) for (const l of (p.luminaires as Record<string, unknown>[] | undefined) ?? []) l.eyeIlluminance_lx = 0;
  },
];

const validEdgeArb: fc.Arbitrary<Json> = fc.tuple(smallScenarioArb, fc.subarray(EDGES.map((_, i) => i), { maxLength: 3 })).map(([doc, picks]) => {
  const d = structuredClone(doc) as unknown as Record<string, Record<string, unknown>>;
  for (const k of picks) EDGES[k]?.(d);
  return d as unknown as Json;
});

const NO_DAMAGE: TextCorruption = { encoding: 'utf8', damage: { kind: 'none' } };

export const scenarioCaseArb: fc.Arbitrary<ScenarioCase> = fc.oneof(
  { weight: 2, arbitrary: fc.record({ doc: validEdgeArb, change: fc.constant<StructuralChange>({ kind: 'none' }), text: fc.oneof(fc.constant(NO_DAMAGE), textCorruptionArb), command: fc.constant<ScenarioCase['command']>('run') }) },
  { weight: 12, arbitrary: fc.record({ doc: smallScenarioArb, change: structuralArb, text: textCorruptionArb, command: fc.constantFrom<ScenarioCase['command']>('validate', 'validate-json', 'validate-json', 'run') }) },
  { weight: 1, arbitrary: fc.record({ doc: fc.jsonValue({ maxDepth: 4 }) as fc.Arbitrary<Json>, change: fc.constant<StructuralChange>({ kind: 'none' }), text: textCorruptionArb, command: fc.constantFrom<ScenarioCase['command']>('validate-json', 'run') }) },
);

/** Largest run the check lets through to `zeitlight run` (person-strategy-days), to keep each case short. */
const MAX_RUN_PSD = 8;

export function scenarioTarget(dir: string): FuzzTarget<ScenarioCase> {
  const file = join(dir, 'scenario.json');
  const out = join(dir, 'out');
  const outcomes: Record<string, number> = {};
  return {
    name: 'scenario',
    outcomes,
    arbitrary: scenarioCaseArb,
    async run(c) {
      const doc = applyStructural(c.doc, c.change);
      let json = JSON.stringify(doc, null, 1);
      // Nesting deeper than JSON.stringify can write is made in the text itself.
      if (c.change.kind === 'deep-text') json = json.replace(/^\{/, `{ "description": ${'{"a":'.repeat(c.change.depth)}[]${'}'.repeat(c.change.depth)},`);
      const text = applyTextCorruption(json, c.text);
      writeFileSync(file, encodeText(text, c.text.encoding));
      const findings: Finding[] = [];
      if (c.command === 'run') {
        // Only small scenarios are run; larger valid ones are checked by validate.
        const v = validateScenarioText(text.replace(/^\uFEFF/, ''));
        if (v.scenario !== undefined && personStrategyDays(v.scenario) > MAX_RUN_PSD) {
          count(outcomes, 'valid but too long to run here');
          return [];
        }
        const call = await callCli(['run', file, '--out', out, '--no-ensemble', '--json']);
        count(outcomes, call.code === 0 ? 'run completed' : 'run refused');
        findings.push(...crashFindings(call), ...refusalFindings(call, ['scenario.json']));
        return findings;
      }
      const call = await callCli(['validate', file, ...(c.command === 'validate-json' ? ['--json'] : [])]);
      count(outcomes, call.code === 0 ? 'validate: valid' : 'validate: refused');
      findings.push(...crashFindings(call), ...refusalFindings(call, ['scenario.json']));
      // A file that cannot be read at all is refused on stderr (checked above) with no document.
      if (c.command === 'validate-json' && call.code <= 1 && call.escaped === null && call.stdout !== '') {
        try {
          const report = JSON.parse(call.stdout) as { problems: { severity: string; path: string; message: string }[] };
          for (const p of report.problems) {
            if (p.severity === 'error' && p.path === '' && !/\bline \d+/.test(p.message)) findings.push({ kind: 'unlocated', detail: `problem without a path or line: ${p.message.slice(0, 200)}` });
          }
        } catch {
          findings.push({ kind: 'crash', detail: `--json output is not one JSON document: ${call.stdout.slice(0, 200)}` });
        }
      }
      return findings;
    },
  };
}
