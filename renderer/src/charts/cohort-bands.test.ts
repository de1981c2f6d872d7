import { describe, expect, it } from 'vitest';
import { bandOf, gridValueAt, markerBands, melatoninBands, type OccupantBodyClock } from './cohort-bands.js';
import type { RunView } from '../results/view-model.js';

const occupant = (dlmo: number[], melatonin: number[] = []): OccupantBodyClock => ({ dlmo_h: dlmo, cbtmin_h: [], melatonin_pmol_L: Float64Array.from(melatonin), melatonin_step_h: 1 });

const run = { phases: [{ day: 0, dlmo_h: 21, cbtmin_h: null }, { day: 1, dlmo_h: 45, cbtmin_h: null }] } as unknown as RunView;

describe('cohort bands', () => {
  it('takes 5–95 % and the interquartile range by Hyndman & Fan definition 7 (as R quantile type 7)', () => {
    // R: quantile(1:11, c(.05, .25, .5, .75, .95), type = 7) → 1.5 3.5 6 8.5 10.5
    expect(bandOf([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11])).toEqual({ outer: [1.5, 10.5], inner: [3.5, 8.5], median: 6, n: 11 });
    expect(bandOf([1, 2, 3, 4])).toBeNull();
  });

  it('matches each occupant’s marker nearest the strategy’s own that day and draws the band around the drawn curve', () => {
    const cohort = [-1, -0.5, 0, 0.5, 1].map((d) => occupant([21 + d, 45 + 2 * d]));
    const bands = markerBands(cohort, run, 'dlmo', [21, 21, null]);
    expect(bands[0]?.median).toBeCloseTo(21, 9);
    expect(bands[0]?.inner).toEqual([20.5, 21.5]);
    // day 1 is drawn at its clock hour 21 (= 45 h since the start)
    expect(bands[1]?.outer[0]).toBeCloseTo(21 - 1.8, 9);
    expect(bands[2]).toBeNull();
  });

  it('reads each occupant’s melatonin curve at the chart’s real times', () => {
    expect(gridValueAt([0, 10, 20], 1, 1.5)).toBe(15);
    expect(Number.isNaN(gridValueAt([0, 10], 1, 3))).toBe(true);
    const cohort = [1, 2, 3, 4, 5].map((k) => occupant([], [0, 10 * k, 20 * k]));
    const [at1] = melatoninBands(cohort, [1]);
    expect(at1?.median).toBe(30);
  });
});
