/** `zeitlight weather`: summary of the Amsterdam IWEC file (test data only) and bad files. */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.js';
import { AMSTERDAM_EPW_PATH, amsterdamEpwText } from './epw-fixture.js';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const status = await runCli(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  return { status, stdout, stderr };
}

describe('zeitlight weather', () => {
  it('prints one JSON document: location with latitude/longitude, 12 months, snow days, illuminance statistics', async () => {
    const r = await run(['weather', AMSTERDAM_EPW_PATH, '--json']);
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout) as {
      location: { latitude_deg: number; longitude_deg: number; time_zone_h: number; city: string };
      months: { month: number; hours: number; snow_days: number; mean_daily_global_klxh: number }[];
      snow_days: number;
      records: number;
      illuminance: { hours_from_file: number; global_horizontal: { max_lx: number } };
    };
    // LOCATION line of the file (its README): 52.30 N, 4.77 E, UTC+1.
    expect(doc.location).toMatchObject({ city: 'AMSTERDAM', latitude_deg: 52.3, longitude_deg: 4.77, time_zone_h: 1 });
    expect(doc.records).toBe(8760);
    expect(doc.months.map((m) => m.month)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect(doc.months.reduce((a, m) => a + m.hours, 0)).toBe(8760);
    // The file's snow-depth column is 0 all year (checked with awk on column 31).
    expect(doc.snow_days).toBe(0);
    expect(doc.illuminance.hours_from_file).toBe(8760);
    // Summer days carry far more light than winter days at 52° N.
    expect(doc.months[5]?.mean_daily_global_klxh).toBeGreaterThan(3 * (doc.months[11]?.mean_daily_global_klxh ?? Infinity));
  });

  it('prints a readable table without --json', async () => {
    const r = await run(['weather', AMSTERDAM_EPW_PATH]);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/AMSTERDAM, NLD/);
    expect(r.stdout).toMatch(/klx·h\/day/);
  });

  it('names the file and line of a truncated file, prints nothing on stdout', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'zeitlight-weather-'));
    const path = join(dir, 'cut.epw');
    writeFileSync(path, amsterdamEpwText().split('\n').slice(0, 1000).join('\n'));
    const r = await run(['weather', path, '--json']);
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/cut\.epw, line 1000: .*truncated/);
  });

  it('names the file and line of a row too short to hold the light fields', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'zeitlight-weather-'));
    const path = join(dir, 'bad.epw');
    const lines = amsterdamEpwText().split('\n');
    lines[20] = (lines[20] ?? '').split(',').slice(0, 18).join(',');
    writeFileSync(path, lines.join('\n'));
    const r = await run(['weather', path, '--json']);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/bad\.epw, line 21: expected 35 comma-separated fields \(at least 20, through zenith luminance\), found 18/);
  });

  it('reports counted warnings naming lines for impossible values and keeps going', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'zeitlight-weather-'));
    const path = join(dir, 'neg.epw');
    const lines = amsterdamEpwText().split('\n');
    const cells = (lines[3650] ?? '').split(',');
    cells[16] = '-300';
    lines[3650] = cells.join(',');
    writeFileSync(path, lines.join('\n'));
    const r = await run(['weather', path, '--json']);
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout) as { warnings: { count: number; listed: { line: number; message: string }[] } };
    expect(doc.warnings.count).toBe(1);
    expect(doc.warnings.listed[0]?.line).toBe(3651);
    expect(doc.warnings.listed[0]?.message).toMatch(/global horizontal illuminance -300 is impossible/);
  });

  it('refuses a missing file, naming it', async () => {
    const r = await run(['weather', '/nonexistent/x.epw', '--json']);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/cannot read the weather file \/nonexistent\/x\.epw: no such file/);
  });
});
