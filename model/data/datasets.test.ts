import { describe, expect, it } from 'vitest';
import { datasetColumn, datasetNames, numericDataset } from './datasets.js';

describe('dataset module', () => {
  it('carries every CIE table with its provenance header naming the CIE licence', () => {
    const spectra = datasetNames().filter((n) => n.startsWith('spectra/'));
    expect(spectra.length).toBe(11);
    for (const name of spectra) {
      const t = numericDataset(name);
      expect(t.provenance.join(' ')).toMatch(/CC BY-SA 4\.0/);
      if (!name.includes('efficacy')) expect(t.columns[0]).toBe('wavelength_nm');
    }
  });

  it('reads D65 as 531 rows with 100 at 560 nm (CIE normalisation)', () => {
    const wl = datasetColumn('spectra/cie_illuminant_D65_1nm.csv', 'wavelength_nm');
    const d65 = datasetColumn('spectra/cie_illuminant_D65_1nm.csv', 'D65');
    expect(wl.length).toBe(531);
    expect(d65[wl.indexOf(560)]).toBe(100);
  });

  it('names the table and column when a column is missing', () => {
    expect(() => datasetColumn('spectra/cie_illuminant_D65_1nm.csv', 'D50')).toThrow(/D65_1nm.csv.*D50/);
    expect(() => numericDataset('spectra/nope.csv')).toThrow(/unknown dataset/);
  });
});
