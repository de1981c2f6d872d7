#!/usr/bin/env node
// Writes schedules/scenario.schema.json from the zod scenario schema.
// Run after `npm run build` (it loads the compiled module from dist/):
//   npm run build && node scripts/generate-scenario-schema.mjs
// tests/schedules/json-schema-file.test.ts fails when the file is out of date.
import { writeFileSync, renameSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

const root = join(fileURLToPath(import.meta.url), '..', '..');
const { scenarioJsonSchemaText } = await import(join(root, 'dist', 'schedules', 'scenario-json-schema.js'));
const target = join(root, 'schedules', 'scenario.schema.json');
const tmp = `${target}.tmp`;
writeFileSync(tmp, scenarioJsonSchemaText());
renameSync(tmp, target);
console.log(`wrote ${target}`);
