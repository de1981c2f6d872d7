import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { describeChange } from './strategy-description.js';

describe('strategy change descriptions', () => {
  const strategy = (id: string) => DEMO_SCENARIO.strategies!.find((s) => s.id === id)!;

  it('names the place, the light and the new values of each change as the scenario names them', () => {
    const [change] = strategy('ward-bright-night-start').changes;
    expect(describeChange(DEMO_SCENARIO, change!)).toBe("Adds a light, Bright 6500 K panel, in Hollowmere General, ward Birch, nurses' station: 6500 K, 1000 lx at the eye at full output, on 22:00–01:30 at full output.");
  });

  it('describes behaviour changes with their conditions in plain words', () => {
    const [change] = strategy('ward-amber-drive-home').changes;
    expect(describeChange(DEMO_SCENARIO, change!)).toBe('Mara Quellbrook wears amber glasses that block blue light on the journey home after night shifts.');
  });

  it('gives one line per change', () => {
    const s = strategy('ward-dark-bedroom');
    expect(s.changes.map((c) => describeChange(DEMO_SCENARIO, c))).toEqual([
      "Nurse's bedroom: blinds kept down all the time, letting 1 % of daylight through when down.",
      "Bedside lamp in Nurse's bedroom: switched off.",
    ]);
  });
});
