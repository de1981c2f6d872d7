import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../demo/demo-scenario.js';
import { validateScenarioValue } from '../validate-scenario.js';
import { personStrategyDays, SCENARIO_LIMITS } from './limit-checks.js';

const demo = () => structuredClone(DEMO_SCENARIO) as unknown as { run: { days: number }; personas: { id: string; name: string }[]; places: unknown[] };

describe('scenario limits', () => {
  it('counts each person under the baseline and the strategies meant for them, times the days', () => {
    const nurse = DEMO_SCENARIO.personas.find((p) => p.id === 'nurse');
    const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
    const all = DEMO_SCENARIO.strategies ?? [];
    const forNurse = all.find((s) => s.personas?.join() === 'nurse');
    const forDesk = all.find((s) => s.personas?.join() === 'desk-worker');
    if (nurse === undefined || desk === undefined || forNurse === undefined || forDesk === undefined) throw new Error('demo changed');
    const forBoth = { ...forDesk, id: 'for-both', personas: undefined, changes: forDesk.changes };
    const v = validateScenarioValue({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 10 }, personas: [nurse, desk], strategies: [forNurse, forDesk, forBoth] });
    if (v.scenario === undefined) throw new Error(v.problems.map((x) => x.message).join('; '));
    // nurse: baseline + her strategy + the one for everyone; desk worker the same: 6 runs × 10 days
    expect(personStrategyDays(v.scenario)).toBe(60);
  });

  it('refuses a run longer than the person-strategy-days allow, saying how many days fit', () => {
    const doc = { ...demo(), personas: DEMO_SCENARIO.personas.filter((p) => p.id === 'desk-worker'), strategies: [], run: { startDate: '2026-03-23', days: 400 } };
    const ok = validateScenarioValue(doc);
    expect(ok.problems.filter((x) => x.path === 'run.days')).toEqual([]);
    const twice = { ...doc, strategies: (DEMO_SCENARIO.strategies ?? []).filter((s) => s.personas?.includes('desk-worker')).slice(0, 1).map((s) => ({ ...s, personas: ['desk-worker'] })) };
    const p = validateScenarioValue(twice).problems.find((x) => x.path === 'run.days');
    expect(p?.severity).toBe('error');
    expect(p?.message).toMatch(new RegExp(`800 person-strategy-days.*at most ${SCENARIO_LIMITS.personStrategyDays}`));
    expect(p?.fix).toMatch(/at most 300 days/);
  });

  it('refuses more people than one scenario holds, naming the list', () => {
    const doc = demo();
    const first = doc.personas[1];
    if (first === undefined) throw new Error('demo changed');
    doc.run.days = 1;
    doc.personas = Array.from({ length: SCENARIO_LIMITS.personas + 1 }, (_, i) => ({ ...first, id: `p${i}`, name: `P${i}` }));
    const v = validateScenarioValue(doc);
    expect(v.problems.filter((x) => x.path === 'personas').map((x) => x.message)).toEqual([`${SCENARIO_LIMITS.personas + 1} people; one scenario holds at most ${SCENARIO_LIMITS.personas}`]);
  });
});
