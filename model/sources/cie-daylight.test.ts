import { describe, expect, it } from 'vitest';
import { cieDaylightSpectrum, NOMINAL_TO_ACTUAL_CCT } from './cie-daylight.js';
import { illuminantD65 } from '../photometry/alpha-opic.js';

describe('CIE D-series daylight', () => {
  it('rebuilt at 6504 K with rounded M1, M2 matches the tabulated D65 within 0.001 (CIE 015:2018 recipe)', () => {
    const rebuilt = cieDaylightSpectrum(6500 * NOMINAL_TO_ACTUAL_CCT, { roundCoefficients: true }).values;
    const table = illuminantD65().values;
    let maxDiff = 0;
    for (let i = 0; i < table.length; i++) maxDiff = Math.max(maxDiff, Math.abs((rebuilt[i] as number) - (table[i] as number)));
    expect(maxDiff).toBeLessThan(0.001);
  });

  it('refuses a CCT outside the D-series range, naming the range', () => {
    expect(() => cieDaylightSpectrum(3000)).toThrow(/4000–25000 K/);
  });
});
