import { describe, expect, test } from 'vitest';
import { daylightResponse, electricResponse } from './spectra.js';

describe('source responses at the eye', () => {
  test('CIE daylight near 6500 K has a melanopic DER of about 1 (D65 defines DER = 1, CIE S 026:2018)', () => {
    expect(daylightResponse(6500, 32).melDer).toBeCloseTo(1, 2);
  });

  test('the 32-year-old reference observer needs no lens correction (CIE S 026 reference age)', () => {
    expect(daylightResponse(6500, 32).lensFactor).toBe(1);
  });

  test('older lenses pass less melanopic light, younger more (CIE 203:2012 lens density rises with age)', () => {
    expect(daylightResponse(6500, 70).lensFactor).toBeLessThan(0.9);
    expect(daylightResponse(6500, 15).lensFactor).toBeGreaterThan(1);
  });

  test('a warm LED has a lower melanopic DER than a cool one (CIE S 026 α-opic quantities: 2700 K LED about 0.4–0.5, 6500 K about 0.8–1.0, common practice)', () => {
    const warm = electricResponse({ kind: 'cct', cct_K: 2700 }, undefined, 32).melDer;
    const cool = electricResponse({ kind: 'cct', cct_K: 6500 }, undefined, 32).melDer;
    expect(warm).toBeGreaterThan(0.3);
    expect(warm).toBeLessThan(0.6);
    expect(cool).toBeGreaterThan(0.7);
    expect(cool).toBeLessThan(1.05);
  });
});
