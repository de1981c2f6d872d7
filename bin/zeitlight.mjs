#!/usr/bin/env node
// Launcher for the `zeitlight` command. The TypeScript sources are compiled to dist/ by
// `npm ci` / `npm install` (the "prepare" script) or `npm run build`.
import { existsSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';

const entry = join(fileURLToPath(import.meta.url), '..', '..', 'dist', 'cli', 'main.js');
if (!existsSync(entry)) {
  process.stderr.write('zeitlight: the command line is not built yet; run "npm run build" in the project folder.\n');
  process.exit(1);
}
// A reader that closes the pipe early (`zeitlight sources | head`) is not an error.
process.stdout.on('error', (err) => {
  if (err.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw err;
});
const { runCli } = await import(pathToFileURL(entry).href);
const code = await runCli(process.argv.slice(2), {
  stdout: (t) => process.stdout.write(t),
  stderr: (t) => process.stderr.write(t),
});
process.exitCode = code;
