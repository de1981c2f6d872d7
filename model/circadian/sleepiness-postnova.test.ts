import { describe, expect, it } from 'vitest';
import { entrain } from './entrain.js';
import { lightFromSteps } from './light-series.js';
import { createJfkX7 } from './jfk-x7.js';
import { simulate } from './simulate.js';
import { homeostatRate_nM_per_h, kss, KSS_SLEEPY, postnovaCircadianDrive, postnovaInertiaKss, POSTNOVA_2018, wakeActiveRate_per_s } from './sleepiness-postnova.js';
import { REGULAR_SLEEP_DAY0, regularDayLight, regularSleep } from './test-schedules.js';

describe('Postnova 2018 sleep pressure (quasi-steady arousal state)', () => {
  it('fires the wake-active group far more awake than asleep at the same sleep drive', () => {
    // Postnova 2018: Q_m ≈ 0 in sleep (MA group inhibited), several s⁻¹ in wake.
    expect(wakeActiveRate_per_s(3, true)).toBeGreaterThan(3);
    expect(wakeActiveRate_per_s(3, false)).toBeLessThan(0.1);
  });

  it('holds wake with the wake-effort floor V_WE at very high drive (Q(−0.07 mV) = 3.37 s⁻¹)', () => {
    expect(wakeActiveRate_per_s(15, true)).toBeGreaterThanOrEqual(3.36);
  });

  it('has the Postnova 2016 circadian drive C(−1, 0) = (1.1/3.7)² (closed form)', () => {
    expect(postnovaCircadianDrive(-1, 0)).toBeCloseTo((1.1 / 3.7) ** 2, 12);
  });

  it('gives the same H and KSS as the full flip-flop (Eqs 1–3 at 5 s steps) through a day and a night of imposed wake', () => {
    // The quasi-steady reduction against the published fast system, both driven by the same
    // smooth circadian drive C(t) ∈ [0.05, 0.95]; wake imposed throughout (F_w = 1, Eq 8).
    const P = POSTNOVA_2018;
    const Q = (v: number) => P.Qmax_per_s / (1 + Math.exp((P.theta_mV - v) / P.sigma_mV));
    const C = (t_h: number) => 0.5 + 0.45 * Math.cos((2 * Math.PI * (t_h - 20)) / 24);
    const rhs = (y: readonly number[], t_s: number): number[] => {
      const [vv, vm, h] = y as [number, number, number];
      const qv = Q(vv);
      const qm = Q(vm);
      const w = Math.max(0, P.VWE_mV - P.nuMv_mV_s * qv - P.Dm_mV);
      const dv = P.nuVH_mV_per_nM * h + P.nuVC_mV * C(t_s / 3600) + P.Av_mV;
      return [(P.nuVm_mV_s * qm - vv + dv) / P.tauV_s, (P.nuMv_mV_s * qv - vm + P.Dm_mV + w) / P.tauM_s, (P.nuHm_nM_s * qm - h) / (P.tauH_h * 3600)];
    };
    const rk4 = (f: (y: readonly number[], t: number) => number[], y: number[], t: number, dt: number): number[] => {
      const k1 = f(y, t);
      const k2 = f(y.map((v, i) => v + 0.5 * dt * (k1[i] as number)), t + 0.5 * dt);
      const k3 = f(y.map((v, i) => v + 0.5 * dt * (k2[i] as number)), t + 0.5 * dt);
      const k4 = f(y.map((v, i) => v + dt * (k3[i] as number)), t + dt);
      return y.map((v, i) => v + (dt / 6) * ((k1[i] as number) + 2 * (k2[i] as number) + 2 * (k3[i] as number) + (k4[i] as number)));
    };
    let full = [-10, 1, 12];
    for (let t = 7 * 3600; t < 31 * 3600 - 1e-6; t += 5) full = rk4(rhs, full, t, 5);
    let reduced = [12];
    for (let t = 7; t < 31 - 1e-9; t += 0.01) reduced = rk4((y, tq) => [homeostatRate_nM_per_h(y[0] as number, C(tq), true)], reduced, t, 0.01);
    const hFull = full[2] as number;
    const hReduced = reduced[0] as number;
    expect(hFull).toBeGreaterThan(13);
    expect(Math.abs(hFull - hReduced)).toBeLessThan(0.01);
    expect(Math.abs(kss(hFull, C(31)) - kss(hReduced, C(31)))).toBeLessThan(0.03);
  });

  it('adds the three-process model sleep inertia on the KSS scale: +3.43 at waking, gone after a few hours', () => {
    // −0.6 (TPM KSS slope) × −5.72 (TPM W at waking), both from memory (sleepiness-tpm.ts)
    expect(postnovaInertiaKss(0)).toBeCloseTo(3.432, 3);
    expect(postnovaInertiaKss(3)).toBeLessThan(0.04);
    expect(postnovaInertiaKss(Infinity)).toBeCloseTo(0, 12);
  });
});

describe('Postnova 2018 KSS in a body-clock run', () => {
  const model = createJfkX7();
  const e = entrain({ model, light: regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });

  it('stays below the sleepy threshold on a regular day, highest at waking (inertia) and lowest 1–4 h later (common practice)', () => {
    const r = simulate({ model, light: regularDayLight(150), periodicLight: true, sleep: regularSleep(2), initial: e.state, end_h: 24, sleepinessModel: 'postnova18-kss' });
    const awakeKss = r.samples.kss.filter((k) => Number.isFinite(k));
    expect(Math.max(...awakeKss)).toBeLessThan(KSS_SLEEPY);
    expect(r.samples.kss[r.samples.t_h.indexOf(7)]).toBe(Math.max(...awakeKss));
    const minAt = r.samples.t_h[r.samples.kss.indexOf(Math.min(...awakeKss))] as number;
    expect(minAt).toBeGreaterThan(8);
    expect(minAt).toBeLessThan(11);
  });

  it('rises across a night of sustained wakefulness and peaks in the early morning after CBTmin', () => {
    // Constant-routine sleepiness peaks in the early morning near/after the temperature minimum
    // (Postnova 2018 fitted KSS to such protocols; peak timing from memory). Model: peak within
    // 0–6 h after CBTmin; the measured lag is reported in docs/validation/circadian.md.
    const light = lightFromSteps([0, 7], [0, 10], 'native_lx', 48);
    const r = simulate({ model, light, sleep: { mode: 'prescribed', episodes: [{ start_h: 0, end_h: 7 }] }, initial: e.state, end_h: 43, sleepinessModel: 'postnova18-kss' });
    const at = (t: number) => r.samples.kss[r.samples.t_h.indexOf(t)] as number;
    expect(at(20)).toBeLessThan(at(24));
    expect(at(24)).toBeLessThan(at(28));
    let peak = 0;
    r.samples.kss.forEach((k, i) => {
      if ((r.samples.t_h[i] as number) >= 9 && (k > (r.samples.kss[peak] as number) || !Number.isFinite(r.samples.kss[peak] as number))) peak = i;
    });
    const lag = (r.samples.t_h[peak] as number) - (r.cbtmin_h[1] as number);
    expect(lag).toBeGreaterThan(0);
    expect(lag).toBeLessThan(6);
    expect(at(30)).toBeGreaterThanOrEqual(6);
  });
});
