/**
 * Compiles the worker pool, its host, the self-check job and test fixtures (with the model code
 * they import) into a fresh temporary folder, so worker tests run on compiled .js without
 * depending on a full `npm run build` of the whole tree.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { PROJECT_ROOT } from '../helpers/run-cli.js';

export interface CompiledWorkers {
  root: string;
  /** file: URL of a compiled module given its repository path ending in .ts */
  url(repoPathTs: string): URL;
}

export function compileWorkers(): CompiledWorkers {
  const root = mkdtempSync(join(tmpdir(), 'zeitlight-workers-'));
  writeFileSync(join(root, 'package.json'), '{ "type": "module" }\n');
  const tsc = join(PROJECT_ROOT, 'node_modules', 'typescript', 'bin', 'tsc');
  const entries = ['cli/workers/job-pool.ts', 'cli/workers/worker-host.ts', 'cli/workers/self-check-job.ts', 'cli/workers/cohort-run.ts', 'tests/cohort/fixtures/exiting-job.ts'];
  // prettier-ignore
  execFileSync(process.execPath, [tsc, '--outDir', root, '--rootDir', PROJECT_ROOT, '--module', 'NodeNext', '--moduleResolution', 'NodeNext',
    '--target', 'ES2022', '--lib', 'ES2023', '--strict', '--skipLibCheck', '--types', 'node', ...entries.map((e) => join(PROJECT_ROOT, e))], { cwd: PROJECT_ROOT, stdio: 'pipe' });
  return { root, url: (p) => pathToFileURL(join(root, p.replace(/\.ts$/, '.js'))) };
}
