import { describe, expect, it } from 'vitest';
import { CIE_SKY_TYPES, cieSkyParameters, relativeSkyLuminance, SKY_OVERCAST, SKY_UNIFORM } from './cie-general-sky.js';
import { skyLuminancePerDiffuseLux } from './sky-luminance.js';
import { tregenzaPatches, tregenzaPatchIndex, TREGENZA_PATCH_COUNT } from './tregenza-patches.js';
import { directionFromAltAz_deg } from './vector3.js';

describe('Tregenza sky patches', () => {
  it('has 145 patches whose solid angles sum to the hemisphere 2π and projected solid angles to π (analytic)', () => {
    const p = tregenzaPatches();
    expect(p.count).toBe(TREGENZA_PATCH_COUNT);
    const proj = p.projectedSolidAngle_sr.reduce((a, b) => a + b, 0);
    // ∫ cos Z dω over the hemisphere = π: horizontal illuminance of a uniform sky of unit luminance (analytic).
    expect(proj).toBeCloseTo(Math.PI, 12);
  });

  it('finds the patch of each patch centre', () => {
    const p = tregenzaPatches();
    for (let k = 0; k < p.count; k++) expect(tregenzaPatchIndex({ x: p.dirX[k] as number, y: p.dirY[k] as number, z: p.dirZ[k] as number })).toBe(k);
  });
});

describe('CIE standard general sky (ISO 15469 / CIE S 011)', () => {
  it('has 15 types and refuses others', () => {
    expect(CIE_SKY_TYPES).toHaveLength(15);
    expect(() => cieSkyParameters(16)).toThrow(/1–15/);
  });

  it('gives zenith luminance ratio 1 at the zenith for every type and sun position (definition L/L_z)', () => {
    for (let t = 1; t <= 15; t++) {
      const p = cieSkyParameters(t);
      for (const zs of [0, 30, 60, 85]) {
        const sunCosZ = Math.cos((zs * Math.PI) / 180);
        expect(relativeSkyLuminance(p, 1, sunCosZ, sunCosZ)).toBeCloseTo(1, 12);
      }
    }
  });

  it('type 1 reproduces the CIE standard overcast sky horizon/zenith ratio of about 1/3 (Moon & Spencer 1942; CIE 1955 overcast sky, common practice)', () => {
    const p = cieSkyParameters(SKY_OVERCAST);
    expect(relativeSkyLuminance(p, 0, 0, 0.5)).toBeCloseTo(1 / 3, 2);
    // Moon–Spencer L(Z)/L_z = (1 + 2 cos Z)/3 at Z = 60°: 2/3.
    expect(relativeSkyLuminance(p, 0.5, 0.5, 0.5)).toBeCloseTo(2 / 3, 1);
  });

  it('type 5 is uniform: every patch has luminance E_dh/π (horizontal illuminance π·L, analytic)', () => {
    const out = skyLuminancePerDiffuseLux(SKY_UNIFORM, directionFromAltAz_deg(40, 150), new Float64Array(145));
    for (const v of out) expect(v).toBeCloseTo(1 / Math.PI, 12);
  });

  it('the clear sky (type 12) is brightest around the sun and normalises to the diffuse illuminance', () => {
    const sun = directionFromAltAz_deg(42, 187.5); // a patch centre
    const out = skyLuminancePerDiffuseLux(12, sun, new Float64Array(145));
    const p = tregenzaPatches();
    let horizontal = 0;
    let brightest = 0;
    for (let k = 0; k < p.count; k++) {
      horizontal += (out[k] as number) * (p.projectedSolidAngle_sr[k] as number);
      if ((out[k] as number) > (out[brightest] as number)) brightest = k;
    }
    expect(horizontal).toBeCloseTo(1, 12);
    expect(brightest).toBe(tregenzaPatchIndex(sun));
  });
});
