import { describe, expect, it } from 'vitest';
import { cohortFromResults } from './cohort-ranges.js';

const d = (p05: number, q25: number, median: number, q75: number, p95: number) => ({ n: 40, missing: 0, median, q25, q75, iqr: q75 - q25, p05, p95, min: p05, max: p95, mean: median });

// A results document's cohort section as `zeitlight run --cohort 40 --seed 7` writes it (docs/results-format.md).
const results = {
  format: 'zeitlight-results',
  cohort: {
    size: 40,
    seed: 7,
    metrics: ['mean_phase_shift_h', 'work_hours_kss_ge_7_share', 'unknown_metric'],
    personas: [
      {
        id: 'desk-worker',
        occupants_run: 40,
        converged_at: null,
        summary: { occupants: 40, strategies: { baseline: { mean_phase_shift_h: d(0, 0, 0, 0, 0), work_hours_kss_ge_7_share: d(0, 0.02, 0.05, 0.1, 0.2) }, daylight: { mean_phase_shift_h: d(-0.8, -0.5, -0.4, -0.3, -0.1), work_hours_kss_ge_7_share: d(0, 0.01, 0.03, 0.06, 0.15) } } },
      },
    ],
  },
};

describe('cohort ranges for the briefing from results.json', () => {
  it('gives one row per person, strategy and known metric (no phase shift for the baseline), with quartiles, shares printed as %', () => {
    const c = cohortFromResults(results);
    expect(c?.occupants).toBe(40);
    expect(c?.seed).toBe(7);
    expect(c?.ranges.map((r) => `${r.strategyId}:${r.label}`)).toEqual(['baseline:Work time with KSS ≥ 7', 'daylight:Phase shift vs baseline, last 7 days (+ later)', 'daylight:Work time with KSS ≥ 7']);
    const kss = c?.ranges[0];
    expect([kss?.p05, kss?.q25, kss?.median, kss?.q75, kss?.p95]).toEqual([0, 2, 5, 10, 20]);
    expect(kss?.unit).toBe('%');
  });

  it('prints the occupants actually run when the stop rule ended the cohort early', () => {
    const early = { cohort: { ...results.cohort, personas: [{ ...results.cohort.personas[0], occupants_run: 250, converged_at: 250 }], size: 1000 } };
    expect(cohortFromResults(early)?.occupants).toBe(250);
  });

  it('has nothing to show without a cohort section or with a malformed one', () => {
    expect(cohortFromResults({ format: 'zeitlight-results' })).toBeUndefined();
    expect(cohortFromResults({ cohort: { personas: 'x' } })).toBeUndefined();
    expect(cohortFromResults(null)).toBeUndefined();
  });
});
