import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { daylightAlphaOpicDer, daylightMelanopicDer } from './daylight-der.js';
import { cieDaylightSpectrum } from './cie-daylight.js';
import { alphaOpicDer } from '../photometry/alpha-opic.js';
import { ALPHA_OPIC_KEYS } from '../photometry/action-spectra.js';

describe('fast daylight DER by CCT', () => {
  it('stays within 1e-5 of the direct CIE S 026 computation on CIE D-series daylight anywhere in 4000–25 000 K', () => {
    fc.assert(
      fc.property(fc.double({ min: 4000, max: 25000, noNaN: true }), (cct) => {
        const direct = alphaOpicDer(cieDaylightSpectrum(cct));
        const fast = daylightAlphaOpicDer(cct);
        for (const k of ALPHA_OPIC_KEYS) expect(Math.abs(fast[k] - direct[k])).toBeLessThan(1e-5);
      }),
      { numRuns: 200 },
    );
  });

  it('gives D65 (6504 K) a melanopic DER of 1 within 1e-3 (CIE S 026 definition; D-series rebuild differs from the table by < 0.001)', () => {
    expect(Math.abs(daylightMelanopicDer(6503.6) - 1)).toBeLessThan(1e-3);
  });

  it('throws outside the D-series range unless asked to clamp', () => {
    expect(() => daylightMelanopicDer(3000)).toThrow(/4000–25000 K/);
    expect(daylightMelanopicDer(3000, { clamp: true })).toBe(daylightMelanopicDer(4000));
    expect(daylightMelanopicDer(40000, { clamp: true })).toBe(daylightMelanopicDer(25000));
  });
});
