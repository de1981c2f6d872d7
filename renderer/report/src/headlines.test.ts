import { describe, expect, it } from 'vitest';
import type { MetricValue, ResultsView, RunView } from '../../src/results/view-model.js';
import { personaSummaries, pickRecommended, sleepyShare_pct, suppressionOf, type StrategyHeadline } from './headlines.js';

const metric = (id: string, label: string, value: number | null): MetricValue => ({ id, label, unit: '%', value, decimals: 1, better: 'lower', increaseWord: 'more', decreaseWord: 'less' });

function run(strategyId: string, dlmoClock_h: number, suppression: number, kss: (number | null)[], days = 1, sleep: RunView['sleep'] = []): RunView {
  return {
    personaId: 'p',
    strategyId,
    light: { start_h: 0, step_h: 1, sources: [] },
    phases: Array.from({ length: days }, (_, day) => ({ day, cbtmin_h: 24 * day + dlmoClock_h + 7, dlmo_h: 24 * day + dlmoClock_h })),
    melatonin: { time_h: [], level: [], unsuppressed: null, unit: 'pmol/L' },
    kssHourly: kss,
    sleep,
    metrics: [metric('suppression', 'Evening melatonin suppression', suppression)],
  };
}

const head = (id: string, share: number | null, suppression: number | null, misalignment: number | null = 2): StrategyHeadline => ({
  strategy: { id, name: id },
  phaseShift_h: null,
  suppression_pct: suppression,
  sleepyShare_pct: share,
  alignment: misalignment === null ? null : { days: 7, biological_nights: 7, work_h_in_biological_night_per_day: misalignment, main_sleep_h_in_biological_day_per_day: 0, waking_h_in_biological_night_per_day: 0, misalignment_h_per_day: misalignment, cbtmin_in_main_sleep_share: 1 },
});

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

describe('recommendation rule (the pipeline’s, on the view’s numbers)', () => {
  it('keeps the baseline when every strategy is worse on sleepiness at work or on alignment', () => {
    const base = head('baseline', 20, 10);
    expect(pickRecommended(base, [head('sleepier', 25, 5), head('misaligned', 10, 5, 3)])).toBe(base);
  });

  it('ranks fewer sleepy work hours first, then less misalignment, then less suppression', () => {
    const base = head('baseline', 20, 10, 4);
    const best = head('best', 5, 9, 4);
    expect(pickRecommended(base, [head('good', 12, 8, 1), best])).toBe(best);
    const aligned = head('aligned', 20, 12, 1);
    expect(pickRecommended(base, [head('calm', 20, 3, 4), aligned])).toBe(aligned);
    const calm = head('calm', 20.3, 3, 4.1);
    expect(pickRecommended(base, [head('bright', 20, 8, 4), calm])).toBe(calm);
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

  it('gives the DLMO advance of the recommended strategy as a negative shift (+ later, − earlier) with a plain sentence', () => {
    const [s] = personaSummaries(view, new Map([['p:baseline', [60, 60, 60, 60]], ['p:morning', [60, 60, 60, 60]]]));
    expect(s?.recommended?.strategy.id).toBe('morning');
    expect(s?.recommended?.phaseShift_h).toBeCloseTo(-0.5, 10);
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

  it('gives a later clock for a night worker as a shift toward alignment and recommends it over a strategy that only lowers suppression', () => {
    // Nights 23:00–07:00 (hours 23–31, 47–55), day sleep 08:00–16:00 (hours 32–40, 56–64).
    const daySleep: RunView['sleep'] = [32, 56].map((h) => ({ start_h: h, end_h: h + 8, kind: 'sleep' as const }));
    const work = Array.from({ length: 72 }, (_, h) => ((h >= 23 && h < 31) || (h >= 47 && h < 55) ? 60 : 0));
    const nights: ResultsView = {
      ...view,
      days: 3,
      strategies: [
        { id: 'baseline', name: 'Baseline' },
        { id: 'calm', name: 'Less evening light' },
        { id: 'delay', name: 'Bright start of the night' },
      ],
      personas: [{ id: 'p', name: 'Nora (night nurse)' }],
      // Baseline night 22:00–07:00 (CBTmin 05:00); the delayed one 02:00–11:00 (CBTmin 09:00).
      runs: [run('baseline', -2, 40, [], 3, daySleep), run('calm', -2, 10, [], 3, daySleep), run('delay', 2, 45, [], 3, daySleep)],
    };
    const weights = new Map(['baseline', 'calm', 'delay'].map((id) => [`p:${id}`, work]));
    const [s] = personaSummaries(nights, weights);
    expect(s?.recommended?.strategy.id).toBe('delay');
    expect(s?.all.find((h) => h.strategy.id === 'baseline')?.alignment?.misalignment_h_per_day).toBeCloseTo(32 / 3, 2);
    expect(s?.recommended?.alignment?.misalignment_h_per_day).toBeCloseTo(20 / 3, 2);
    expect(s?.sentences.phase).toContain("4.0 h later than with the baseline by the last day (DLMO) — toward alignment with Nora's work and sleep hours");
  });

  it('quotes the pipeline’s recommendation, sentences and rule when the view carries them', () => {
    const piped: ResultsView = { ...view, recommendations: [{ personaId: 'p', strategyId: 'baseline', reason: 'Because.', headlines: [], rule: 'The rule.', sentences: { phase: 'Phase.', suppression: 'Suppression.', sleepiness: 'Sleepiness.' } }] };
    const [s] = personaSummaries(piped, new Map());
    expect(s?.recommended?.strategy.id).toBe('baseline');
    expect([s?.sentences.phase, s?.sentences.reason, s?.rule]).toEqual(['Phase.', 'Because.', 'The rule.']);
  });
});
