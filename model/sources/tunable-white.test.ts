import { describe, expect, it } from 'vitest';
import { tunableWhiteMix } from './tunable-white.js';
import { cieLampSpectrum } from './cie-lamp-tables.js';
import { alphaOpicDer, alphaOpicQuantities } from '../photometry/alpha-opic.js';
import { cctDuv } from '../photometry/cct-ohno.js';

describe('two-channel tunable white', () => {
  const warm = cieLampSpectrum('LED-B1');
  const cool = cieLampSpectrum('LED-B5');

  it('hits the target CCT within 0.1 K and the target illuminance exactly', () => {
    for (const t of [2800, 3500, 4000, 5000, 6000]) {
      const r = tunableWhiteMix(warm, cool, t, 300);
      const q = alphaOpicQuantities(r.spectrum);
      expect(q.illuminance_lx).toBeCloseTo(300, 8);
      expect(Math.abs(cctDuv(r.spectrum).cct_K - t)).toBeLessThan(0.1);
      expect(r.warm_lx + r.cool_lx).toBeCloseTo(300, 10);
    }
  });

  it('gives a melanopic EDI equal to the illuminance-weighted channel DERs (linearity of CIE S 026 quantities)', () => {
    const r = tunableWhiteMix(warm, cool, 4000, 500);
    const edi = alphaOpicQuantities(r.spectrum).alpha_opic.mel.edi_lx;
    expect(edi).toBeCloseTo(r.warm_lx * alphaOpicDer(warm).mel + r.cool_lx * alphaOpicDer(cool).mel, 8);
  });

  it('refuses a target CCT the channels cannot reach, naming the reachable range', () => {
    expect(() => tunableWhiteMix(warm, cool, 2000, 100)).toThrow(/outside the range the two channels can mix \(2733–6600 K\)/);
  });
});
