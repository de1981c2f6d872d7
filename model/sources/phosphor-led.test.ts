import { describe, expect, it } from 'vitest';
import { phosphorLedSpectrum } from './phosphor-led.js';
import { cctDuv } from '../photometry/cct-ohno.js';
import { alphaOpicDer } from '../photometry/alpha-opic.js';

describe('parametric phosphor-converted white LED', () => {
  it('sits on the Planckian locus at the requested CCT (within 0.5 K, |Duv| < 1e-5)', () => {
    for (const t of [2200, 2700, 3500, 4000, 5000, 6500, 8000]) {
      const r = cctDuv(phosphorLedSpectrum(t));
      expect(Math.abs(r.cct_K - t)).toBeLessThan(0.5);
      expect(Math.abs(r.duv)).toBeLessThan(1e-5);
    }
  });

  it('has a melanopic DER that rises with CCT, in the range published CIE LED tables span (LED-B1 0.41 … LED-B5 0.85, CIE 015:2018 data)', () => {
    const d2700 = alphaOpicDer(phosphorLedSpectrum(2700)).mel;
    const d6500 = alphaOpicDer(phosphorLedSpectrum(6500)).mel;
    expect(d2700).toBeLessThan(d6500);
    expect(d2700).toBeGreaterThan(0.3);
    expect(d6500).toBeLessThan(1);
  });

  it('refuses a CCT outside the modelled range, naming it', () => {
    expect(() => phosphorLedSpectrum(1800)).toThrow(/2200–8000 K/);
  });
});
