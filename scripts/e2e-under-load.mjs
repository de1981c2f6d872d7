// Race check for the end-to-end suite: runs tests/e2e once on the machine as it is, then once
// while busy loops keep every core occupied, and fails unless both runs pass. A test that waits
// for a passing state on screen, or sizes a wait to one machine's speed, tends to fail in one of
// the two runs. Prints one JSON summary line per run and a closing line; exit code 0 only if both
// runs passed.
//
//   npm run test:e2e:load            (both runs)
//   npm run test:e2e:load -- --load-only
import { spawn } from 'node:child_process';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import * as path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const loadOnly = process.argv.includes('--load-only');

/** Starts one busy process per core; returns a function that stops them. */
function startLoad(cores) {
  const burners = [];
  for (let i = 0; i < cores; i++) {
    burners.push(spawn(process.execPath, ['-e', 'const end = Date.now() + 3_600_000; let x = 0; while (Date.now() < end) x = (x * 1103515245 + 12345) % 2147483648;'], { stdio: 'ignore' }));
  }
  return () => {
    for (const b of burners) b.kill('SIGKILL');
  };
}

function runE2e(label) {
  return new Promise((resolve) => {
    const started = process.hrtime.bigint();
    const child = spawn(process.execPath, [path.join(root, 'node_modules', 'vitest', 'vitest.mjs'), 'run', 'tests/e2e'], { cwd: root, stdio: ['ignore', 'inherit', 'inherit'] });
    child.on('exit', (code, signal) => {
      const seconds = Number(process.hrtime.bigint() - started) / 1e9;
      const result = { run: label, passed: code === 0, exit: code ?? signal, seconds: Math.round(seconds * 10) / 10 };
      console.log(JSON.stringify(result));
      resolve(result);
    });
  });
}

const results = [];
if (!loadOnly) results.push(await runE2e('idle'));
const cores = availableParallelism();
const stopLoad = startLoad(cores);
try {
  results.push(await runE2e(`under load (${cores} busy processes)`));
} finally {
  stopLoad();
}
const failed = results.filter((r) => !r.passed).length;
console.log(`e2e race check: ${results.length - failed} passed, ${failed} failed`);
process.exit(failed === 0 ? 0 : 1);
