/**
 * `npm run fuzz`: every robustness property over at least 10 000 generated cases with a fixed
 * seed (tests/fuzz/targets), on worker threads, each case bounded in time: a case still running
 * after HANG_MS is a hang — its thread is stopped and the run goes on with the next case. Prints
 * the findings and one summary line (recorded in docs/validation/robustness.md); then runs the
 * largest inputs the limits allow, one process each, and checks their peak memory (under 1 GB).
 * Exits 1 when anything was found.
 *   node dist/tests/fuzz/fuzz-main.js [--seed <n>] [--workers <n>] [--only <target>] [--scale <x>]
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { parseArgs } from 'node:util';
import { FUZZ_CASES, FUZZ_SEED } from './targets/index.js';
import type { Chunk, WorkerMessage } from './fuzz-worker.js';
import { measureLargestInputs, MEMORY_BOUND_MB } from './largest-inputs.js';

/** Bound on the time of one case (wall clock on a loaded 2-core machine; the slowest cases take a few seconds). */
const HANG_MS = 60_000;
const CHUNK = 100;

interface Found {
  readonly target: string;
  readonly index: number;
  readonly kind: string;
  readonly detail: string;
}

const { values } = parseArgs({ options: { seed: { type: 'string' }, workers: { type: 'string' }, only: { type: 'string' }, scale: { type: 'string' }, 'no-memory': { type: 'boolean' } } });
const seed = values.seed !== undefined ? Number(values.seed) : FUZZ_SEED;
const workerCount = Math.max(1, Number(values.workers ?? Math.min(2, availableParallelism())));
const scale = Number(values.scale ?? 1);
const plan = Object.entries(FUZZ_CASES)
  .filter(([name]) => values.only === undefined || values.only === name)
  .map(([name, n]) => [name, Math.max(1, Math.round(n * scale))] as const);

const queue: Chunk[] = [];
for (const [target, n] of plan) for (let from = 0; from < n; from += CHUNK) queue.push({ target, seed, from, count: Math.min(CHUNK, n - from) });

const found: Found[] = [];
const outcomes: Record<string, Record<string, number>> = {};
let cases = 0;
let longest = { ms: 0, target: '', index: 0 };
const t0 = performance.now();

function runWorker(): Promise<void> {
  return new Promise((done) => {
    const worker = new Worker(new URL('./fuzz-worker.js', import.meta.url));
    let chunk: Chunk | undefined;
    let current: { target: string; index: number; since: number } | undefined;
    let lastEnded = -1;
    const next = () => {
      chunk = queue.shift();
      if (chunk === undefined) {
        clearInterval(watchdog);
        void worker.terminate().then(() => done());
        return;
      }
      lastEnded = chunk.from - 1;
      worker.postMessage(chunk);
    };
    /** The cases of the current chunk that did not run, back to the queue (after a hang or a lost thread). */
    const requeueRest = () => {
      if (chunk === undefined) return;
      const from = lastEnded + 2;
      const end = chunk.from + chunk.count;
      if (from < end) queue.unshift({ ...chunk, from, count: end - from });
    };
    const watchdog = setInterval(() => {
      if (current !== undefined && performance.now() - current.since > HANG_MS) {
        found.push({ target: current.target, index: current.index, kind: 'hang', detail: `still running after ${HANG_MS / 1000} s` });
        cases++;
        lastEnded = current.index;
        requeueRest();
        chunk = undefined;
        current = undefined;
        clearInterval(watchdog);
        void worker.terminate().then(() => runWorker().then(done));
      }
    }, 1000);
    worker.on('message', (m: WorkerMessage) => {
      if (m.type === 'start') current = { target: m.target, index: m.index, since: performance.now() };
      else if (m.type === 'case') {
        cases++;
        lastEnded = m.index;
        current = undefined;
        if (m.ms > longest.ms) longest = { ms: m.ms, target: m.target, index: m.index };
        if (m.ms > HANG_MS) found.push({ target: m.target, index: m.index, kind: 'hang', detail: `took ${(m.ms / 1000).toFixed(1)} s` });
        for (const f of m.findings) found.push({ target: m.target, index: m.index, ...f });
      } else if (m.type === 'chunk-done') {
        for (const [t, o] of Object.entries(m.outcomes)) for (const [k, v] of Object.entries(o)) ((outcomes[t] ??= {})[k] = (outcomes[t]?.[k] ?? 0) + v);
        next();
      } else {
        found.push({ target: chunk?.target ?? '?', index: current?.index ?? -1, kind: 'crash', detail: `the checking thread failed: ${m.message.slice(0, 400)}` });
        requeueRest();
        next();
      }
    });
    worker.on('error', (err) => {
      // An error that escaped into the thread (e.g. out of memory): a crash of the case it was running.
      found.push({ target: current?.target ?? chunk?.target ?? '?', index: current?.index ?? -1, kind: 'crash', detail: `thread stopped: ${err.message.slice(0, 300)}` });
      cases++;
      if (current !== undefined) lastEnded = current.index;
      requeueRest();
      chunk = undefined;
      current = undefined;
      clearInterval(watchdog);
      void runWorker().then(done);
    });
    next();
  });
}

await Promise.all(Array.from({ length: workerCount }, () => runWorker()));

const by = (kind: string) => found.filter((f) => f.kind === kind).length;
for (const f of found.slice(0, 50)) process.stdout.write(`${f.target} #${f.index} ${f.kind}: ${f.detail.replace(/\s+/g, ' ').slice(0, 500)}\n`);
if (found.length > 50) process.stdout.write(`… and ${found.length - 50} more\n`);
for (const [t, o] of Object.entries(outcomes)) process.stdout.write(`${t}: ${Object.entries(o).map(([k, v]) => `${k} ${v}`).join(', ')}\n`);
// The largest allowed inputs, one process each, after the cases (so their memory is measured alone).
const memory = values['no-memory'] === true ? [] : measureLargestInputs();
for (const m of memory) {
  process.stdout.write(`largest inputs — ${m.name}: ${m.peak_mb ?? '?'} MB peak, ${m.seconds.toFixed(0)} s, exit ${m.exitCode}${m.exitCode !== 0 ? ` (${m.message})` : ''}\n`);
  if (m.exitCode !== 0 || m.peak_mb === null || m.peak_mb >= MEMORY_BOUND_MB) found.push({ target: 'largest-inputs', index: 0, kind: 'memory', detail: `${m.name}: ${m.peak_mb ?? '?'} MB, exit ${m.exitCode}` });
}
const perTarget = plan.map(([name, n]) => `${name} ${n}`).join(', ');
const peak = memory.reduce((a, m) => Math.max(a, m.peak_mb ?? Number.POSITIVE_INFINITY), 0);
const seconds = (performance.now() - t0) / 1000;
process.stdout.write(
  `zeitlight fuzz: ${cases} cases (${perTarget}), ${by('crash')} crashes, ${by('hang')} hangs, ${by('unlocated')} unlocated messages, ${by('non-finite')} non-finite numbers${memory.length > 0 ? `; largest allowed inputs peak at ${peak} MB (bound ${MEMORY_BOUND_MB} MB)` : ''}; seed ${seed}, longest case ${(longest.ms / 1000).toFixed(1)} s (${longest.target} #${longest.index}), ${seconds.toFixed(0)} s on ${workerCount} threads\n`,
);
process.exitCode = found.length > 0 ? 1 : 0;
