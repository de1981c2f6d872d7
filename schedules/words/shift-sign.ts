/**
 * The one sign convention for body-clock (phase) shifts, used by results.json
 * (`mean_phase_shift_h`), summary.csv, the command line, the app and the briefing: a shift is the
 * strategy's body-clock time minus the baseline's, in hours, so + means later (a delay) and −
 * earlier (an advance). Numbers carry their sign ("+1.45", "−0.66"); words say "later" or
 * "earlier".
 */
import { SAME_TIMING_H } from '../run/phase-words.js';

/** The convention, stated once wherever shifts are printed. */
export const PHASE_SHIFT_CONVENTION = 'Body-clock shifts are given in hours against the baseline: + means later (a delay), − means earlier (an advance).';

/** Short form for labels: "(+ later, − earlier)". */
export const PHASE_SHIFT_SIGN_LABEL = '+ later, − earlier';

/** "+1.45", "−0.66", "0.00": a shift with its sign (typographic minus) at the given decimals. */
export function signedShift(later_h: number, decimals = 2): string {
  let text = later_h.toFixed(decimals);
  if (/^-0(\.0*)?$/.test(text)) text = text.slice(1);
  if (text.startsWith('-')) return `−${text.slice(1)}`;
  return /^0(\.0*)?$/.test(text) ? text : `+${text}`;
}

/** "1.5 h later", "0.7 h earlier", or "no shift" below 5 min, where the shift sentences say "about the same timing" (phase-words.ts): a shift in words at one decimal. */
export function shiftInWords(later_h: number | null): string {
  if (later_h === null) return '—';
  if (Math.abs(later_h) < SAME_TIMING_H) return 'no shift';
  return `${Math.abs(later_h).toFixed(1)} h ${later_h > 0 ? 'later' : 'earlier'}`;
}

/** Direction of a printed shift: its sign or its word ("later"/"earlier"); null for no shift. */
export function directionOfShift(text: string): 'later' | 'earlier' | null {
  if (/\blater\b/.test(text) || /^\+\d/.test(text.trim())) return 'later';
  if (/\bearlier\b/.test(text) || /^[−-]\d/.test(text.trim())) return 'earlier';
  return null;
}
