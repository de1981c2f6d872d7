import { describe, expect, it } from 'vitest';
import { clockSpan, clockTimeToMinutes, minutesToClockTime } from './clock-time.js';

describe('clock times', () => {
  it('reads 00:00–24:00 and refuses anything else', () => {
    expect(clockTimeToMinutes('00:00')).toBe(0);
    expect(clockTimeToMinutes('23:59')).toBe(1439);
    expect(clockTimeToMinutes('24:00')).toBe(1440);
    for (const bad of ['24:01', '7:00', '12:60', 'noon']) expect(clockTimeToMinutes(bad)).toBeNaN();
  });
  it('runs a segment past midnight when its end is at or before its start', () => {
    expect(clockSpan('23:00', '07:00')).toEqual({ start_min: 1380, end_min: 1860 });
    expect(clockSpan('00:00', '24:00')).toEqual({ start_min: 0, end_min: 1440 });
    expect(clockSpan('07:00', '07:00').end_min - clockSpan('07:00', '07:00').start_min).toBe(1440);
  });
  it('writes minutes back as HH:MM', () => {
    expect(minutesToClockTime(1440)).toBe('24:00');
    expect(minutesToClockTime(1860)).toBe('07:00');
    expect(minutesToClockTime(-60)).toBe('23:00');
  });
});
