import { describe, expect, it } from 'vitest';
import { parseSpdCsv, SpdInputError } from './spd-csv.js';
import { alphaOpicQuantities, illuminantD65, KM_LM_PER_W } from './alpha-opic.js';
import { GRID_LENGTH } from './wavelength-grid.js';

function d65Csv(step: number, from = 380, to = 780): string {
  const d = illuminantD65().values;
  const rows = ['wavelength_nm,irradiance_W_m2_nm'];
  for (let w = from; w <= to; w += step) rows.push(`${w},${(d[w - 380] as number) / 100}`);
  return rows.join('\n') + '\n';
}

function errorOf(text: string): string {
  try {
    parseSpdCsv(text, 'spd.csv');
  } catch (e) {
    expect(e).toBeInstanceOf(SpdInputError);
    return (e as Error).message;
  }
  throw new Error('expected an error');
}

describe('spectral CSV input', () => {
  it('reads D65 at 5 nm steps to DER = 1 within 1e-3 (CIE S 026 definition; 5 nm vs 1 nm sampling)', () => {
    const r = parseSpdCsv(d65Csv(5), 'd65.csv');
    expect(r.resampling).toBe('linear');
    expect(r.warnings).toEqual([]);
    expect(Math.abs(alphaOpicQuantities(r.spectrum).alpha_opic.mel.der - 1)).toBeLessThan(1e-3);
  });

  it('keeps the power of a narrow line measured at 0.1 nm steps between grid points (bin mean, 1 nm bins)', () => {
    const rows = ['wavelength_nm,E'];
    for (let i = 3800; i <= 7800; i++) {
      const w = i / 10;
      rows.push(`${w},${Math.abs(w - 555.5) < 0.25 ? 2 : 0}`);
    }
    const r = parseSpdCsv(rows.join('\n'), 'line.csv');
    expect(r.resampling).toBe('bin-mean');
    let radiant = 0;
    for (let i = 0; i < GRID_LENGTH; i++) radiant += r.spectrum.values[i] as number;
    expect(radiant).toBeCloseTo(1.0, 1); // ≈ 2 W·m⁻²·nm⁻¹ × 0.5 nm
    expect(alphaOpicQuantities(r.spectrum).illuminance_lx / radiant).toBeCloseTo(KM_LM_PER_W, -1);
  });

  it('accepts comments, semicolons with decimal commas and a chosen value column', () => {
    const text = '# measured at desk\nwavelength_nm;a;b\n380;0,1;1\n780;0,2;2\n';
    const r = parseSpdCsv(text, 'x.csv', { column: 'b' });
    expect(r.column).toBe('b');
    expect(r.spectrum.values[400]).toBeCloseTo(2, 12);
    expect(parseSpdCsv(text, 'x.csv').warnings[0]).toMatch(/using column "a"; 1 other value column/);
  });

  it('warns, saying what was assumed, when the data do not cover 380–780 nm', () => {
    const r = parseSpdCsv(d65Csv(5, 400, 700), 'short.csv');
    expect(r.warnings.join('\n')).toMatch(/short\.csv: the data cover 400–700 nm.*outside 400–700 nm was assumed to be zero/);
  });

  it('sets small negative values (spectrometer noise) to 0 and counts them in a warning', () => {
    const r = parseSpdCsv('wavelength_nm,E\n380,-0.001\n390,-0.015\n400,0.2\n500,1\n780,-0.004\n', 'noise.csv');
    expect(r.warnings).toContainEqual('noise.csv: 3 negative value(s) down to -0.015 (at 390 nm, line 3) taken as measurement noise and set to 0');
    expect(Math.min(...r.spectrum.values)).toBe(0);
    // the same as the file with the noise written as 0
    expect([...r.spectrum.values]).toEqual([...parseSpdCsv('wavelength_nm,E\n380,0\n390,0\n400,0.2\n500,1\n780,0\n', 'zero.csv').spectrum.values]);
  });

  it('refuses a negative value larger than noise (2 % of the peak), naming its line', () => {
    expect(errorOf('wavelength_nm,E\n380,-0.001\n390,-0.03\n500,1\n780,0\n')).toMatch(/spd\.csv, line 3, column "E": negative value -0\.03.*more than measurement noise \(below -0\.02/);
  });

  it('names the problem, the file and the line for bad input', () => {
    expect(errorOf('')).toMatch(/spd\.csv: the file is empty/);
    expect(errorOf('380,1\n390,2\n')).toMatch(/spd\.csv, line 1: missing header row/);
    expect(errorOf('wavelength_nm,E\n380,1\n390,abc\n')).toMatch(/spd\.csv, line 3, column "E": "abc" is not a number/);
    expect(errorOf('wavelength_nm,E\n380,1\n390,1\n390,2\n')).toMatch(/line 4: wavelength 390 nm repeats line 3/);
    expect(errorOf('wavelength_nm,E\n380,1\n400,1\n390,2\n')).toMatch(/line 4: wavelength 390 nm comes after 400 nm \(line 3\)/);
    expect(errorOf('wavelength_nm,E\n380,1\n390,-0.5\n')).toMatch(/line 3, column "E": negative value -0.5/);
    expect(errorOf('wavelength_nm\n380\n')).toMatch(/line 1: the header names 1 column/);
    expect(errorOf('wavelength_nm,E\n0.38,1\n0.78,1\n')).toMatch(/does not overlap 380–780 nm/);
    expect(errorOf('wavelength_nm,E\n380,1\n')).toMatch(/at least two data rows/);
    expect(errorOf('wavelength_nm,E\n380,1\n390\n')).toMatch(/line 3: expected at least 2 cells, found 1/);
  });
});
