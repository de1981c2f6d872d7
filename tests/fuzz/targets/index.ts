/** Every entry point the robustness checks cover, with the cases each gets per run. */
import type { FuzzTarget } from '../target.js';
import { scenarioTarget } from './scenario.js';
import { lightLogTarget } from './light-log.js';
import { epwTarget } from './epw.js';
import { spectrumTarget } from './spectrum.js';
import { sleepTarget } from './sleep.js';
import { argsTarget } from './args.js';

/** The seed of every fuzz run, so that each run (and the sample in npm test) sees the same cases. */
export const FUZZ_SEED = 20261205;

/** Cases per target in `npm run fuzz` (at least 10 000 in all). */
export const FUZZ_CASES: Readonly<Record<string, number>> = { scenario: 3000, 'light-log': 2000, epw: 1500, spectrum: 1500, sleep: 1000, args: 1500 };

/** Cases per target in the sample that `npm test` runs. */
export const SAMPLE_CASES: Readonly<Record<string, number>> = { scenario: 40, 'light-log': 40, epw: 30, spectrum: 30, sleep: 10, args: 40 };

export function fuzzTargets(dir: string): FuzzTarget<never>[] {
  return [scenarioTarget(dir), lightLogTarget(dir), epwTarget(dir), spectrumTarget(dir), sleepTarget(dir), argsTarget(dir)] as unknown as FuzzTarget<never>[];
}
