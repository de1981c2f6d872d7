/** Runs the built `zeitlight` launcher as a user would, capturing stdout, stderr and exit code. */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

export const PROJECT_ROOT = join(fileURLToPath(import.meta.url), '..', '..', '..');
const LAUNCHER = join(PROJECT_ROOT, 'bin', 'zeitlight.mjs');

export interface CliResult {
  status: number;
  stdout: string;
  stderr: string;
}

export function runZeitlight(args: readonly string[], options: { cwd?: string; input?: string } = {}): CliResult {
  const r = spawnSync(process.execPath, [LAUNCHER, ...args], {
    cwd: options.cwd ?? PROJECT_ROOT,
    input: options.input,
    encoding: 'utf8',
    timeout: 120_000,
  });
  return { status: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}
