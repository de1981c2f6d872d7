/**
 * A clock change inside a run: the demo's 14 days from Monday 23 March 2026 in Europe/Berlin
 * include the start of summer time on Sunday 29 March 2026 (EU rule, Directive 2000/84/EC
 * art. 2: the last Sunday of March at 01:00 UTC, so local 02:00 CET becomes 03:00 CEST).
 * exposure.csv must step through real time without losing or repeating an interval.
 */
import { DateTime } from 'luxon';
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { exposureCsv, EXPOSURE_STEP_MIN } from '../../schedules/run/index.js';
import { demoRun } from './demo-run.js';

describe('daylight-saving change inside the demo run', () => {
  const out = demoRun();
  const rows = Papa.parse<Record<string, string>>(exposureCsv(out.light, out.clock), { header: true, skipEmptyLines: true }).data;
  const one = rows.filter((r) => r['persona_id'] === 'nurse' && r['strategy_id'] === 'baseline');

  test('the run is 14 × 24 − 1 real hours long and the change day has 23 h (luxon as the outside reference)', () => {
    const start = DateTime.fromISO('2026-03-23T00:00', { zone: 'Europe/Berlin' });
    const end = DateTime.fromISO('2026-04-06T00:00', { zone: 'Europe/Berlin' });
    const hours = end.diff(start, 'hours').hours;
    expect(hours).toBe(335);
    expect(one.length).toBe((hours * 60) / EXPOSURE_STEP_MIN);
    const change = out.results.days.find((d) => d.date === '2026-03-29');
    expect(change?.length_h).toBe(23);
    expect(out.results.hours.start_local.length).toBe(335);
  });

  test('UTC times advance by exactly one interval per row: no lost or doubled interval', () => {
    for (let i = 1; i < one.length; i++) {
      const a = Date.parse(one[i - 1]?.['utc'] ?? '');
      const b = Date.parse(one[i]?.['utc'] ?? '');
      expect(b - a).toBe(EXPOSURE_STEP_MIN * 60_000);
    }
  });

  test('local time jumps from 01:50+01:00 to 03:00+02:00 at 01:00 UTC on 29 March', () => {
    const k = one.findIndex((r) => r['utc'] === '2026-03-29T01:00Z');
    expect(one[k - 1]?.['local_time']).toBe('2026-03-29T01:50+01:00');
    expect(one[k]?.['local_time']).toBe('2026-03-29T03:00+02:00');
    expect(one.filter((r) => (r['local_time'] ?? '').startsWith('2026-03-29T02:')).length).toBe(0);
  });

  test('local times of every row agree with luxon for the same UTC instant', () => {
    for (const r of one.filter((_, i) => i % 7 === 0)) {
      const t = DateTime.fromISO(r['utc'] ?? '', { zone: 'utc' }).setZone('Europe/Berlin');
      expect(r['local_time']).toBe(t.toFormat("yyyy-MM-dd'T'HH:mmZZ"));
    }
  });

  test('routine clock times stay on the local clock after the change: the desk worker leaves home at 07:30 local on both Mondays', () => {
    const dw = rows.filter((r) => r['persona_id'] === 'desk-worker' && r['strategy_id'] === 'baseline');
    for (const date of ['2026-03-23', '2026-03-30']) {
      const row = dw.find((r) => r['local_time'] === `${date}T07:30${date === '2026-03-23' ? '+01:00' : '+02:00'}`);
      expect(row?.['place']).toBe('street');
    }
  });
});
