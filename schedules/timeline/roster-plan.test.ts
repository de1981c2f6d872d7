import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../schema/scenario-schema.js';
import type { Scenario } from '../schema/scenario-types.js';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { expandPersona } from './expand-scenario.js';
import { rosterDay } from './roster-plan.js';

function nurseScenario(edit: (s: Scenario) => void): Scenario {
  const s = scenarioSchema.parse(structuredClone(DEMO_SCENARIO));
  edit(s);
  return s;
}

function sleepBlocks(s: Scenario): { day: number; start_h: number; end_h: number; activity: string }[] {
  const nurse = s.personas.find((p) => p.id === 'nurse');
  if (nurse === undefined) throw new Error('demo changed');
  const t = expandPersona(s, nurse, undefined);
  // The demo's run starts 2026-03-23 in winter time; hours counted from that local midnight.
  return t.slices
    .filter((x) => x.sleep === 'asleep')
    .map((x) => ({ day: Math.floor(x.start_min / 1440), start_h: x.start_min / 60, end_h: x.end_min / 60, activity: x.activity }));
}

describe('roster sleep rules', () => {
  it('follows the cycle from the anchor date, also before it (cycle repeats backwards)', () => {
    const s = nurseScenario(() => {});
    const r = s.rosters[0];
    if (r === undefined) throw new Error('demo changed');
    expect(rosterDay(r, 0, '2026-03-23').kind).toBe('day');
    expect(rosterDay(r, 0, '2026-03-22').kind).toBe('rest'); // last cycle day
    expect(rosterDay(r, 4, '2026-03-23').kind).toBe('night'); // offset by 4 days
  });

  it('splits sleep between nights into a morning sleep and an afternoon nap', () => {
    const s = nurseScenario((x) => {
      const r = x.rosters[0];
      if (r !== undefined) r.sleep.afterNight = 'split';
    });
    const blocks = sleepBlocks(s);
    // Between night 1 (day 4) and night 2 (day 5): morning sleep of 6.5 − 2 = 4.5 h from 08:10,
    // nap of 2 h ending 20:35 (22:00 − 25 min − 60 min).
    const day5 = blocks.filter((b) => b.day === 5);
    expect(day5.map((b) => [b.activity, +(b.end_h - b.start_h).toFixed(2)])).toEqual([
      ['sleep', 4.5],
      ['nap', 2],
    ]);
    expect(day5[1]?.end_h).toBeCloseTo(5 * 24 + 20 + 35 / 60, 6);
  });

  it('gives a short recovery sleep after the last night, then a normal night', () => {
    const blocks = sleepBlocks(nurseScenario(() => {}));
    const day7 = blocks.filter((b) => b.day === 7);
    expect(day7[0]).toMatchObject({ activity: 'sleep' });
    expect((day7[0]?.end_h ?? 0) - (day7[0]?.start_h ?? 0)).toBeCloseTo(4, 6);
    // That evening: usual bedtime 23:00 for 7.5 h (no shift next day). Day 7 is 30 March, after
    // the change to summer time on 29 March, so 23:00 local is one real hour earlier in the run.
    expect(day7[1]?.start_h).toBeCloseTo(7 * 24 + 23 - 1, 6);
    expect((day7[1]?.end_h ?? 0) - (day7[1]?.start_h ?? 0)).toBeCloseTo(7.5, 6);
  });

  it('under free sleep leaves sleep to the model outside work and travel', () => {
    const s = nurseScenario((x) => {
      const p = x.personas.find((q) => q.id === 'nurse');
      if (p !== undefined) p.sleep.mode = 'free';
    });
    const nurse = s.personas.find((p) => p.id === 'nurse');
    if (nurse === undefined) throw new Error('demo changed');
    const t = expandPersona(s, nurse, undefined);
    expect(t.slices.some((x) => x.sleep === 'asleep')).toBe(false);
    for (const x of t.slices) expect(x.sleep).toBe(x.activity === 'work' || x.activity === 'commute' ? 'awake' : 'free');
  });
});
