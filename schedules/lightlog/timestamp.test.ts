import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DateTime } from 'luxon';
import { detectTimestampFormat, parseTimestamp, timestampReader } from './timestamp.js';

// Expected instants computed by hand from the stated offsets; Europe/Berlin is UTC+1 in winter
// and UTC+2 in summer (EU Directive 2000/84/EC; summer time 2026 starts 29 March).
describe('timestamp parsing', () => {
  const Z = 'Europe/Berlin';
  it('reads ISO 8601 with an offset regardless of the zone', () => {
    expect(parseTimestamp('2026-03-31T14:05:00+02:00', 'iso', 'America/New_York')).toBe(Date.UTC(2026, 2, 31, 12, 5));
    expect(parseTimestamp('2026-03-31 14:05:00Z', 'iso', Z)).toBe(Date.UTC(2026, 2, 31, 14, 5));
  });
  it('reads a local time in the given zone, summer and winter', () => {
    expect(parseTimestamp('2026-01-10T08:00', 'iso', Z)).toBe(Date.UTC(2026, 0, 10, 7, 0));
    expect(parseTimestamp('2026-07-10T08:00', 'iso', Z)).toBe(Date.UTC(2026, 6, 10, 6, 0));
  });
  it('reads day-first, month-first and year-first forms with AM/PM and fractions', () => {
    expect(parseTimestamp('31/03/2026 14:05:30', 'dmy', 'UTC')).toBe(Date.UTC(2026, 2, 31, 14, 5, 30));
    expect(parseTimestamp('03/31/2026 2:05 PM', 'mdy', 'UTC')).toBe(Date.UTC(2026, 2, 31, 14, 5));
    expect(parseTimestamp('12/31/2026 12:00 AM', 'mdy', 'UTC')).toBe(Date.UTC(2026, 11, 31, 0, 0));
    expect(parseTimestamp('2026/03/31 14:05:00.250', 'ymd', 'UTC')).toBe(Date.UTC(2026, 2, 31, 14, 5, 0, 250));
    expect(parseTimestamp('31.03.26 14:05 +01:00', 'dmy', 'UTC')).toBe(Date.UTC(2026, 2, 31, 13, 5));
  });
  it('reads Unix epoch seconds and milliseconds (1 774 958 400 s = 2026-03-31T12:00Z)', () => {
    expect(parseTimestamp('1774958400', 'epoch-s', Z)).toBe(Date.UTC(2026, 2, 31, 12, 0));
    expect(parseTimestamp('1774958400000', 'epoch-ms', Z)).toBe(Date.UTC(2026, 2, 31, 12, 0));
  });
  it('refuses impossible dates and junk', () => {
    expect(parseTimestamp('31/02/2026 10:00', 'dmy', 'UTC')).toBeUndefined();
    expect(parseTimestamp('yesterday', 'iso', 'UTC')).toBeUndefined();
    expect(parseTimestamp('13:00 PM', 'dmy', 'UTC')).toBeUndefined();
  });
});

describe('timestamp format detection', () => {
  it('tells day-first from month-first by the numbers over 12', () => {
    expect(detectTimestampFormat(['01/02/2026 10:00', '25/02/2026 10:00']).format).toBe('dmy');
    expect(detectTimestampFormat(['02/01/2026 10:00', '02/25/2026 10:00']).format).toBe('mdy');
    expect(detectTimestampFormat(['01/02/2026 10:00']).note).toMatch(/day-first was assumed/);
  });
  it('recognises ISO and epoch forms', () => {
    expect(detectTimestampFormat(['2026-03-31T14:05:00+02:00']).format).toBe('iso');
    expect(detectTimestampFormat(['1774958400']).format).toBe('epoch-s');
    expect(detectTimestampFormat(['1774958400000']).format).toBe('epoch-ms');
  });
});

describe('fast timestamp reading agrees with luxon (IANA tz rules) reading by reading', () => {
  // Zones with summer time, a half-hour zone and Lord Howe's half-hour summer shift.
  const ZONES = ['Europe/Berlin', 'America/New_York', 'Australia/Sydney', 'Australia/Lord_Howe', 'America/St_Johns', 'Asia/Kolkata', 'UTC'];
  it('for local ISO times around the year, clock changes included', () => {
    fc.assert(
      fc.property(fc.constantFrom(...ZONES), fc.integer({ min: Date.UTC(2024, 0, 1), max: Date.UTC(2027, 0, 1) }), (zone, wall) => {
        const iso = new Date(wall).toISOString().slice(0, 23);
        const reference = DateTime.fromISO(iso, { zone });
        expect(parseTimestamp(iso, 'iso', zone)).toBe(reference.isValid ? reference.toMillis() : undefined);
        const d = new Date(wall);
        const dmy = `${d.getUTCDate()}/${d.getUTCMonth() + 1}/${d.getUTCFullYear()} ${d.getUTCHours()}:${String(d.getUTCMinutes()).padStart(2, '0')}:${String(d.getUTCSeconds()).padStart(2, '0')}`;
        const ref2 = DateTime.fromObject({ year: d.getUTCFullYear(), month: d.getUTCMonth() + 1, day: d.getUTCDate(), hour: d.getUTCHours(), minute: d.getUTCMinutes(), second: d.getUTCSeconds() }, { zone });
        expect(parseTimestamp(dmy, 'dmy', zone)).toBe(ref2.isValid ? ref2.toMillis() : undefined);
      }),
      { numRuns: 3000, seed: 4242 },
    );
  });
  it('in every minute of the days the clocks change', () => {
    for (const [zone, day] of [['Europe/Berlin', '2026-03-29'], ['Europe/Berlin', '2026-10-25'], ['Australia/Lord_Howe', '2026-04-05'], ['Australia/Lord_Howe', '2026-10-04'], ['America/New_York', '2026-11-01']] as const) {
      const read = timestampReader('iso', zone);
      for (let m = 0; m < 1440; m++) {
        const iso = `${day}T${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}:30`;
        const reference = DateTime.fromISO(iso, { zone });
        expect(read(iso)).toBe(reference.isValid ? reference.toMillis() : undefined);
      }
    }
  });
});
