/**
 * Free (model-predicted) sleep timing: the Homeostatic–Circadian–Light model of Skeldon et al.
 * 2023/24 (PLoS Comput Biol; values from the authors' code supplement), which couples a
 * homeostat to the light-driven Forger 1999 cubic oscillator by threshold switching:
 *
 *   dH/dt = (μ·W − H)/χ,   W = 1 awake, 0 asleep,   χ = 45 h
 *   C     = a·(0.7896 − 0.3912·xc + 0.7583·x − 0.4442·xc² + 0.0250·xc·x − 0.9647·x²)   (Forger letters)
 *   fall asleep when H ≥ H0⁺ + C (13.5);  wake when H ≤ H0⁻ + C (12.5)
 *
 * Chosen over the classic two-process thresholds, whose published sets disagree (three sets, and
 * a harmonic coefficient 0.07 vs 0.007). For pacemakers other than the cubic, C is evaluated on
 * the cubic oscillator's state at the same time since CBTmin (limit-cycle.ts). An alarm is a hard
 * switch to W = 1 at a clock time, as the authors describe forced wake.
 */
export interface HclParams {
  readonly a: number;
  readonly mu: number;
  readonly chi_h: number;
  readonly upper: number;
  readonly lower: number;
}

/** Age presets of the authors' code (30 y default). */
export const HCL_PRESETS: Readonly<Record<'age30' | 'age65', HclParams>> = {
  age30: { a: 2.72, mu: 18.67, chi_h: 45, upper: 13.5, lower: 12.5 },
  age65: { a: 1.72, mu: 17.87, chi_h: 45, upper: 13.5, lower: 12.5 },
};

/** Circadian threshold modulation C from cubic-oscillator (x, xc). */
export function hclCircadianModulation(P: HclParams, x: number, xc: number): number {
  return P.a * (0.7896 - 0.3912 * xc + 0.7583 * x - 0.4442 * xc * xc + 0.025 * xc * x - 0.9647 * x * x);
}
