import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { describeChange } from './strategy-description.js';

describe('strategy change descriptions', () => {
  const strategy = (id: string) => DEMO_SCENARIO.strategies!.find((s) => s.id === id)!;

  it('names the place, the item and the new values of each change', () => {
    const [change] = strategy('ward-bright-night-start').changes;
    expect(describeChange(DEMO_SCENARIO, change!)).toBe('Hollowmere General, ward Birch, nurses\' station: adds luminaire “bright-panel”, 1000 lx at the eye, on 22:00–01:30.');
  });

  it('describes behaviour changes with their conditions', () => {
    const [change] = strategy('ward-amber-drive-home').changes;
    expect(describeChange(DEMO_SCENARIO, change!)).toBe('Mara Quellbrook (invented): eyewear → amber (commute, from-work, night shifts).');
  });

  it('gives one line per change', () => {
    const s = strategy('ward-dark-bedroom');
    expect(s.changes.map((c) => describeChange(DEMO_SCENARIO, c))).toEqual([
      'Nurse\'s bedroom: blinds rule becomes “always-down”.',
      'Nurse\'s bedroom: luminaire “bedside” — switched off.',
    ]);
  });
});
