// What a run rests on, said wherever results are read:
//  - a weather file for a place far from the site (more than 1° in latitude or longitude) or in
//    another time zone warns in results.json and in the text `zeitlight run` prints (the app's notes
//    and the briefing: renderer/report/src/run-basis.test.ts); one near the site in the same zone
//    does not. Weather data: the IWEC
//    typical year for Amsterdam Schiphol (52.30° N, 4.77° E, UTC+1; test data only), run for the
//    demo's site (52.40° N, 10.80° E, Europe/Berlin) and for a site at Schiphol;
//  - a measured light log: results.json lists the days with measured light and every gap with how
//    it was filled (the briefing's list: renderer/report/src/run-basis.test.ts).
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CommandContext } from '../../cli/command.js';
import { runCommand } from '../../cli/commands/run.js';
import { DEMO_SCENARIO, validateScenarioValue, type Scenario } from '../../schedules/index.js';
import { demoPart } from '../../schedules/demo/demo-part.js';
import { runScenario, type RunResults } from '../../schedules/run/index.js';
import { weatherBasis, weatherSiteWarning } from '../../schedules/run/run-basis.js';
import { AMSTERDAM_EPW_PATH, amsterdamEpwText } from '../weather/epw-fixture.js';

function validated(doc: unknown): Scenario {
  const v = validateScenarioValue(doc);
  if (v.scenario === undefined) throw new Error(v.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return v.scenario;
}

describe('weather file and site', () => {
  const site = { latitude_deg: 52.4, longitude_deg: 10.8 };
  const scenarioWith = (s: Scenario['site']) => validated({ ...demoPart(['desk-worker'], []), run: { startDate: '2026-03-28', days: 1 }, site: s });

  it('are compared by position and standard time zone (1° either way; Europe/Berlin is UTC+1 in winter)', () => {
    const berlin = scenarioWith({ ...DEMO_SCENARIO.site, weather: { kind: 'file', file: 'x.epw' } } as Scenario['site']);
    const near = weatherBasis(berlin, 'x.epw', { city: 'Near', country: 'DEU', latitude_deg: 52.9, longitude_deg: 11.6, timeZone_h: 1 });
    expect(near).toMatchObject({ kind: 'weather-file', near_site: true, site_time_zone_h: 1 });
    expect(weatherSiteWarning(near, site)).toBeNull();
    const far = weatherBasis(berlin, 'x.epw', { city: 'Far', country: 'NLD', latitude_deg: 52.3, longitude_deg: 4.77, timeZone_h: 1 });
    expect(far).toMatchObject({ near_site: false, offset_deg: 6.03 });
    const zone = weatherBasis(berlin, 'x.epw', { city: 'Zone', country: '-', latitude_deg: 52.4, longitude_deg: 10.8, timeZone_h: 0 });
    expect(zone.kind === 'weather-file' && zone.near_site).toBe(false);
    expect(weatherSiteWarning(zone, site)).toMatch(/in another time zone \(UTC\+0 against the site's UTC\+1\)/);
  });

  describe.skipIf(!existsSync(AMSTERDAM_EPW_PATH))('in a run', () => {
    const text = amsterdamEpwText();
    const weather = { kind: 'file', file: 'amsterdam.epw', format: 'epw', snowFromFile: true } as const;
    const farScenario = scenarioWith({ ...DEMO_SCENARIO.site, weather } as Scenario['site']);
    const far = runScenario({ scenario: farScenario, weather: { fileName: 'amsterdam.epw', text } });
    const warning = /The weather file amsterdam\.epw was recorded for a place \(AMSTERDAM, NLD\) at 52\.30° N, 4\.77° E, 6\.0° away from the site \(52\.40° N, 10\.80° E\)/;

    it('warn in results.json for a file 6° from the site, and not for one at the site', () => {
      expect(far.results.warnings.filter((w) => warning.test(w))).toHaveLength(1);
      expect(far.results.basis?.weather).toMatchObject({ kind: 'weather-file', near_site: false });
      const near = runScenario({ scenario: scenarioWith({ ...DEMO_SCENARIO.site, latitude_deg: 52.3, longitude_deg: 4.77, timeZone: 'Europe/Amsterdam', weather } as Scenario['site']), weather: { fileName: 'amsterdam.epw', text } });
      expect(near.results.warnings.some((w) => /weather file/i.test(w) && /away from the site/.test(w))).toBe(false);
      expect(near.results.basis?.weather).toMatchObject({ near_site: true });
    });

    it('warn in the text zeitlight run prints', async () => {
      const dir = mkdtempSync(join(tmpdir(), 'zeitlight-weather-site-'));
      writeFileSync(join(dir, 'amsterdam.epw'), text);
      writeFileSync(join(dir, 'scenario.json'), JSON.stringify({ ...demoPart(['desk-worker'], []), run: { startDate: '2026-03-28', days: 1 }, site: { ...DEMO_SCENARIO.site, weather: { kind: 'file', file: 'amsterdam.epw' } } }));
      let stdout = '';
      const ctx: CommandContext = { positionals: [join(dir, 'scenario.json')], values: { out: join(dir, 'out'), 'no-ensemble': true }, json: false, stdout: (t) => (stdout += t), stderr: () => undefined };
      expect(await runCommand.run(ctx)).toBe(0);
      expect(stdout).toMatch(new RegExp(`warning: ${warning.source}`));
    });
  });
});

/** One reading a minute from 08:00 to 20:00 local time (UTC+1) on 2026-03-23 and again on 2026-03-24, none from 12:00 to 13:00 on the first day. */
function logText(): string {
  const lines = ['timestamp,lux'];
  for (const day of [23, 24]) {
    const t0 = Date.UTC(2026, 2, day, 7, 0);
    for (let m = 0; m < 12 * 60; m++) if (day === 24 || m < 240 || m >= 300) lines.push(`${new Date(t0 + m * 60_000).toISOString()},${300 + (m % 7)}`);
  }
  return lines.join('\n') + '\n';
}

describe('a measured light log', () => {
  const doc = { ...demoPart(['desk-worker'], []), run: { startDate: '2026-03-23', days: 3 }, personas: [{ ...demoPart(['desk-worker'], []).personas[0], measuredLight: [{ log: 'wear' }] }], lightLogs: [{ id: 'wear', file: 'wear.csv', timestampFormat: 'iso', quantity: { kind: 'photopic-lux' }, fill: 'hold' }] };
  const scenario = validated(doc);
  const results = JSON.parse(JSON.stringify(runScenario({ scenario, lightLogTexts: { wear: logText() } }).results)) as RunResults;

  it('is listed in results.json with its days, hours of measured light and the gap with its fill', () => {
    const use = results.basis?.measured_light[0];
    expect(use).toMatchObject({ persona_id: 'desk-worker', log_id: 'wear', file: 'wear.csv' });
    // readings 08:00–20:00 each day; the gaps between (12:00–13:00 and the night 20:00–08:00) are
    // filled by the hold rule, so they count as measured: 08:00–24:00 on the first day, 00:00–20:00 on the second
    expect(use?.days).toEqual([
      { date: '2026-03-23', measured_h: 16 },
      { date: '2026-03-24', measured_h: 20 },
    ]);
    expect(use?.gaps).toEqual([
      { start_local: '2026-03-23T12:00', end_local: '2026-03-23T13:00', duration_min: 60, reason: 'no readings', fill_rule: 'hold', filled_with: 'the last reading before it' },
      expect.objectContaining({ start_local: '2026-03-23T20:00', end_local: '2026-03-24T08:00', reason: 'no readings' }),
    ]);
  });
});
