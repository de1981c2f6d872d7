// Web Worker entry: runs scenarios off the page's thread so editing stays responsive.
import type { PageToWorker, WorkerToPage } from './simulation-protocol.js';
import { handleRunRequest } from './run-in-worker.js';

interface WorkerScope {
  postMessage(message: WorkerToPage): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<PageToWorker>) => void): void;
}

const scope = self as unknown as WorkerScope;
scope.addEventListener('message', (event) => {
  void handleRunRequest(event.data, (message) => scope.postMessage(message));
});
