// Web Worker entry of cohort runs: one of navigator.hardwareConcurrency workers.
import type { CohortWorkerToPage, PageToCohortWorker } from './cohort-protocol.js';
import { cohortWorkerHandler } from './cohort-in-worker.js';

interface WorkerScope {
  postMessage(message: CohortWorkerToPage): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<PageToCohortWorker>) => void): void;
}

const scope = self as unknown as WorkerScope;
const handle = cohortWorkerHandler((message) => scope.postMessage(message));
scope.addEventListener('message', (event) => handle(event.data));
