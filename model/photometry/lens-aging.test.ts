import { describe, expect, it } from 'vitest';
import { lensTransmittanceRelativeTo32, relativeLensTransmittance } from './lens-aging.js';
import { alphaOpicQuantities, illuminantD65, scaleToIlluminance } from './alpha-opic.js';
import { ALPHA_OPIC_KEYS } from './action-spectra.js';
import { GRID_LENGTH } from './wavelength-grid.js';

/** Full CIE 203:2012 ocular-media density (with the age-independent terms), written out separately. */
function cie203Density(l: number, a: number): number {
  return (
    (0.15 + 0.000031 * a * a) * (400 / l) ** 4 +
    14.19 * 10.68 * Math.exp(-((0.057 * (l - 273)) ** 2)) +
    (1.05 - 0.000063 * a * a) * 2.13 * Math.exp(-((0.029 * (l - 370)) ** 2)) +
    (0.059 + 0.000186 * a * a) * 11.95 * Math.exp(-((0.021 * (l - 325)) ** 2)) +
    (0.016 + 0.000132 * a * a) * 1.43 * Math.exp(-((0.008 * (l - 325)) ** 2)) +
    0.06
  );
}

describe('age-dependent lens transmittance relative to 32 years (CIE S 026:2018 / CIE 203:2012)', () => {
  it('is exactly 1 for the 32-year-old reference observer', () => {
    const t = lensTransmittanceRelativeTo32(32);
    for (let i = 0; i < GRID_LENGTH; i++) expect(t.values[i]).toBe(1);
  });

  it('equals the ratio of full CIE 203:2012 transmittances τ(λ, a)/τ(λ, 32)', () => {
    for (const a of [10, 25, 45, 64, 85]) {
      for (const l of [380, 420, 450, 490, 555, 650, 780]) {
        const ratio = 10 ** -(cie203Density(l, a) - cie203Density(l, 32));
        expect(relativeLensTransmittance(l, a)).toBeCloseTo(ratio, 12);
      }
    }
  });

  it('lets an older eye pass less short-wavelength light, and nearly all long-wavelength light', () => {
    expect(relativeLensTransmittance(450, 64)).toBeLessThan(relativeLensTransmittance(450, 50));
    expect(relativeLensTransmittance(450, 20)).toBeGreaterThan(1);
    expect(Math.abs(relativeLensTransmittance(700, 64) - 1)).toBeLessThan(0.03);
  });

  it('lowers the melanopic EDI of 500 lx D65 for a 64-year-old without changing photopic illuminance', () => {
    const s = scaleToIlluminance(illuminantD65(), 500);
    const ref = alphaOpicQuantities(s);
    const old = alphaOpicQuantities(s, { eyeTransmittance: lensTransmittanceRelativeTo32(64) });
    expect(old.illuminance_lx).toBeCloseTo(500, 9);
    for (const k of ALPHA_OPIC_KEYS) expect(old.alpha_opic[k].edi_lx).toBeLessThan(ref.alpha_opic[k].edi_lx);
    expect(old.alpha_opic.mel.der).toBeGreaterThan(0.6);
    expect(old.alpha_opic.mel.der).toBeLessThan(0.8);
  });

  it('refuses ages outside 1–100 years, naming the range', () => {
    expect(() => lensTransmittanceRelativeTo32(0)).toThrow(/1–100 years/);
    expect(() => lensTransmittanceRelativeTo32(Number.NaN)).toThrow(/1–100 years/);
  });
});
