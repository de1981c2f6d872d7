/**
 * Limits of `zeitlight run --cohort`: the cohort size, and the number of worker threads. Memory
 * of a cohort run, measured (docs/validation/robustness.md): the single run before the cohort
 * grows with the scenario's person-strategy-days (SCENARIO_LIMITS.personStrategyDays, about
 * 0.75 MB each above 150 MB); each worker holds one person's light at the eye under every
 * strategy plus its own runtime — about 30 MB + 1.06 MB per person-strategy-day of that person —
 * and reads the person's measured light logs (about 6 MB per MB of log). So in person-strategy-
 * days of the single run, a worker weighs WORKER_WEIGHT × (its person's person-strategy-days +
 * LOG_MB_AS_PERSON_STRATEGY_DAYS per MB of log) + WORKER_BASE, and
 *   scenario + workers × worker weight ≤ SCENARIO_LIMITS.personStrategyDays,
 * which keeps the largest allowed cohort run under 1 GB. Without --workers, the default count
 * (one per processor) is lowered to fit; a --workers above it is refused. Results do not depend
 * on the number of workers. Documented in docs/scenario-format.md ("Limits").
 */
import { UsageError } from '../cli-error.js';
import { defaultWorkerCount } from '../workers/job-pool.js';
import type { Scenario } from '../../schedules/index.js';
import { personStrategyDays, SCENARIO_LIMITS } from '../../schedules/validation/sense/limit-checks.js';

/** Largest cohort per person. */
export const MAX_COHORT_SIZE = 10_000;
/** Most worker threads, whatever the machine. */
export const MAX_COHORT_WORKERS = 64;
/** Memory of reading 1 MB of light log in a worker, in person-strategy-days (see above). */
export const LOG_MB_AS_PERSON_STRATEGY_DAYS = 10;
/** A worker's memory per person-strategy-day of its person, relative to the single run's (see above). */
export const WORKER_WEIGHT = 1.5;
/** A worker thread's own runtime, in person-strategy-days of memory (see above). */
export const WORKER_BASE = 40;

/** The worker count for a cohort of this scenario; throws UsageError when none fits or the requested count does not. */
export function cohortWorkerCount(scenario: Scenario, requested: number | undefined, lightLogBytes: Readonly<Record<string, number>> = {}): number {
  const total = personStrategyDays(scenario);
  const logCost = (ids: readonly string[]) => Math.ceil((ids.reduce((a, id) => a + (lightLogBytes[id] ?? 0), 0) / 1e6) * LOG_MB_AS_PERSON_STRATEGY_DAYS);
  const perPerson = Math.max(...scenario.personas.map((p) => personStrategyDays({ ...scenario, personas: [p] }) + logCost(p.measuredLight.map((m) => m.log))));
  const perWorker = Math.ceil(WORKER_WEIGHT * perPerson + WORKER_BASE);
  const budget = SCENARIO_LIMITS.personStrategyDays;
  const fit = Math.min(MAX_COHORT_WORKERS, Math.floor((budget - total) / perWorker));
  const sizes = `the scenario asks for ${total} person-strategy-days and each worker the memory of ${perWorker} (its largest person${Object.keys(lightLogBytes).length > 0 ? ' with its light logs' : ''}, and the worker itself); with a cohort, the scenario plus its workers may hold at most ${budget}`;
  if (fit < 1) throw new UsageError(`--cohort: ${sizes}, so not even one worker fits — shorten the run, compare fewer strategies or people, or run the cohort without the light logs`);
  if (requested !== undefined && requested > fit) throw new UsageError(`--workers ${requested}: ${sizes}, so at most ${fit} worker(s) fit; give --workers ${fit} or fewer`);
  return requested ?? Math.min(fit, defaultWorkerCount());
}
