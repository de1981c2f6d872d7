import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { changeWords } from './strategy-changes.js';

describe('roster changes in plain words', () => {
  it('names the roster switched to and from, and the day of the cycle the person starts on', () => {
    const s = structuredClone(DEMO_SCENARIO);
    const first = s.rosters?.[0];
    if (first === undefined) throw new Error('the demo has no roster');
    s.rosters = [first, { ...structuredClone(first), id: 'other', name: 'Twelve-hour rotation' }];
    expect(changeWords(s, { op: 'set-roster', persona: 'nurse', roster: 'other', offsetDays: 3, note: 'option B' })).toBe(
      "Mara Quellbrook's roster: Twelve-hour rotation instead of Ward Birch two-week rotation, from day 4 of its cycle (option B).",
    );
  });

  it('words sleep rules and a cycle list as a roster pattern', () => {
    expect(changeWords(DEMO_SCENARIO, { op: 'set-roster', persona: 'nurse', cycle: ['night', 'night', 'rest'], sleep: { napBeforeFirstNight_h: 0, mainSleep_h: 8 } })).toBe(
      "Mara Quellbrook's roster: cycle 2night rest; a main sleep of 8 h; no nap before the first night.",
    );
  });
});
