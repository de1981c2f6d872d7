/**
 * The words for a gap in a measured light log: when it starts and ends (local time in the log's
 * zone), how long it is, why (no readings, or the logger marked as not worn), which line of the
 * file it follows, and how the run fills it (the log's fill rule, log-to-minutes.ts).
 */
import { DateTime } from 'luxon';
import type { FillRule } from '../schema/light-log-schema.js';
import type { LogGap } from './import-light-log.js';

/** What each fill rule puts into a gap. */
export const FILL_RULE_WORDS: Readonly<Record<FillRule, string>> = {
  model: 'the modelled light at the eye',
  dark: 'darkness (0 lx)',
  hold: 'the last reading before it',
  linear: 'a straight line between the readings either side',
};

function localTime(utc_ms: number, zone: string): string {
  const t = DateTime.fromMillis(utc_ms, { zone });
  return t.isValid ? t.toFormat('yyyy-MM-dd HH:mm') : new Date(utc_ms).toISOString().slice(0, 16).replace('T', ' ') + ' UTC';
}

function duration(min: number): string {
  if (min < 120) return `${Math.round(min)} min`;
  const h = min / 60;
  return h < 48 ? `${h.toFixed(1)} h` : `${(h / 24).toFixed(1)} days`;
}

/** One sentence for one gap, e.g. `gap from 2026-03-24 10:20 to 2026-03-24 10:40 (20 min, no readings) after line 21: filled with …`. */
export function describeGap(gap: LogGap, fill: FillRule, zone: string): string {
  const why = gap.reason === 'not-worn' ? 'logger not worn' : 'no readings';
  return `gap from ${localTime(gap.start_ms, zone)} to ${localTime(gap.end_ms, zone)} (${duration(gap.duration_min)}, ${why}) after line ${gap.line}: filled with ${FILL_RULE_WORDS[fill]} ("${fill}" rule)`;
}
