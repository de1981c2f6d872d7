/** The example in docs/scenario-format.md must stay a valid scenario. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from '../helpers/run-cli.js';
import { expandScenario, validateScenarioText } from '../../schedules/index.js';

describe('scenario format documentation', () => {
  const doc = readFileSync(join(PROJECT_ROOT, 'docs', 'scenario-format.md'), 'utf8');
  const block = /<!-- scenario-example:start -->\s*```json\n([\s\S]*?)```\s*<!-- scenario-example:end -->/.exec(doc)?.[1] ?? '';
  it('holds an example that validates with no problems', () => {
    const v = validateScenarioText(block);
    expect(v.problems).toEqual([]);
  });
  it('has an example whose week holds the 25-hour day at the end of summer time (EU Directive 2000/84/EC)', () => {
    const v = validateScenarioText(block);
    if (v.scenario === undefined) throw new Error('invalid example');
    const t = expandScenario(v.scenario).timelines[0];
    expect(t?.total_min).toBe(7 * 1440 + 60);
    expect(t?.days.find((d) => d.date === '2026-10-25')?.length_min).toBe(1500);
  });
});
