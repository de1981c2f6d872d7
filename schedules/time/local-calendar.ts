/**
 * Local wall-clock time at the site ↔ real (UTC) instants, through the IANA time-zone rules
 * (luxon). Daylight-saving transitions: a wall time that does not exist (the skipped spring hour)
 * maps to the instant of the transition; a wall time that occurs twice (the repeated autumn hour)
 * maps to its first occurrence. This keeps the mapping monotonic, so segments laid out in wall
 * time tile real time with no gap and no overlap.
 */
import { IANAZone } from 'luxon';

const MS_PER_MIN = 60_000;

export function isValidTimeZone(zone: string): boolean {
  return IANAZone.isValidZone(zone);
}

/**
 * Offset lookups go through Intl and are slow; offsets are memoised per zone on a 15-minute grid
 * (every transition in the modern tz database falls on a quarter hour).
 */
const QUARTER_HOUR_MS = 15 * MS_PER_MIN;
const offsetMemo = new Map<string, Map<number, number>>();
const MEMO_LIMIT = 200_000;

function zoneOffset_min(zone: string, utc_ms: number): number {
  let memo = offsetMemo.get(zone);
  if (memo === undefined) {
    memo = new Map();
    offsetMemo.set(zone, memo);
  }
  const key = Math.floor(utc_ms / QUARTER_HOUR_MS);
  let off = memo.get(key);
  if (off === undefined) {
    off = IANAZone.create(zone).offset(key * QUARTER_HOUR_MS);
    if (memo.size > MEMO_LIMIT) memo.clear();
    memo.set(key, off);
  }
  return off;
}

/** Offset from UTC (minutes) in force at a UTC instant. */
export function utcOffsetAt_min(zone: string, utc_ms: number): number {
  return zoneOffset_min(zone, utc_ms);
}

/** Parses "YYYY-MM-DD" to {year, month, day}; undefined for an impossible date. */
const dateMemo = new Map<string, { year: number; month: number; day: number } | undefined>();

export function parseIsoDate(text: string): { year: number; month: number; day: number } | undefined {
  if (dateMemo.has(text)) return dateMemo.get(text);
  if (dateMemo.size > 100_000) dateMemo.clear();
  const parsed = parseIsoDateUncached(text);
  dateMemo.set(text, parsed);
  return parsed;
}

function parseIsoDateUncached(text: string): { year: number; month: number; day: number } | undefined {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (m === null) return undefined;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const d = new Date(Date.UTC(year, month - 1, day));
  d.setUTCFullYear(year);
  return d.getUTCFullYear() === year && d.getUTCMonth() === month - 1 && d.getUTCDate() === day ? { year, month, day } : undefined;
}

function formatIsoDate(d: Date): string {
  return `${String(d.getUTCFullYear()).padStart(4, '0')}-${String(d.getUTCMonth() + 1).padStart(2, '0')}-${String(d.getUTCDate()).padStart(2, '0')}`;
}

/** "YYYY-MM-DD" of the date `days` after `date` (calendar arithmetic, zone-free). */
export function addDays(date: string, days: number): string {
  const p = parseIsoDate(date);
  if (p === undefined) throw new RangeError(`not a date: ${date}`);
  return formatIsoDate(new Date(Date.UTC(p.year, p.month - 1, p.day + days)));
}

/** Whole days from date a to date b (b − a). */
export function daysBetween(a: string, b: string): number {
  const pa = parseIsoDate(a);
  const pb = parseIsoDate(b);
  if (pa === undefined || pb === undefined) throw new RangeError(`not a date: ${pa === undefined ? a : b}`);
  return Math.round((Date.UTC(pb.year, pb.month - 1, pb.day) - Date.UTC(pa.year, pa.month - 1, pa.day)) / 86_400_000);
}

/** ISO weekday of a date, 1 = Monday … 7 = Sunday. */
export function isoWeekday(date: string): number {
  const p = parseIsoDate(date);
  if (p === undefined) throw new RangeError(`not a date: ${date}`);
  const dow = new Date(Date.UTC(p.year, p.month - 1, p.day)).getUTCDay();
  return dow === 0 ? 7 : dow;
}

/**
 * The real instant (UTC ms) at which the site's clocks first read `minuteOfDay` minutes after
 * midnight on `date` (minuteOfDay may exceed 1440 to reach later days).
 */
export function wallTimeToUtc_ms(zone: string, date: string, minuteOfDay: number): number {
  const p = parseIsoDate(date);
  if (p === undefined) throw new RangeError(`not a date: ${date}`);
  const wallAsUtc = Date.UTC(p.year, p.month - 1, p.day) + minuteOfDay * MS_PER_MIN;
  const z = { offset: (t: number) => zoneOffset_min(zone, t) };
  // Offsets a day either side bracket any single transition near this wall time.
  const offBefore = z.offset(wallAsUtc - 86_400_000);
  const offAfter = z.offset(wallAsUtc + 86_400_000);
  const candidates = [wallAsUtc - offBefore * MS_PER_MIN, wallAsUtc - offAfter * MS_PER_MIN]
    .filter((t) => t + z.offset(t) * MS_PER_MIN === wallAsUtc)
    .sort((a, b) => a - b);
  const first = candidates[0];
  if (first !== undefined) return first;
  // Skipped wall time: find the transition instant (first instant whose wall clock is past it).
  let lo = wallAsUtc - Math.max(offBefore, offAfter) * MS_PER_MIN; // wall clock before the target
  let hi = wallAsUtc - Math.min(offBefore, offAfter) * MS_PER_MIN; // wall clock after the target
  if (lo > hi) [lo, hi] = [hi, lo];
  while (hi - lo > MS_PER_MIN) {
    const mid = lo + Math.floor((hi - lo) / 2 / MS_PER_MIN) * MS_PER_MIN;
    if (mid + z.offset(mid) * MS_PER_MIN >= wallAsUtc) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** Local date, minute after local midnight and ISO weekday (1 = Monday) for a real instant. */
export function utcToWallTime(zone: string, utc_ms: number): { date: string; minuteOfDay: number; weekday: number } {
  const local = new Date(utc_ms + zoneOffset_min(zone, utc_ms) * MS_PER_MIN);
  const dow = local.getUTCDay();
  return {
    date: formatIsoDate(local),
    minuteOfDay: local.getUTCHours() * 60 + local.getUTCMinutes() + local.getUTCSeconds() / 60 + local.getUTCMilliseconds() / 60_000,
    weekday: dow === 0 ? 7 : dow,
  };
}
