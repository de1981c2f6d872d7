import { describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { addDays, daysBetween, isoWeekday, wallTimeToUtc_ms, utcToWallTime } from './local-calendar.js';

// Transition dates: EU summer time starts on the last Sunday of March at 01:00 UTC and ends on
// the last Sunday of October at 01:00 UTC (Directive 2000/84/EC, Art. 2–3); in 2026 those are
// 29 March and 25 October. US DST 2026: 8 March and 1 November at 02:00 local (15 U.S.C. § 260a).
describe('wall time to real time across daylight-saving transitions', () => {
  it('maps an ordinary wall time exactly as the time-zone rules say (cross-check: luxon DateTime)', () => {
    const t = wallTimeToUtc_ms('Europe/Berlin', '2026-06-15', 9 * 60 + 30);
    expect(t).toBe(DateTime.fromISO('2026-06-15T09:30', { zone: 'Europe/Berlin' }).toMillis());
    expect(new Date(t).toISOString()).toBe('2026-06-15T07:30:00.000Z');
  });
  it('makes the spring-forward day 23 h long and maps the skipped hour to the transition', () => {
    const midnight = wallTimeToUtc_ms('Europe/Berlin', '2026-03-29', 0);
    const next = wallTimeToUtc_ms('Europe/Berlin', '2026-03-30', 0);
    expect((next - midnight) / 3_600_000).toBe(23);
    const skipped = wallTimeToUtc_ms('Europe/Berlin', '2026-03-29', 2 * 60 + 30);
    expect(new Date(skipped).toISOString()).toBe('2026-03-29T01:00:00.000Z');
  });
  it('makes the fall-back day 25 h long and maps the repeated hour to its first occurrence', () => {
    const midnight = wallTimeToUtc_ms('Europe/Berlin', '2026-10-25', 0);
    const next = wallTimeToUtc_ms('Europe/Berlin', '2026-10-26', 0);
    expect((next - midnight) / 3_600_000).toBe(25);
    const repeated = wallTimeToUtc_ms('Europe/Berlin', '2026-10-25', 2 * 60 + 30);
    expect(new Date(repeated).toISOString()).toBe('2026-10-25T00:30:00.000Z');
  });
  it('handles the US transitions at 02:00 local', () => {
    const a = wallTimeToUtc_ms('America/New_York', '2026-03-08', 0);
    const b = wallTimeToUtc_ms('America/New_York', '2026-03-09', 0);
    expect((b - a) / 3_600_000).toBe(23);
    const c = wallTimeToUtc_ms('America/New_York', '2026-11-01', 0);
    const d = wallTimeToUtc_ms('America/New_York', '2026-11-02', 0);
    expect((d - c) / 3_600_000).toBe(25);
  });
  it('is monotonic minute by minute through both transitions', () => {
    for (const date of ['2026-03-29', '2026-10-25']) {
      let prev = -Infinity;
      for (let m = 0; m <= 1440; m++) {
        const t = wallTimeToUtc_ms('Europe/Berlin', date, m);
        expect(t).toBeGreaterThanOrEqual(prev);
        prev = t;
      }
    }
  });
  it('round-trips real time to wall time', () => {
    const t = Date.UTC(2026, 0, 5, 12, 0);
    expect(utcToWallTime('Europe/Berlin', t)).toEqual({ date: '2026-01-05', minuteOfDay: 13 * 60, weekday: 1 });
  });
});

describe('calendar arithmetic', () => {
  it('counts days and weekdays (2026-01-05 is a Monday — common calendar fact)', () => {
    expect(isoWeekday('2026-01-05')).toBe(1);
    expect(addDays('2026-02-27', 2)).toBe('2026-03-01');
    expect(daysBetween('2026-01-01', '2027-01-01')).toBe(365);
  });
});

describe('wall time round trip (property)', () => {
  // Zones with 1 h, 30 min (Lord Howe) and midnight (Santiago) transitions, per the IANA tz database.
  const zones = ['Europe/Berlin', 'America/New_York', 'Australia/Lord_Howe', 'America/Santiago', 'Asia/Tehran', 'Pacific/Auckland'];
  it('maps the wall clock of any instant back to that instant, or to the first pass of a repeated time', async () => {
    const fc = (await import('fast-check')).default;
    fc.assert(
      fc.property(fc.constantFrom(...zones), fc.integer({ min: Date.UTC(2015, 0, 1) / 60_000, max: Date.UTC(2035, 0, 1) / 60_000 }), (zone, minute) => {
        const t = minute * 60_000;
        const w = utcToWallTime(zone, t);
        const back = wallTimeToUtc_ms(zone, w.date, w.minuteOfDay);
        expect(back).toBeLessThanOrEqual(t);
        expect(t - back).toBeLessThanOrEqual(60 * 60_000);
        expect(utcToWallTime(zone, back)).toEqual(w);
        // Cross-check against luxon's own reading of the instant.
        const dt = DateTime.fromMillis(t, { zone });
        expect(w.date).toBe(dt.toISODate());
        expect(w.minuteOfDay).toBe(dt.hour * 60 + dt.minute);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('wall time round trip through every transition of 2026', () => {
  it('holds for every quarter hour of the year in zones with half-hour and midnight transitions', () => {
    for (const zone of ['Australia/Lord_Howe', 'America/Santiago', 'Europe/Berlin']) {
      let shortDays = 0;
      let longDays = 0;
      for (let t = Date.UTC(2026, 0, 1); t < Date.UTC(2027, 0, 1); t += 15 * 60_000) {
        const w = utcToWallTime(zone, t);
        const back = wallTimeToUtc_ms(zone, w.date, w.minuteOfDay);
        if (back > t || t - back > 3_600_000) throw new Error(`${zone} ${new Date(t).toISOString()} → ${new Date(back).toISOString()}`);
      }
      for (let d = 0; d < 365; d++) {
        const date = addDays('2026-01-01', d);
        const len = (wallTimeToUtc_ms(zone, addDays(date, 1), 0) - wallTimeToUtc_ms(zone, date, 0)) / 60_000;
        if (len < 1440) shortDays++;
        if (len > 1440) longDays++;
      }
      // One short and one long day a year in each zone (IANA tz rules for these zones).
      expect([zone, shortDays, longDays]).toEqual([zone, 1, 1]);
    }
  });
});
