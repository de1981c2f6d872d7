import { describe, expect, test } from 'vitest';
import type { AlignmentSummary } from './alignment.js';
import { alignmentClause, alignmentTag, directionOf, lastDayShiftReading, phaseShiftSentence } from './phase-words.js';

const fig = (work: number, sleep: number, waking: number): AlignmentSummary => ({
  days: 7,
  biological_nights: 7,
  work_h_in_biological_night_per_day: work,
  main_sleep_h_in_biological_day_per_day: sleep,
  waking_h_in_biological_night_per_day: waking,
  misalignment_h_per_day: work + sleep + waking,
  cbtmin_in_main_sleep_share: 0,
});

describe('phase-shift sentences say whether the shift moves the body clock toward or away from alignment', () => {
  test('a delay for a night worker: toward alignment, with fewer work hours in the biological night', () => {
    expect(phaseShiftSentence({ person: 'Nora', strategyName: 'Bright start of the night shift', isBaseline: false, later_h: 1.1, alignment: fig(5.7, 6.1, 0), baselineAlignment: fig(8, 6.5, 0) })).toBe(
      'Under "Bright start of the night shift", Nora\'s body clock runs about 1 h 06 min later than under the baseline (core-temperature minimum, mean of the last days of the run) — ' +
        "toward alignment with Nora's work and sleep hours: 2.3 h a day less work in the biological night (misalignment 11.8 h a day against 14.5 h a day under the baseline).",
    );
  });

  test('an advance for a day worker that ends the biological night before she wakes: away from alignment', () => {
    expect(phaseShiftSentence({ person: 'Pat', strategyName: 'Dim evening', isBaseline: false, later_h: -0.75, alignment: fig(0, 0.6, 0), baselineAlignment: fig(0, 0, 0) })).toBe(
      'Under "Dim evening", Pat\'s body clock runs about 45 min earlier than under the baseline (core-temperature minimum, mean of the last days of the run) — ' +
        "away from alignment with Pat's work and sleep hours: 36 min a day more main sleep in the biological day (misalignment 0.6 h a day against 0.0 h a day under the baseline).",
    );
  });

  test('a shift that leaves the misalignment within the margin is said to be neither', () => {
    expect(alignmentClause('Pat', fig(0, 0.1, 0), fig(0, 0, 0))).toBe("neither toward nor away from alignment with Pat's work and sleep hours (misalignment 0.1 h a day against 0.0 h a day under the baseline)");
    expect(alignmentClause('Pat', fig(0, 0, 0), fig(0, 0, 0))).toBe("neither toward nor away from alignment with Pat's work and sleep hours (misalignment 0.0 h a day under both)");
  });

  test('views read the last day and tables get a short tag', () => {
    expect(lastDayShiftReading(-1.04, 'Pat', fig(0, 0, 1), fig(0, 0, 0))).toBe(
      "1.0 h earlier (advance) than baseline on the last day — away from alignment with Pat's work and sleep hours: 1.0 h a day more time awake before the biological night is over (misalignment 1.0 h a day against 0.0 h a day under the baseline)",
    );
    expect(alignmentTag(directionOf(fig(1, 1, 0), fig(4, 4, 0)))).toBe('toward alignment');
    expect(alignmentTag(directionOf(null, fig(0, 0, 0)))).toBe('alignment not assessed');
  });
});
