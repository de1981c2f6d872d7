import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sampleCohort, sampleOccupantTraits } from './sample-occupants.js';
import { populationCohortSpread, zeroCohortSpread, type PersonaTraits } from './occupant-traits.js';
import {
  HABITUAL_MID_SLEEP_SD_H,
  INTRINSIC_PERIOD_SD_H,
  LIGHT_SENSITIVITY_SD_LN,
  PHILLIPS_2019_ED50_RANGE_LX,
  PHILLIPS_2019_PARTICIPANTS,
} from './population-spread.js';

const persona: PersonaTraits = { intrinsicPeriod_h: 24.18, lightSensitivity: 1, age_y: 40 };

function meanSd(xs: readonly number[]): { mean: number; sd: number } {
  let s = 0;
  for (const x of xs) s += x;
  const mean = s / xs.length;
  let ss = 0;
  for (const x of xs) ss += (x - mean) ** 2;
  return { mean, sd: Math.sqrt(ss / (xs.length - 1)) };
}

describe('cohort sampling matches its stated distributions (seed 20261201, n = 20 000)', () => {
  // Tolerances are 4 standard errors for this n: SE(mean) = σ/√n, SE(SD) ≈ σ/√(2(n − 1)) for a
  // normal variable (textbook large-sample results). Truncation at ±4 SD lowers the SD by 0.05 %,
  // far below 4 SE (2.8 %).
  const n = 20_000;
  const cohort = sampleCohort(persona, populationCohortSpread([25, 45]), 20261201, n);
  const seMean = (sd: number) => sd / Math.sqrt(n);
  const seSd = (sd: number) => sd / Math.sqrt(2 * (n - 1));

  it('intrinsic period: mean = persona τ, SD 0.2 h (Duffy et al. 2011 PNAS, 24.15 ± 0.2 h)', () => {
    const { mean, sd } = meanSd(cohort.map((o) => o.intrinsicPeriod_h));
    expect(Math.abs(mean - 24.18)).toBeLessThan(4 * seMean(INTRINSIC_PERIOD_SD_H));
    expect(Math.abs(sd - INTRINSIC_PERIOD_SD_H)).toBeLessThan(4 * seSd(INTRINSIC_PERIOD_SD_H));
  });

  it('light sensitivity: ln multiplier has mean 0 and SD 0.889 (from Phillips et al. 2019 PNAS ED50 range)', () => {
    const { mean, sd } = meanSd(cohort.map((o) => Math.log(o.lightSensitivity)));
    expect(Math.abs(mean)).toBeLessThan(4 * seMean(LIGHT_SENSITIVITY_SD_LN));
    expect(Math.abs(sd - LIGHT_SENSITIVITY_SD_LN)).toBeLessThan(4 * seSd(LIGHT_SENSITIVITY_SD_LN));
  });

  it('habitual mid-sleep shift: mean 0 h, SD 1.27 h (Santisteban et al. 2018, MSFsc SD 1:16)', () => {
    const { mean, sd } = meanSd(cohort.map((o) => o.habitualMidSleepShift_h));
    expect(Math.abs(mean)).toBeLessThan(4 * seMean(HABITUAL_MID_SLEEP_SD_H));
    expect(Math.abs(sd - HABITUAL_MID_SLEEP_SD_H)).toBeLessThan(4 * seSd(HABITUAL_MID_SLEEP_SD_H));
  });

  it('normal traits put 68.27 % of occupants within ±1 SD (standard normal table), within 4 binomial SE', () => {
    const p = 0.6827;
    const within = cohort.filter((o) => Math.abs(o.intrinsicPeriod_h - 24.18) <= INTRINSIC_PERIOD_SD_H).length / n;
    expect(Math.abs(within - p)).toBeLessThan(4 * Math.sqrt((p * (1 - p)) / n));
  });

  it('age: uniform over the persona range 25–45 y (mean 35, SD 20/√12 = 5.77)', () => {
    const ages = cohort.map((o) => o.age_y);
    const { mean, sd } = meanSd(ages);
    const sigma = 20 / Math.sqrt(12);
    // Uniform: SE(variance) = √((μ4 − σ⁴)/n), μ4 = w⁴/80, σ⁴ = w⁴/144; SE(SD) ≈ SE(variance)/(2σ).
    const seVar = Math.sqrt((20 ** 4 / 80 - 20 ** 4 / 144) / n);
    expect(Math.min(...ages)).toBeGreaterThanOrEqual(25);
    expect(Math.max(...ages)).toBeLessThanOrEqual(45);
    expect(Math.abs(mean - 35)).toBeLessThan(4 * seMean(sigma));
    expect(Math.abs(sd - sigma)).toBeLessThan(4 * (seVar / (2 * sigma)));
  });
});

describe('light-sensitivity spread reproduces the published ED50 range', () => {
  it('panels of 55 occupants span on average ln(350/6) in sensitivity (Phillips et al. 2019: 6–350 lx)', () => {
    // Across 1 000 simulated panels the mean of ln(max/min) estimates E[range]; its SD across panels
    // is about 0.6·σ_ln for n = 55 (normal range distribution), so the SE of the average is
    // ≈ 0.53/√1000 = 0.017. Tolerance: 4 SE plus 0.01 for the rounding of σ_ln to three digits.
    const panels = 1000;
    const target = Math.log(PHILLIPS_2019_ED50_RANGE_LX[1] / PHILLIPS_2019_ED50_RANGE_LX[0]);
    let sumRange = 0;
    for (let p = 0; p < panels; p++) {
      const lns = sampleCohort(persona, populationCohortSpread(), 1000 + p, PHILLIPS_2019_PARTICIPANTS).map((o) => Math.log(o.lightSensitivity));
      sumRange += Math.max(...lns) - Math.min(...lns);
    }
    expect(Math.abs(sumRange / panels - target)).toBeLessThan(4 * 0.017 + 0.01);
  });
});

describe('zero-spread cohorts', () => {
  it('give every occupant exactly the persona’s own values', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 22, max: 26, noNaN: true }),
        fc.double({ min: 0.05, max: 20, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.nat({ max: 2 ** 40 }),
        fc.nat({ max: 10_000 }),
        (tau, sens, age, seed, index) => {
          const p: PersonaTraits = { intrinsicPeriod_h: tau, lightSensitivity: sens, age_y: age };
          const o = sampleOccupantTraits(p, zeroCohortSpread(), seed, index);
          expect(o).toEqual({ occupantIndex: index, intrinsicPeriod_h: tau, lightSensitivity: sens, age_y: age, habitualMidSleepShift_h: 0 });
        },
      ),
      { numRuns: 200 },
    );
  });

  it('a one-year age range [a, a] also returns exactly a', () => {
    const o = sampleOccupantTraits(persona, { ...zeroCohortSpread(), ageRange_y: [33, 33] }, 7, 3);
    expect(o.age_y).toBe(33);
  });
});

describe('determinism', () => {
  it('the same seed gives the same occupant whatever else is sampled', () => {
    const spread = populationCohortSpread([20, 60]);
    const whole = sampleCohort(persona, spread, 99, 50);
    expect(sampleOccupantTraits(persona, spread, 99, 37)).toEqual(whole[37]);
    expect(sampleCohort(persona, spread, 99, 10)).toEqual(whole.slice(0, 10));
    expect(sampleCohort(persona, spread, 100, 10)).not.toEqual(whole.slice(0, 10));
  });
});

describe('bad input', () => {
  it('names the offending field', () => {
    expect(() => sampleOccupantTraits({ ...persona, lightSensitivity: 0 }, zeroCohortSpread(), 1, 0)).toThrow(/lightSensitivity/);
    expect(() => sampleOccupantTraits(persona, { ...zeroCohortSpread(), intrinsicPeriodSd_h: -0.1 }, 1, 0)).toThrow(/intrinsicPeriodSd_h/);
    expect(() => sampleOccupantTraits(persona, { ...zeroCohortSpread(), ageRange_y: [50, 30] }, 1, 0)).toThrow(/ageRange_y/);
    expect(() => sampleCohort(persona, zeroCohortSpread(), 1, 0)).toThrow(/cohort size/);
    expect(() => sampleOccupantTraits(persona, zeroCohortSpread(), -5, 0)).toThrow(/seed/);
  });
});
