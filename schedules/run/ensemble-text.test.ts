import { describe, expect, test } from 'vitest';
import { figureNumber, rangeText, valueWithRange } from './ensemble-text.js';
import type { EnsembleRange } from './results-types.js';

const range = (min: number | null, max: number | null, n = 3): EnsembleRange => ({ default: min, min, max, model_count: n, models: [] });

describe('ensemble ranges in words for the CLI', () => {
  test('a phase shift shows its sign and the range beside the default model’s value', () => {
    expect(valueWithRange('mean_phase_shift_h', 0.42, range(0.3, 0.55))).toBe('+0.42 h (models: +0.30 to +0.55 h)');
    expect(valueWithRange('mean_phase_shift_h', -0.4, range(-0.55, -0.3))).toBe('−0.40 h (models: −0.55 to −0.30 h)');
  });

  test('shares are shown in percent and agreeing models are said to agree', () => {
    expect(valueWithRange('work_hours_kss_ge_7_share', 0.0132, range(0, 0.0164, 6))).toBe('1 % (models: 0 to 2 %)');
    expect(valueWithRange('work_hours_kss_ge_7_share', 0, range(0, 0, 6))).toBe('0 % (all 6 models: 0 %)');
  });

  test('no range without the ensemble or with a single model; a dash for no value', () => {
    expect(valueWithRange('mean_melatonin_suppression_pct', 37.4, undefined)).toBe('37 %');
    expect(valueWithRange('mean_melatonin_suppression_pct', 37.4, range(37.4, 37.4, 1))).toBe('37 %');
    expect(figureNumber('mean_phase_angle_dlmo_to_sleep_h', null)).toBe('—');
    expect(rangeText('mean_phase_angle_dlmo_to_sleep_h', range(null, null, 0))).toBe('—');
  });

  test('a value that rounds to zero shows neither sign', () => {
    expect(figureNumber('mean_phase_shift_h', -0.001)).toBe('0.00');
    expect(figureNumber('mean_phase_shift_h', 0.001)).toBe('0.00');
  });
});
