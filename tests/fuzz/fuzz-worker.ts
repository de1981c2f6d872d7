/**
 * A worker thread of `npm run fuzz`: runs the chunks of cases the main thread sends, in its own
 * folder, and reports when each case starts and what it found, so the main thread can tell a case
 * that hangs and stop the thread.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parentPort } from 'node:worker_threads';
import { runCases } from './run-cases.js';
import { fuzzTargets } from './targets/index.js';

export interface Chunk {
  readonly target: string;
  readonly seed: number;
  readonly from: number;
  readonly count: number;
}

export type WorkerMessage =
  | { readonly type: 'start'; readonly target: string; readonly index: number }
  | { readonly type: 'case'; readonly target: string; readonly index: number; readonly findings: readonly { kind: string; detail: string }[]; readonly ms: number }
  | { readonly type: 'chunk-done'; readonly outcomes: Record<string, Record<string, number>> }
  | { readonly type: 'failed'; readonly message: string };

const port = parentPort;
if (port === null) throw new Error('fuzz-worker runs as a worker thread');
const dir = mkdtempSync(join(tmpdir(), 'zeitlight-fuzz-'));
const targets = fuzzTargets(dir);

port.on('message', (chunk: Chunk) => {
  void (async () => {
    const target = targets.find((t) => t.name === chunk.target);
    if (target === undefined) {
      port.postMessage({ type: 'failed', message: `no target ${chunk.target}` } satisfies WorkerMessage);
      return;
    }
    const before = { ...target.outcomes };
    // runCases reports each case when it ends; the start of the next is announced here first.
    port.postMessage({ type: 'start', target: chunk.target, index: chunk.from } satisfies WorkerMessage);
    await runCases(target, chunk.seed, chunk.from, chunk.count, (r) => {
      port.postMessage({ type: 'case', target: r.target, index: r.index, findings: r.findings, ms: r.ms } satisfies WorkerMessage);
      if (r.index + 1 < chunk.from + chunk.count) port.postMessage({ type: 'start', target: chunk.target, index: r.index + 1 } satisfies WorkerMessage);
    });
    const delta: Record<string, number> = {};
    for (const [k, v] of Object.entries(target.outcomes)) if (v - (before[k] ?? 0) > 0) delta[k] = v - (before[k] ?? 0);
    port.postMessage({ type: 'chunk-done', outcomes: { [chunk.target]: delta } } satisfies WorkerMessage);
  })().catch((err: unknown) => port.postMessage({ type: 'failed', message: err instanceof Error ? (err.stack ?? err.message) : String(err) } satisfies WorkerMessage));
});
