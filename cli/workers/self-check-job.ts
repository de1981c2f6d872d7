/**
 * A pure, deterministic CPU job for checking and timing the worker pool: samples one virtual
 * occupant's traits and folds `iterations` draws of that occupant's own random stream into a
 * checksum. Its result depends only on the job, never on the worker that runs it.
 */
import { occupantStream } from '../../model/cohort/occupant-stream.js';
import { sampleOccupantTraits } from '../../model/cohort/sample-occupants.js';
import type { CohortSpread, OccupantTraits, PersonaTraits } from '../../model/cohort/occupant-traits.js';
import type { OccupantOutcome } from '../../model/cohort/aggregate-cohort.js';

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

/**
 * The same job shaped as a cohort outcome with two invented strategies, for checking the cohort
 * runner end to end. The "metrics" are arithmetic on the traits, not model output.
 */
export function runOutcomeJob(job: SelfCheckJob): OccupantOutcome {
  const { traits, checksum } = runJob(job);
  return {
    occupantIndex: job.occupantIndex,
    byStrategy: {
      baseline: { periodExcess_h: traits.intrinsicPeriod_h - 24, checksum },
      brighter: { periodExcess_h: traits.intrinsicPeriod_h - 24 - 0.1 * Math.log(traits.lightSensitivity), checksum },
    },
  };
}
