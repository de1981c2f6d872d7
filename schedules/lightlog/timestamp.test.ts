import { describe, expect, it } from 'vitest';
import { detectTimestampFormat, parseTimestamp } from './timestamp.js';

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
