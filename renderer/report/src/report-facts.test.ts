import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { scenarioFacts, workKey } from './scenario-facts.js';
import { representativeDay } from './report-day.js';
import { checkBriefingDocument } from './briefing-document.js';

describe('what was modelled', () => {
  const result = scenarioFacts(DEMO_SCENARIO);
  if (!result.ok) throw new Error(result.message);
  const facts = result.facts;

  it('lists every place, person and strategy of the scenario', () => {
    expect(facts.places.length).toBe(DEMO_SCENARIO.places.length);
    expect(facts.personas.map((p) => p.id)).toEqual(DEMO_SCENARIO.personas.map((p) => p.id));
    expect(facts.strategies.map((s) => s.id)).toEqual((DEMO_SCENARIO.strategies ?? []).map((s) => s.id));
    expect(facts.formatVersion).toBe(2);
  });

  it('draws seven days per person whose bars cover each day from 00:00 to 24:00 without overlap', () => {
    for (const p of facts.personas) {
      expect(p.rows.length).toBe(7);
      for (const row of p.rows) {
        expect(row.bars[0]?.from_h).toBe(0);
        expect(row.bars[row.bars.length - 1]?.to_h).toBeCloseTo(24, 9);
        for (let i = 1; i < row.bars.length; i++) expect(row.bars[i]?.from_h).toBeCloseTo(row.bars[i - 1]?.to_h ?? NaN, 9);
      }
    }
  });

  it('counts work minutes per hour between 0 and 60 for baseline and each applicable strategy', () => {
    const work = facts.workMinutesPerHour.get(workKey('desk-worker', 'baseline'));
    expect(work).toBeDefined();
    expect(work?.every((m) => m >= 0 && m <= 60)).toBe(true);
    expect(work?.reduce((a, b) => a + b, 0)).toBeGreaterThan(0);
    expect(facts.workMinutesPerHour.has(workKey('desk-worker', 'ward-dark-bedroom'))).toBe(false);
  });

  it('names the field of an invalid scenario', () => {
    const bad = scenarioFacts({ ...DEMO_SCENARIO, run: { startDate: '2026-13-40', days: 3 } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toContain('run.startDate');
  });
});

describe('chosen day and document checks', () => {
  it('picks the last working day whose following night is inside the run', () => {
    const work = new Array<number>(5 * 24).fill(0);
    work[1 * 24 + 9] = 60;
    expect(representativeDay(5, work)).toBe(1);
    expect(representativeDay(5, undefined)).toBe(3);
    expect(representativeDay(1, undefined)).toBe(0);
  });

  it('refuses a document without a paper size, naming the field', () => {
    const r = checkBriefingDocument({ kind: 'zeitlight-briefing', paper: 'A3' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('"paper"');
  });
});
