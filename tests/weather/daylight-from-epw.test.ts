/**
 * Per-minute daylight from the Amsterdam IWEC file (test data only): the minute values keep the
 * file's hourly illuminance (hour means of the minute series against the file's hourly columns)
 * while sunrise and sunset follow the sun.
 */
import { describe, expect, it } from 'vitest';
import { daylightFromEpw } from '../../model/daylight/daylight-from-epw.js';
import { parseEpw } from '../../model/weather/epw.js';
import { amsterdamEpwText } from './epw-fixture.js';

const file = parseEpw(amsterdamEpwText(), 'NLD_Amsterdam062400_IWEC.epw');

function check(month: number, day: number) {
  // Local standard midnight (UTC+1) of the date in a non-leap year, 2 days per minute.
  const start = Date.UTC(2025, month - 1, day) - 3_600_000;
  const { series, filledHours } = daylightFromEpw(file, { startEpochMs: start, step_min: 1, count: 2 * 1440 });
  let fileSum = 0;
  let minuteSum = 0;
  const hourErrors: number[] = [];
  for (let h = 0; h < 48; h++) {
    let mean = 0;
    for (let m = 0; m < 60; m++) mean += (series.globalHorizontal_lx[h * 60 + m] as number) / 60;
    const firstIndex = file.month.findIndex((mm, i) => mm === month && file.day[i] === day);
    const fileValue = file.values.globalHorizontal_lx[firstIndex + h] as number;
    fileSum += fileValue;
    minuteSum += mean;
    if (fileValue > 5000) hourErrors.push(Math.abs(mean / fileValue - 1));
  }
  hourErrors.sort((a, b) => a - b);
  return { series, filledHours, dailyRatio: minuteSum / fileSum, medianHourError: hourErrors[Math.floor(hourErrors.length / 2)] ?? 0 };
}

describe('per-minute daylight from an EPW file', () => {
  for (const [month, day] of [[6, 1], [1, 15], [9, 22]] as const) {
    it(`keeps the file's light on ${day}/${month}: two-day sum within 5 %, median hour within 10 %`, () => {
      const r = check(month, day);
      expect(r.filledHours).toBe(0);
      expect(Math.abs(r.dailyRatio - 1)).toBeLessThan(0.05);
      expect(r.medianHourError).toBeLessThan(0.1);
    });
  }

  it('has no direct sun with the sun below the horizon and no step larger than 15 % of the day maximum between minutes', () => {
    const { series } = check(6, 1);
    const max = Math.max(...series.globalHorizontal_lx);
    for (let i = 1; i < series.count; i++) {
      if ((series.sun.elevation_deg[i] as number) <= 0) expect(series.directNormal_lx[i]).toBe(0);
      expect(Math.abs((series.globalHorizontal_lx[i] as number) - (series.globalHorizontal_lx[i - 1] as number))).toBeLessThan(0.15 * max);
    }
  });
});

describe('per-minute daylight from a partial-year EPW file', () => {
  it('refuses a time span outside the file, naming the file and the day', async () => {
    const lines = amsterdamEpwText().split(/\r?\n/).filter((l) => l.trim() !== '');
    // Keep January only (31 × 24 rows) and say so in DATA PERIODS.
    const head = lines.slice(0, 8);
    head[7] = (head[7] ?? '').replace('12/31', ' 1/31');
    const januaryOnly = parseEpw([...head, ...lines.slice(8, 8 + 31 * 24)].join('\n'), 'january.epw');
    expect(januaryOnly.count).toBe(744);
    expect(() => daylightFromEpw(januaryOnly, { startEpochMs: Date.UTC(2025, 2, 3), step_min: 1, count: 60 })).toThrow(/january\.epw, line 8: .*no data for 3\/3/);
  });
});
