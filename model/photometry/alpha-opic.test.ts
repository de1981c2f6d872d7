import { describe, expect, it } from 'vitest';
import { alphaOpicQuantities, d65Efficacy_W_lm, illuminantD65, scaleToIlluminance } from './alpha-opic.js';
import { ALPHA_OPIC_KEYS } from './action-spectra.js';

describe('CIE S 026 quantities', () => {
  it('D65 has DER = 1 for all five α-opic quantities (CIE S 026:2018 definition)', () => {
    const q = alphaOpicQuantities(illuminantD65());
    for (const k of ALPHA_OPIC_KEYS) expect(q.alpha_opic[k].der).toBeCloseTo(1, 12);
  });

  it('D65 efficacies round to the published constants 0.8173/1.4558/1.6289/1.4497/1.3262 mW/lm (CIE S 026:2018)', () => {
    const k = d65Efficacy_W_lm();
    expect((k.sc * 1000).toFixed(4)).toBe('0.8173');
    expect((k.mc * 1000).toFixed(4)).toBe('1.4558');
    expect((k.lc * 1000).toFixed(4)).toBe('1.6289');
    expect((k.rh * 1000).toFixed(4)).toBe('1.4497');
    expect((k.mel * 1000).toFixed(4)).toBe('1.3262');
  });

  it('EDI equals DER times illuminance (CIE S 026:2018 identity)', () => {
    const s = scaleToIlluminance(illuminantD65(), 500);
    const q = alphaOpicQuantities(s);
    expect(q.illuminance_lx).toBeCloseTo(500, 9);
    for (const k of ALPHA_OPIC_KEYS) expect(q.alpha_opic[k].edi_lx).toBeCloseTo(q.alpha_opic[k].der * 500, 9);
  });
});
