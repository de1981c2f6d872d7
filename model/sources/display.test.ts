import { describe, expect, it } from 'vitest';
import { D65_WHITE_POINT, DEFAULT_NIGHT_CCT_K, defaultDisplayModel, displayLuminance_cd_m2, displayWhite } from './display.js';
import { chromaticityXy } from '../photometry/colorimetry.js';
import { cctDuv } from '../photometry/cct-ohno.js';
import { alphaOpicDer, photopicIlluminance_lx } from '../photometry/alpha-opic.js';

describe('parametric display model', () => {
  const model = defaultDisplayModel();

  it('renders normal-mode white at the D65 white point (x 0.3127, y 0.3290) and night white on the locus at 3400 K', () => {
    const c = chromaticityXy(displayWhite(model, 'normal').unitSpectrum);
    expect(c.x).toBeCloseTo(D65_WHITE_POINT.x, 6);
    expect(c.y).toBeCloseTo(D65_WHITE_POINT.y, 6);
    const n = cctDuv(displayWhite(model, 'night').unitSpectrum);
    expect(Math.abs(n.cct_K - DEFAULT_NIGHT_CCT_K)).toBeLessThan(0.5);
  });

  it('reaches the night white point by lowering primaries only, so night-mode luminance is lower', () => {
    const night = displayWhite(model, 'night');
    for (const d of night.drive) expect(d).toBeLessThanOrEqual(1 + 1e-12);
    expect(night.nightLuminanceRatio).toBeLessThan(1);
    expect(displayLuminance_cd_m2(model, 'night', 1)).toBeCloseTo(250 * night.nightLuminanceRatio, 9);
  });

  it('lowers melanopic DER in night mode (direction reported for phones by Xu et al. 2023, Optics Express 31(6):10420)', () => {
    expect(alphaOpicDer(displayWhite(model, 'night').unitSpectrum).mel).toBeLessThan(alphaOpicDer(displayWhite(model, 'normal').unitSpectrum).mel - 0.2);
  });

  it('scales the unit spectrum to 1 photopic unit and brightness linearly', () => {
    expect(photopicIlluminance_lx(displayWhite(model, 'normal').unitSpectrum)).toBeCloseTo(1, 12);
    expect(displayLuminance_cd_m2(model, 'normal', 0.4, 0.5)).toBeCloseTo(50, 9);
    expect(() => displayLuminance_cd_m2(model, 'normal', 1.5)).toThrow(/brightness/);
  });
});
