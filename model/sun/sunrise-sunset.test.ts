import { describe, expect, it } from 'vitest';
import { sunTimes } from './sunrise-sunset.js';

const hms = (h: number) => {
  const s = Math.round(h * 3600);
  return `${String(Math.floor(s / 3600)).padStart(2, '0')}:${String(Math.floor((s % 3600) / 60)).padStart(2, '0')}:${String(s % 60).padStart(2, '0')}`;
};
const hm = (h: number) => h * 60; // minutes

describe('sunrise and sunset (SPA Appendix A.2)', () => {
  it('reproduces the worked example: sunrise 06:12:43, sunset 17:20:19 local (Reda & Andreas 2004, Table A5.2)', () => {
    const t = sunTimes({ year: 2003, month: 10, day: 17 }, { latitude_deg: 39.742476, longitude_deg: -105.1786, elevation_m: 1830.14, pressure_hPa: 820, temperature_C: 11 }, -7, { deltaT_s: 67, dayStart: 'ut' });
    expect(t.kind).toBe('normal');
    expect(hms(t.sunrise_h ?? Number.NaN)).toBe('06:12:43');
    expect(hms(t.sunset_h ?? Number.NaN)).toBe('17:20:19');
  });

  it('gives the evening of the local date by default (the paper\'s 0 h UT day start puts its sunset on 16 Oct)', () => {
    const obs = { latitude_deg: 39.742476, longitude_deg: -105.1786, elevation_m: 1830.14, pressure_hPa: 820, temperature_C: 11 };
    const local = sunTimes({ year: 2003, month: 10, day: 17 }, obs, -7, { deltaT_s: 67 });
    const paperNextDay = sunTimes({ year: 2003, month: 10, day: 18 }, obs, -7, { deltaT_s: 67, dayStart: 'ut' });
    expect(Math.abs((local.sunset_h ?? 0) - (paperNextDay.sunset_h ?? 1)) * 3600).toBeLessThan(2);
    expect(hms(local.sunrise_h ?? Number.NaN)).toBe('06:12:43');
    // The instants agree with the local clock hours in the −7 h zone.
    expect(local.sunriseEpochMs).toBe(Date.UTC(2003, 9, 17, 7) + (local.sunrise_h ?? 0) * 3_600_000);
  });

  // U.S. Naval Observatory rise/set tables (to the minute), as quoted in pvlib-python's SPA tests:
  // Golden CO (39.0 N, 105.0 W, MST = UTC−7) and Beijing (39.917 N, 116.383 E, UTC+8), 2015.
  const usno: { name: string; lat: number; lon: number; tz: number; date: [number, number, number]; rise: string; set: string }[] = [
    { name: 'Golden Jan 2', lat: 39, lon: -105, tz: -7, date: [2015, 1, 2], rise: '07:19', set: '16:49' },
    { name: 'Golden Apr 2', lat: 39, lon: -105, tz: -7, date: [2015, 4, 2], rise: '05:43', set: '18:24' },
    { name: 'Golden Aug 2', lat: 39, lon: -105, tz: -7, date: [2015, 8, 2], rise: '05:01', set: '19:10' },
    { name: 'Golden Dec 2', lat: 39, lon: -105, tz: -7, date: [2015, 12, 2], rise: '07:01', set: '16:38' },
    { name: 'Beijing Jan 2', lat: 39.917, lon: 116.383, tz: 8, date: [2015, 1, 2], rise: '07:36', set: '17:00' },
    { name: 'Beijing Apr 2', lat: 39.917, lon: 116.383, tz: 8, date: [2015, 4, 2], rise: '05:58', set: '18:39' },
    { name: 'Beijing Aug 2', lat: 39.917, lon: 116.383, tz: 8, date: [2015, 8, 2], rise: '05:13', set: '19:28' },
    { name: 'Beijing Dec 2', lat: 39.917, lon: 116.383, tz: 8, date: [2015, 12, 2], rise: '07:17', set: '16:50' },
  ];
  for (const c of usno) {
    it(`matches the USNO table within one minute: ${c.name}`, () => {
      const t = sunTimes({ year: c.date[0], month: c.date[1], day: c.date[2] }, { latitude_deg: c.lat, longitude_deg: c.lon }, c.tz);
      const toMin = (s: string) => Number(s.slice(0, 2)) * 60 + Number(s.slice(3, 5));
      expect(Math.abs(hm(t.sunrise_h ?? Number.NaN) - toMin(c.rise))).toBeLessThanOrEqual(1);
      expect(Math.abs(hm(t.sunset_h ?? Number.NaN) - toMin(c.set))).toBeLessThanOrEqual(1);
    });
  }

  it('reports polar day and polar night instead of inventing times (physical: |δ| > 90° − |φ|)', () => {
    const summer = sunTimes({ year: 2024, month: 6, day: 21 }, { latitude_deg: 78.2, longitude_deg: 15.6 }, 1);
    const winter = sunTimes({ year: 2024, month: 12, day: 21 }, { latitude_deg: 78.2, longitude_deg: 15.6 }, 1);
    expect(summer.kind).toBe('polar-day');
    expect(summer.sunrise_h).toBeNull();
    expect(winter.kind).toBe('polar-night');
    expect(winter.sunset_h).toBeNull();
  });

  it('refuses an impossible UTC offset, naming the field', () => {
    expect(() => sunTimes({ year: 2024, month: 6, day: 21 }, { latitude_deg: 52, longitude_deg: 5 }, 30)).toThrow(/utcOffset_h/);
  });
});
