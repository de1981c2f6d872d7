/**
 * Plasma melatonin: St Hilaire, Gronfier, Zeitzer & Klerman 2007, J Pineal Res 43:294
 * (extension of Brown et al. 1997, Am J Physiol 272:E506). Population means of 51 subjects.
 *
 *   dH1/dt = −β_IP·H1 + A'(t)                 pineal (pmol/L)
 *   dH2/dt =  β_IP·H1 − β_CP·H2               plasma (pmol/L); the saliva compartment is omitted
 *   A(t)  = A·(1 − e^{−λ(t − t_on)}) / (1 − e^{−λ(t_off − t_on)})   t_on ≤ t < t_off
 *   A(t)  = A(t_off)·e^{−α_M·(t − t_off)}                           after t_off
 *   A'(t) = A(t)·max(0, 1 − m·B̂)              light suppression, B̂ from Process L (SH07 set, see melatonin-pass.ts)
 *   t_on  = crossing of atan2(xc, x) = −65.3° + 0.97 h;  t_off = crossing of −166.2° + 0.97 h
 *
 * Open items settled here:
 *  • Units of λ and α_M are not stated in the paper: both are taken per minute (per hour would
 *    keep daytime melatonin near two-thirds of its peak). With λ = 0.588 min⁻¹ the normalising
 *    denominator differs from 1 by < 1e-100 for any synthesis window longer than 10 min, so it is
 *    taken as 1 and the rising branch needs no look-ahead to t_off.
 *  • (1 − m·B̂) goes negative in bright light (B̂ ≈ 1.7 at the onset of 9 500 lx): clamped at 0.
 *  • Which Process L feeds m·B̂ (K99 by citation, SH07 possible): SH07, settled by reproducing
 *    the paper's published intensity–response (melatonin-pass.ts). It runs as its own n state,
 *    whichever pacemaker sets the synthesis times.
 *  • At the switch to decay, A continues from its value at t_off (continuity; ≈ A).
 */
export const ST_HILAIRE_MELATONIN = {
  betaIP_per_min: 0.047,
  betaCP_per_min: 0.025,
  alphaM_per_min: 0.067,
  lambda_per_min: 0.588,
  A_pmol_L_min: 4.834,
  m: 7,
  synOnAngle_deg: -65.3,
  synOffAngle_deg: -166.2,
  synDelay_h: 0.97,
} as const;

/** 1 pg/mL = 4.305 pmol/L (molar mass 232.28 g/mol, from memory). */
export const PMOL_L_PER_PG_ML = 4.305;

/** Unsuppressed AA-NAT activity A(t) (pmol L⁻¹ min⁻¹). */
export function synthesisRate(on: boolean, since_h: number, valueAtSwitch: number, t_h: number): number {
  const M = ST_HILAIRE_MELATONIN;
  const dt_min = 60 * (t_h - since_h);
  if (on) return M.A_pmol_L_min * (1 - Math.exp(-M.lambda_per_min * dt_min));
  return valueAtSwitch * Math.exp(-M.alphaM_per_min * dt_min);
}
