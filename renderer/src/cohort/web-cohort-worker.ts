// A browser Web Worker running cohort occupants, seen through the pool's narrow WorkerLike.
import type { WorkerLike } from './cohort-pool.js';
import type { CohortWorkerToPage, PageToCohortWorker } from './cohort-protocol.js';

export function createCohortWorker(): WorkerLike {
  const worker = new Worker(new URL('./cohort.worker.ts', import.meta.url), { type: 'module' });
  const like: WorkerLike = {
    onmessage: null,
    onerror: null,
    postMessage: (message: PageToCohortWorker) => worker.postMessage(message),
    terminate: () => worker.terminate(),
  };
  worker.addEventListener('message', (event: MessageEvent<CohortWorkerToPage>) => like.onmessage?.({ data: event.data }));
  worker.addEventListener('error', (event) => like.onerror?.({ message: event.message }));
  return like;
}
