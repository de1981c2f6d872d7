/**
 * Words for clients about body-clock shifts: the one place where a phase shift is put into a
 * sentence for the CLI summary, the app's views and the briefing. Every shift is said together
 * with whether it moves the body clock toward or away from alignment with the person's work and
 * sleep hours (alignment.ts: misalignment hours per day against the baseline), because a later or
 * earlier clock is good or bad only against those hours.
 * Sign convention of the inputs: `later_h` > 0 = later than the baseline (a delay).
 */
import { alignmentDirection, type AlignmentDirection, type AlignmentSummary } from './alignment.js';

/** Shifts smaller than this read as "about the same timing" (h; 5 min). */
export const SAME_TIMING_H = 5 / 60;

/** "1 h 05 min", "40 min". */
export function durationWords(h: number): string {
  const min = Math.round(Math.abs(h) * 60);
  return min >= 60 ? `${Math.floor(min / 60)} h ${String(min % 60).padStart(2, '0')} min` : `${min} min`;
}

/** "2.3 h" from 1 h up, "40 min" below. */
function amount(h: number): string {
  const a = Math.abs(h);
  return a >= 1 - 1 / 120 ? `${a.toFixed(1)} h` : `${Math.round(a * 60)} min`;
}

const perDay = (h: number) => `${h.toFixed(1)} h a day`;

type Alignment = Pick<AlignmentSummary, 'misalignment_h_per_day' | 'work_h_in_biological_night_per_day' | 'main_sleep_h_in_biological_day_per_day' | 'waking_h_in_biological_night_per_day'>;

/** Toward, away or unchanged; null when either side could not be assessed. */
export function directionOf(strategy: Alignment | null | undefined, baseline: Alignment | null | undefined): AlignmentDirection | null {
  return strategy == null || baseline == null ? null : alignmentDirection(strategy, baseline);
}

/** Short tag for tables: "toward alignment", "away from alignment", "alignment unchanged". */
export function alignmentTag(direction: AlignmentDirection | null): string {
  if (direction === null) return 'alignment not assessed';
  return direction === 'toward' ? 'toward alignment' : direction === 'away' ? 'away from alignment' : 'alignment unchanged';
}

/** The part of the misalignment that changed most in the stated direction, in words. */
function mainChange(s: Alignment, b: Alignment, direction: 'toward' | 'away'): string {
  const parts = [
    { d: s.work_h_in_biological_night_per_day - b.work_h_in_biological_night_per_day, what: 'work in the biological night' },
    { d: s.main_sleep_h_in_biological_day_per_day - b.main_sleep_h_in_biological_day_per_day, what: 'main sleep in the biological day' },
    { d: s.waking_h_in_biological_night_per_day - b.waking_h_in_biological_night_per_day, what: 'time awake before the biological night is over' },
  ];
  const sign = direction === 'toward' ? -1 : 1;
  const best = parts.reduce((a, p) => (sign * p.d > sign * a.d ? p : a));
  return `${amount(best.d)} a day ${best.d < 0 ? 'less' : 'more'} ${best.what}`;
}

/**
 * Whether a change moves the body clock toward or away from alignment with `person`'s work and
 * sleep hours, with the main reason and the misalignment under both, e.g.
 * "toward alignment with Nora's work and sleep hours: 2.3 h a day less work in the biological
 * night (misalignment 9.8 h a day against 13.2 h a day under the baseline)".
 */
export function alignmentClause(person: string, strategy: Alignment | null | undefined, baseline: Alignment | null | undefined): string {
  const whose = `${person}'s work and sleep hours`;
  if (strategy == null || baseline == null) return `alignment with ${whose} could not be assessed from these results`;
  const direction = alignmentDirection(strategy, baseline);
  const figures = `misalignment ${perDay(strategy.misalignment_h_per_day)} against ${perDay(baseline.misalignment_h_per_day)} under the baseline`;
  if (direction === 'unchanged') {
    const same = Math.abs(strategy.misalignment_h_per_day - baseline.misalignment_h_per_day) < 0.05;
    return `neither toward nor away from alignment with ${whose} (${same ? `misalignment ${perDay(strategy.misalignment_h_per_day)} under both` : figures})`;
  }
  return `${direction === 'toward' ? 'toward' : 'away from'} alignment with ${whose}: ${mainChange(strategy, baseline, direction)} (${figures})`;
}

export interface PhaseShiftSentenceInput {
  readonly person: string;
  readonly strategyName: string;
  readonly isBaseline: boolean;
  /** Mean CBTmin shift vs the baseline over the last days (h; + later), null when none could be read. */
  readonly later_h: number | null;
  readonly alignment: Alignment | null | undefined;
  readonly baselineAlignment: Alignment | null | undefined;
}

/** The misalignment under the baseline, by part. */
export function baselineAlignmentSentence(person: string, a: Alignment | null | undefined): string {
  if (a == null) return `Under the baseline, the alignment of ${person}'s body clock with work and sleep hours could not be assessed (no body-clock minimum in the run).`;
  return (
    `Under the baseline, ${person}'s work and sleep hours are out of step with the body clock for ${perDay(a.misalignment_h_per_day)} ` +
    `(work in the biological night ${perDay(a.work_h_in_biological_night_per_day)}, main sleep in the biological day ${perDay(a.main_sleep_h_in_biological_day_per_day)}, ` +
    `awake before the biological night is over ${perDay(a.waking_h_in_biological_night_per_day)}; mean over the run). Strategies are compared with this.`
  );
}

/** The phase-shift headline of one strategy (results.json `headlines[]`, CLI summary, app, briefing). */
export function phaseShiftSentence(inp: PhaseShiftSentenceInput): string {
  const { person } = inp;
  if (inp.isBaseline) return baselineAlignmentSentence(person, inp.alignment);
  const under = `Under "${inp.strategyName}"`;
  const clause = alignmentClause(person, inp.alignment, inp.baselineAlignment);
  const s = inp.later_h;
  if (s === null) return `${under}, no phase shift could be read for ${person} (no matching body-clock minimum); ${clause}.`;
  if (Math.abs(s) < SAME_TIMING_H) return `${under}, ${person}'s body clock keeps about the same timing as under the baseline (within 5 min, last days of the run) — ${clause}.`;
  return `${under}, ${person}'s body clock runs about ${durationWords(s)} ${s < 0 ? 'earlier' : 'later'} than under the baseline (core-temperature minimum, mean of the last days of the run) — ${clause}.`;
}

/** A view's one-line reading of a shift on the last day: "1.1 h later (delay) than baseline on the last day — toward alignment …". */
export function lastDayShiftReading(later_h: number | null, person: string, strategy: Alignment | null | undefined, baseline: Alignment | null | undefined): string {
  const clause = alignmentClause(person, strategy, baseline);
  if (later_h === null) return `no common day to compare; ${clause}`;
  if (Math.abs(later_h) < 0.05) return `no shift versus baseline on the last day — ${clause}`;
  return `${Math.abs(later_h).toFixed(1)} h ${later_h < 0 ? 'earlier (advance)' : 'later (delay)'} than baseline on the last day — ${clause}`;
}

/** A briefing sentence for a shift read on the last day from a view's markers: "With “X”, Pat's body clock runs 0.5 h earlier than with the baseline by the last day (DLMO) — …". */
export function lastDayShiftSentence(person: string, strategyName: string, marker: 'DLMO' | 'CBTmin', later_h: number | null, strategy: Alignment | null | undefined, baseline: Alignment | null | undefined): string {
  const clause = alignmentClause(person, strategy, baseline);
  if (later_h === null) return `With “${strategyName}” no day has the ${marker} in both runs, so no shift can be given; ${clause}.`;
  if (Math.abs(later_h) < 0.05) return `With “${strategyName}” ${person}'s body clock keeps the baseline timing by the last day (${marker}) — ${clause}.`;
  return `With “${strategyName}” ${person}'s body clock runs ${Math.abs(later_h).toFixed(1)} h ${later_h < 0 ? 'earlier' : 'later'} than with the baseline by the last day (${marker}) — ${clause}.`;
}

/** A persona's name without a trailing note in brackets ("Mara (night nurse)" → "Mara"), as the sentences use it. */
export function shortPersonName(name: string): string {
  return name.replace(/\s*\([^)]*\)\s*$/, '');
}
