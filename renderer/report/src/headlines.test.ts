import { describe, expect, it } from 'vitest';
import type { MetricValue, ResultsView, RunView } from '../../src/results/view-model.js';
import { dominates, personaSummaries, pickRecommended, sleepyShare_pct, suppressionOf, type StrategyHeadline } from './headlines.js';

const metric = (id: string, label: string, value: number | null): MetricValue => ({ id, label, unit: '%', value, decimals: 1, better: 'lower', increaseWord: 'more', decreaseWord: 'less' });

function run(strategyId: string, dlmoClock_h: number, suppression: number, kss: (number | null)[]): RunView {
  return {
    personaId: 'p',
    strategyId,
    light: { start_h: 0, step_h: 1, sources: [] },
    phases: [{ day: 0, cbtmin_h: dlmoClock_h + 7, dlmo_h: dlmoClock_h }],
    melatonin: { time_h: [], level: [], unsuppressed: null, unit: 'pmol/L' },
    kssHourly: kss,
    sleep: [],
    metrics: [metric('suppression', 'Evening melatonin suppression', suppression)],
  };
}

const head = (id: string, share: number | null, suppression: number | null): StrategyHeadline => ({ strategy: { id, name: id }, phaseShift_h: null, suppression_pct: suppression, sleepyShare_pct: share });

describe('summary numbers', () => {
  it('weights sleepy hours by the minutes at work in each hour (KSS ≥ 7 threshold, common practice)', () => {
    // hour 0: 60 min work at KSS 8; hour 1: 30 min at KSS 6; hour 2: no work at KSS 9
    expect(sleepyShare_pct([8, 6, 9], [60, 30, 0])).toBeCloseTo((100 * 60) / 90, 10);
  });

  it('counts awake hours when no work weights are given, and ignores sleep (null KSS)', () => {
    expect(sleepyShare_pct([7, null, 3, 9], null)).toBeCloseTo((100 * 2) / 3, 10);
    expect(sleepyShare_pct([null, null], null)).toBeNull();
  });

  it('reads evening suppression by metric id, then by label', () => {
    expect(suppressionOf(run('a', 21, 12, []))).toBe(12);
    const other = { ...run('a', 21, 0, []), metrics: [metric('mel-x', 'Melatonin suppression before bed', 7)] };
    expect(suppressionOf(other)).toBe(7);
  });
});

describe('recommendation rule', () => {
  it('a strategy beats the baseline only when better on one number and not worse on the other', () => {
    const base = head('baseline', 20, 10);
    expect(dominates(head('a', 10, 10), base)).toBe(true);
    expect(dominates(head('b', 10, 30), base)).toBe(false);
    expect(dominates(head('c', 20.3, 5), base)).toBe(true);
    expect(dominates(head('d', 20, 10), base)).toBe(false);
  });

  it('keeps the baseline when no strategy dominates it, otherwise picks the lowest sleepy share', () => {
    const base = head('baseline', 20, 10);
    expect(pickRecommended(base, [head('worse', 25, 5)])).toBe(base);
    const best = head('best', 5, 9);
    expect(pickRecommended(base, [head('good', 12, 8), best, head('mixed', 1, 40)])).toBe(best);
  });

  it('breaks a tie in sleepy share by lower evening suppression', () => {
    const base = head('baseline', 20, 10);
    const calm = head('calm', 10.2, 3);
    expect(pickRecommended(base, [head('bright', 10, 8), calm])).toBe(calm);
  });
});

describe('persona summaries', () => {
  const view: ResultsView = {
    scenarioName: 's',
    startDate: '2026-03-23',
    days: 1,
    baselineId: 'baseline',
    strategies: [
      { id: 'baseline', name: 'Baseline' },
      { id: 'morning', name: 'Morning light' },
    ],
    personas: [{ id: 'p', name: 'Pat' }],
    runs: [run('baseline', 22, 20, [8, 8, 5, 5]), run('morning', 21.5, 10, [8, 5, 5, 5])],
    cautions: [],
  };

  it('gives the DLMO advance of the recommended strategy as a positive shift with a plain sentence', () => {
    const [s] = personaSummaries(view, new Map([['p:baseline', [60, 60, 60, 60]], ['p:morning', [60, 60, 60, 60]]]));
    expect(s?.recommended?.strategy.id).toBe('morning');
    expect(s?.recommended?.phaseShift_h).toBeCloseTo(0.5, 10);
    expect(s?.sentences.phase).toContain('0.5 h earlier');
    expect(s?.sentences.suppression).toContain('10 %');
    expect(s?.sentences.sleepiness).toContain('25 % of work hours');
    expect(s?.basis).toBe('work');
  });

  it('falls back to waking hours and says so when the routine has no work', () => {
    const [s] = personaSummaries(view, new Map());
    expect(s?.basis).toBe('awake');
    expect(s?.sentences.sleepiness).toContain('waking hours');
  });
});
