import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { duplicateStrategy, removeStrategy } from './strategy-edits.js';

describe('strategy list edits', () => {
  it('copies a strategy right after the original with a fresh id, and the result stays valid', () => {
    const once = duplicateStrategy(DEMO_SCENARIO, 'ward-dark-bedroom');
    const twice = duplicateStrategy(once, 'ward-dark-bedroom');
    const ids = twice.strategies!.map((s) => s.id);
    const at = ids.indexOf('ward-dark-bedroom');
    expect(ids.slice(at, at + 3)).toEqual(['ward-dark-bedroom', 'ward-dark-bedroom-copy2', 'ward-dark-bedroom-copy']);
    expect(twice.strategies![at + 1]!.name).toBe('Dark bedroom for day sleep (copy)');
    expect(validateScenarioValue(twice).problems.filter((p) => p.severity === 'error')).toEqual([]);
  });

  it('removes a strategy and leaves the rest in order', () => {
    const ids = removeStrategy(DEMO_SCENARIO, 'ward-amber-drive-home').strategies!.map((s) => s.id);
    expect(ids).not.toContain('ward-amber-drive-home');
    expect(ids).toHaveLength(DEMO_SCENARIO.strategies!.length - 1);
  });
});
