import { describe, expect, it } from 'vitest';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { newScenario } from './new-scenario.js';

describe('new scenario', () => {
  it('passes the scenario format checks without errors', () => {
    const v = validateScenarioValue(newScenario('2026-06-01'));
    expect(v.problems.filter((p) => p.severity === 'error')).toEqual([]);
    expect(v.ok).toBe(true);
  });
});
