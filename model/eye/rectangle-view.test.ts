import { describe, expect, it } from 'vitest';
import { cornerFormFactor, offsetRectangleFormFactor } from '../../tests/eye/handbook-form-factor.js';
import { rectangleElements, uniformRectangleIlluminance_lx } from './rectangle-view.js';
import { vec3 } from './vector3.js';

const eye = vec3(0, 0, 0);
const facingNorth = vec3(0, 1, 0);

describe('rectangle seen from a point', () => {
  it('a very large rectangle fills the half-space: solid angle → 2π and illuminance → π·L (analytic)', () => {
    const rect = { centre: vec3(0, 1, 0), uAxis: vec3(1, 0, 0), vAxis: vec3(0, 0, 1), width_m: 1e6, height_m: 1e6 };
    const el = rectangleElements(eye, rect, 64);
    expect(el.solidAngle_sr.reduce((a, b) => a + b, 0)).toBeCloseTo(2 * Math.PI, 4);
    expect(uniformRectangleIlluminance_lx(eye, rect, facingNorth, 1, 64)).toBeCloseTo(Math.PI, 3);
  });

  it('handbook check of the test formula itself: corner factor of an infinite quadrant is 1/4', () => {
    expect(cornerFormFactor(1e9, 1e9, 1)).toBeCloseTo(0.25, 8);
  });

  it.each([
    [2, 1, 2],
    [0.6, 0.35, 0.6],
    [4, 3, 0.5],
  ])('uniform rectangle %s×%s m at %s m on its central normal matches the parallel-rectangle form factor (Howell B-3)', (w, h, d) => {
    const rect = { centre: vec3(0, d, 0), uAxis: vec3(1, 0, 0), vAxis: vec3(0, 0, 1), width_m: w, height_m: h };
    const expected = Math.PI * 4 * cornerFormFactor(w / 2, h / 2, d);
    const got = uniformRectangleIlluminance_lx(eye, rect, facingNorth, 1, 24);
    expect(Math.abs(got / expected - 1)).toBeLessThan(1e-3);
  });

  it('an off-centre rectangle matches corner superposition of the form factor', () => {
    const rect = { centre: vec3(1.5, 2, 0.8), uAxis: vec3(1, 0, 0), vAxis: vec3(0, 0, 1), width_m: 1.2, height_m: 0.9 };
    const expected = Math.PI * offsetRectangleFormFactor(0.9, 2.1, 0.35, 1.25, 2);
    const got = uniformRectangleIlluminance_lx(eye, rect, facingNorth, 1, 24);
    expect(Math.abs(got / expected - 1)).toBeLessThan(1e-3);
  });
});
