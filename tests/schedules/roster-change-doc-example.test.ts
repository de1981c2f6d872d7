/** The roster-change example in docs/scenario-format.md must stay a valid strategy for the demo ward. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from '../helpers/run-cli.js';
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';
import { validateScenarioValue } from '../../schedules/index.js';

describe('roster change example in the scenario format guide', () => {
  it('is accepted with no problems as a strategy of the demo scenario', () => {
    const doc = readFileSync(join(PROJECT_ROOT, 'docs', 'scenario-format.md'), 'utf8');
    const block = /```json\n(\{ "id": "short-night-blocks"[\s\S]*?)```/.exec(doc)?.[1];
    expect(block).toBeDefined();
    const strategy = JSON.parse(block ?? '{}') as unknown;
    const s = structuredClone(DEMO_SCENARIO);
    s.strategies = [strategy as never];
    const v = validateScenarioValue(s);
    expect(v.problems).toEqual([]);
  });
});
