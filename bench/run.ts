/**
 * `npm run -s bench -- [--json] [--only <name>]` (`-s` keeps npm's banner off stdout): runs every benchmark case in bench/cases/ and
 * prints one JSON document merging their keys (with --json) or a readable list.
 * A case module exports `bench(): Promise<Record<string, unknown>>` and reports medians over
 * repeated runs. Timing goals live here, never in timed tests.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { parseArgs } from 'node:util';

interface BenchCase {
  bench(): Promise<Record<string, unknown>>;
}

const { values } = parseArgs({ options: { json: { type: 'boolean' }, only: { type: 'string' } }, allowPositionals: false });
const dir = join(dirname(fileURLToPath(import.meta.url)), 'cases');
const files = readdirSync(dir).filter((f) => f.endsWith('.js') && (values.only === undefined || f.startsWith(values.only))).sort();
const merged: Record<string, unknown> = { node: process.version, cores: (await import('node:os')).cpus().length };
for (const f of files) {
  const mod = (await import(pathToFileURL(join(dir, f)).href)) as BenchCase;
  if (!values.json) process.stderr.write(`bench: ${f}\n`);
  Object.assign(merged, await mod.bench());
}
if (values.json) process.stdout.write(JSON.stringify(merged, null, 2) + '\n');
else for (const [k, v] of Object.entries(merged)) process.stdout.write(`${k}: ${JSON.stringify(v)}\n`);
