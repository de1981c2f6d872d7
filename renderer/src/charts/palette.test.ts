import { describe, expect, it } from 'vitest';
import { kssColour, OKABE_ITO, seriesColour } from './palette.js';

// Relative luminance per WCAG 2.x (sRGB), to check that KSS steps stay ordered in lightness.
function luminance(rgb: string): number {
  const [r, g, b] = (rgb.match(/\d+/g) ?? []).map((v) => {
    const c = Number(v) / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * (r ?? 0) + 0.7152 * (g ?? 0) + 0.0722 * (b ?? 0);
}

describe('colour palette', () => {
  it('uses the eight Okabe–Ito colours (Okabe & Ito 2008)', () => {
    expect(Object.values(OKABE_ITO)).toEqual(['#000000', '#E69F00', '#56B4E9', '#009E73', '#F0E442', '#0072B2', '#D55E00', '#CC79A7']);
  });

  it('gives the baseline black and distinct colours to the next strategies', () => {
    const first = [0, 1, 2, 3, 4, 5, 6].map(seriesColour);
    expect(first[0]).toBe('#000000');
    expect(new Set(first).size).toBe(7);
  });

  it('makes sleepier KSS values strictly darker, so the grid reads without hue', () => {
    const lums = [1, 2, 3, 4, 5, 6, 7, 8, 9].map((k) => luminance(kssColour(k)));
    for (let i = 1; i < lums.length; i++) expect(lums[i]!).toBeLessThan(lums[i - 1]!);
  });
});
