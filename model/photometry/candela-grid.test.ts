import { describe, expect, it } from 'vitest';
import { candelaAt_cd, expandCandelaTable, foldC_deg, peakCandela } from './candela-grid.js';
import type { CandelaTable, HorizontalSymmetry, PhotometryType } from './candela-table.js';

function table(type: PhotometryType, symmetry: HorizontalSymmetry, h: number[], v: number[], cd: number[][]): CandelaTable {
  return {
    format: 'LM-63', edition: 'LM-63-2002', photometryType: type, symmetry, horizontal_deg: h, vertical_deg: v, candela_cd: cd,
    statedFlux_lm: undefined, absolutePhotometry: true, multiplier: 1, opening: { width_m: 0, length_m: 0, height_m: 0 },
    lamps: { count: 1, lumensPerLamp: undefined, description: '', watts: 0 }, ballastFactor: 1, tilt: undefined, labels: {},
  };
}

describe('candela grid', () => {
  it('folds C angles into the stored range of each symmetry (LM-63-2002 §5.15, EULUMDAT Isym)', () => {
    expect([100, 200, 300].map((c) => foldC_deg(c, 'quadrant'))).toEqual([80, 20, 60]);
    expect([200, 350].map((c) => foldC_deg(c, 'plane-C0-C180'))).toEqual([160, 10]);
    expect([30, 300, 200].map((c) => foldC_deg(c, 'plane-C90-C270'))).toEqual([150, 240, 200]);
    expect(foldC_deg(-30, 'none')).toBe(330);
    expect(foldC_deg(123, 'rotational')).toBe(0);
  });

  it('expands a quadrant table to 0–360° and interpolates bilinearly', () => {
    const g = expandCandelaTable(table('C', 'quadrant', [0, 90], [0, 90], [[100, 0], [60, 0]]));
    expect(g.horizontal_deg).toEqual([0, 90, 180, 270, 360]);
    expect(candelaAt_cd(g, 180, 0)).toBe(100);
    expect(candelaAt_cd(g, 225, 0)).toBe(80);
    expect(candelaAt_cd(g, 45, 45)).toBe(40); // (100 + 60) / 2 at γ 0, halfway to 0 at γ 90
    expect(candelaAt_cd(g, -45, 0)).toBe(80);
    expect(candelaAt_cd(g, 0, 120)).toBe(0); // beyond the 0–90° range the file gives
  });

  it('wraps a table stored over 0–270° from its last plane back to C0', () => {
    const g = expandCandelaTable(table('C', 'none', [0, 270], [0, 90], [[100, 100], [0, 0]]));
    expect(candelaAt_cd(g, 315, 0)).toBe(50);
  });

  it('mirrors type B tables laterally and about the photometric horizontal', () => {
    const g = expandCandelaTable(table('B', 'lateral', [0, 90], [0, 90], [[100, 40], [20, 0]]));
    expect(g.horizontal_deg).toEqual([-90, 0, 90]);
    expect(g.vertical_deg).toEqual([-90, 0, 90]);
    expect(candelaAt_cd(g, -45, -45)).toBe(40);
    expect(peakCandela(g)).toEqual({ candela_cd: 100, horizontal_deg: 0, vertical_deg: 0 });
  });
});
