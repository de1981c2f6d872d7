/**
 * Jewett–Forger–Kronauer 1999 higher-order ("x⁷") oscillator (J Biol Rhythms 14:493, citation
 * from memory; equations as restated in St Hilaire et al. 2007 J Pineal Res 43:294, Eqs 7–9),
 * with one of two published light front ends (process-l.ts):
 *   `jfk99-x7`       Kronauer 1999 Process L (K99), the set published with the oscillator;
 *   `jfk99-x7-sh07`  St Hilaire et al. 2007 J Theor Biol Process L (SH07), the same group's refit.
 * SH07 was fitted together with a non-photic sleep–wake drive on dx/dt (ρ = 0.032), which is not
 * included here: the pacemakers of this product take light alone.
 *
 *   B      = B̂ · (1 − b·x) · (1 − b·xc),  b = 0.4
 *   dx/dt  = (π/12) · [xc + μ·(x/3 + 4x³/3 − 256x⁷/105) + B]
 *   dxc/dt = (π/12) · [q·B·xc − x·((24/(0.99729·τx))² + k·B)]
 *
 * The sign of the x⁷ term is negative (the machine-readable copy of the paper shows "+", a
 * transcription error: every public implementation has "−" and "+" makes the cycle unbounded).
 * Phase marker: CBTmin = time of the minimum of x + φref, φref = 0.8 h (Jewett/Kronauer
 * convention, from public code and memory). St Hilaire's alternative (atan2(xc, x) = −170.7°
 * + 0.97 h) falls ≈ 0.6 h later; it is not used for CBTmin here.
 */
import type { Pacemaker, PersonParams } from './pacemaker.js';
import { PROCESS_L_K99, PROCESS_L_SH07, cachedLightActivation, photicDrive, processLRate_per_h } from './process-l.js';

const W = Math.PI / 12;

export const JFK_X7_PARAMETERS = {
  mu: 0.13, // stiffness (public code ×4)
  q: 1 / 3, // St Hilaire 2007 J Pineal Res Eq 8 (symbol), value from public code
  k: 0.55,
  b: 0.4, // circadian modulation of the photic drive, St Hilaire 2007 Eq 9
  tau_h: 24.2, // intrinsic period
  periodCorrection: 0.99729, // St Hilaire 2007 Eq 8
  cbtminOffset_h: 0.8, // φref
} as const;

/** Light front end of the x⁷ oscillator: Kronauer 1999 or St Hilaire 2007 (J Theor Biol). */
export type JfkX7FrontEnd = 'k99' | 'sh07';

export function createJfkX7(person: PersonParams = {}, frontEnd: JfkX7FrontEnd = 'k99'): Pacemaker {
  const P = JFK_X7_PARAMETERS;
  const processL = frontEnd === 'k99' ? PROCESS_L_K99 : PROCESS_L_SH07;
  const tau = person.tau_h ?? P.tau_h;
  const w2 = (24 / (P.periodCorrection * tau)) ** 2;
  const { mu, q, k, b } = P;
  const activation = cachedLightActivation(processL);
  return {
    id: frontEnd === 'k99' ? 'jfk99-x7' : 'jfk99-x7-sh07',
    label:
      frontEnd === 'k99'
        ? 'Jewett–Forger–Kronauer 1999 higher-order (x⁷) oscillator with Kronauer 1999 Process L'
        : 'Jewett–Forger–Kronauer 1999 higher-order (x⁷) oscillator with the St Hilaire et al. 2007 Process L (without its non-photic drive)',
    source: `Jewett, Forger & Kronauer 1999 J Biol Rhythms 14:493, restated in St Hilaire et al. 2007 J Pineal Res 43:294; Process L: ${processL.source}`,
    oscillator: 'x7',
    stateNames: ['x', 'xc', 'n'],
    stateSize: 3,
    nIndex: 2,
    processL,
    parameters: { mu, q, k, b, tau_h: tau, periodCorrection: P.periodCorrection },
    tau_h: tau,
    lightSensitivity: person.lightSensitivity ?? 1,
    marker: { kind: 'x-min', cbtminOffset_h: P.cbtminOffset_h },
    seedState: [-0.5, -0.86, 0.3],
    derivatives(y, I, dydt) {
      const x = y[0] as number;
      const xc = y[1] as number;
      const n = y[2] as number;
      const a = activation(I);
      const bh = photicDrive(processL, a, n);
      const B = bh * (1 - b * x) * (1 - b * xc);
      const x2 = x * x;
      const x3 = x2 * x;
      const x7 = x3 * x3 * x;
      dydt[0] = W * (xc + mu * (x / 3 + (4 / 3) * x3 - (256 / 105) * x7) + B);
      dydt[1] = W * (q * B * xc - x * (w2 + k * B));
      dydt[2] = processLRate_per_h(processL, a, n);
      return bh;
    },
    angle: (y) => Math.atan2(y[1] as number, y[0] as number),
    amplitude: (y) => Math.hypot(y[0] as number, y[1] as number),
  };
}
