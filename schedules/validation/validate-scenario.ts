/**
 * Validation of a scenario document: migrate older versions, check the schema, then the sense
 * checks that a schema cannot express. Every problem has a path and a plain-language fix.
 */
import { z } from 'zod';
import { migrateScenario } from '../migration/migrate.js';
import { scenarioSchema } from '../schema/scenario-schema.js';
import type { Scenario } from '../schema/scenario-types.js';
import { problem, type ScenarioProblem } from './problem.js';
import { schemaProblems } from './zod-problems.js';
import { referenceChecks } from './sense/reference-checks.js';
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

/** Validates an already-parsed JSON value. */
export function validateScenarioValue(input: unknown): ScenarioValidation {
  const migrated = migrateScenario(input);
  if (migrated.problems.length > 0) {
    return { ok: false, scenario: undefined, problems: migrated.problems, migratedFrom: migrated.fromVersion, migrations: migrated.applied };
  }
  const parsed = scenarioSchema.safeParse(migrated.value);
  if (!parsed.success) {
    return { ok: false, scenario: undefined, problems: schemaProblems(parsed.error, migrated.value, allFieldNames), migratedFrom: migrated.fromVersion, migrations: migrated.applied };
  }
  const scenario = parsed.data;
  const problems = [...siteChecks(scenario), ...referenceChecks(scenario), ...personChecks(scenario), ...timingChecks(scenario)];
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
