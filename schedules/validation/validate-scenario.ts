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
import { problem, type ScenarioProblem } from './problem.js';
import { schemaProblems } from './zod-problems.js';
import { referenceChecks, type SetAsideIds } from './sense/reference-checks.js';
import { siteChecks } from './sense/site-checks.js';
import { personChecks } from './sense/person-checks.js';
import { timingChecks } from './sense/timing-checks.js';

export interface ScenarioValidation {
  /** True when there is no error (warnings allowed). */
  readonly ok: boolean;
  /** The scenario with defaults filled in, when the schema accepted it and no error was found. */
  readonly scenario: Scenario | undefined;
  readonly problems: readonly ScenarioProblem[];
  readonly migratedFrom: number | undefined;
  readonly migrations: readonly string[];
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
  return [...siteChecks(scenario), ...referenceChecks(scenario, setAside), ...personChecks(scenario), ...timingChecks(scenario)];
}

interface KeptItems<T> {
  readonly items: T[];
  /** Original index of each kept item. */
  readonly originalIndex: number[];
  readonly setAsideIds: Set<string>;
}

function keepValid<T>(list: unknown, schema: z.ZodType<T>): KeptItems<T> {
  const kept: KeptItems<T> = { items: [], originalIndex: [], setAsideIds: new Set() };
  if (!Array.isArray(list)) return kept;
  list.forEach((item: unknown, i) => {
    const r = schema.safeParse(item);
    if (r.success) {
      kept.items.push(r.data);
      kept.originalIndex.push(i);
    } else if (item !== null && typeof item === 'object' && typeof (item as { id?: unknown }).id === 'string') {
      kept.setAsideIds.add((item as { id: string }).id);
    }
  });
  return kept;
}

/**
 * Sense checks on the parts of a document that passed the schema, so one run lists schema and
 * sense problems together. Items that failed the schema are left out, references to them are
 * not reported again, and paths point at the original list positions.
 */
function partialSenseChecks(doc: unknown): ScenarioProblem[] {
  if (doc === null || typeof doc !== 'object') return [];
  const d = doc as Record<string, unknown>;
  const run = runSettingsSchema.safeParse(d.run);
  const site = siteSchema.safeParse(d.site);
  if (!run.success || !site.success) return [];
  const places = keepValid(d.places, placeSchema);
  const personas = keepValid(d.personas, personaSchema);
  const rosters = keepValid(d.rosters, rosterSchema);
  const strategies = keepValid(d.strategies, strategySchema);
  const lightLogs = keepValid(d.lightLogs, lightLogSpecSchema);
  const partial: Scenario = {
    format: SCENARIO_FORMAT,
    version: SCENARIO_FORMAT_VERSION,
    name: 'partial',
    run: run.data,
    site: site.data,
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
  return senseChecks(partial, setAside).map((p) => ({
    ...p,
    path: p.path.replace(/^(places|personas|rosters|strategies|lightLogs)\[(\d+)\]/, (whole, key: string, index: string) => `${key}[${maps[key]?.[Number(index)] ?? index}]`),
  }));
}

/** Validates an already-parsed JSON value. */
export function validateScenarioValue(input: unknown): ScenarioValidation {
  const migrated = migrateScenario(input);
  if (migrated.problems.length > 0) {
    return { ok: false, scenario: undefined, problems: migrated.problems, migratedFrom: migrated.fromVersion, migrations: migrated.applied };
  }
  const parsed = scenarioSchema.safeParse(migrated.value);
  if (!parsed.success) {
    const problems = [...schemaProblems(parsed.error, migrated.value, allFieldNames), ...partialSenseChecks(migrated.value)];
    return { ok: false, scenario: undefined, problems, migratedFrom: migrated.fromVersion, migrations: migrated.applied };
  }
  const scenario = parsed.data;
  const problems = senseChecks(scenario);
  const ok = !problems.some((p) => p.severity === 'error');
  return { ok, scenario: ok ? scenario : undefined, problems, migratedFrom: migrated.fromVersion, migrations: migrated.applied };
}

/** Validates the text of a scenario file; JSON syntax errors are reported with line and column. */
export function validateScenarioText(text: string): ScenarioValidation {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (err) {
    const msg = err instanceof Error ? err.message : String(err);
    const pos = /position (\d+)/.exec(msg);
    let where = '';
    if (pos !== null) {
      const offset = Number(pos[1]);
      const before = text.slice(0, offset);
      const line = before.split('\n').length;
      const column = offset - before.lastIndexOf('\n');
      where = ` at line ${line}, column ${column}`;
    }
    return {
      ok: false,
      scenario: undefined,
      problems: [problem('error', '', `the file is not valid JSON${where}: ${msg}`, 'Fix the JSON syntax there (a missing comma, quote or bracket is the usual cause).')],
      migratedFrom: undefined,
      migrations: [],
    };
  }
  return validateScenarioValue(value);
}
