import { describe, expect, it } from 'vitest';
import { validateScenarioValue } from '../validation/validate-scenario.js';
import { demoPart } from './demo-part.js';

describe('a part of the demo', () => {
  it('keeps the people named, the strategies for them narrowed to them, and validates', () => {
    const part = demoPart(['desk-worker']);
    expect(part.personas.map((p) => p.id)).toEqual(['desk-worker']);
    expect(part.rosters).toEqual([]);
    const walk = part.strategies?.find((s) => s.id === 'office-lunch-walk');
    expect(walk?.personas).toEqual(['desk-worker']);
    expect(walk?.changes).toHaveLength(1);
    expect(part.strategies?.some((s) => s.id.startsWith('ward-'))).toBe(false);
    expect(validateScenarioValue(part).problems.filter((p) => p.severity === 'error')).toEqual([]);
  });

  it('takes only the strategies asked for', () => {
    expect(demoPart(['desk-worker', 'deep-desk-worker'], ['office-tunable-white']).strategies?.map((s) => s.id)).toEqual(['office-tunable-white']);
  });
});
