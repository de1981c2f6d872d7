/**
 * The JSON Schema of the scenario format (draft 2020-12), generated from the zod schema, for
 * editors that offer completion and checking. It describes the file as written (defaults
 * optional). Sense checks beyond the schema are done by `validateScenarioValue`.
 */
import { z } from 'zod';
import { SCENARIO_FORMAT, SCENARIO_FORMAT_VERSION, scenarioSchema } from './schema/scenario-schema.js';

export const SCENARIO_JSON_SCHEMA_ID = `https://zeitlight.invalid/schema/${SCENARIO_FORMAT}-v${SCENARIO_FORMAT_VERSION}.json`;

export function scenarioJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(scenarioSchema, { io: 'input', target: 'draft-2020-12', unrepresentable: 'any' }) as Record<string, unknown>;
  return {
    $schema: generated.$schema,
    $id: SCENARIO_JSON_SCHEMA_ID,
    title: `Zeitlight scenario, format version ${SCENARIO_FORMAT_VERSION}`,
    ...Object.fromEntries(Object.entries(generated).filter(([k]) => k !== '$schema')),
  };
}

/** The text written to schedules/scenario.schema.json. */
export function scenarioJsonSchemaText(): string {
  return JSON.stringify(scenarioJsonSchema(), null, 2) + '\n';
}
