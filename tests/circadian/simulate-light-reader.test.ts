/**
 * `zeitlight simulate` reads its light series with the light-log reader: "hour,lux" as before, and
 * also semicolon-, tab- or bar-separated files with decimal commas and logger exports with
 * timestamps; its messages quote the file's own delimiter.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.js';

async function simulate(name: string, text: string, ...extra: string[]): Promise<{ code: number; out: string; err: string }> {
  const dir = mkdtempSync(join(tmpdir(), 'zl-sim-reader-'));
  const file = join(dir, name);
  writeFileSync(file, text);
  let out = '';
  let err = '';
  const code = await runCli(['simulate', file, '--days', '2', '--json', ...extra], { stdout: (t) => (out += t), stderr: (t) => (err += t) });
  return { code, out, err };
}

const COMMA = 'hour,lux\n0,0\n7,250.5\n19,80\n23,0\n';
const figures = (out: string) => {
  const d = JSON.parse(out) as { cbtmin_h: number[]; dlmo_h: number[]; melatonin_suppression_pct: (number | null)[] };
  return { cbtmin_h: d.cbtmin_h, dlmo_h: d.dlmo_h, melatonin_suppression_pct: d.melatonin_suppression_pct };
};

describe('zeitlight simulate light files', () => {
  it('reads "hour;lux" with decimal commas exactly as "hour,lux"', async () => {
    const comma = await simulate('comma.csv', COMMA);
    const semicolon = await simulate('semicolon.csv', 'hour;lux\n0;0\n7;250,5\n19;80\n23;0\n');
    expect(comma.code).toBe(0);
    expect(semicolon.err).toBe('');
    expect(semicolon.code).toBe(0);
    expect(figures(semicolon.out)).toEqual(figures(comma.out));
  });

  it('reads a logger export with time stamps, from local midnight of its first day', async () => {
    const rows = ['timestamp\tlux', '2026-03-23T00:00:00+01:00\t0', '2026-03-23T07:00:00+01:00\t250,5', '2026-03-23T19:00:00+01:00\t80', '2026-03-23T23:00:00+01:00\t0'];
    const logged = await simulate('logger.tsv', rows.join('\n') + '\n');
    expect(logged.err).toBe('');
    expect(logged.code).toBe(0);
    const doc = JSON.parse(logged.out) as { input: { start_local: string } };
    expect(doc.input.start_local).toBe('2026-03-23T00:00+01:00');
    expect(figures(logged.out)).toEqual(figures((await simulate('comma.csv', COMMA)).out));
  });

  it('quotes a wrong header with the file\'s own delimiter', async () => {
    const r = await simulate('wrong.csv', 'hour;lumens\n0;0\n');
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/wrong\.csv, line 1: .*"hour;lux" or "hour;mel_edi_lx".*got "hour;lumens"/);
  });
});
