/** Messages between the job pool (main thread) and its worker hosts. Values travel by structured clone. */

/** Data each worker host starts with. */
export interface WorkerHostData {
  /** file: URL of the compiled job module. */
  jobModuleUrl: string;
  /** Name of the exported per-job function (default `runJob`). */
  exportName: string;
}

export interface JobMessage {
  type: 'job';
  index: number;
  job: unknown;
}

export type HostMessage =
  | { type: 'result'; index: number; result: unknown }
  | { type: 'job-error'; index: number; message: string; stack: string | undefined }
  | { type: 'load-error'; message: string };
