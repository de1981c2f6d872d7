import { describe, expect, it } from 'vitest';
import { chromaticityXy, uv1960ToXy, xyToUv1960 } from './colorimetry.js';
import { illuminantD65 } from './alpha-opic.js';
import { illuminantA } from '../sources/planckian.js';

describe('CIE 1931 chromaticity', () => {
  it('D65 has x, y = 0.31272, 0.32903 within 1e-4 (CIE 015:2018 table of illuminant chromaticities; values from memory)', () => {
    const c = chromaticityXy(illuminantD65());
    expect(Math.abs(c.x - 0.31272)).toBeLessThan(1e-4);
    expect(Math.abs(c.y - 0.32903)).toBeLessThan(1e-4);
  });

  it('illuminant A has x, y = 0.44757, 0.40745 within 1e-4 (CIE 015:2018; values from memory)', () => {
    const c = chromaticityXy(illuminantA());
    expect(Math.abs(c.x - 0.44757)).toBeLessThan(1e-4);
    expect(Math.abs(c.y - 0.40745)).toBeLessThan(1e-4);
  });

  it('converts x, y to CIE 1960 u, v and back without loss (CIE 015:2018 identities)', () => {
    for (const xy of [{ x: 0.3127, y: 0.329 }, { x: 0.45, y: 0.41 }, { x: 0.2, y: 0.1 }]) {
      const back = uv1960ToXy(xyToUv1960(xy));
      expect(back.x).toBeCloseTo(xy.x, 12);
      expect(back.y).toBeCloseTo(xy.y, 12);
    }
  });
});
