import { describe, expect, it } from 'vitest';
import { validateScenarioValue } from '../validation/validate-scenario.js';
import { demoPart } from '../demo/demo-part.js';
import { standardOffset_h, utcOffsetWords, weatherBasis, weatherSiteWarning, WEATHER_SITE_TOLERANCE_DEG } from './run-basis.js';

describe('what a run rests on: the weather', () => {
  const v = validateScenarioValue({ ...demoPart(['desk-worker'], []), site: { ...demoPart([]).site, weather: { kind: 'file', file: 'w.epw' } } });
  if (v.scenario === undefined) throw new Error('scenario does not validate');
  const scenario = v.scenario;
  const at = (latitude_deg: number, longitude_deg: number, timeZone_h = 1) => weatherBasis(scenario, 'w.epw', { city: 'X', country: 'Y', latitude_deg, longitude_deg, timeZone_h });

  it('takes the standard (winter) offset of the site’s zone: Europe/Berlin UTC+1, America/New_York UTC−5 (IANA tz database)', () => {
    expect(standardOffset_h('Europe/Berlin', 2026)).toBe(1);
    expect(standardOffset_h('America/New_York', 2026)).toBe(-5);
    expect([1, -5, 5.5, 0].map(utcOffsetWords)).toEqual(['UTC+1', 'UTC−5', 'UTC+5:30', 'UTC+0']);
  });

  it(`counts a file as near within ${WEATHER_SITE_TOLERANCE_DEG}° of latitude and longitude in the same time zone`, () => {
    expect(at(52.4 + 0.99, 10.8 - 0.99)).toMatchObject({ near_site: true });
    expect(at(52.4 + 1.01, 10.8)).toMatchObject({ near_site: false, offset_deg: 1.01 });
    expect(at(52.4, 10.8 + 1.2)).toMatchObject({ near_site: false });
    expect(at(52.4, 10.8, 2)).toMatchObject({ near_site: false, offset_deg: 0 });
  });

  it('says nothing for generated skies or a near file, and names place, distance and zone otherwise', () => {
    expect(weatherSiteWarning(at(52.5, 10.9), scenario.site)).toBeNull();
    const w = weatherSiteWarning(at(40.71, -74.01, -5), scenario.site);
    expect(w).toMatch(/^The weather file w\.epw was recorded for a place \(X, Y\) at 40\.71° N, 74\.01° W, 84\.8° away from the site \(52\.40° N, 10\.80° E\) and in another time zone \(UTC−5 against the site's UTC\+1\)/);
  });
});
