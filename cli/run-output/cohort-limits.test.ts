import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, validateScenarioValue, type Scenario } from '../../schedules/index.js';
import { UsageError } from '../cli-error.js';
import { cohortWorkerCount } from './cohort-limits.js';

function deskWorker(days: number): Scenario {
  const v = validateScenarioValue({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days }, personas: DEMO_SCENARIO.personas.filter((p) => p.id === 'desk-worker'), rosters: [], strategies: [] });
  if (v.scenario === undefined) throw new Error('scenario does not validate');
  return v.scenario;
}

describe('cohort worker count', () => {
  it('keeps the scenario plus its workers within the person-strategy-day budget', () => {
    // 100 + 2 × (1.5 × 100 + 40) = 480 ≤ 600; a third worker would make 670
    expect(cohortWorkerCount(deskWorker(100), 2)).toBe(2);
    expect(() => cohortWorkerCount(deskWorker(100), 3)).toThrow(UsageError);
    expect(() => cohortWorkerCount(deskWorker(100), 3)).toThrow(/--workers 3: .*at most 2 worker/);
  });

  it('counts the memory of reading a person\'s light logs', () => {
    const s = deskWorker(100);
    const withLog: Scenario = { ...s, personas: s.personas.map((p) => ({ ...p, measuredLight: [{ log: 'wear' }] })) };
    // 100 + 1.5 × (100 + 10 × 16) + 40 = 530 — one worker
    expect(cohortWorkerCount(withLog, undefined, { wear: 16_000_000 })).toBe(1);
  });

  it('refuses a cohort when not even one worker fits, before any work', () => {
    expect(() => cohortWorkerCount(deskWorker(300), undefined)).toThrow(/--cohort: .*not even one worker fits/);
  });
});
