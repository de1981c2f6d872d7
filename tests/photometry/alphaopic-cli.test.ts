/**
 * Golden behaviour of `zeitlight alphaopic` and `zeitlight sources` through the built launcher
 * (needs `npm run build`). Numeric expectations name their outside source.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { runZeitlight } from '../helpers/run-cli.js';
import { datasetColumn } from '../../model/data/datasets.js';

const D65_TABLE = 'spectra/cie_illuminant_D65_1nm.csv';

let dir = '';
function file(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

const KEYS = ['sc', 'mc', 'lc', 'rh', 'mel'];
const FIELDS = ['irradiance_mW_m2', 'edi_lx', 'der', 'elr_mW_lm'];

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'zeitlight-alphaopic-'));
});

function json(args: string[]): Record<string, unknown> {
  const r = runZeitlight([...args, '--json']);
  expect(r.stderr).toBe('');
  expect(r.status).toBe(0);
  return JSON.parse(r.stdout) as Record<string, unknown>;
}

describe('zeitlight alphaopic', () => {
  it('answers for the bundled example spectrum with the contract keys (architecture §4)', () => {
    const out = json(['alphaopic', 'docs/examples/warm-white-led-desk.csv']);
    expect(Object.keys(out)).toEqual(expect.arrayContaining(['illuminance_lx', 'alpha_opic', 'cct_K', 'duv']));
    const ao = out.alpha_opic as Record<string, Record<string, number>>;
    expect(Object.keys(ao).sort()).toEqual([...KEYS].sort());
    for (const k of KEYS) expect(Object.keys(ao[k] ?? {})).toEqual(FIELDS);
    expect(Math.abs((out.illuminance_lx as number) - 250)).toBeLessThan(0.5);
    expect(Math.abs((out.cct_K as number) - 3000)).toBeLessThan(5);
  });

  it('gives D65 from a user file DER = 1 and scales it to the requested illuminance (CIE S 026:2018 definition)', () => {
    // A user file made from the CIE D65 table (ISO/CIE 11664-2:2022 Table B.1) sampled every 10 nm, relative units.
    const wl = datasetColumn(D65_TABLE, 'wavelength_nm');
    const v = datasetColumn(D65_TABLE, 'D65');
    const rows = ['wavelength_nm,D65'];
    wl.forEach((w, i) => {
      if (w >= 380 && w <= 780 && w % 10 === 0) rows.push(`${w},${v[i]}`);
    });
    const out = json(['alphaopic', file('d65.csv', rows.join('\n')), '--illuminance', '1000']);
    expect(out.illuminance_lx as number).toBeCloseTo(1000, 6);
    const ao = out.alpha_opic as Record<string, Record<string, number>>;
    for (const k of KEYS) expect(Math.abs((ao[k]?.der ?? 0) - 1)).toBeLessThan(3e-3);
    expect(Math.abs((out.cct_K as number) - 6504)).toBeLessThan(10);
  });

  it('answers for built-in CIE tables by name: illuminant A has melanopic DER ≈ 0.496 and CCT ≈ 2856 K', () => {
    const out = json(['alphaopic', '--source', 'A', '--illuminance', '200']);
    const mel = (out.alpha_opic as Record<string, Record<string, number>>).mel as Record<string, number>;
    expect(Math.abs((mel.der as number) - 0.496)).toBeLessThan(0.001);
    expect(mel.edi_lx as number).toBeCloseTo(200 * (mel.der as number), 8);
    expect(Math.abs((out.cct_K as number) - 2856)).toBeLessThan(1);
    for (const id of ['FL11', 'LED-B3', 'LED-V2', 'E', 'pc-LED-3500K', 'display-night']) expect(runZeitlight(['alphaopic', '--source', id, '--json']).status).toBe(0);
  });

  it('lowers melanopic EDI for an older observer and through amber glasses', () => {
    const base = json(['alphaopic', '--source', 'D65', '--illuminance', '500']);
    const old = json(['alphaopic', '--source', 'D65', '--illuminance', '500', '--age', '70']);
    const amber = json(['alphaopic', '--source', 'D65', '--illuminance', '500', '--filter', 'eyewear-amber']);
    const mel = (o: Record<string, unknown>) => ((o.alpha_opic as Record<string, Record<string, number>>).mel as Record<string, number>).edi_lx as number;
    expect(mel(old)).toBeLessThan(mel(base));
    expect(old.illuminance_lx as number).toBeCloseTo(500, 6);
    expect(old.age_years).toBe(70);
    expect(mel(amber)).toBeLessThan(0.3 * 500);
  });

  it('prints a readable table with the caution when --json is absent', () => {
    const r = runZeitlight(['alphaopic', 'docs/examples/warm-white-led-desk.csv']);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/melanopic\s+[\d.]+\s+[\d.]+\s+0\.\d{4}/);
    expect(r.stdout).toContain('Caution:');
  });

  it('warns, saying what was assumed, when the file does not cover 380–780 nm', () => {
    const out = json(['alphaopic', file('short.csv', 'wavelength_nm,E\n400,1\n500,1\n600,1\n700,1\n')]);
    expect((out.warnings as string[]).join(' ')).toMatch(/cover 400–700 nm.*assumed to be zero/);
  });

  const bad: [string, string[], RegExp][] = [
    ['an unreadable file', ['no-such-file.csv'], /cannot read the spectrum file no-such-file\.csv: no such file/],
    ['a missing header', ['@noheader'], /noheader\.csv, line 1: missing header row/],
    ['a non-numeric cell, naming the line', ['@text'], /text\.csv, line 4, column "E": "n\/a" is not a number/],
    ['unsorted wavelengths', ['@unsorted'], /unsorted\.csv, line 4: wavelength 450 nm comes after 500 nm/],
    ['duplicate wavelengths', ['@dup'], /dup\.csv, line 4: wavelength 500 nm repeats line 3/],
    ['negative values', ['@neg'], /neg\.csv, line 3, column "E": negative value -1/],
    ['zero illuminance with --illuminance', ['@good', '--illuminance', '0'], /--illuminance must be greater than 0 lx/],
    ['a spectrum with no visible light when scaling', ['@dark', '--illuminance', '100'], /photopic illuminance 0 lx/],
    ['an unknown built-in source', ['--source', 'LED-Q7'], /unknown light source "LED-Q7"/],
    ['an age outside 1–100 years', ['@good', '--age', '150'], /--age must be between 1 and 100 years/],
  ];
  const texts: Record<string, string> = {
    noheader: '380,1\n780,1\n',
    text: 'wavelength_nm,E\n380,1\n390,1\n400,n/a\n',
    unsorted: 'wavelength_nm,E\n400,1\n500,1\n450,1\n',
    dup: 'wavelength_nm,E\n400,1\n500,1\n500,2\n',
    neg: 'wavelength_nm,E\n400,1\n500,-1\n',
    good: 'wavelength_nm,E\n380,1\n780,1\n',
    dark: 'wavelength_nm,E\n380,0\n780,0\n',
  };
  for (const [what, args, message] of bad) {
    it(`refuses ${what} with a message on stderr and a non-zero exit`, () => {
      const resolved = args.map((a) => (a.startsWith('@') ? file(`${a.slice(1)}.csv`, texts[a.slice(1)] ?? '') : a));
      const r = runZeitlight(['alphaopic', ...resolved, '--json']);
      expect(r.status).not.toBe(0);
      expect(r.stdout).toBe('');
      expect(r.stderr).toMatch(message);
    });
  }
});

describe('zeitlight sources', () => {
  it('lists the library as one JSON document with CCT and melanopic DER per source', () => {
    const out = json(['sources']);
    const sources = out.sources as { id: string; cct_K: number; melanopic_der: number; parametric: boolean }[];
    const ids = sources.map((s) => s.id);
    for (const id of ['D65', 'A', 'FL1', 'FL12', 'LED-B1', 'LED-V2', 'pc-LED-4000K', 'display-night']) expect(ids).toContain(id);
    const d65 = sources.find((s) => s.id === 'D65');
    expect(d65?.melanopic_der).toBeCloseTo(1, 9);
    expect((out.filters as unknown[]).length).toBeGreaterThan(4);
  });
});
