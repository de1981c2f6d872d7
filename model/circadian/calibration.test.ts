import { describe, expect, it } from 'vitest';
import { alphaOpicDer, alphaOpicQuantities, illuminantD65, scaleToIlluminance } from '../photometry/alpha-opic.js';
import { illuminantA } from '../sources/planckian.js';
import { calibrationMelanopicDer, nativeLightSeries, nativeLuxFromMelEdi } from './calibration.js';
import { lightFromSteps } from './light-series.js';

describe('melanopic calibration of the native input', () => {
  it('gives a cool-white fluorescent melanopic DER near the 0.61–0.62 implied by Tekieh et al. 2020 constants', () => {
    // Tekieh 2020 F_4100K = 8.0854e-4 / 8.19e-4 W m⁻² lx⁻¹ over K_mel,v^D65 1.3262e-3 W/lm → 0.610 / 0.618
    // CIE FL2 is a different cool-white spectrum: accept within 10 %.
    const der = calibrationMelanopicDer();
    expect(der).toBeGreaterThan(0.55);
    expect(der).toBeLessThan(0.62);
  });

  it('converts melanopic EDI to more native lux than EDI (DER < 1)', () => {
    expect(nativeLuxFromMelEdi(100)).toBeCloseTo(100 / calibrationMelanopicDer(), 10);
  });

  it('gives a warm and a cool source of equal melanopic EDI the same model input, although their photopic lux differ', () => {
    // CIE illuminant A (2856 K) and D65 (6504 K), each scaled to 100 lx melanopic EDI (CIE S 026)
    const atMelEdi = (s: ReturnType<typeof illuminantA>) => {
      const q = alphaOpicQuantities(scaleToIlluminance(s, 100));
      return scaleToIlluminance(s, (100 * 100) / q.alpha_opic.mel.edi_lx);
    };
    const warm = alphaOpicQuantities(atMelEdi(illuminantA()));
    const cool = alphaOpicQuantities(atMelEdi(illuminantD65()));
    expect(warm.alpha_opic.mel.edi_lx).toBeCloseTo(100, 6);
    expect(cool.alpha_opic.mel.edi_lx).toBeCloseTo(100, 6);
    // their photopic lux differ by the ratio of the melanopic DERs (D65 = 1 by the CIE S 026 definition; A ≈ 0.50)
    expect(warm.illuminance_lx / cool.illuminance_lx).toBeCloseTo(1 / alphaOpicDer(illuminantA()).mel, 6);
    expect(warm.illuminance_lx / cool.illuminance_lx).toBeGreaterThan(1.9);
    const input = (melEdi: number) => nativeLightSeries(lightFromSteps([0], [melEdi], 'mel_edi_lx', 24)).level[0] as number;
    expect(input(warm.alpha_opic.mel.edi_lx)).toBeCloseTo(input(cool.alpha_opic.mel.edi_lx), 6);
    expect(input(cool.alpha_opic.mel.edi_lx)).toBeCloseTo(100 / calibrationMelanopicDer(), 6);
  });
});
