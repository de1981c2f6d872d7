import { join } from 'node:path';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.js';
import { DEFAULT_PACEMAKER_ID, PACEMAKER_IDS } from '../../model/circadian/registry.js';

const FIX = join(import.meta.dirname, 'fixtures');

async function cli(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await runCli(args, { stdout: (t) => (out += t), stderr: (t) => (err += t) });
  return { code, out, err };
}

function tmpFile(name: string, text: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'zl-sim-'));
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

describe('zeitlight simulate', () => {
  it('prints exactly the contract keys (plus extras) as one JSON document', async () => {
    const r = await cli(['simulate', join(FIX, 'regular-day-lux.csv'), '--days', '3', '--sleep', join(FIX, 'sleep-23-07.csv'), '--json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as Record<string, unknown>;
    for (const k of ['model', 'xmin_h', 'cbtmin_h', 'dlmo_h', 'melatonin_suppression_pct', 'kss_hourly']) expect(doc).toHaveProperty(k);
    expect(doc.model).toBe(DEFAULT_PACEMAKER_ID);
    const cbt = doc.cbtmin_h as number[];
    const dlmo = doc.dlmo_h as number[];
    expect(cbt.length).toBe(3);
    // entrained 23:00–07:00 sleeper: CBTmin 1.5–3.5 h before the 07:00 wake (from memory)
    cbt.forEach((c) => expect(7 - (c % 24)).toBeGreaterThan(1.5));
    // DLMO: the dim-light curve rising through 10 pg/mL, 1–3 h before the 23:00 sleep onset
    // (Burgess et al. 2003 Behav Sleep Med 1:102; Sletten et al. 2010 Front Neurol 1:137: ≈ 2 h)
    expect(dlmo.length).toBe(3);
    dlmo.forEach((d) => {
      expect(23 - (d % 24)).toBeGreaterThan(1);
      expect(23 - (d % 24)).toBeLessThan(3);
    });
    const defs = doc.definitions as Record<string, string>;
    expect(defs.dlmo_h).toMatch(/without light suppression.*10 pg\/mL/);
    expect(defs.melatonin_suppression_pct).toMatch(/biological night.*awake/);
    expect((doc.kss_hourly as unknown[]).length).toBe(72);
    // nights 0 and 1 complete and alike (same light each day); night 2 is cut by the end of the run
    const supp = doc.melatonin_suppression_pct as (number | null)[];
    expect(supp.length).toBe(3);
    expect(Math.abs((supp[0] as number) - (supp[1] as number))).toBeLessThan(1);
    expect(supp[2]).toBeNull();
    // melatonin curve: low by day, nocturnal peak of tens of pg/mL (typical adult plasma levels, common practice)
    const mel = doc.melatonin_pg_ml_hourly as number[];
    expect(mel.length).toBe(72);
    expect(mel[12]).toBeLessThan(1);
    expect(Math.max(...mel.slice(24, 32))).toBeGreaterThan(20);
    expect((doc.kss_hourly as unknown[])[2]).toBeNull(); // asleep at 02:00
  });

  it('accepts melanopic EDI and each model id', async () => {
    for (const model of PACEMAKER_IDS.filter((id) => id !== DEFAULT_PACEMAKER_ID)) {
      const r = await cli(['simulate', join(FIX, 'regular-day-medi.csv'), '--days', '2', '--model', model, '--sleep', join(FIX, 'sleep-23-07.csv'), '--json']);
      expect(r.code).toBe(0);
      expect(JSON.parse(r.out).model).toBe(model);
    }
  });

  it('predicts sleep when no sleep file is given, and honours an alarm', async () => {
    const r = await cli(['simulate', join(FIX, 'regular-day-lux.csv'), '--days', '3', '--alarm', '6.5', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as { sleep_episodes: { start_h: number; end_h: number }[] };
    expect(doc.sleep_episodes.length).toBeGreaterThanOrEqual(2);
    for (const e of doc.sleep_episodes) if (e.end_h < 72) expect(((e.end_h % 24) + 24) % 24).toBeLessThanOrEqual(6.5 + 1e-6);
  });

  it('starts from an explicit state', async () => {
    const r = await cli(['simulate', join(FIX, 'regular-day-lux.csv'), '--days', '2', '--init', '-0.5,-0.86,0.3', '--sleep', join(FIX, 'sleep-23-07.csv'), '--json']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).entrainment).toBeNull();
  });

  it('skips a bad light value and names its file and line, as the light-log reader does', async () => {
    const p = tmpFile('bad.csv', 'hour,lux\n0,0\n7,abc\n9,100\n');
    const r = await cli(['simulate', p, '--days', '1', '--json']);
    expect(r.code).toBe(0);
    expect((JSON.parse(r.out) as { warnings: string[] }).warnings).toContainEqual(expect.stringContaining('bad.csv, line 3'));
    const mostlyBad = await cli(['simulate', tmpFile('worse.csv', 'hour,lux\n0,0\n7,abc\n9,?\n'), '--days', '1', '--json']);
    expect(mostlyBad.code).toBe(1);
    expect(mostlyBad.out).toBe('');
    expect(mostlyBad.err).toContain('worse.csv, line 3');
  });

  it('refuses hours out of order, a wrong header, a bad sleep row and a bad --init', async () => {
    const order = await cli(['simulate', tmpFile('o.csv', 'hour,lux\n0,0\n7,5\n6,1\n'), '--days', '1']);
    expect(order.err).toMatch(/o\.csv, line 4: hour 6 is not after/);
    const head = await cli(['simulate', tmpFile('h.csv', 'hour,lumens\n0,0\n'), '--days', '1']);
    expect(head.err).toMatch(/h\.csv, line 1: header must be/);
    const sleep = await cli(['simulate', join(FIX, 'regular-day-lux.csv'), '--days', '1', '--sleep', tmpFile('s.csv', 'start_h,end_h\n23,22\n')]);
    expect(sleep.err).toMatch(/s\.csv, line 2: end_h/);
    const init = await cli(['simulate', join(FIX, 'regular-day-lux.csv'), '--days', '1', '--init', '1,2']);
    expect(init.code).toBe(2);
    expect(init.err).toContain('--init');
  });

  it('refuses an unknown model and a missing file', async () => {
    expect((await cli(['simulate', join(FIX, 'regular-day-lux.csv'), '--days', '1', '--model', 'nope'])).err).toContain('unknown model "nope"');
    expect((await cli(['simulate', join(FIX, 'missing.csv'), '--days', '1'])).err).toContain('no such file');
  });
});

describe('zeitlight models', () => {
  it('lists every model id with parameters and sources as JSON', async () => {
    const r = await cli(['models', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as { pacemakers: { id: string; source: string; parameters: Record<string, number> }[] };
    expect(doc.pacemakers.map((p) => p.id)).toEqual([...PACEMAKER_IDS]);
    expect(doc.pacemakers[0]?.parameters.mu).toBe(0.13);
  });
});
