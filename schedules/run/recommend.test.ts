import { describe, expect, test } from 'vitest';
import type { AlignmentSummary } from './alignment.js';
import { compareByRule, headlines, pickByRule, recommend, type RuleFigures } from './recommend.js';
import type { StrategyResult, StrategySummary } from './results-types.js';

type Run = Omit<StrategyResult, 'headlines'>;

/** A misalignment split as a night worker's: work in the biological night and main sleep in the biological day, half each. */
function alignment(mis: number): AlignmentSummary {
  return { days: 7, biological_nights: 7, work_h_in_biological_night_per_day: mis / 2, main_sleep_h_in_biological_day_per_day: mis / 2, waking_h_in_biological_night_per_day: 0, misalignment_h_per_day: mis, cbtmin_in_main_sleep_share: 0 };
}

function run(id: string, f: { share: number; mis: number; sup: number; day?: number; shift?: number }): Run {
  const summary: StrategySummary = {
    mean_mel_dose_lx_h: 1000,
    mean_daytime_hours_ge_250_lx: f.day ?? 1,
    mean_pre_sleep_mel_edi_lx: 50,
    nights_pre_sleep_meeting_10_lx: 0,
    nights_sleep_meeting_1_lx: 7,
    nights_assessed: 7,
    mean_phase_shift_h: f.shift ?? 0,
    mean_phase_angle_dlmo_to_sleep_h: 2,
    mean_melatonin_suppression_pct: f.sup,
    work_hours: 40,
    work_hours_kss_ge_7_share: f.share,
    mean_sleep_duration_h: 7.5,
  };
  return {
    id,
    name: id,
    is_baseline: id === 'baseline',
    changes: [],
    summary,
    days: [],
    hourly: { mel_edi_lx: { daylight: [], electric: [], screen: [], outdoor: [], measured: [], total: [] }, photopic_lx: [], kss: [] },
    cbtmin: [],
    dlmo: [],
    sleep_episodes: [],
    melatonin_nights: [],
    solver: { light_segments: 0, rhs_evaluations: 0 },
    alignment: alignment(f.mis),
  };
}

describe('recommendation rule: sleepiness at work and alignment first, melatonin suppression to break ties', () => {
  test('for a night worker, a strategy that delays her clock toward her day sleep beats one that only lowers melatonin suppression', () => {
    const base = run('baseline', { share: 0.3, mis: 16, sup: 40 });
    const delay = run('delay-toward-day-sleep', { share: 0.3, mis: 10, sup: 43, shift: 3 });
    const calm = run('less-suppression-only', { share: 0.3, mis: 16, sup: 20 });
    const r = recommend('Nora', [base, calm, delay]);
    expect(r.strategy_id).toBe('delay-toward-day-sleep');
    expect(r.reason).toContain('6 h 00 min a day less misalignment');
    expect(r.reason).toContain('melatonin suppression per night rises by 3 points');
  });

  test('fewer sleepy work hours rank first, alignment second', () => {
    const base = run('baseline', { share: 0.2, mis: 16, sup: 40 });
    const alert = run('alert', { share: 0.15, mis: 15, sup: 40 });
    const aligned = run('aligned', { share: 0.2, mis: 10, sup: 40 });
    expect(recommend('Nora', [base, aligned, alert]).strategy_id).toBe('alert');
  });

  test('a strategy worse on sleepiness at work or on alignment is not recommended, whatever else it improves', () => {
    const base = run('baseline', { share: 0.2, mis: 4, sup: 40 });
    const trade = run('alert-but-misaligned', { share: 0.1, mis: 5, sup: 10 });
    const sleepier = run('aligned-but-sleepier', { share: 0.25, mis: 1, sup: 10 });
    expect(recommend('Nora', [base, trade, sleepier]).strategy_id).toBe('baseline');
  });

  test('with sleepiness at work and alignment unchanged, less melatonin suppression decides; more suppression alone does not qualify', () => {
    const base = run('baseline', { share: 0.1, mis: 2, sup: 30 });
    expect(recommend('Pat', [base, run('dim-evening', { share: 0.1, mis: 2.1, sup: 15 })]).strategy_id).toBe('dim-evening');
    expect(recommend('Pat', [base, run('bright-evening', { share: 0.1, mis: 2, sup: 40, day: 3 })]).strategy_id).toBe('baseline');
  });

  test('differences below the margins do not separate strategies', () => {
    const f = (share: number, mis: number, sup: number): RuleFigures => ({ sleepyWorkShare: share, misalignment_h_per_day: mis, suppression_pct: sup, daytime_h_ge_250_lx: 1 });
    expect(compareByRule(f(0.105, 2.1, 31), f(0.1, 2, 30))).toBe(0);
    expect(compareByRule(f(0.1, 1.75, 30), f(0.1, 2, 30))).toBeGreaterThan(0);
    expect(pickByRule('b', ['x'], (t) => (t === 'b' ? f(0.1, 2, 30) : f(0.1, 2.2, 29)))).toBe('b');
  });

  test('the phase-shift headline says whether the shift moves the clock toward or away from alignment', () => {
    const base = run('baseline', { share: 0.3, mis: 16, sup: 40 });
    const delay = run('delay', { share: 0.3, mis: 10, sup: 43, shift: 1.1 });
    const advance = run('advance', { share: 0.3, mis: 18, sup: 40, shift: -0.8 });
    expect(headlines('Nora', delay, base, 'delay', false)[0]?.sentence).toContain('later than under the baseline (core-temperature minimum, mean of the last days of the run) — toward alignment');
    expect(headlines('Nora', advance, base, 'advance', false)[0]?.sentence).toContain('earlier than under the baseline (core-temperature minimum, mean of the last days of the run) — away from alignment');
    expect(headlines('Nora', base, base, 'Baseline', true)[0]?.sentence).toContain("Nora's work and sleep hours are out of step with the body clock for 16.0 h a day");
  });
});
