/**
 * A pure, deterministic CPU job for checking and timing the worker pool: samples one virtual
 * occupant's traits and folds `iterations` draws of that occupant's own random stream into a
 * checksum. Its result depends only on the job, never on the worker that runs it.
 */
import { occupantStream } from '../../model/cohort/occupant-stream.js';
import { sampleOccupantTraits } from '../../model/cohort/sample-occupants.js';
import type { CohortSpread, OccupantTraits, PersonaTraits } from '../../model/cohort/occupant-traits.js';

export interface SelfCheckJob {
  seed: number;
  occupantIndex: number;
  persona: PersonaTraits;
  spread: CohortSpread;
  iterations: number;
  /** Makes the job throw, to exercise error reporting. */
  failWith?: string;
}

export interface SelfCheckResult {
  traits: OccupantTraits;
  checksum: number;
}

/** Stream id outside the trait streams, so the checksum never disturbs the traits. */
const CHECKSUM_STREAM = 1000;

export function runJob(job: SelfCheckJob): SelfCheckResult {
  if (job.failWith !== undefined) throw new Error(job.failWith);
  const traits = sampleOccupantTraits(job.persona, job.spread, job.seed, job.occupantIndex);
  const rng = occupantStream(job.seed, job.occupantIndex, CHECKSUM_STREAM);
  let checksum = 0;
  for (let i = 0; i < job.iterations; i++) checksum += Math.sin(rng.nextFloat64() * traits.intrinsicPeriod_h);
  return { traits, checksum };
}
