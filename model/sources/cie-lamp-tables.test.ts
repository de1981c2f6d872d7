import { describe, expect, it } from 'vitest';
import { CIE_FL_NAMES, CIE_LED_NAMES, cieLampSpectrum } from './cie-lamp-tables.js';
import { datasetColumn } from '../data/datasets.js';

describe('CIE FL and LED illuminants', () => {
  it('the FL spectra pass exactly through the normative 5 nm table values (CIE 015:2018 Tables 10.1–10.3)', () => {
    const t = 'spectra/cie_fluorescent_FL1_FL12_5nm.csv';
    const wl = datasetColumn(t, 'wavelength_nm');
    for (const n of CIE_FL_NAMES) {
      const col = datasetColumn(t, n);
      const s = cieLampSpectrum(n).values;
      for (let j = 0; j < wl.length; j++) expect(s[(wl[j] as number) - 380]).toBeCloseTo(col[j] as number, 10);
    }
  });

  it('the LED spectra equal the CIE 1 nm table and agree with the printed 5 nm table within its 2-decimal rounding', () => {
    const t5 = 'spectra/cie_led_illuminants_5nm.csv';
    const wl = datasetColumn(t5, 'wavelength_nm');
    for (const n of CIE_LED_NAMES) {
      const col = datasetColumn(t5, n);
      const s = cieLampSpectrum(n).values;
      for (let j = 0; j < wl.length; j++) expect(Math.abs((s[(wl[j] as number) - 380] as number) - (col[j] as number))).toBeLessThanOrEqual(0.005 + 1e-9);
    }
  });
});
