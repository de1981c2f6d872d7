import { describe, expect, it } from 'vitest';
import { datasetColumn, numericDataset } from '../data/datasets.js';
import { illuminantD65 } from './alpha-opic.js';
import { EYELID_DATASET, eyelidMelanopicTransmittance, eyelidTransmittance } from './eyelid-transmittance.js';
import { resampleLinear } from './resample.js';
import { spectrum } from './spectrum.js';
import { GRID_START_NM } from './wavelength-grid.js';

const at = (nm: number) => eyelidTransmittance().values[nm - GRID_START_NM] as number;

function illuminantA() {
  const t = 'spectra/cie_illuminant_A_1nm.csv';
  return spectrum(resampleLinear(datasetColumn(t, 'wavelength_nm'), datasetColumn(t, 'A')).values, false);
}

describe('closed-eyelid spectral transmittance', () => {
  it('carries its provenance header', () => {
    const p = numericDataset(EYELID_DATASET).provenance.join(' ');
    expect(p).toContain('Ando K, Kripke DF (1996)');
    expect(p).toContain('Robinson J, Bayliss SC, Fielder AR (1991)');
  });

  it('passes 0.3 % of blue and green light (Ando & Kripke 1996, abstract)', () => {
    expect(at(460)).toBeCloseTo(0.003, 6);
    expect(at(530)).toBeCloseTo(0.003, 6);
  });

  it('passes 5.6 % of red light at the 640 nm placement (Ando & Kripke 1996, abstract) and 14.5 % at 700 nm (Robinson et al. 1991, adult mean)', () => {
    expect(at(640)).toBeCloseTo(0.056, 6);
    expect(at(700)).toBeCloseTo(0.145, 6);
  });

  it('stays at or below 3 % below 580 nm (Robinson et al. 1991, abstract)', () => {
    for (let nm = 380; nm < 580; nm++) expect(at(nm)).toBeLessThanOrEqual(0.03);
  });

  it('is a red-pass filter: transmittance never falls with wavelength', () => {
    for (let nm = 381; nm <= 780; nm++) expect(at(nm)).toBeGreaterThanOrEqual(at(nm - 1) - 1e-15);
  });

  it('has a mean optical density over 450–650 nm within one s.d. of Bierman, Figueiro & Rea 2011 (2.1 ± 0.3, abstract)', () => {
    let sum = 0;
    for (let nm = 450; nm <= 650; nm++) sum += -Math.log10(at(nm));
    expect(Math.abs(sum / 201 - 2.1)).toBeLessThanOrEqual(0.3);
  });

  it('passes about 0.3 % of the melanopic EDI of daylight, a little more of warm light (more of its power lies in the red)', () => {
    const d65 = eyelidMelanopicTransmittance(illuminantD65());
    const a = eyelidMelanopicTransmittance(illuminantA());
    expect(d65).toBeGreaterThan(0.003);
    expect(d65).toBeLessThan(0.0035);
    expect(a).toBeGreaterThan(d65);
  });

  it('gives 0 for a spectrum with no melanopic content', () => {
    expect(eyelidMelanopicTransmittance(spectrum(new Float64Array(401), false))).toBe(0);
  });
});
