import { describe, expect, it } from 'vitest';
import { calibrationMelanopicDer, nativeLuxFromMelEdi } from './calibration.js';

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
});
