/**
 * The real IWEC weather file for Amsterdam (test data only, see epw-fixture.ts): parsed without
 * loss, hour-ending convention, and Perez (1990) luminous efficacy against the file's own
 * illuminance columns (IWEC illuminance is itself modelled from irradiance).
 */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { dayOfYearUtc, extraterrestrialNormal_W_m2 } from '../../model/daylight/extraterrestrial.js';
import { perezIlluminance } from '../../model/daylight/perez-efficacy.js';
import { solarPosition } from '../../model/sun/spa.js';
import { sunTimes } from '../../model/sun/sunrise-sunset.js';
import { EPW_FIELDS } from '../../model/weather/epw-fields.js';
import { checkDirectLightAgainstSun } from '../../model/weather/epw-sun-check.js';
import { epwDayIndex, epwIntervalEndMs, epwRecordIndexAt } from '../../model/weather/epw-time.js';
import { parseEpw } from '../../model/weather/epw.js';
import { amsterdamEpwText } from './epw-fixture.js';

const text = amsterdamEpwText();
const file = parseEpw(text, 'NLD_Amsterdam062400_IWEC.epw');

describe('Amsterdam IWEC weather file', () => {
  it('reads the LOCATION line as the file states it (52.30 N, 4.77 E, UTC+1, −2 m; file README)', () => {
    expect(file.location).toMatchObject({ city: 'AMSTERDAM', country: 'NLD', wmo: '062400', latitude_deg: 52.3, longitude_deg: 4.77, timeZone_h: 1, elevation_m: -2 });
  });

  it('keeps all 8760 hourly records, every used field equal to an independent CSV parse (papaparse)', () => {
    expect(file.count).toBe(8760);
    expect(file.hasLeapDay).toBe(false);
    const rows = Papa.parse<string[]>(text.split(/\r?\n/).slice(8).join('\n').trim(), { delimiter: ',' }).data;
    expect(rows.length).toBe(8760);
    let compared = 0;
    rows.forEach((row, i) => {
      for (const f of EPW_FIELDS) {
        const v = Number(row[f.column - 1]);
        const ours = file.values[f.key][i] as number;
        if (Number.isNaN(ours)) expect(f.isMissing(v) || row[f.column - 1] === '').toBe(true);
        else expect(ours).toBe(v);
        compared++;
      }
    });
    expect(compared).toBe(8760 * EPW_FIELDS.length);
    expect(file.warningCount).toBe(0);
  });

  it('counts the missing zenith-luminance codes (9999) instead of passing them on', () => {
    expect(file.missingCounts.zenithLuminance_cd_m2).toBeGreaterThan(0);
    for (let i = 0; i < file.count; i++) expect(file.values.zenithLuminance_cd_m2[i]).not.toBe(9999);
  });

  it('has no direct light while the sun is below the horizon all hour', () => {
    expect(checkDirectLightAgainstSun(file).count).toBe(0);
  });

  it('treats hour labels as interval ends in local standard time: the daily light centroid falls on solar noon (SPA transit) within 10 min on average, not 60 min late', () => {
    let sumOffset_min = 0;
    let days = 0;
    for (let start = 0; start < file.count; start += 24) {
      let wsum = 0;
      let tsum = 0;
      for (let h = 1; h <= 24; h++) {
        const g = file.values.globalHorizontal_Wh_m2[start + h - 1] as number;
        wsum += g;
        tsum += g * (h - 0.5); // hour-ending: interval midpoint is h − 0.5 local standard time
      }
      if (wsum <= 0) continue;
      const noon = sunTimes({ year: 2001, month: file.month[start] as number, day: file.day[start] as number }, { latitude_deg: 52.3, longitude_deg: 4.77 }, 1).transit_h;
      sumOffset_min += (tsum / wsum - noon) * 60;
      days++;
    }
    expect(days).toBe(365);
    expect(Math.abs(sumOffset_min / days)).toBeLessThan(10);
  });

  it('maps UT instants to the record whose hour contains them (hour-ending, UTC+1 standard time, no DST)', () => {
    const idx = epwDayIndex(file);
    // 1 Jan 00:30 UT = 01:30 local standard time → hour label 2 (01:00–02:00).
    expect(epwRecordIndexAt(file, idx, Date.UTC(2025, 0, 1, 0, 30))).toBe(1);
    // exactly 01:00 local standard = 00:00 UT ends hour 1.
    expect(epwRecordIndexAt(file, idx, Date.UTC(2025, 0, 1, 0, 0))).toBe(0);
    // 1 Jul 10:30 UT = 11:30 local STANDARD time (12:30 summer clock time) → hour 12 of 1 July.
    const i = epwRecordIndexAt(file, idx, Date.UTC(2025, 6, 1, 10, 30));
    expect([file.month[i], file.day[i], file.hour[i]]).toEqual([7, 1, 12]);
    // 29 Feb of a leap simulation year uses 28 Feb of the file.
    const j = epwRecordIndexAt(file, idx, Date.UTC(2024, 1, 29, 11, 30));
    expect([file.month[j], file.day[j], file.hour[j]]).toEqual([2, 28, 13]);
    expect(epwIntervalEndMs(file, 0, 2025)).toBe(Date.UTC(2025, 0, 1, 0));
  });

  it('Perez (1990) efficacy reproduces the file illuminance: annual sums within 1 %, hourly median within 1 %, 90 % of hours within 5 %', () => {
    const sums = { file: [0, 0, 0], model: [0, 0, 0] };
    const rel: number[] = [];
    for (let i = 0; i < file.count; i++) {
      const dhi = file.values.diffuseHorizontal_Wh_m2[i] as number;
      if (!(dhi > 0)) continue;
      const mid = epwIntervalEndMs(file, i, file.year[i] as number) - 1_800_000;
      const sun = solarPosition(mid, { latitude_deg: 52.3, longitude_deg: 4.77 });
      const r = perezIlluminance({
        zenith_deg: sun.zenith_deg,
        directNormal_W_m2: file.values.directNormal_Wh_m2[i] as number,
        diffuseHorizontal_W_m2: dhi,
        dewPoint_C: file.values.dewPoint_C[i] as number,
        extraterrestrial_W_m2: extraterrestrialNormal_W_m2(dayOfYearUtc(mid)),
      });
      const f = [file.values.globalHorizontal_lx[i], file.values.directNormal_lx[i], file.values.diffuseHorizontal_lx[i]] as number[];
      const m = [r.globalHorizontal_lx, r.directNormal_lx, r.diffuseHorizontal_lx];
      for (let k = 0; k < 3; k++) {
        sums.file[k] = (sums.file[k] as number) + (f[k] as number);
        sums.model[k] = (sums.model[k] as number) + (m[k] as number);
      }
      if ((f[0] as number) > 1000) rel.push(Math.abs((m[0] as number) / (f[0] as number) - 1));
    }
    for (let k = 0; k < 3; k++) expect(Math.abs((sums.model[k] as number) / (sums.file[k] as number) - 1)).toBeLessThan(0.01);
    rel.sort((a, b) => a - b);
    expect(rel[Math.floor(rel.length / 2)]).toBeLessThan(0.01);
    expect(rel[Math.floor(rel.length * 0.9)]).toBeLessThan(0.05);
  });
});
