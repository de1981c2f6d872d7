/** Brings a scenario written in an older format version up to the current one, step by step. */
import { SCENARIO_FORMAT, SCENARIO_FORMAT_VERSION } from '../schema/scenario-schema.js';
import { problem, type ScenarioProblem } from '../validation/problem.js';
import { migrateV1ToV2 } from './v1-to-v2.js';

type Json = Record<string, unknown>;

/** Migration from version n to n + 1, keyed by n. */
export const MIGRATIONS: Readonly<Record<number, (input: Json) => Json>> = {
  1: migrateV1ToV2,
};

export interface MigrationResult {
  /** The document in the current version (unchanged when it already was). */
  readonly value: unknown;
  readonly fromVersion: number | undefined;
  /** e.g. ["1 → 2"] */
  readonly applied: readonly string[];
  readonly problems: readonly ScenarioProblem[];
}

export function migrateScenario(input: unknown): MigrationResult {
  if (input === null || typeof input !== 'object' || Array.isArray(input)) {
    return { value: input, fromVersion: undefined, applied: [], problems: [problem('error', '', 'the file does not hold a JSON object', 'A scenario is one JSON object { … }; start from the demo scenario.')] };
  }
  const doc = input as Json;
  if (doc.format !== SCENARIO_FORMAT) {
    return {
      value: input,
      fromVersion: undefined,
      applied: [],
      problems: [problem('error', ['format'], doc.format === undefined ? 'this file does not say it is a Zeitlight scenario' : `format ${JSON.stringify(doc.format)} is not a Zeitlight scenario`, `Set "format" to "${SCENARIO_FORMAT}".`)],
    };
  }
  const version = doc.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { value: input, fromVersion: undefined, applied: [], problems: [problem('error', ['version'], 'the format version is missing or not a whole number', `Set "version" to ${SCENARIO_FORMAT_VERSION} (the current version).`)] };
  }
  if (version > SCENARIO_FORMAT_VERSION) {
    return {
      value: input,
      fromVersion: version,
      applied: [],
      problems: [problem('error', ['version'], `format version ${version} is newer than this program understands (${SCENARIO_FORMAT_VERSION})`, 'Open it with a newer version of Zeitlight.')],
    };
  }
  let value: Json = doc;
  const applied: string[] = [];
  for (let v = version; v < SCENARIO_FORMAT_VERSION; v++) {
    const step = MIGRATIONS[v];
    if (step === undefined) {
      return { value, fromVersion: version, applied, problems: [problem('error', ['version'], `no migration from version ${v}`, `Set "version" to ${SCENARIO_FORMAT_VERSION} and check the fields by hand.`)] };
    }
    value = step(value);
    applied.push(`${v} → ${v + 1}`);
  }
  return { value, fromVersion: version, applied, problems: [] };
}
