import { describe, expect, it } from 'vitest';
import { lightFromPerMinute } from './light-series.js';
import { perMinuteLightCase } from './per-minute-light-cases.js';
import { PROCESS_L_K99, lightActivation_per_min, photicDrive, processLRate_per_h } from './process-l.js';
import { ProcessLDrive } from './process-l-drive.js';

/** Reference by brute force: n by 1-second explicit midpoint steps, ∫B̂ and ∫B̂·t by the midpoint rule. */
function bruteForce(levels: Float64Array, t1: number, n0: number): { integral: number; moment: number; n: number } {
  const dt = 1 / 3600;
  let n = n0;
  let integral = 0;
  let moment = 0;
  for (let t = 0; t < t1 - 1e-12; t += dt) {
    const I = levels[Math.floor(t * 60 + 1e-9)] ?? 0;
    const a = lightActivation_per_min(PROCESS_L_K99, I);
    const nMid = n + 0.5 * dt * processLRate_per_h(PROCESS_L_K99, a, n);
    const b = photicDrive(PROCESS_L_K99, a, nMid);
    integral += b * dt;
    moment += b * (t + dt / 2) * dt;
    n += dt * processLRate_per_h(PROCESS_L_K99, a, nMid);
  }
  return { integral, moment, n };
}

describe('photic drive of Process L in closed form', () => {
  const light = perMinuteLightCase('measured-log', 1, 5);
  const morning = light.mel_edi_lx.subarray(6 * 60, 10 * 60); // 06:00–10:00: home, commute, desk
  const series = lightFromPerMinute(morning, 'native_lx');

  it('gives ∫B̂, ∫B̂·t and n like a brute-force integration of dn/dt over light that changes every minute', () => {
    const drive = new ProcessLDrive(PROCESS_L_K99, series, 1, 0, 0.2);
    const m = drive.moments(4);
    drive.advance(4);
    const ref = bruteForce(morning, 4, 0.2);
    expect(m.integral).toBeCloseTo(ref.integral, 6);
    expect(m.firstMoment).toBeCloseTo(ref.moment, 6);
    expect(drive.processL).toBeCloseTo(ref.n, 7);
  });

  it('adds up over consecutive intervals: W[0,T] = W[0,s] + W[s,T] and M[0,T] = M[0,s] + M[s,T] + s·W[s,T]', () => {
    const whole = new ProcessLDrive(PROCESS_L_K99, series, 1, 0, 0.4).moments(3.3);
    const split = new ProcessLDrive(PROCESS_L_K99, series, 1, 0, 0.4);
    const first = split.moments(1.234);
    split.advance(1.234);
    const second = split.moments(3.3);
    expect(first.integral + second.integral).toBeCloseTo(whole.integral, 12);
    expect(first.firstMoment + second.firstMoment + 1.234 * second.integral).toBeCloseTo(whole.firstMoment, 12);
  });

  it('is zero in darkness while n decays at the rate 60·β per hour', () => {
    const dark = lightFromPerMinute(new Float64Array(120), 'native_lx');
    const drive = new ProcessLDrive(PROCESS_L_K99, dark, 1, 0, 0.5);
    expect(drive.moments(2).integral).toBe(0);
    drive.advance(2);
    expect(drive.processL).toBeCloseTo(0.5 * Math.exp(-60 * PROCESS_L_K99.beta_per_min * 2), 12);
    expect(drive.valueNow()).toBe(0);
  });

  it('scales the light by its gain before Process L (sleep gating, sensitivity)', () => {
    const bright = lightFromPerMinute(new Float64Array(60).fill(500), 'native_lx');
    const doubled = lightFromPerMinute(new Float64Array(60).fill(1000), 'native_lx');
    const a = new ProcessLDrive(PROCESS_L_K99, bright, 2, 0, 0).moments(1);
    const b = new ProcessLDrive(PROCESS_L_K99, doubled, 1, 0, 0).moments(1);
    expect(a.integral).toBeCloseTo(b.integral, 12);
  });
});
