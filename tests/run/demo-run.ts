/** The demo scenario run once per test file (the pipeline is deterministic; see golden.test.ts). */
import { DEMO_SCENARIO, validateScenarioValue, type Scenario } from '../../schedules/index.js';
import { runScenario, type RunInput, type RunOutput } from '../../schedules/run/index.js';

export function demoScenario(): Scenario {
  const v = validateScenarioValue(DEMO_SCENARIO);
  if (v.scenario === undefined) throw new Error('demo scenario does not validate');
  return v.scenario;
}

let cached: RunOutput | undefined;
export function demoRun(): RunOutput {
  cached ??= runScenario({ scenario: demoScenario() });
  return cached;
}

export function run(input: RunInput): RunOutput {
  return runScenario(input);
}
