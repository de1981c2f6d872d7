/**
 * Local wall-clock time in an IANA zone → UTC milliseconds, fast for long logs: the zone's offset
 * is looked up (luxon, IANA tz rules) once per local hour and reused for every reading in that
 * hour. An hour in which the offset changes, or that the clock skips (start of summer time), is
 * handed to luxon reading by reading, so the result is always luxon's.
 */
import { DateTime, type Zone } from 'luxon';

const MS_PER_HOUR = 3_600_000;
const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

export interface LocalFields {
  readonly year: number;
  readonly month: number;
  readonly day: number;
  readonly hour: number;
  readonly minute: number;
  readonly second: number;
  readonly millisecond: number;
}

/** True when the fields name a real calendar date and a clock time 00:00:00.000–23:59:59.999. */
export function validFields(f: LocalFields): boolean {
  const leap = (f.year % 4 === 0 && f.year % 100 !== 0) || f.year % 400 === 0;
  const dim = f.month === 2 ? (leap ? 29 : 28) : (DAYS_IN_MONTH[f.month - 1] ?? 0);
  return (
    Number.isInteger(f.year) && f.month >= 1 && f.month <= 12 && f.day >= 1 && f.day <= dim &&
    f.hour >= 0 && f.hour <= 23 && f.minute >= 0 && f.minute <= 59 && f.second >= 0 && f.second <= 59 && f.millisecond >= 0 && f.millisecond <= 999
  );
}

/** A converter for one zone (`zone` is an IANA name or a luxon zone); undefined where luxon finds the time invalid. */
export function localToUtcReader(zone: string | Zone): (f: LocalFields) => number | undefined {
  /** Offset in ms (local − UTC) of each local hour, or null when the hour needs luxon for each reading. */
  const offsets = new Map<number, number | null>();
  const viaLuxon = (f: LocalFields): number | undefined => {
    const dt = DateTime.fromObject({ ...f }, { zone });
    return dt.isValid ? dt.toMillis() : undefined;
  };
  return (f) => {
    if (!validFields(f)) return undefined;
    const wall = Date.UTC(f.year, f.month - 1, f.day, f.hour, f.minute, f.second, f.millisecond);
    const key = Math.floor(wall / MS_PER_HOUR);
    let offset = offsets.get(key);
    if (offset === undefined) {
      const a = DateTime.fromObject({ year: f.year, month: f.month, day: f.day, hour: f.hour, minute: 0, second: 0, millisecond: 0 }, { zone });
      const b = DateTime.fromObject({ year: f.year, month: f.month, day: f.day, hour: f.hour, minute: 59, second: 59, millisecond: 999 }, { zone });
      const steady = a.isValid && b.isValid && a.offset === b.offset && a.hour === f.hour && b.hour === f.hour && a.minute === 0 && b.minute === 59;
      offset = steady ? a.offset * 60_000 : null;
      offsets.set(key, offset);
    }
    return offset === null ? viaLuxon(f) : wall - offset;
  };
}
