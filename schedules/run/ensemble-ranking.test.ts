import { describe, expect, test } from 'vitest';
import { rankedBetter, rankingSentence, strategyRanks, type Ranked } from './ensemble-ranking.js';
import type { StrategySummary } from './results-types.js';

const SUMMARY: StrategySummary = {
  mean_mel_dose_lx_h: 0, mean_daytime_hours_ge_250_lx: 0, mean_pre_sleep_mel_edi_lx: null, nights_pre_sleep_meeting_10_lx: 0, nights_sleep_meeting_1_lx: 0, nights_assessed: 0,
  mean_phase_shift_h: 0, mean_phase_angle_dlmo_to_sleep_h: null, mean_melatonin_suppression_pct: null, work_hours: 40, work_hours_kss_ge_7_share: null, mean_sleep_duration_h: null,
};
const s = (kss: number | null, sup: number | null, day: number, misalignment: number | null = 2): Ranked => ({
  summary: { ...SUMMARY, work_hours_kss_ge_7_share: kss, mean_melatonin_suppression_pct: sup, mean_daytime_hours_ge_250_lx: day },
  alignment: misalignment === null ? null : { days: 14, biological_nights: 14, work_h_in_biological_night_per_day: 0, main_sleep_h_in_biological_day_per_day: misalignment, waking_h_in_biological_night_per_day: 0, misalignment_h_per_day: misalignment, cbtmin_in_main_sleep_share: 1 },
});

describe('strategy ranks under one model (the recommendation’s ordered comparison)', () => {
  test('fewer sleepy work hours outranks less misalignment, which outranks less suppression, which outranks more daytime light', () => {
    expect(rankedBetter(s(0.1, 40, 2, 3), s(0.2, 10, 9, 1))).toBe(true);
    expect(rankedBetter(s(0.1, 40, 2, 1), s(0.1, 10, 9, 3))).toBe(true);
    expect(rankedBetter(s(0.1, 10, 2), s(0.1, 20, 9))).toBe(true);
    expect(rankedBetter(s(0.1, 20, 9), s(0.1, 20, 2))).toBe(true);
  });

  test('differences below the recommendation margins do not separate strategies: they share a rank', () => {
    // margins: 1 percentage point of work hours, 0.25 h a day of misalignment, 2 points of suppression, 0.25 h of daytime light
    expect(strategyRanks([s(0, 30, 5, 2), s(0.005, 31.5, 5.2, 2.2), s(0, 20, 5, 2)])).toEqual([2, 2, 1]);
  });
});

describe('ranking sentences', () => {
  test('a rank that changes with the model is said in words, the default model first', () => {
    const sentence = rankingSentence(
      '“Tunable white”',
      [
        { name: 'Jewett et al. 1999 x⁷ oscillator', rank: 1 },
        { name: 'Hannay et al. 2019 single-population model', rank: 2 },
        { name: 'Forger et al. 1999 cubic oscillator', rank: 1 },
      ],
      'body-clock models',
    );
    expect(sentence).toBe('“Tunable white” ranks first with 2 of 3 body-clock models; with the Hannay et al. 2019 single-population model it ranks second.');
  });

  test('several other ranks are listed in order, models of the same rank together', () => {
    const sentence = rankingSentence('The baseline', [{ name: 'A', rank: 2 }, { name: 'B', rank: 4 }, { name: 'C', rank: 1 }, { name: 'D', rank: 4 }], 'body-clock models');
    expect(sentence).toBe('The baseline ranks second with 1 of 4 body-clock models; with the C it ranks first; with the B and the D it ranks fourth.');
  });

  test('with pairs of models, a sleepiness or body-clock model whose every pairing gives one rank is named once', () => {
    const pair = (clock: string, kss: string, rank: number) => ({ name: `${clock} (KSS: ${kss})`, rank, pair: { clock, kss } });
    const sentence = rankingSentence('“Bright light”', [pair('A', 'S', 5), pair('A', 'P', 1), pair('B', 'S', 5), pair('B', 'P', 1), pair('C', 'S', 4), pair('C', 'P', 1)], 'model pairs');
    expect(sentence).toBe('“Bright light” ranks fifth with 2 of 6 model pairs; with KSS from the P (any body-clock model) it ranks first; with the C (KSS: S) it ranks fourth.');
    // a body-clock model whose two pairings share a rank
    expect(rankingSentence('“X”', [pair('A', 'S', 1), pair('A', 'P', 1), pair('B', 'S', 2), pair('B', 'P', 2)], 'model pairs')).toBe('“X” ranks first with 2 of 4 model pairs; with the B (either KSS model) it ranks second.');
  });

  test('no sentence when every model gives the same rank', () => {
    expect(rankingSentence('“X”', [{ name: 'A', rank: 3 }, { name: 'B', rank: 3 }], 'body-clock models')).toBeNull();
  });
});
