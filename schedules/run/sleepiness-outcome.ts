/**
 * A body-clock outcome read with another sleepiness (KSS) model. Every run computes the KSS of
 * each registered sleepiness model on the same samples (model/circadian/sleepiness-registry.ts,
 * SimulationSamples.kssByModel), so a sleepiness model is swapped without a second body-clock run;
 * everything else in the outcome (phase, melatonin, sleep) is the same.
 */
import { hourlyKss } from '../../model/circadian/body-clock.js';
import type { SimulationRun } from '../../model/circadian/simulate.js';
import type { SleepinessModelId } from '../../model/circadian/sleepiness-registry.js';
import type { BodyClockOutcome } from './body-clock-run.js';

export function outcomeWithSleepiness(bc: BodyClockOutcome, run: SimulationRun, id: SleepinessModelId): BodyClockOutcome {
  const kss = run.samples.kssByModel[id];
  if (kss === bc.kssSamples.kss) return bc;
  return { ...bc, kssSamples: { t_h: run.samples.t_h, kss }, kssHourly: hourlyKss({ ...run, samples: { ...run.samples, kss } }, bc.kssHourly.length) };
}
