/**
 * Deterministic worker_threads pool: runs one per-job function over an index-ordered job list on
 * every core, streams each result back as it finishes, and returns the results ordered by job
 * index. Jobs are handed out in index order to whichever worker is free; since a job's result
 * depends only on the job itself (seeded per index), the returned array is identical for any
 * number of workers.
 *
 * The job module is a compiled ES module (.js) exporting `runJob(job) => result | Promise<result>`
 * with structured-clone-able jobs and results. Workers load compiled code: the host script is
 * resolved next to this file (dist/cli/workers/worker-host.js after `npm run build`).
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { HostMessage, JobMessage, WorkerHostData } from './messages.js';

export interface JobResultEvent<R> {
  index: number;
  result: R;
  /** Jobs finished so far (including this one). */
  completed: number;
  /** Jobs that will run (shrinks if the caller stops early). */
  total: number;
}

export interface JobPoolControl {
  /** Only jobs 0 … count − 1 are still needed: no later job starts, results beyond are dropped. */
  stopAfter(count: number): void;
}

export interface JobPoolOptions<J, R> {
  jobs: readonly J[];
  /** Compiled job module (file URL or absolute path). */
  jobModule: URL | string;
  /** Exported function name in the job module; default "runJob". */
  exportName?: string;
  /** Worker threads; default os.availableParallelism(), never more than the jobs. */
  workers?: number;
  /** Called on the main thread as each job finishes (in completion order). */
  onResult?: (event: JobResultEvent<R>, control: JobPoolControl) => void;
  /** Cancels the run: workers are stopped and the promise rejects with a WorkerPoolError. */
  signal?: AbortSignal;
}

export interface JobPoolRun<R> {
  /** Results of jobs 0 … n − 1, in index order (n = jobs, or the stopAfter count). */
  results: R[];
  workers: number;
  /** True when the caller stopped early. */
  stoppedEarly: boolean;
}

/** A job threw (or its result could not be sent back). */
export class JobFailedError extends Error {
  constructor(
    readonly jobIndex: number,
    message: string,
    readonly workerStack: string | undefined,
  ) {
    super(`job ${jobIndex} failed: ${message}`);
    this.name = 'JobFailedError';
  }
}

/** The pool itself could not run (worker host missing, job module not loadable, worker crashed). */
export class WorkerPoolError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'WorkerPoolError';
  }
}

export function defaultWorkerCount(): number {
  return availableParallelism();
}

const HOST_URL = new URL('./worker-host.js', import.meta.url);

function toFileUrl(module: URL | string): string {
  if (module instanceof URL) return module.href;
  if (module.startsWith('file:')) return module;
  return pathToFileURL(module).href;
}

export async function runJobPool<J, R>(options: JobPoolOptions<J, R>): Promise<JobPoolRun<R>> {
  const total = options.jobs.length;
  const requested = options.workers ?? defaultWorkerCount();
  if (!Number.isSafeInteger(requested) || requested < 1) {
    throw new WorkerPoolError(`workers: must be a whole number ≥ 1, got ${String(requested)}`);
  }
  if (total === 0) return { results: [], workers: 0, stoppedEarly: false };
  const hostPath = fileURLToPath(HOST_URL);
  if (!existsSync(hostPath)) {
    throw new WorkerPoolError(`worker host ${hostPath} not found: workers run compiled code, build first (npm run build)`);
  }
  const jobModuleUrl = toFileUrl(options.jobModule);
  if (!existsSync(fileURLToPath(jobModuleUrl))) {
    throw new WorkerPoolError(`job module ${fileURLToPath(jobModuleUrl)} not found (workers load compiled .js; build first)`);
  }
  if (options.signal?.aborted === true) throw new WorkerPoolError('job run cancelled before it started');
  const workerCount = Math.min(requested, total);
  const hostData: WorkerHostData = { jobModuleUrl, exportName: options.exportName ?? 'runJob' };

  return await new Promise<JobPoolRun<R>>((resolve, reject) => {
    const results: R[] = new Array<R>(total);
    const received = new Uint8Array(total);
    let limit = total;
    let nextIndex = 0;
    let completed = 0; // finished jobs with index < limit
    let settled = false;
    const workers: Worker[] = [];
    const running = new Map<Worker, number>();

    const onAbort = (): void => finish(new WorkerPoolError(`cancelled after ${completed} of ${limit} jobs`));
    const finish = (error: Error | null): void => {
      if (settled) return;
      settled = true;
      options.signal?.removeEventListener('abort', onAbort);
      for (const w of workers) void w.terminate();
      if (error !== null) reject(error);
      else resolve({ results: results.slice(0, limit), workers: workerCount, stoppedEarly: limit < total });
    };

    const control: JobPoolControl = {
      stopAfter(count: number) {
        if (!Number.isSafeInteger(count) || count < 0) throw new RangeError(`stopAfter: must be a whole number ≥ 0, got ${String(count)}`);
        if (count >= limit) return;
        limit = count;
        completed = 0;
        for (let i = 0; i < limit; i++) completed += received[i] as number;
        // Every job below the new limit has already finished: jobs still running beyond it are abandoned.
        if (completed === limit) finish(null);
      },
    };

    const dispatch = (w: Worker): void => {
      if (nextIndex < limit) {
        const index = nextIndex++;
        running.set(w, index);
        const message: JobMessage = { type: 'job', index, job: options.jobs[index] };
        try {
          w.postMessage(message);
        } catch (e) {
          finish(new WorkerPoolError(`job ${index} cannot be sent to a worker: ${e instanceof Error ? e.message : String(e)}`));
        }
      } else {
        running.delete(w);
      }
    };

    options.signal?.addEventListener('abort', onAbort);
    for (let k = 0; k < workerCount; k++) {
      const w = new Worker(HOST_URL, { workerData: hostData });
      workers.push(w);
      w.on('message', (message: HostMessage) => {
        if (settled) return;
        if (message.type === 'load-error') return finish(new WorkerPoolError(message.message));
        const index = message.index;
        running.delete(w);
        if (message.type === 'job-error') {
          // A job beyond an early stop is no longer needed; its failure does not fail the run.
          if (index < limit) return finish(new JobFailedError(index, message.message, message.stack));
          return dispatch(w);
        }
        if (index < limit && received[index] === 0) {
          received[index] = 1;
          results[index] = message.result as R;
          completed++;
          try {
            options.onResult?.({ index, result: results[index] as R, completed, total: limit }, control);
          } catch (e) {
            return finish(e instanceof Error ? e : new Error(String(e)));
          }
        }
        if (settled) return;
        if (completed === limit) return finish(null);
        dispatch(w);
      });
      w.on('error', (e) => {
        const index = running.get(w);
        finish(new WorkerPoolError(`worker ${k} failed${index === undefined ? '' : ` while running job ${index}`}: ${e.message}`));
      });
      w.on('exit', (code) => {
        if (!settled) finish(new WorkerPoolError(`worker ${k} exited unexpectedly with code ${code}${running.has(w) ? ` while running job ${running.get(w)}` : ''}`));
      });
      dispatch(w);
    }
  });
}
