import { describe, expect, it } from 'vitest';
import { listSources, sourceAlphaOpicDer, sourceInfo, sourceMelanopicDer, sourceSpectrum } from './source-library.js';
import { GRID_LENGTH } from '../photometry/wavelength-grid.js';

describe('light-source library', () => {
  it('lists every fixed source with a spectrum on the grid, a CCT and a melanopic DER', () => {
    const list = listSources();
    expect(list.length).toBeGreaterThan(35);
    for (const s of list) {
      expect(sourceSpectrum(s.id).values.length).toBe(GRID_LENGTH);
      expect(s.cct_K).toBeGreaterThan(1000);
      expect(s.melanopic_der).toBeGreaterThan(0);
    }
    expect(list.filter((s) => s.parametric).map((s) => s.kind)).not.toContain('cie-led');
  });

  it('gives D65 a DER of 1 for every α-opic quantity (CIE S 026:2018 definition)', () => {
    for (const v of Object.values(sourceAlphaOpicDer('D65'))) expect(v).toBeCloseTo(1, 12);
  });

  it('builds parameterised sources from their ids', () => {
    expect(Math.abs(sourceInfo('planckian-3000K').cct_K - 3000)).toBeLessThan(0.5);
    expect(Math.abs(sourceInfo('daylight-5000K').cct_K - 5000)).toBeLessThan(15);
    expect(Math.abs(sourceInfo('pc-LED-3500K').cct_K - 3500)).toBeLessThan(0.5);
    expect(Math.abs(sourceInfo('tunable-white-3200K').cct_K - 3200)).toBeLessThan(0.1);
  });

  it('returns the same cached DER object on repeated lookups', () => {
    expect(sourceAlphaOpicDer('LED-B3')).toBe(sourceAlphaOpicDer('LED-B3'));
    expect(sourceMelanopicDer('LED-B3')).toBe(sourceAlphaOpicDer('LED-B3').mel);
  });

  it('explains an unknown id and an out-of-range parameter', () => {
    expect(() => sourceSpectrum('LED-Z9')).toThrow(/unknown light source "LED-Z9"/);
    expect(() => sourceSpectrum('daylight-2000K')).toThrow(/4000–25000 K/);
  });
});
