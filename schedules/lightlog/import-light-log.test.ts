import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { importLightLog, type LightLogOptions } from './import-light-log.js';
import { logToMinuteSeries } from './log-to-minutes.js';

const LUX: LightLogOptions = { quantity: { kind: 'photopic-lux' }, timestampFormat: 'auto', fill: 'model', timeZone: 'Europe/Berlin' };

function csv(rows: readonly (readonly (string | number)[])[]): string {
  return rows.map((r) => r.join(',')).join('\n');
}

describe('light log import', () => {
  it('reads an ISO-timestamped lux log with a one-minute interval', () => {
    const text = csv([['timestamp', 'lux'], ...Array.from({ length: 10 }, (_, i) => [`2026-03-24T10:${String(i).padStart(2, '0')}:00+01:00`, 100 + i])]);
    const r = importLightLog(text, LUX);
    expect(r.ok).toBe(true);
    expect(r.log?.interval_s).toBe(60);
    expect(r.log?.samples[0]).toEqual({ utc_ms: Date.UTC(2026, 2, 24, 9, 0), photopic_lx: 100, melanopicEdi_lx: null });
    expect(r.log?.gaps).toEqual([]);
  });

  it('reads semicolon-separated, day-first, decimal-comma melanopic EDI in the given zone', () => {
    const text = '# exported by a logger\nDate Time;Melanopic EDI\n24/03/2026 22:00:00;12,5\n24/03/2026 22:00:30;13,5\n24/03/2026 22:01:00;14\n';
    const r = importLightLog(text, { ...LUX, quantity: { kind: 'melanopic-edi' } });
    expect(r.ok).toBe(true);
    expect(r.log?.timestampFormat).toBe('dmy');
    expect(r.log?.interval_s).toBe(30);
    expect(r.log?.samples.map((s) => s.melanopicEdi_lx)).toEqual([12.5, 13.5, 14]);
    expect(r.log?.samples[0]?.utc_ms).toBe(Date.UTC(2026, 2, 24, 21, 0));
  });

  it('turns raw channels into lux and melanopic EDI with the user calibration (Σ kᵢ·cᵢ)', () => {
    const text = csv([['time', 'R', 'G', 'B'], ['1774958400', 10, 20, 30], ['1774958460', 0, 0, 0]]);
    const r = importLightLog(text, { ...LUX, quantity: { kind: 'channels', columns: ['R', 'G', 'B'], calibration: { photopic_lx: [1, 2, 0.5], melanopicEdi_lx: [0, 0.5, 2] } } });
    expect(r.log?.samples[0]).toMatchObject({ photopic_lx: 10 + 40 + 15, melanopicEdi_lx: 10 + 60 });
  });

  it('detects a device-off gap and a not-worn stretch and reports both', () => {
    const rows: (string | number)[][] = [['time', 'lux', 'worn']];
    for (let i = 0; i < 60; i++) if (i < 20 || i >= 40) rows.push([`2026-03-24T10:${String(i).padStart(2, '0')}:00Z`, 50, i >= 50 && i < 55 ? 0 : 1]);
    const r = importLightLog(csv(rows), { ...LUX, wornColumn: 'worn' });
    expect(r.ok).toBe(true);
    expect(r.log?.gaps).toEqual([
      { start_ms: Date.UTC(2026, 2, 24, 10, 20), end_ms: Date.UTC(2026, 2, 24, 10, 40), duration_min: 20, reason: 'no-data', line: 21 },
      { start_ms: Date.UTC(2026, 2, 24, 10, 50), end_ms: Date.UTC(2026, 2, 24, 10, 55), duration_min: 5, reason: 'not-worn', line: 32 },
    ]);
  });

  it('names the line of an unreadable reading and skips it', () => {
    const text = 'time,lux\n2026-03-24T10:00Z,5\n2026-03-24T10:01Z,abc\n2026-03-24T10:02Z,7\n2026-03-24T10:03Z,8\n';
    const r = importLightLog(text, LUX);
    expect(r.ok).toBe(true);
    expect(r.problems).toEqual([expect.objectContaining({ line: 3, column: 'lux', severity: 'warning' })]);
  });

  it('with timestampFormat "auto", skips one unreadable timestamp and lists its line, like the explicit formats', () => {
    const rows = ['time;lux', '24/03/2026 10:00:00;5', '24/03/2026 10:01:00;6', 'n/a;7', '24/03/2026 10:03:00;8', '24/03/2026 10:04:00;9'];
    const auto = importLightLog(rows.join('\n'), LUX);
    const explicit = importLightLog(rows.join('\n'), { ...LUX, timestampFormat: 'dmy' });
    expect(auto.ok).toBe(true);
    expect(auto.log?.timestampFormat).toBe('dmy');
    expect(auto.log?.samples.map((x) => x.photopic_lx)).toEqual(explicit.log?.samples.map((x) => x.photopic_lx));
    expect(auto.problems.filter((p) => p.line !== null)).toEqual([expect.objectContaining({ line: 4, column: 'time', severity: 'warning' })]);
  });

  it('refuses a file without the needed column and lists the columns it has', () => {
    const r = importLightLog('time,temperature\n2026-03-24T10:00Z,21\n', LUX);
    expect(r.ok).toBe(false);
    expect(r.problems[0]?.fix).toContain('temperature');
  });
});

describe('gaps in a light log are reported with their start, end and fill rule', () => {
  const rows: (string | number)[][] = [['time', 'lux']];
  for (let i = 0; i < 60; i++) if (i < 20 || i >= 40) rows.push([`2026-03-24T10:${String(i).padStart(2, '0')}:00Z`, 50]);
  for (const fill of ['model', 'dark', 'hold', 'linear'] as const) {
    it(`names the gap and the "${fill}" rule`, () => {
      const r = importLightLog(csv(rows), { ...LUX, fill, timeZone: 'UTC' });
      const gapNotes = r.problems.filter((p) => /gap/.test(p.message));
      expect(gapNotes).toHaveLength(1);
      expect(gapNotes[0]).toMatchObject({ severity: 'warning', line: 21 });
      expect(gapNotes[0]?.message).toMatch(/2026-03-24 10:20.*2026-03-24 10:40.*20 min/);
      expect(gapNotes[0]?.message).toContain(`"${fill}"`);
    });
  }
});

describe('measured light on the minute grid', () => {
  const start = Date.UTC(2026, 2, 24, 10, 0);
  const text = csv([['time', 'lux'], ...[0, 1, 2, 6, 7].map((m) => [`${new Date(start + m * 60_000).toISOString()}`, m * 10])]);
  const imported = importLightLog(text, { ...LUX, maxGap_min: 2 });
  const log = imported.log;
  if (log === undefined) throw new Error('import failed');
  it('leaves a gap to the model under the "model" rule', () => {
    const s = logToMinuteSeries(log, start, 10);
    expect([...s.measured]).toEqual([1, 1, 1, 0, 0, 0, 1, 1, 0, 0]);
    expect(s.photopic_lx[1]).toBe(10);
  });
  it('fills the gap with 0, the last value or a straight line under the other rules', () => {
    expect([...logToMinuteSeries({ ...log, fill: 'dark' }, start, 8).photopic_lx]).toEqual([0, 10, 20, 0, 0, 0, 60, 70]);
    expect([...logToMinuteSeries({ ...log, fill: 'hold' }, start, 8).photopic_lx]).toEqual([0, 10, 20, 20, 20, 20, 60, 70]);
    expect([...logToMinuteSeries({ ...log, fill: 'linear' }, start, 8).photopic_lx]).toEqual([0, 10, 20, 30, 40, 50, 60, 70]);
  });
  it('averages sub-minute readings over each minute (time-weighted mean)', () => {
    const t = csv([['time', 'lux'], ...[0, 15, 30, 45, 60, 75].map((s, k) => [new Date(start + s * 1000).toISOString(), k * 4])]);
    const l = importLightLog(t, LUX).log;
    if (l === undefined) throw new Error('import failed');
    const series = logToMinuteSeries(l, start, 2);
    expect(series.photopic_lx[0]).toBeCloseTo((0 + 4 + 8 + 12) / 4, 12);
  });
});

describe('light log import: property-based', () => {
  it('never throws or hangs on arbitrary text, and always explains a refusal', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 400 }), (text) => {
        const r = importLightLog(text, LUX);
        if (!r.ok) expect(r.problems.some((p) => p.severity === 'error' && p.message.length > 0 && p.fix.length > 0)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
  it('never throws on CSV-shaped junk (random cells under a valid header)', () => {
    const cell = fc.oneof(fc.string({ maxLength: 12 }), fc.double({ noNaN: false }).map(String), fc.constantFrom('', '-1', 'NaN', '2026-13-45T99:99', '31/02/2026 10:00'));
    fc.assert(
      fc.property(fc.array(fc.tuple(cell, cell), { maxLength: 40 }), (rows) => {
        const r = importLightLog(csv([['timestamp', 'lux'], ...rows]), LUX);
        expect(typeof r.ok).toBe('boolean');
      }),
      { numRuns: 300 },
    );
  });
  it('round-trips random valid logs: every reading comes back with its time and value', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 600 }),
        fc.array(fc.double({ min: 0, max: 1e5, noNaN: true }), { minLength: 2, maxLength: 60 }),
        fc.constantFrom('iso', 'epoch-ms'),
        (step_s, values, form) => {
          const t0 = Date.UTC(2026, 5, 1, 0, 0);
          const rows = values.map((v, i) => [form === 'iso' ? new Date(t0 + i * step_s * 1000).toISOString() : String(t0 + i * step_s * 1000), v]);
          const r = importLightLog(csv([['time', 'lux'], ...rows]), LUX);
          expect(r.ok).toBe(true);
          expect(r.log?.samples.map((s) => s.utc_ms)).toEqual(values.map((_, i) => t0 + i * step_s * 1000));
          expect(r.log?.samples.map((s) => s.photopic_lx)).toEqual(values);
          expect(r.log?.gaps).toEqual([]);
        },
      ),
      { numRuns: 200 },
    );
  });
});
