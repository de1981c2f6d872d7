import { describe, expect, it } from 'vitest';
import { runStatus } from './run-status.js';
import { readChoice, writeChoice } from './remembered-choice.js';
import { headlineRangeText, headlineText } from './summary-text.js';
import { wrapWords } from '../charts/wrap-words.js';

describe('status line', () => {
  it('says plainly whether the results are up to date, running and why, or need a run and why', () => {
    expect(runStatus({ status: 'ready', view: {} as never }, []).state).toBe('Results up to date');
    const running = runStatus({ status: 'running', fraction: 0.2, stage: 'Nurse: Baseline', previous: {} as never }, []);
    expect(running.state).toBe('Running');
    expect(running.reason).toContain('After your edit');
    expect(runStatus({ status: 'running', fraction: 0, stage: 'Starting', previous: null }, []).reason).toContain('First run');
    const problem = { severity: 'error', path: 'site.latitude_deg', message: 'too large', fix: 'use −90 … 90' } as const;
    expect(runStatus({ status: 'failed', message: 'Fix the problems' }, [problem])).toMatchObject({ state: 'Needs fixes', reason: expect.stringContaining('1 problem in the scenario') });
    expect(runStatus({ status: 'unavailable', message: 'This scenario needs its weather file.' }, [])).toMatchObject({ state: 'Needs a run', reason: 'This scenario needs its weather file.' });
  });
});

describe('remembered choices', () => {
  it('reads back only allowed values and falls back otherwise', () => {
    const store = new Map<string, string>();
    const storage = { getItem: (k: string) => store.get(k) ?? null, setItem: (k: string, v: string) => void store.set(k, v) };
    expect(readChoice('light-scale', ['capped', 'log'] as const, 'capped', storage)).toBe('capped');
    writeChoice('light-scale', 'log', storage);
    expect(readChoice('light-scale', ['capped', 'log'] as const, 'capped', storage)).toBe('log');
    store.set('zeitlight.light-scale', 'sideways');
    expect(readChoice('light-scale', ['capped', 'log'] as const, 'capped', storage)).toBe('capped');
    expect(readChoice('light-scale', ['capped', 'log'] as const, 'capped', null)).toBe('capped');
  });
});

describe('summary wording', () => {
  it('gives the body-clock shift as a duration earlier or later, the others in %', () => {
    expect(headlineText('phase_shift_h', -0.58, false)).toBe('35 min earlier');
    expect(headlineText('phase_shift_h', 1.05, false)).toBe('1 h 03 min later');
    expect(headlineText('phase_shift_h', 0, true)).toBe('reference');
    expect(headlineText('melatonin_suppression_pct', 32.6, false)).toBe('33 %');
    expect(headlineText('work_hours_kss_ge_7_share', 0.125, false)).toBe('13 %');
    expect(headlineText('work_hours_kss_ge_7_share', null, false)).toBe('not available');
  });

  it('gives a headline’s range across the models in the same words', () => {
    expect(headlineRangeText('phase_shift_h', { min: -0.75, max: -0.5, models: 3 })).toBe('30–45 min earlier across 3 models');
    expect(headlineRangeText('phase_shift_h', { min: 0.5, max: 1.25, models: 3 })).toBe('30 min–1 h 15 min later across 3 models');
    expect(headlineRangeText('phase_shift_h', { min: -0.25, max: 0.25, models: 3 })).toBe('15 min earlier to 15 min later across 3 models');
    expect(headlineRangeText('melatonin_suppression_pct', { min: 20.2, max: 31, models: 6 })).toBe('20–31 % across 6 models');
  });
});

describe('strategy names on chart axes', () => {
  it('wraps at spaces instead of cutting', () => {
    expect(wrapWords('Tunable white: brighter day, warmer afternoon', 30)).toEqual(['Tunable white: brighter day,', 'warmer afternoon']);
    expect(wrapWords('Baseline', 30)).toEqual(['Baseline']);
  });
});
