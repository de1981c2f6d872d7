/**
 * Timestamps in the forms light loggers write: ISO 8601 (with or without an offset), Unix
 * epoch seconds or milliseconds, and day-first, month-first or year-first date-times
 * ("31/03/2026 14:05:00", "03/31/2026 2:05 PM", "2026/03/31 14:05"). A time without an offset is
 * read in the given IANA zone.
 */
import { DateTime, FixedOffsetZone } from 'luxon';
import type { TimestampFormat } from '../schema/light-log-schema.js';

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

function zoneFor(offset: string | undefined, zone: string): string | FixedOffsetZone {
  if (offset === undefined) return zone;
  if (offset === 'Z' || offset === 'UTC' || offset === 'GMT') return FixedOffsetZone.utcInstance;
  const sign = offset.startsWith('-') ? -1 : 1;
  const digits = offset.slice(1).replace(':', '');
  return FixedOffsetZone.instance(sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4))));
}

function build(year: number, month: number, day: number, p: Parts, zone: string): number | undefined {
  if (year < 1970 || year > 2200) return undefined;
  const dt = DateTime.fromObject({ year, month, day, hour: p.h, minute: p.mi, second: p.s, millisecond: p.ms }, { zone: zoneFor(p.offset, zone) });
  return dt.isValid ? dt.toMillis() : undefined;
}

/** UTC ms of a timestamp in the given format; undefined when it cannot be read. */
export function parseTimestamp(text: string, format: Exclude<TimestampFormat, 'auto'>, zone: string): number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  switch (format) {
    case 'epoch-s':
    case 'epoch-ms': {
      if (!/^\d+(\.\d+)?$/.test(t)) return undefined;
      const v = Number(t) * (format === 'epoch-s' ? 1000 : 1);
      return Number.isFinite(v) ? Math.round(v) : undefined;
    }
    case 'iso': {
      const hasOffset = /(Z|[+-]\d{2}(:?\d{2})?)$/.test(t) && /T|\d \d/.test(t);
      const dt = hasOffset ? DateTime.fromISO(t.replace(' ', 'T'), { setZone: true }) : DateTime.fromISO(t.replace(' ', 'T'), { zone });
      return dt.isValid ? dt.toMillis() : undefined;
    }
    case 'ymd':
    case 'dmy':
    case 'mdy': {
      const p = splitDateTime(t);
      if (p === undefined) return undefined;
      if (format === 'ymd') return build(p.a, p.b, p.c, p, zone);
      const year = p.c < 100 ? 2000 + p.c : p.c;
      return format === 'dmy' ? build(year, p.b, p.a, p, zone) : build(year, p.a, p.b, p, zone);
    }
  }
}

export interface DetectedFormat {
  readonly format: Exclude<TimestampFormat, 'auto'> | undefined;
  /** Set when the guess could be wrong (e.g. all days ≤ 12). */
  readonly note: string | undefined;
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
  const texts = samples.map((s) => s.trim()).filter((s) => s !== '');
  if (texts.length === 0) return { format: undefined, note: 'no timestamps to look at' };
  const epoch = texts.filter((t) => EPOCH.test(t));
  const iso = texts.filter((t) => ISO.test(t));
  const parts = texts.map(splitDateTime).filter((p): p is Parts => p !== undefined);
  const best = Math.max(epoch.length, iso.length, parts.length);
  if (2 * best <= texts.length) {
    const unknown = texts.find((t) => !EPOCH.test(t) && !ISO.test(t) && splitDateTime(t) === undefined);
    return { format: undefined, note: unknown !== undefined ? `"${unknown.slice(0, 40)}" is not a date-time form we know` : 'the timestamps are written in several different forms' };
  }
  if (epoch.length === best) return { format: Number(epoch[0]) > 1e11 ? 'epoch-ms' : 'epoch-s', note: undefined };
  if (iso.length === best) return { format: 'iso', note: undefined };
  if (parts.every((p) => p.a > 31)) return { format: 'ymd', note: undefined };
  const firstOver12 = parts.some((p) => p.a > 12);
  const secondOver12 = parts.some((p) => p.b > 12);
  if (firstOver12 && !secondOver12) return { format: 'dmy', note: undefined };
  if (secondOver12 && !firstOver12) return { format: 'mdy', note: undefined };
  if (!firstOver12 && !secondOver12) return { format: 'dmy', note: 'every day number is 12 or less, so day-first was assumed' };
  return { format: undefined, note: 'the dates mix day-first and month-first forms' };
}
