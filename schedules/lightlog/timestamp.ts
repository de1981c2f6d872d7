/**
 * Timestamps in the forms light loggers write: ISO 8601 (with or without an offset), Unix
 * epoch seconds or milliseconds, and day-first, month-first or year-first date-times
 * ("31/03/2026 14:05:00", "03/31/2026 2:05 PM", "2026/03/31 14:05"). A time without an offset is
 * read in the given IANA zone.
 */
import { DateTime } from 'luxon';
import type { TimestampFormat } from '../schema/light-log-schema.js';
import { localToUtcReader, validFields, type LocalFields } from './local-time.js';

const DATE_TIME = /^(\d{1,4})[./-](\d{1,2})[./-](\d{1,4})(?:[ T]+(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,6}))?)?\s*([AaPp][Mm])?)?\s*(Z|[+-]\d{2}:?\d{2}|UTC|GMT)?$/;

interface Parts {
  a: number;
  b: number;
  c: number;
  h: number;
  mi: number;
  s: number;
  ms: number;
  offset: string | undefined;
}

function splitDateTime(text: string): Parts | undefined {
  const m = DATE_TIME.exec(text.trim());
  if (m === null) return undefined;
  let h = Number(m[4] ?? 0);
  const ampm = m[8]?.toLowerCase();
  if (ampm !== undefined) {
    if (h < 1 || h > 12) return undefined;
    h = (h % 12) + (ampm === 'pm' ? 12 : 0);
  }
  const frac = m[7] ?? '';
  return { a: Number(m[1]), b: Number(m[2]), c: Number(m[3]), h, mi: Number(m[5] ?? 0), s: Number(m[6] ?? 0), ms: frac === '' ? 0 : Math.round(Number(`0.${frac}`) * 1000), offset: m[9] };
}

const MIN_YEAR = 1970;
const MAX_YEAR = 2200;

/** ISO 8601 calendar date-times in extended form (the form loggers write); other ISO forms go to luxon. */
const ISO_FAST = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?)?(Z|[+-]\d{2}(?::?\d{2})?)?$/;

function offsetMinutes(offset: string): number {
  if (offset === 'Z' || offset === 'UTC' || offset === 'GMT') return 0;
  const sign = offset.startsWith('-') ? -1 : 1;
  const digits = offset.slice(1).replace(':', '');
  return sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4) || '0'));
}

/**
 * A reader of timestamps in one format and zone: text → UTC ms, undefined when it cannot be read.
 * Local times go through localToUtcReader (one zone lookup per local hour), so long logs read fast.
 */
export function timestampReader(format: Exclude<TimestampFormat, 'auto'>, zone: string): (text: string) => number | undefined {
  const local = localToUtcReader(zone);
  const withOffset = (f: LocalFields, offset: string | undefined): number | undefined => {
    if (f.year < MIN_YEAR || f.year > MAX_YEAR) return undefined;
    if (offset === undefined) return local(f);
    if (!validFields(f)) return undefined;
    const minutes = offsetMinutes(offset);
    if (Math.abs(minutes) > 18 * 60) return undefined;
    return Date.UTC(f.year, f.month - 1, f.day, f.hour, f.minute, f.second, f.millisecond) - minutes * 60_000;
  };
  const isoViaLuxon = (t: string): number | undefined => {
    const hasOffset = /(Z|[+-]\d{2}(:?\d{2})?)$/.test(t) && /T|\d \d/.test(t);
    const dt = hasOffset ? DateTime.fromISO(t.replace(' ', 'T'), { setZone: true }) : DateTime.fromISO(t.replace(' ', 'T'), { zone });
    return dt.isValid ? dt.toMillis() : undefined;
  };
  return (text: string) => {
    const t = text.trim();
    if (t === '') return undefined;
    switch (format) {
      case 'epoch-s':
      case 'epoch-ms': {
        if (!/^\d+(\.\d+)?$/.test(t)) return undefined;
        const v = Number(t) * (format === 'epoch-s' ? 1000 : 1);
        return Number.isFinite(v) && v <= 8.64e15 ? Math.round(v) : undefined;
      }
      case 'iso': {
        const m = ISO_FAST.exec(t);
        if (m === null) return isoViaLuxon(t);
        const frac = m[7] ?? '';
        // Fractions of a second: milliseconds truncated, as luxon reads them.
        const f: LocalFields = { year: Number(m[1]), month: Number(m[2]), day: Number(m[3]), hour: Number(m[4] ?? 0), minute: Number(m[5] ?? 0), second: Number(m[6] ?? 0), millisecond: frac === '' ? 0 : Math.floor(Number(`0.${frac}`) * 1000) };
        if (!validFields(f)) return undefined;
        if (m[8] === undefined || m[4] === undefined) return m[8] === undefined ? local(f) : isoViaLuxon(t);
        const minutes = offsetMinutes(m[8]);
        return Math.abs(minutes) > 18 * 60 ? undefined : Date.UTC(f.year, f.month - 1, f.day, f.hour, f.minute, f.second, f.millisecond) - minutes * 60_000;
      }
      case 'ymd':
      case 'dmy':
      case 'mdy': {
        const p = splitDateTime(t);
        if (p === undefined) return undefined;
        const time = { hour: p.h, minute: p.mi, second: p.s, millisecond: p.ms };
        if (format === 'ymd') return withOffset({ year: p.a, month: p.b, day: p.c, ...time }, p.offset);
        const year = p.c < 100 ? 2000 + p.c : p.c;
        return format === 'dmy' ? withOffset({ year, month: p.b, day: p.a, ...time }, p.offset) : withOffset({ year, month: p.a, day: p.b, ...time }, p.offset);
      }
    }
  };
}

/** UTC ms of a timestamp in the given format; undefined when it cannot be read. */
export function parseTimestamp(text: string, format: Exclude<TimestampFormat, 'auto'>, zone: string): number | undefined {
  return timestampReader(format, zone)(text);
}

export interface DetectedFormat {
  readonly format: Exclude<TimestampFormat, 'auto'> | undefined;
  /** Set when the guess could be wrong (e.g. all days ≤ 12), or says why there is none. */
  readonly note: string | undefined;
  /** Index (in the samples given) of the text the note is about, when there is one. */
  readonly at?: number;
}

const EPOCH = /^\d+(\.\d+)?$/;
const ISO = /^\d{4}-\d{2}-\d{2}([T ]\d{2}:\d{2}(:\d{2}([.,]\d+)?)?)?\s*(Z|[+-]\d{2}(:?\d{2})?)?$/;

/**
 * Guesses the format from a sample of timestamp texts: the form (epoch number, ISO 8601, or a
 * date-time with "/", "." or "-") that most of them are written in, provided more than half are;
 * texts in no known form do not decide anything (their rows are skipped and listed later, as with
 * an explicit format).
 */
export function detectTimestampFormat(samples: readonly string[]): DetectedFormat {
  const trimmed = samples.map((s) => s.trim());
  const texts = trimmed.filter((s) => s !== '');
  if (texts.length === 0) return { format: undefined, note: 'no timestamps to look at' };
  const epoch = texts.filter((t) => EPOCH.test(t));
  const iso = texts.filter((t) => ISO.test(t));
  const parts = texts.map(splitDateTime).filter((p): p is Parts => p !== undefined);
  const best = Math.max(epoch.length, iso.length, parts.length);
  if (2 * best <= texts.length) {
    const at = trimmed.findIndex((t) => t !== '' && !EPOCH.test(t) && !ISO.test(t) && splitDateTime(t) === undefined);
    const unknown = trimmed[at];
    return unknown !== undefined ? { format: undefined, note: `"${unknown.slice(0, 40)}" is not a date-time form we know`, at } : { format: undefined, note: 'the timestamps are written in several different forms', at: 0 };
  }
  if (epoch.length === best) return { format: Number(epoch[0]) > 1e11 ? 'epoch-ms' : 'epoch-s', note: undefined };
  if (iso.length === best) return { format: 'iso', note: undefined };
  if (parts.every((p) => p.a > 31)) return { format: 'ymd', note: undefined };
  const firstOver12 = parts.some((p) => p.a > 12);
  const secondOver12 = parts.some((p) => p.b > 12);
  if (firstOver12 && !secondOver12) return { format: 'dmy', note: undefined };
  if (secondOver12 && !firstOver12) return { format: 'mdy', note: undefined };
  if (!firstOver12 && !secondOver12) return { format: 'dmy', note: 'every day number is 12 or less, so day-first was assumed' };
  const all = trimmed.map(splitDateTime);
  const dayFirst = all.findIndex((p) => p !== undefined && p.a > 12);
  const monthFirst = all.findIndex((p) => p !== undefined && p.b > 12);
  return { format: undefined, note: 'the dates mix day-first and month-first forms', at: Math.max(dayFirst, monthFirst) };
}
