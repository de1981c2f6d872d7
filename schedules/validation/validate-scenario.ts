/**
 * Validation of a scenario document: migrate older versions, check the schema, then the sense
 * checks that a schema cannot express. Every problem has a path and a plain-language fix.
 */
import { z } from 'zod';
import { migrateScenario } from '../migration/migrate.js';
import { runSettingsSchema, scenarioSchema, SCENARIO_FORMAT, SCENARIO_FORMAT_VERSION } from '../schema/scenario-schema.js';
import { siteSchema } from '../schema/site-schema.js';
import { placeSchema } from '../schema/places-schema.js';
import { personaSchema } from '../schema/personas-schema.js';
import { rosterSchema } from '../schema/roster-schema.js';
import { strategySchema } from '../schema/strategy-schema.js';
import { lightLogSpecSchema } from '../schema/light-log-schema.js';
import type { Scenario } from '../schema/scenario-types.js';
import { formatPath, problem, type ScenarioProblem } from './problem.js';
import { repairForChecks } from './repair-for-checks.js';
import { jsonErrorOffset, positionAt } from './json-error-position.js';
import { cutDeepNesting, MAX_NESTING_DEPTH } from './nesting-depth.js';
import { schemaProblems } from './zod-problems.js';
import { referenceChecks, type SetAsideIds } from './sense/reference-checks.js';
import { siteChecks } from './sense/site-checks.js';
import { personChecks } from './sense/person-checks.js';
import { timingChecks } from './sense/timing-checks.js';
import { limitChecks } from './sense/limit-checks.js';

export interface ScenarioValidation {
  /** True when there is no error (warnings allowed). */
  readonly ok: boolean;
  /** The scenario with defaults filled in, when the schema accepted it and no error was found. */
  readonly scenario: Scenario | undefined;
  readonly problems: readonly ScenarioProblem[];
  readonly migratedFrom: number | undefined;
  readonly migrations: readonly string[];
  /** The parts that could be checked, for checks of the files they name (absent when nothing could be). */
  readonly checkable?: CheckableParts;
}

/** A scenario as far as it could be checked: stand-ins for invalid fields, invalid items left out. */
export interface CheckableParts {
  readonly scenario: Scenario;
  /** Original position of each of scenario.lightLogs in the file's "lightLogs". */
  readonly lightLogIndex: readonly number[];
  /** Paths of the fields given stand-ins (their own problems are reported by the schema). */
  readonly replaced: readonly string[];
}

let fieldNames: readonly string[] | undefined;
/** Every field name the format knows, to suggest the intended one for a misspelling. */
function allFieldNames(): readonly string[] {
  if (fieldNames !== undefined) return fieldNames;
  const names = new Set<string>();
  const walk = (node: unknown): void => {
    if (Array.isArray(node)) node.forEach(walk);
    else if (node !== null && typeof node === 'object') {
      for (const [k, v] of Object.entries(node)) {
        if (k === 'properties' && v !== null && typeof v === 'object') Object.keys(v).forEach((n) => names.add(n));
        walk(v);
      }
    }
  };
  walk(z.toJSONSchema(scenarioSchema, { io: 'input', unrepresentable: 'any' }));
  fieldNames = [...names];
  return fieldNames;
}

function senseChecks(scenario: Scenario, setAside?: SetAsideIds): ScenarioProblem[] {
  return [...limitChecks(scenario), ...siteChecks(scenario), ...referenceChecks(scenario, setAside), ...personChecks(scenario), ...timingChecks(scenario)];
}

interface KeptItems<T> {
  readonly items: T[];
  /** Original index of each kept item. */
  readonly originalIndex: number[];
  readonly setAsideIds: Set<string>;
  /** Full paths of fields that failed the schema and were given stand-ins for the checks. */
  readonly replaced: (readonly PropertyKey[])[];
}

function idOf(item: unknown): string | undefined {
  const id = item !== null && typeof item === 'object' ? (item as { id?: unknown }).id : undefined;
  return typeof id === 'string' ? id : undefined;
}

/**
 * The items of a list that can be sense-checked: those that pass the schema, and those that pass
 * with stand-ins for their invalid fields (repair-for-checks.ts); the rest are set aside.
 */
function keepCheckable<T extends { id: string }>(list: unknown, schema: z.ZodType<T>, key: string): KeptItems<T> {
  const kept: KeptItems<T> = { items: [], originalIndex: [], setAsideIds: new Set(), replaced: [] };
  if (!Array.isArray(list)) return kept;
  list.forEach((item: unknown, i) => {
    const r = schema.safeParse(item);
    if (r.success) {
      kept.items.push(r.data);
      kept.originalIndex.push(i);
      return;
    }
    const original = idOf(item);
    const fixed = repairForChecks(item, schema);
    if (fixed === undefined) {
      if (original !== undefined) kept.setAsideIds.add(original);
      return;
    }
    kept.items.push(fixed.data);
    kept.originalIndex.push(i);
    for (const p of fixed.replaced) kept.replaced.push([key, i, ...p]);
    // An identifier that was itself replaced: references to the written one are not reported again.
    if (original !== undefined && fixed.data.id !== original) kept.setAsideIds.add(original);
  });
  return kept;
}

/** Stand-ins for run settings or a site that cannot be checked at all; their own problems are reported by the schema. */
const STAND_IN_RUN = { startDate: '2026-01-01', days: 1 };
const STAND_IN_SITE = { latitude_deg: 0, longitude_deg: 0, timeZone: 'UTC', weather: { kind: 'sky-model', seasons: [{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], clear: 1, intermediate: 0, overcast: 0 }] } };

function checkableSingle<T>(value: unknown, schema: z.ZodType<T>, key: string, standIn: unknown, replaced: (readonly PropertyKey[])[]): T {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const fixed = repairForChecks(value, schema);
  if (fixed !== undefined) {
    for (const p of fixed.replaced) replaced.push([key, ...p]);
    return fixed.data;
  }
  replaced.push([key]);
  return schema.parse(standIn);
}

/** True when `path` is `base` or lies under it (formatted paths). */
function isUnder(path: string, base: string): boolean {
  return path === base || path.startsWith(`${base}.`) || path.startsWith(`${base}[`);
}

/**
 * The part of the document a stand-in can disturb beyond its own field: the innermost list inside
 * the item that holds it (a day plan, a schedule — order and overlap checks compare neighbours),
 * else the item itself (a place, a persona …), else the section (run, site).
 */
function disturbedBy(replacedPath: readonly PropertyKey[]): readonly PropertyKey[] {
  for (let j = replacedPath.length - 1; j >= 2; j--) if (typeof replacedPath[j] === 'number') return replacedPath.slice(0, j);
  return typeof replacedPath[1] === 'number' ? replacedPath.slice(0, 2) : replacedPath.slice(0, 1);
}

/**
 * Whether a sense-check problem may come from a stand-in value rather than from what the user
 * wrote: errors at or under a replaced field; warnings anywhere in the part it can disturb, or at
 * one of that part's enclosing paths.
 */
function fromStandIn(p: ScenarioProblem, replaced: readonly (readonly PropertyKey[])[]): boolean {
  return replaced.some((r) => {
    if (isUnder(p.path, formatPath(r))) return true;
    if (p.severity !== 'warning') return false;
    const part = disturbedBy(r);
    if (isUnder(p.path, formatPath(part))) return true;
    for (let k = 1; k < part.length; k++) if (p.path === formatPath(part.slice(0, k))) return true;
    return false;
  });
}

/**
 * Sense checks on the parts of a document that can be checked, so one run lists schema and
 * sense problems together. Items that failed the schema are checked with stand-ins for their
 * invalid fields where possible (problems coming from a stand-in are not reported), else left
 * out; references to items left out are not reported again; paths point at the original list
 * positions.
 */
function partialSenseChecks(doc: unknown): { problems: ScenarioProblem[]; checkable: CheckableParts | undefined } {
  if (doc === null || typeof doc !== 'object' || Array.isArray(doc)) return { problems: [], checkable: undefined };
  const d = doc as Record<string, unknown>;
  const replaced: (readonly PropertyKey[])[] = [];
  const run = checkableSingle(d.run, runSettingsSchema, 'run', STAND_IN_RUN, replaced);
  const site = checkableSingle(d.site, siteSchema, 'site', STAND_IN_SITE, replaced);
  const places = keepCheckable(d.places, placeSchema, 'places');
  const personas = keepCheckable(d.personas, personaSchema, 'personas');
  const rosters = keepCheckable(d.rosters, rosterSchema, 'rosters');
  const strategies = keepCheckable(d.strategies, strategySchema, 'strategies');
  const lightLogs = keepCheckable(d.lightLogs, lightLogSpecSchema, 'lightLogs');
  for (const k of [places, personas, rosters, strategies, lightLogs]) replaced.push(...k.replaced);
  const partial: Scenario = {
    format: SCENARIO_FORMAT,
    version: SCENARIO_FORMAT_VERSION,
    name: 'partial',
    run,
    site,
    places: places.items,
    personas: personas.items,
    rosters: rosters.items,
    strategies: strategies.items,
    lightLogs: lightLogs.items,
  };
  const setAside: SetAsideIds = { places: places.setAsideIds, personas: personas.setAsideIds, rosters: rosters.setAsideIds, lightLogs: lightLogs.setAsideIds };
  const maps: Record<string, number[]> = {
    places: places.originalIndex,
    personas: personas.originalIndex,
    rosters: rosters.originalIndex,
    strategies: strategies.originalIndex,
    lightLogs: lightLogs.originalIndex,
  };
  const problems = senseChecks(partial, setAside)
    .map((p) => ({
      ...p,
      path: p.path.replace(/^(places|personas|rosters|strategies|lightLogs)\[(\d+)\]/, (whole, key: string, index: string) => `${key}[${maps[key]?.[Number(index)] ?? index}]`),
    }))
    .filter((p) => !fromStandIn(p, replaced));
  return { problems, checkable: { scenario: partial, lightLogIndex: lightLogs.originalIndex, replaced: replaced.map((r) => formatPath(r)) } };
}

/**
 * A document whose format marker is missing or wrong, or whose version is missing, is still
 * checked as the current version when it looks like a scenario (it has one of the scenario's
 * main sections), so that every other problem is listed in the same pass.
 */
function readableAsCurrent(input: unknown, migrated: ReturnType<typeof migrateScenario>): Record<string, unknown> | undefined {
  if (input === null || typeof input !== 'object' || Array.isArray(input)) return undefined;
  const doc = input as Record<string, unknown>;
  if (typeof doc.version === 'number' && Number.isInteger(doc.version) && doc.version >= 1 && doc.format === SCENARIO_FORMAT) return undefined;
  if (typeof doc.version === 'number' && doc.version > SCENARIO_FORMAT_VERSION) return undefined;
  if (!['run', 'site', 'places', 'personas'].some((k) => k in doc)) return undefined;
  if (!migrated.problems.every((p) => p.path === 'format' || p.path === 'version')) return undefined;
  return { ...doc, format: SCENARIO_FORMAT, version: SCENARIO_FORMAT_VERSION };
}

function wholeScenario(scenario: Scenario): CheckableParts {
  return { scenario, lightLogIndex: scenario.lightLogs.map((_, i) => i), replaced: [] };
}

/** Validates an already-parsed JSON value. */
export function validateScenarioValue(value: unknown): ScenarioValidation {
  const nesting = cutDeepNesting(value);
  if (nesting.cut.length === 0) return validateShallowValue(value);
  const v = validateShallowValue(nesting.value);
  const deep = nesting.cut.map((p) => problem('error', p, `nested more than ${MAX_NESTING_DEPTH} levels deep`, 'A scenario nests about ten levels; replace this part with the value the format asks for here.'));
  return { ...v, ok: false, scenario: undefined, problems: [...deep, ...v.problems] };
}

function validateShallowValue(input: unknown): ScenarioValidation {
  let migrated = migrateScenario(input);
  const identity: ScenarioProblem[] = [];
  if (migrated.problems.length > 0) {
    const asCurrent = readableAsCurrent(input, migrated);
    if (asCurrent === undefined) {
      return { ok: false, scenario: undefined, problems: migrated.problems, migratedFrom: migrated.fromVersion, migrations: migrated.applied };
    }
    identity.push(...migrated.problems);
    migrated = { ...migrateScenario(asCurrent), fromVersion: undefined };
  }
  const parsed = scenarioSchema.safeParse(migrated.value);
  if (!parsed.success || identity.length > 0) {
    const schema = parsed.success ? [] : schemaProblems(parsed.error, migrated.value, allFieldNames);
    const partial = parsed.success ? { problems: senseChecks(parsed.data), checkable: wholeScenario(parsed.data) } : partialSenseChecks(migrated.value);
    return { ok: false, scenario: undefined, problems: [...identity, ...schema, ...partial.problems], migratedFrom: migrated.fromVersion, migrations: migrated.applied, ...(partial.checkable !== undefined ? { checkable: partial.checkable } : {}) };
  }
  const scenario = parsed.data;
  const problems = senseChecks(scenario);
  const ok = !problems.some((p) => p.severity === 'error');
  return { ok, scenario: ok ? scenario : undefined, problems, migratedFrom: migrated.fromVersion, migrations: migrated.applied, checkable: wholeScenario(scenario) };
}

/** Validates the text of a scenario file; JSON syntax errors are reported with line and column. */
export function validateScenarioText(text: string): ScenarioValidation {
  const body = text.replace(/^\uFEFF/, '');
  let value: unknown;
  try {
    value = JSON.parse(body);
  } catch (err) {
    const msg = (err instanceof Error ? err.message : String(err)).replace(/\s+/g, ' ').slice(0, 160);
    const stated = /position (\d+)/.exec(msg);
    const offset = jsonErrorOffset(body) ?? (stated !== null ? Number(stated[1]) : body.length);
    const at = positionAt(body, offset);
    const what = body.trim() === '' ? 'the file is empty' : `the file is not valid JSON at line ${at.line}, column ${at.column}: ${msg}`;
    return {
      ok: false,
      scenario: undefined,
      problems: [problem('error', '', body.trim() === '' ? `${what} (line 1)` : what, body.trim() === '' ? 'Start from the demo scenario (zeitlight demo writes one).' : 'Fix the JSON syntax there (a missing comma, quote or bracket is the usual cause).')],
      migratedFrom: undefined,
      migrations: [],
    };
  }
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    const at = positionAt(body, body.length - body.trimStart().length);
    const holds = Array.isArray(value) ? 'a list [ … ]' : value === null ? 'null' : typeof value === 'string' ? 'a text' : `a ${typeof value}`;
    return {
      ok: false,
      scenario: undefined,
      problems: [problem('error', '', `the file must hold one JSON object { … }, but at line ${at.line} it holds ${holds}`, 'A scenario is one JSON object { … }; start from the demo scenario (zeitlight demo writes one).')],
      migratedFrom: undefined,
      migrations: [],
    };
  }
  return validateScenarioValue(value);
}
