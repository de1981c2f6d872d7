import { describe, expect, it } from 'vitest';
import { equalEnergySpectrum, illuminantA, planckianSpectrum } from './planckian.js';
import { datasetColumn } from '../data/datasets.js';
import { resampleLinear } from '../photometry/resample.js';

describe('thermal sources', () => {
  it('illuminant A from its formula matches the CIE 1 nm table to 6 significant figures (ISO/CIE 11664-2:2022 Table A.1)', () => {
    const t = 'spectra/cie_illuminant_A_1nm.csv';
    const table = resampleLinear(datasetColumn(t, 'wavelength_nm'), datasetColumn(t, 'A')).values;
    const formula = illuminantA().values;
    let worst = 0;
    for (let i = 0; i < table.length; i++) worst = Math.max(worst, Math.abs((formula[i] as number) / (table[i] as number) - 1));
    expect(worst).toBeLessThan(5e-6);
  });

  it('a Planckian radiator at 2848 × 1.4388/1.435 K has the same relative spectrum as illuminant A (same c2/T)', () => {
    const p = planckianSpectrum((2848 * 1.4388) / 1.435).values;
    const a = illuminantA().values;
    for (let i = 0; i < a.length; i += 20) expect((p[i] as number) / (a[i] as number)).toBeCloseTo(1, 10);
  });

  it('normalises Planckian spectra to 100 at 560 nm and refuses temperatures outside 1000–100 000 K', () => {
    expect(planckianSpectrum(3000).values[180]).toBeCloseTo(100, 10);
    expect(() => planckianSpectrum(500)).toThrow(/1000–100000 K/);
  });

  it('the equal-energy spectrum is constant', () => {
    expect(new Set(equalEnergySpectrum().values).size).toBe(1);
  });
});
