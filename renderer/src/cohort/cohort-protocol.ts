// Messages between the page and a cohort worker.
import type { OccupantJob, OccupantOutcomeWithSeries } from './occupant-job.js';

export type PageToCohortWorker = { readonly type: 'init'; readonly scenario: unknown } | { readonly type: 'job'; readonly job: OccupantJob };

export type CohortWorkerToPage =
  | { readonly type: 'outcome'; readonly personaId: string; readonly outcome: OccupantOutcomeWithSeries }
  | { readonly type: 'failed'; readonly personaId: string; readonly occupantIndex: number; readonly message: string };
