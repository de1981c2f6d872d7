import { describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { offsetsFromHourStarts, STEADY_CLOCK, WallClock, wallClockOf } from './wall-clock.js';

// Europe/Berlin, EU rule (Directive 2000/84/EC, art. 2 and 3): summer time from 01:00 UTC on the
// last Sunday of March to 01:00 UTC on the last Sunday of October. 2026: 29 March and 25 October.
// A run from Monday 23 March 2026 (CET, +60 min) reaches the change 6 days + 2 h after its start;
// a run from Monday 19 October 2026 (CEST, +120 min) 6 days + 3 h after its start.
const SPRING = new WallClock([
  { from_h: 0, utc_offset_min: 60 },
  { from_h: 146, utc_offset_min: 120 },
]);
const AUTUMN = new WallClock([
  { from_h: 0, utc_offset_min: 120 },
  { from_h: 147, utc_offset_min: 60 },
]);

/** Local day and "HH:mm" of real hour t of a run from local midnight of `start` (luxon as the outside reference). */
function luxonWall(start: string, t_h: number): { day: number; text: string } {
  const t0 = DateTime.fromISO(`${start}T00:00`, { zone: 'Europe/Berlin' });
  const at = t0.plus({ minutes: Math.round(t_h * 60) });
  return { day: Math.round(at.startOf('day').diff(t0.startOf('day'), 'days').days), text: at.toFormat('HH:mm') };
}

describe('run time to local wall-clock time', () => {
  it('gives the spring-forward day 23 hours and the fall-back day 25, the others 24', () => {
    expect([5, 6, 7].map((d) => SPRING.dayLength_h(d))).toEqual([24, 23, 24]);
    expect([5, 6, 7].map((d) => AUTUMN.dayLength_h(d))).toEqual([24, 25, 24]);
    expect(SPRING.dayStart_h(7)).toBe(167);
    expect(AUTUMN.dayStart_h(7)).toBe(169);
    expect(STEADY_CLOCK.dayLength_h(6)).toBe(24);
  });

  it('puts every 10 minutes of both runs on the day and clock time luxon gives for Europe/Berlin', () => {
    for (const [clock, start] of [
      [SPRING, '2026-03-23'],
      [AUTUMN, '2026-10-19'],
    ] as const) {
      for (let m = 0; m < 9 * 24 * 60; m += 10) {
        const t = m / 60;
        const wall = clock.at(t);
        const ref = luxonWall(start, t);
        expect({ t, day: wall.day, text: clock.format(t) }).toEqual({ t, day: ref.day, text: ref.text });
        expect(wall.x_h).toBeCloseTo(t - clock.dayStart_h(wall.day), 9);
      }
    }
  });

  it('has no 02:30 on the spring day and two on the autumn day', () => {
    expect(SPRING.timesOf(6, 2.5)).toEqual([]);
    expect(SPRING.timesOf(6, 3)).toEqual([146]);
    expect(AUTUMN.timesOf(6, 2.5)).toEqual([146.5, 147.5]);
    expect(AUTUMN.timesOf(5, 2.5)).toEqual([122.5]);
  });

  it('draws a one-day axis over the real length with wall-clock ticks: 03:00 two real hours after midnight in spring, four in autumn', () => {
    const spring = SPRING.dayAxis(6);
    expect(spring.domain).toEqual([0, 23]);
    expect(spring.ticks).toEqual([0, 2, 5, 8, 11, 14, 17, 20, 23]);
    expect(spring.ticks.map(spring.labelOf)).toEqual(['00:00', '03:00', '06:00', '09:00', '12:00', '15:00', '18:00', '21:00', '24:00']);
    const autumn = AUTUMN.dayAxis(6);
    expect(autumn.domain).toEqual([0, 25]);
    expect(autumn.ticks).toEqual([0, 4, 7, 10, 13, 16, 19, 22, 25]);
    // hourly ticks show the repeated hour twice
    expect(AUTUMN.dayTicks(6, 1).map((k) => k.label).slice(0, 5)).toEqual(['00:00', '01:00', '02:00', '02:00', '03:00']);
  });

  it('names the change of the day in words', () => {
    expect(SPRING.changeNote(6)).toBe('23-hour day: clocks went forward one hour at 02:00');
    expect(AUTUMN.changeNote(6)).toBe('25-hour day: clocks went back one hour at 03:00');
    expect(SPRING.changeNote(5)).toBeNull();
    // the night from 18:00 on Saturday 28 March to 12:00 on Sunday holds the change; the next night does not
    expect(SPRING.changeNoteBetween(5 * 24 + 18, 6 * 24 + 11)).toBe('clocks go forward one hour at 02:00');
    expect(SPRING.changeNoteBetween(6 * 24 + 17, 7 * 24 + 11)).toBeNull();
  });

  it('reads the offsets back from local hour starts of results written without them', () => {
    const starts = ['2026-03-29T00:00+01:00', '2026-03-29T01:00+01:00', '2026-03-29T03:00+02:00', '2026-03-29T04:00+02:00'];
    expect(offsetsFromHourStarts(starts)).toEqual([
      { from_h: 0, utc_offset_min: 60 },
      { from_h: 2, utc_offset_min: 120 },
    ]);
    expect(offsetsFromHourStarts(['2026-01-01T00:00-03:30'])).toEqual([{ from_h: 0, utc_offset_min: -210 }]);
  });

  it('uses 24-hour days for a view without offsets or with a single one', () => {
    expect(wallClockOf({})).toBe(STEADY_CLOCK);
    expect(wallClockOf({ utcOffsets: [{ from_h: 0, utc_offset_min: 60 }] })).toBe(STEADY_CLOCK);
    const offsets = [
      { from_h: 0, utc_offset_min: 60 },
      { from_h: 146, utc_offset_min: 120 },
    ];
    expect(wallClockOf({ utcOffsets: offsets })).toBe(wallClockOf({ utcOffsets: offsets }));
  });
});
