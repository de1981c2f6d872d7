import { describe, expect, it } from 'vitest';
import { createOdexIntegrator } from './odex-integrator.js';
import { createRk4Integrator } from './rk4-integrator.js';

// Harmonic oscillator y'' = −ω²y: exact solution y = cos ωt (textbook closed form).
const OMEGA = Math.PI / 12;
const rhs = (_t: number, y: readonly number[]) => [y[1] as number, -OMEGA * OMEGA * (y[0] as number)];

describe.each([
  ['odex', createOdexIntegrator()],
  ['rk4', createRk4Integrator()],
])('%s integrator', (_name, integ) => {
  it('follows the closed-form harmonic solution over 10 periods (error < 5e-4 at the default tolerance 1e-5)', () => {
    const r = integ.integrate(rhs, 0, [1, 0], 240);
    expect(Math.abs((r.y[0] as number) - Math.cos(OMEGA * 240))).toBeLessThan(5e-4);
    expect(r.stoppedEarly).toBe(false);
  });

  it('stops where the observer asks and returns the dense state there', () => {
    let stopAsked = false;
    const r = integ.integrate(rhs, 0, [1, 0], 48, (tOld, t) => {
      if (!stopAsked && tOld < 6 && t >= 6) {
        stopAsked = true;
        return 6;
      }
      return undefined;
    });
    expect(r.stoppedEarly).toBe(true);
    expect(r.t).toBe(6);
    expect(r.y[0]).toBeCloseTo(Math.cos(OMEGA * 6), 4); // cos(π/2) = 0
  });
});
