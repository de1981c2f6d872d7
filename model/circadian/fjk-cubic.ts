/**
 * Forger–Jewett–Kronauer 1999 "simpler" (cubic) oscillator (J Biol Rhythms 14:532,
 * doi:10.1177/074873099129000867), in the arrangement every public implementation uses
 * (damping on xc, no q-term, B added to dx/dt; the paper itself was not read):
 *
 *   B      = B̂ · (1 − b·x) · (1 − b·xc),  b = 0.4
 *   dx/dt  = (π/12) · (xc + B)
 *   dxc/dt = (π/12) · [μ·(xc − 4xc³/3) − x·((24/(0.99669·τx))² + k·B)]
 *
 * Process L (process-l.ts): the original F99 set by default (model id `fjk99-cubic`); the
 * Serkh & Forger 2014 re-use of the K99 constants as `fjk99-cubic-sf14`; and, because both
 * published sets shift the clock less than people do (docs/validation/circadian.md), the
 * St Hilaire et al. 2007 J Theor Biol set as `fjk99-cubic-sh07`. That pairing is the product's
 * own (SH07 was fitted with the x⁷ oscillator) and is labelled as such.
 * Phase marker (open item, settled): CBTmin = time of the minimum of x with no offset, the
 * convention of the Hannay/Forger group's research code; it lands 1.5–3.5 h before habitual
 * wake as observed (see docs/validation/circadian.md). Adding 0.7–0.8 h, as some code does,
 * would still land inside that range; the choice is documented, not measured.
 */
import type { Pacemaker, PersonParams } from './pacemaker.js';
import { PROCESS_L_F99, PROCESS_L_SF14, PROCESS_L_SH07, cachedLightActivation, photicDrive, processLRate_per_h, type ProcessLParams } from './process-l.js';

const W = Math.PI / 12;

export const FJK_CUBIC_PARAMETERS = {
  mu: 0.23,
  k: 0.55,
  b: 0.4,
  tau_h: 24.2,
  periodCorrection: 0.99669,
  cbtminOffset_h: 0,
} as const;

/** Light front end of the cubic oscillator (see the header). */
export type FjkCubicFrontEnd = 'f99' | 'sf14' | 'sh07';

const CUBIC_VARIANTS: Record<FjkCubicFrontEnd, { readonly id: string; readonly processL: ProcessLParams; readonly label: string }> = {
  f99: { id: 'fjk99-cubic', processL: PROCESS_L_F99, label: 'Forger–Jewett–Kronauer 1999 simpler (cubic) oscillator with its original Process L' },
  sf14: { id: 'fjk99-cubic-sf14', processL: PROCESS_L_SF14, label: 'Forger–Jewett–Kronauer 1999 cubic oscillator with the Serkh & Forger 2014 Process L constants' },
  sh07: { id: 'fjk99-cubic-sh07', processL: PROCESS_L_SH07, label: 'Forger–Jewett–Kronauer 1999 cubic oscillator with the St Hilaire et al. 2007 Process L (pairing not published)' },
};

export function createFjkCubic(person: PersonParams = {}, variant: FjkCubicFrontEnd = 'f99'): Pacemaker {
  const P = FJK_CUBIC_PARAMETERS;
  const V = CUBIC_VARIANTS[variant];
  const processL = V.processL;
  const tau = person.tau_h ?? P.tau_h;
  const w2 = (24 / (P.periodCorrection * tau)) ** 2;
  const { mu, k, b } = P;
  const activation = cachedLightActivation(processL);
  return {
    id: V.id,
    label: V.label,
    source: `Forger, Jewett & Kronauer 1999 J Biol Rhythms 14:532; Process L: ${processL.source}`,
    oscillator: 'cubic',
    stateNames: ['x', 'xc', 'n'],
    stateSize: 3,
    nIndex: 2,
    processL,
    parameters: { mu, k, b, tau_h: tau, periodCorrection: P.periodCorrection },
    tau_h: tau,
    lightSensitivity: person.lightSensitivity ?? 1,
    marker: { kind: 'x-min', cbtminOffset_h: P.cbtminOffset_h },
    // Seed from public code (Skeldon et al. 2023 supplement), in Forger letters.
    seedState: [-0.5574, 0.8805, 0.5],
    derivatives(y, I, dydt) {
      const x = y[0] as number;
      const xc = y[1] as number;
      const n = y[2] as number;
      const a = activation(I);
      const bh = photicDrive(processL, a, n);
      const B = bh * (1 - b * x) * (1 - b * xc);
      dydt[0] = W * (xc + B);
      dydt[1] = W * (mu * (xc - (4 / 3) * xc * xc * xc) - x * (w2 + k * B));
      dydt[2] = processLRate_per_h(processL, a, n);
      return bh;
    },
    angle: (y) => Math.atan2(y[1] as number, y[0] as number),
    amplitude: (y) => Math.hypot(y[0] as number, y[1] as number),
  };
}
