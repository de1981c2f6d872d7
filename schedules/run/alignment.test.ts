import { describe, expect, test } from 'vitest';
import { ALIGNMENT_MARGIN_H, alignmentDirection, alignmentSummary, biologicalNights, type AlignmentInput, type Interval } from './alignment.js';

/** `days` repeated days from day 0: intervals given as clock hours (end may pass 24), markers as clock hours of each day. */
function week(opts: { sleep: [number, number]; work?: [number, number]; cbtmin: number; dlmo?: number | null; days?: number }): AlignmentInput {
  const days = opts.days ?? 5;
  const rep = (iv: [number, number]): Interval[] => Array.from({ length: days }, (_, d) => ({ start_h: d * 24 + iv[0], end_h: d * 24 + iv[1] }));
  return {
    from_h: 24,
    to_h: 24 * 4,
    days: 3,
    work: opts.work === undefined ? [] : rep(opts.work),
    sleep: rep(opts.sleep),
    mainSleepMin_h: 3,
    cbtmin_h: Array.from({ length: days }, (_, d) => d * 24 + opts.cbtmin),
    dlmo_h: opts.dlmo === null ? [] : Array.from({ length: days }, (_, d) => d * 24 + (opts.dlmo ?? opts.cbtmin - 7)),
    fallbackDlmoBeforeCbtmin_h: 7,
  };
}

describe('alignment of the body clock with work and sleep', () => {
  test('a day worker whose biological night covers her sleep and ends at waking scores no misalignment', () => {
    // Sleep 23:00–07:00, work 09:00–17:00, DLMO 22:00, CBTmin 05:00 → biological night 22:00–07:00.
    const a = alignmentSummary(week({ sleep: [23, 31], work: [9, 17], cbtmin: 29 - 24, dlmo: 22 - 24 }));
    expect(a?.misalignment_h_per_day).toBe(0);
    expect(a?.cbtmin_in_main_sleep_share).toBe(1);
  });

  test('a later clock for the day worker counts the waking hour still inside her biological night', () => {
    // CBTmin 06:00 → the biological night runs to 08:00, one hour past her 07:00 wake.
    const a = alignmentSummary(week({ sleep: [23, 31], work: [9, 17], cbtmin: 6 }));
    expect(a?.waking_h_in_biological_night_per_day).toBeCloseTo(1, 6);
    expect(a?.main_sleep_h_in_biological_day_per_day).toBe(0);
    expect(a?.misalignment_h_per_day).toBeCloseTo(1, 6);
  });

  test('an earlier clock for the day worker counts the last hour of sleep in her biological day', () => {
    // CBTmin 04:00 → the biological night ends at 06:00, one hour before she wakes.
    const a = alignmentSummary(week({ sleep: [23, 31], work: [9, 17], cbtmin: 4 }));
    expect(a?.main_sleep_h_in_biological_day_per_day).toBeCloseTo(1, 6);
    expect(a?.misalignment_h_per_day).toBeCloseTo(1, 6);
  });

  test('a night worker with a day-oriented clock works and sleeps at the wrong time; a delayed clock is better aligned', () => {
    // Work 23:00–07:00, sleep 08:00–16:00. Day-oriented clock: CBTmin 05:00, night 22:00–07:00.
    const day = alignmentSummary(week({ sleep: [8, 16], work: [23 - 24, 7], cbtmin: 5 }));
    expect(day?.work_h_in_biological_night_per_day).toBeCloseTo(8, 6);
    expect(day?.main_sleep_h_in_biological_day_per_day).toBeCloseTo(8, 6);
    expect(day?.misalignment_h_per_day).toBeCloseTo(16, 6);
    expect(day?.cbtmin_in_main_sleep_share).toBe(0);
    // Delayed 4 h: CBTmin 09:00, night 02:00–11:00: 5 h of work and 5 h of sleep misplaced.
    const delayed = alignmentSummary(week({ sleep: [8, 16], work: [23 - 24, 7], cbtmin: 9 }));
    expect(delayed?.misalignment_h_per_day).toBeCloseTo(10, 6);
    expect(delayed?.cbtmin_in_main_sleep_share).toBe(1);
    if (day === null || delayed === null) throw new Error('no alignment');
    expect(alignmentDirection(delayed, day)).toBe('toward');
    expect(alignmentDirection(day, delayed)).toBe('away');
  });

  test('counts a minute that is both work and waking in the biological night once', () => {
    // Early shift: sleep 21:00–04:00, work 05:00–13:00, night 22:00–07:00 (CBTmin 05:00):
    // sleep before the night 1 h, awake in the night 04:00–07:00 3 h (2 h of it at work).
    const a = alignmentSummary(week({ sleep: [21 - 24, 4], work: [5, 13], cbtmin: 5 }));
    expect(a?.work_h_in_biological_night_per_day).toBeCloseTo(2, 6);
    expect(a?.waking_h_in_biological_night_per_day).toBeCloseTo(3, 6);
    expect(a?.main_sleep_h_in_biological_day_per_day).toBeCloseTo(1, 6);
    expect(a?.misalignment_h_per_day).toBeCloseTo(4, 6);
  });

  test('without a DLMO the night starts the fallback interval before CBTmin; without CBTmin there is no figure', () => {
    expect(biologicalNights([], [29], 7)).toEqual([{ start_h: 22, end_h: 31 }]);
    expect(biologicalNights([21.5, 40], [29], 7)).toEqual([{ start_h: 21.5, end_h: 31 }]);
    expect(alignmentSummary({ ...week({ sleep: [23, 31], cbtmin: 5 }), cbtmin_h: [] })).toBeNull();
  });

  test('differences within the margin are no change in alignment', () => {
    const at = (h: number) => ({ misalignment_h_per_day: h });
    expect(alignmentDirection(at(2 - ALIGNMENT_MARGIN_H / 2), at(2))).toBe('unchanged');
    expect(alignmentDirection(at(2 + ALIGNMENT_MARGIN_H), at(2))).toBe('away');
    expect(alignmentDirection(at(2 - ALIGNMENT_MARGIN_H), at(2))).toBe('toward');
  });
});
