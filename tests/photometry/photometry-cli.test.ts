/** `zeitlight photometry`: one JSON document for each format, the listing in help, refusals naming file, line and field. */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.js';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const status = await runCli(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  return { status, stdout, stderr };
}

const CORPUS = 'tests/photometry/luminaires';

describe('zeitlight photometry', () => {
  it('prints one JSON document for an LM-63 file: format, fluxes within 1 % (closed form π·I0 = 2000 lm), symmetry, grids, peak, dimensions', async () => {
    const r = await run(['photometry', `${CORPUS}/wallwasher-c0-c180.ies`, '--json']);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(doc).toMatchObject({ format: 'LM-63', edition: 'LM-63-2002', photometry_type: 'C', symmetry: 'plane-C0-C180', stated_flux_lm: 2000, flux_method: 'zonal-constant' });
    expect(Math.abs((doc.flux_lm as number) / 2000 - 1)).toBeLessThan(0.01);
    expect(doc.flux_table_lm).toBe(doc.flux_lm);
    expect(doc.grid).toEqual({ stored: { horizontal: 13, vertical: 19 }, expanded: { horizontal: 25, vertical: 19 }, horizontal_range_deg: [0, 360], vertical_range_deg: [0, 90] });
    // Generator: I0·cos γ·(1 + 0.8 cos C) with π·I0 = 2000 lm, so the peak is 1.8·2000/π cd at C0, γ 0.
    expect(doc.peak).toEqual({ candela_cd: expect.closeTo((1.8 * 2000) / Math.PI, 2) as number, horizontal_deg: 0, vertical_deg: 0 });
    expect(doc.dimensions_m).toEqual({ width: 0.1, length: 1.2, height: 0 });
  });

  it('reads EULUMDAT and absolute photometry (no stated flux)', async () => {
    const ldt = JSON.parse((await run(['photometry', `${CORPUS}/batwing-quadrant.ldt`, '--json'])).stdout) as Record<string, unknown>;
    expect(ldt).toMatchObject({ format: 'EULUMDAT', symmetry: 'quadrant', stated_flux_lm: 4000 });
    const abs = JSON.parse((await run(['photometry', `${CORPUS}/globe-absolute.ies`, '--json'])).stdout) as Record<string, unknown>;
    expect(abs).toMatchObject({ absolute_photometry: true, stated_flux_lm: null, flux_difference_percent: null });
    expect(abs.flux_lm as number).toBeCloseTo(400 * Math.PI, 6); // isotropic 100 cd: Φ = 4π·I
  });

  it('prints a readable summary without --json and is listed in help as photometric', async () => {
    const r = await run(['photometry', `${CORPUS}/floodlight-type-b.ies`]);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('type B photometry');
    expect(r.stdout).toContain('peak intensity');
    const help = await run(['--help']);
    expect(help.stdout).toMatch(/photometry\s+.*photometric/);
  });

  it('refuses a bad file naming the file, the line and the field; a missing file by name', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'zeitlight-photometry-'));
    const bad = join(dir, 'bad.ies');
    writeFileSync(bad, 'IESNA:LM-63-2002\nTILT=NONE\n1 1000 1 2 1 7 2 0 0 0\n1 1 1\n0 90\n0\n1 0\n');
    const r = await run(['photometry', bad]);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain(`${bad}, line 3, photometric type:`);
    const missing = await run(['photometry', join(dir, 'none.ldt')]);
    expect(missing.status).toBe(1);
    expect(missing.stderr).toContain('none.ldt: no such file');
    expect((await run(['photometry'])).status).toBe(2);
  });
});
