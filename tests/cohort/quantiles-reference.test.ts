import { describe, expect, it } from 'vitest';
import { quantileSorted } from 'victory-vendor/d3-array';
import { quantileOfSorted } from '../../model/cohort/quantiles.js';
import { sampleCohort } from '../../model/cohort/sample-occupants.js';
import { populationCohortSpread } from '../../model/cohort/occupant-traits.js';

describe('cohort quantiles agree with an independent library', () => {
  it('match d3-array quantileSorted (R-7 definition; npm d3-array via recharts’ victory-vendor) on sampled traits', () => {
    const persona = { intrinsicPeriod_h: 24.2, lightSensitivity: 1, age_y: 30 };
    for (const n of [1, 2, 3, 10, 101, 1000]) {
      const xs = sampleCohort(persona, populationCohortSpread([18, 65]), n, n)
        .map((o) => o.lightSensitivity)
        .sort((a, b) => a - b);
      for (const p of [0, 0.05, 0.25, 0.5, 0.75, 0.95, 1]) {
        expect(quantileOfSorted(xs, p)).toBeCloseTo(quantileSorted(xs, p) as number, 12);
      }
    }
  });
});
