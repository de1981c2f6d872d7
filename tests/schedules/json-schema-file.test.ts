/** The shipped JSON Schema file must match the zod schema it is generated from. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from '../helpers/run-cli.js';
import { scenarioJsonSchema, scenarioJsonSchemaText } from '../../schedules/scenario-json-schema.js';

describe('scenario JSON Schema file', () => {
  it('is up to date (regenerate: npm run build && node scripts/generate-scenario-schema.mjs)', () => {
    const onDisk = readFileSync(join(PROJECT_ROOT, 'schedules', 'scenario.schema.json'), 'utf8');
    expect(onDisk).toBe(scenarioJsonSchemaText());
  });
  it('declares JSON Schema draft 2020-12 and requires the format name and version', () => {
    const s = scenarioJsonSchema();
    expect(s.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(s.required).toEqual(expect.arrayContaining(['format', 'version', 'site', 'places', 'personas', 'run']));
  });
});
