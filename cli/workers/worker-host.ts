/**
 * Runs inside each worker thread: loads the job module named in workerData, then answers every
 * job message with the per-job function's result (or its error), tagged with the job index.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { HostMessage, JobMessage, WorkerHostData } from './messages.js';

const port = parentPort;
if (port === null) throw new Error('worker-host.js must run as a worker thread');
const { jobModuleUrl, exportName } = workerData as WorkerHostData;

const post = (message: HostMessage): void => port.postMessage(message);
const describe = (e: unknown): { message: string; stack: string | undefined } =>
  e instanceof Error ? { message: e.message, stack: e.stack } : { message: String(e), stack: undefined };

let runJob: ((job: unknown) => unknown) | null = null;
try {
  const mod = (await import(jobModuleUrl)) as Record<string, unknown>;
  const fn = mod[exportName];
  if (typeof fn !== 'function') {
    post({ type: 'load-error', message: `job module ${jobModuleUrl} has no exported function "${exportName}"` });
  } else {
    runJob = fn as (job: unknown) => unknown;
  }
} catch (e) {
  post({ type: 'load-error', message: `could not load job module ${jobModuleUrl}: ${describe(e).message}` });
}

if (runJob !== null) {
  const run = runJob;
  port.on('message', (message: JobMessage) => {
    void (async () => {
      try {
        const result = await run(message.job);
        post({ type: 'result', index: message.index, result });
      } catch (e) {
        post({ type: 'job-error', index: message.index, ...describe(e) });
      }
    })();
  });
}
