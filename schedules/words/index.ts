/**
 * Words for clients: every sentence and label a client reads (the briefing, the app's summaries,
 * the command line's summary) takes its phrasing from here — the names people gave things in the
 * scenario (never ids), plain words for the format's values and for strategy changes, the models
 * with their one citation each, the one sign convention for body-clock shifts, what a run rests
 * on, and the phase-shift sentences.
 */
export * from './scenario-terms.js';
export * from './scenario-names.js';
export * from './strategy-changes.js';
export * from './place-words.js';
export * from './model-words.js';
export * from './shift-sign.js';
export * from './run-basis-words.js';
export * from './seat-comparison.js';
export {
  alignmentClause,
  alignmentTag,
  baselineAlignmentSentence,
  directionOf,
  durationWords,
  lastDayShiftReading,
  lastDayShiftSentence,
  phaseShiftSentence,
  shortPersonName,
  SAME_TIMING_H,
} from '../run/phase-words.js';
