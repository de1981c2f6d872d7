/**
 * Hannay, Booth & Forger 2019 macroscopic single-population model (J Biol Rhythms 34:658,
 * doi:10.1177/0748730419878298; equations and values as in public research code, abstract read):
 *
 *   dR/dt = −γR + (K/2)cos(β1)·R(1 − R⁴) + L_R
 *   dψ/dt = ω0 + (K/2)sin(β1)·(1 + R⁴) + L_ψ
 *   L_R   = (A1/2)B̂(1 − R⁴)cos(ψ + βL1) + (A2/2)B̂·R(1 − R⁸)cos(2ψ + βL2)
 *   L_ψ   = σB̂ − (A1/2)B̂(R³ + 1/R)sin(ψ + βL1) − (A2/2)B̂(1 + R⁸)sin(2ψ + βL2)
 *   Process L in Hill form (H19 set), B̂ without circadian modulation.
 *
 * The published τ = 23.84 h is the natural frequency ω0 = 2π/τ, not the free-running period:
 * in darkness R → R* = (1 − γ/((K/2)cos β1))^¼ = 0.701 and the period is
 * 2π/(ω0 + (K/2)sin β1 (1 + R*⁴)) = 24.18 h. The per-person τ of this product is the free-running
 * period, so ω0 is set from it; the default keeps the published ω0 exactly.
 * Markers: CBTmin at ψ ≡ π, DLMO at ψ ≡ 5π/12 (7 h earlier). ψ increases with time; the
 * product's clockwise angle is −ψ.
 */
import type { Pacemaker, PersonParams } from './pacemaker.js';
import { PROCESS_L_H19, cachedLightActivation, photicDrive, processLRate_per_h } from './process-l.js';

export const HANNAY_SP_PARAMETERS = {
  tau0_h: 23.84,
  K: 0.06358,
  gamma: 0.024,
  beta1: -0.09318,
  A1: 0.3855,
  A2: 0.1977,
  betaL1: -0.0026,
  betaL2: -0.957756,
  sigma: 0.0400692,
} as const;

/** Darkness limit-cycle amplitude R*. */
export function hannayDarkAmplitude(): number {
  const P = HANNAY_SP_PARAMETERS;
  return Math.pow(1 - P.gamma / ((P.K / 2) * Math.cos(P.beta1)), 0.25);
}

/** Free-running period in darkness for a natural frequency ω0 (rad/h). */
function darkPeriod_h(omega0: number): number {
  const P = HANNAY_SP_PARAMETERS;
  const r4 = hannayDarkAmplitude() ** 4;
  return (2 * Math.PI) / (omega0 + (P.K / 2) * Math.sin(P.beta1) * (1 + r4));
}

export function createHannaySp(person: PersonParams = {}): Pacemaker {
  const P = HANNAY_SP_PARAMETERS;
  const r4 = hannayDarkAmplitude() ** 4;
  const defaultOmega = (2 * Math.PI) / P.tau0_h;
  const tau = person.tau_h ?? darkPeriod_h(defaultOmega);
  const omega0 = person.tau_h === undefined ? defaultOmega : (2 * Math.PI) / tau - (P.K / 2) * Math.sin(P.beta1) * (1 + r4);
  const processL = PROCESS_L_H19;
  const { K, gamma, beta1, A1, A2, betaL1, betaL2, sigma } = P;
  const kc = (K / 2) * Math.cos(beta1);
  const ks = (K / 2) * Math.sin(beta1);
  const activation = cachedLightActivation(processL);
  return {
    id: 'hfb19-sp',
    label: 'Hannay–Booth–Forger 2019 macroscopic single-population model',
    source: 'Hannay, Booth & Forger 2019 J Biol Rhythms 34:658',
    oscillator: 'macroscopic',
    stateNames: ['R', 'psi', 'n'],
    stateSize: 3,
    nIndex: 2,
    processL,
    parameters: { tau0_h: (2 * Math.PI) / omega0, K, gamma, beta1, A1, A2, betaL1, betaL2, sigma, tau_h: tau },
    tau_h: tau,
    lightSensitivity: person.lightSensitivity ?? 1,
    marker: { kind: 'angle', angle_rad: -Math.PI, cbtminOffset_h: 0 },
    seedState: [0.8, 0, 0],
    derivatives(y, I, dydt) {
      const R = y[0] as number;
      const psi = y[1] as number;
      const n = y[2] as number;
      const a = activation(I);
      const bh = photicDrive(processL, a, n);
      const R2 = R * R;
      const R4 = R2 * R2;
      const R8 = R4 * R4;
      const c1 = Math.cos(psi + betaL1);
      const s1 = Math.sin(psi + betaL1);
      const c2 = Math.cos(2 * psi + betaL2);
      const s2 = Math.sin(2 * psi + betaL2);
      const LR = (A1 / 2) * bh * (1 - R4) * c1 + (A2 / 2) * bh * R * (1 - R8) * c2;
      const Lpsi = sigma * bh - (A1 / 2) * bh * (R2 * R + 1 / R) * s1 - (A2 / 2) * bh * (1 + R8) * s2;
      dydt[0] = -gamma * R + kc * R * (1 - R4) + LR;
      dydt[1] = omega0 + ks * (1 + R4) + Lpsi;
      dydt[2] = processLRate_per_h(processL, a, n);
      return bh;
    },
    angle: (y) => -(y[1] as number),
    amplitude: (y) => y[0] as number,
  };
}
