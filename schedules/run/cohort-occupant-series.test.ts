import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { validateScenarioValue } from '../validation/validate-scenario.js';
import { onRegularGrid, OCCUPANT_MELATONIN_STEP_H, prepareCohortPersona, runCohortOccupant, runCohortOccupantWithSeries } from './cohort-occupant.js';

describe('an occupant’s body clock kept for cohort bands', () => {
  it('puts samples on a regular grid by linear interpolation, NaN outside them', () => {
    const grid = onRegularGrid([0, 1, 2], [0, 10, 30], 0.5, 3);
    expect([...grid].slice(0, 5)).toEqual([0, 5, 10, 20, 30]);
    expect(Number.isNaN(grid[5])).toBe(true);
    expect(Number.isNaN(onRegularGrid([1, 2], [5, 6], 1, 2)[0])).toBe(true);
  });

  it('comes from the same body-clock runs as the summaries: same summaries, one curve and marker list per strategy', () => {
    const checked = validateScenarioValue(DEMO_SCENARIO);
    if (checked.scenario === undefined) throw new Error('demo does not validate');
    const base = prepareCohortPersona({ scenario: { ...checked.scenario, run: { ...checked.scenario.run, days: 4 } } }, 'desk-worker');
    const person = { intrinsicPeriod_h: 24.3, lightSensitivity: 1.2, habitualMidSleepShift_h: 0.5 };
    const { summaries, series } = runCohortOccupantWithSeries(base, person);
    expect(summaries).toEqual(runCohortOccupant(base, person));
    for (const s of base.strategies) {
      const one = series[s.id];
      expect(one).toBeDefined();
      expect(one?.melatonin_step_h).toBe(OCCUPANT_MELATONIN_STEP_H);
      expect(one?.melatonin_pmol_L.length).toBe(Math.floor(s.timeline.total_min / 60 / OCCUPANT_MELATONIN_STEP_H + 1e-9) + 1);
      expect(one?.dlmo_h.length).toBeGreaterThan(0);
      expect(one?.cbtmin_h.length).toBeGreaterThan(0);
    }
  });
});
