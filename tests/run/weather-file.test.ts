/**
 * A run with a weather file: the demo's desk worker moved to Amsterdam with the IWEC typical
 * year for Amsterdam Schiphol (ASHRAE 2001, test data only; tests/weather/epw-fixture.ts),
 * 3 days from 28 March 2026 so the start of summer time falls inside. The outdoor daylight the
 * pipeline uses must follow the file: hour by hour, the mean global horizontal illuminance
 * of the run's minutes follows the file's "Global Horizontal Illuminance" of the same hour
 * (EPW hour-ending values in local standard time, EnergyPlus Weather File data dictionary).
 * The daylight model spreads each hour over its minutes along the clear-sky shape, blending
 * neighbouring hours, so single hours on changeable days differ by up to ~20 %; the median hour
 * and each day's total must agree closely, and shifting the run by one hour must not.
 */
import { existsSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { parseEpw } from '../../model/daylight/index.js';
import type { Scenario } from '../../schedules/index.js';
import { AMSTERDAM_EPW_PATH, amsterdamEpwText } from '../weather/epw-fixture.js';
import { demoScenario, run } from './demo-run.js';

describe.skipIf(!existsSync(AMSTERDAM_EPW_PATH))('run with an EPW weather file', () => {
  const base = demoScenario();
  const scenario: Scenario = {
    ...base,
    run: { startDate: '2026-03-28', days: 3 },
    site: { ...base.site, name: 'Amsterdam (test)', latitude_deg: 52.3, longitude_deg: 4.77, timeZone: 'Europe/Amsterdam', weather: { kind: 'file', file: 'amsterdam.epw', format: 'epw', snowFromFile: true } },
    personas: base.personas.filter((p) => p.id === 'desk-worker'),
    rosters: [],
    strategies: [],
  };
  const text = amsterdamEpwText();
  const out = run({ scenario, weather: { fileName: 'amsterdam.epw', text } });

  test('runs and reports a weather-file run (no drawn sky)', () => {
    expect(out.results.scenario.weather).toBe('weather-file');
    expect(out.results.scenario.sky_by_day).toEqual([null, null, null]);
    expect(out.results.days.map((d) => d.length_h)).toEqual([24, 23, 24]);
  });

  test('hourly global horizontal illuminance follows the file: median hour within 5 %, daily totals (of those hours) within 5 %, and a one-hour shift at least 3 times worse', () => {
    const epw = parseEpw(text, 'amsterdam.epw');
    const series = out.outdoor.series;
    const devs: number[] = [];
    const shifted: number[] = [];
    const dayFile = new Map<number, number>();
    const dayRun = new Map<number, number>();
    const meanAt = (a: number) => {
      let sum = 0;
      for (let m = a; m < a + 60; m++) sum += series.globalHorizontal_lx[m] ?? 0;
      return sum / 60;
    };
    for (let k = 0; k < epw.count; k++) {
      const month = epw.month[k];
      const day = epw.day[k];
      if (month !== 3 || day === undefined || day < 28 || day > 30) continue;
      const hour = epw.hour[k] ?? 0;
      const file_lx = epw.values.globalHorizontal_lx[k] ?? 0;
      if (!(file_lx >= 5000)) continue;
      // Hour ending at `hour` in local standard time (UTC+1) → UTC interval.
      const endUtc = Date.UTC(2026, 2, day, hour - 1);
      const a = Math.round((endUtc - 3_600_000 - series.startEpochMs) / 60_000);
      const run_lx = meanAt(a);
      devs.push(Math.abs(run_lx - file_lx) / file_lx);
      shifted.push(Math.abs(meanAt(a + 60) - file_lx) / file_lx);
      dayFile.set(day, (dayFile.get(day) ?? 0) + file_lx);
      dayRun.set(day, (dayRun.get(day) ?? 0) + run_lx);
    }
    const median = (xs: number[]) => [...xs].sort((x, y) => x - y)[Math.floor(xs.length / 2)] ?? Number.NaN;
    expect(devs.length).toBeGreaterThan(20);
    expect(median(devs)).toBeLessThan(0.05);
    expect(median(shifted)).toBeGreaterThan(3 * median(devs));
    for (const [d, f] of dayFile) expect(Math.abs((dayRun.get(d) ?? 0) - f) / f, `day ${d}`).toBeLessThan(0.05);
  });

  test('a weather text that is not an EPW is refused naming the field and the file', () => {
    expect(() => run({ scenario, weather: { fileName: 'broken.epw', text: 'not,a,weather,file\n' } })).toThrow(/site\.weather\.file: broken\.epw/);
  });
});
