/** `zeitlight sun`: the JSON contract, the SPA worked example through the command line, bad input. */
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.js';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const status = await runCli(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  return { status, stdout, stderr };
}

describe('zeitlight sun', () => {
  it('prints exactly one JSON document with the contract keys; reproduces the SPA worked example (Reda & Andreas 2004, Table A5.2)', async () => {
    const r = await run([
      'sun', '--lat', '39.742476', '--lon', '-105.1786', '--time', '2003-10-17T12:30:30-07:00',
      '--elevation-m', '1830.14', '--pressure-hPa', '820', '--temperature-C', '11', '--delta-t-s', '67', '--json',
    ]);
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
    const doc = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(Object.keys(doc).slice(0, 3)).toEqual(['zenith_deg', 'azimuth_deg', 'elevation_deg']);
    expect(Math.abs((doc.zenith_deg as number) - 50.11162)).toBeLessThanOrEqual(5e-6);
    expect(Math.abs((doc.azimuth_deg as number) - 194.34024)).toBeLessThanOrEqual(5e-6);
    expect((doc.elevation_deg as number) + (doc.zenith_deg as number)).toBeCloseTo(90, 5);
    expect(doc.sunrise).toBe('2003-10-17T06:12:43-07:00');
    expect(String(doc.sunset)).toMatch(/^2003-10-17T17:1[89]/);
  });

  it('accepts Z as the offset and reports the sun below the horizon at night', async () => {
    const r = await run(['sun', '--lat', '52.3', '--lon', '4.77', '--time', '2025-01-15T00:00Z', '--json']);
    expect(r.status).toBe(0);
    expect((JSON.parse(r.stdout) as { elevation_deg: number }).elevation_deg).toBeLessThan(-40);
  });

  it('refuses a time without a UTC offset, naming --time', async () => {
    const r = await run(['sun', '--lat', '52', '--lon', '5', '--time', '2025-06-21T12:00:00', '--json']);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/--time/);
  });

  it('refuses a latitude beyond 90°, naming --lat', async () => {
    const r = await run(['sun', '--lat', '91', '--lon', '5', '--time', '2025-06-21T12:00:00+02:00', '--json']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--lat/);
  });

  it('refuses a non-numeric pressure, naming --pressure-hPa', async () => {
    const r = await run(['sun', '--lat', '52', '--lon', '5', '--time', '2025-06-21T12:00:00+02:00', '--pressure-hPa', 'high']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--pressure-hPa/);
  });

  it('requires --lat', async () => {
    const r = await run(['sun', '--lon', '5', '--time', '2025-06-21T12:00:00+02:00']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--lat is required/);
  });

  it('says when the sun does not set (polar day)', async () => {
    const r = await run(['sun', '--lat', '78.2', '--lon', '15.6', '--time', '2025-06-21T12:00:00+02:00', '--json']);
    const doc = JSON.parse(r.stdout) as { sunrise: unknown; day_kind: string };
    expect(doc.sunrise).toBeNull();
    expect(doc.day_kind).toBe('polar-day');
  });
});

describe('zeitlight sun through the built launcher', () => {
  it('prints exactly one JSON document on stdout and nothing on stderr', async () => {
    const { runZeitlight } = await import('../helpers/run-cli.js');
    const r = runZeitlight(['sun', '--lat', '52.3', '--lon', '4.77', '--time', '2025-06-21T13:40:00+02:00', '--json']);
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
    const doc = JSON.parse(r.stdout) as { elevation_deg: number; azimuth_deg: number };
    // Near local solar noon at midsummer, 52.3°N: elevation ≈ 90 − 52.3 + 23.44 = 61.1° (declination, common practice).
    expect(doc.elevation_deg).toBeGreaterThan(60.5);
    expect(doc.elevation_deg).toBeLessThan(61.5);
    expect(Math.abs(doc.azimuth_deg - 180)).toBeLessThan(5);
  });
});
