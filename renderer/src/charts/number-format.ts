// Numbers as the app and the briefing show them: one minus sign throughout (U+2212, the
// typographic minus of ISO 80000-1 and common typesetting practice), clock times as hh:mm and
// durations in hours and minutes. Files meant for other programs (CSV) keep the ASCII hyphen-minus
// through plainNumber so spreadsheets read them as numbers.
import { formatClock } from './clock.js';

export const MINUS = '\u2212';

/** Fixed decimals with "−" for negatives; "−0.0" shows as "0.0"; "—" when unknown. */
export function formatNumber(value: number | null, decimals: number): string {
  const text = plainNumber(value, decimals);
  return text.startsWith('-') ? `${MINUS}${text.slice(1)}` : text === '' ? '—' : text;
}

/** Fixed decimals with an ASCII "-" for files; "" when unknown; "-0.0" shows as "0.0". */
export function plainNumber(value: number | null, decimals: number): string {
  if (value === null || !Number.isFinite(value)) return '';
  const text = value.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** "+1.2", "−0.4", or "±0.0" when the value rounds to zero at the shown decimals. */
export function formatSigned(value: number, decimals: number): string {
  const text = plainNumber(Math.abs(value), decimals);
  if (/^0(\.0*)?$/.test(text)) return `±${text}`;
  return `${value > 0 ? '+' : MINUS}${text}`;
}

/** A duration in hours as "1 h 05 min", "35 min" or "0 min" (to the nearest minute; sign dropped). */
export function formatDuration(hours: number): string {
  const minutes = Math.round(Math.abs(hours) * 60);
  if (minutes < 60) return `${minutes} min`;
  const m = minutes % 60;
  return m === 0 ? `${Math.floor(minutes / 60)} h` : `${Math.floor(minutes / 60)} h ${String(m).padStart(2, '0')} min`;
}

/** A signed duration, e.g. "+1 h 05 min", "−35 min", "±0 min". */
export function formatSignedDuration(hours: number): string {
  const text = formatDuration(hours);
  if (text === '0 min') return '±0 min';
  return `${hours > 0 ? '+' : MINUS}${text}`;
}

/** A clock value in hours (any real number; 24 and over wrap) as "HH:MM"; "—" when unknown. */
export function formatClockValue(hours: number | null): string {
  return hours === null || !Number.isFinite(hours) ? '—' : formatClock(hours);
}
