/**
 * Process L, the light-processing front end of Kronauer, Forger & Jewett 1999 (J Biol Rhythms
 * 14:500), as restated in St Hilaire et al. 2007 (J Pineal Res 43:294, Eqs 4–6):
 *
 *   α(I)  = α0 · (I / I0)^p                       min⁻¹      (power form, K99 / F99 / SF14)
 *   α(I)  = α0 · I^p / (I^p + I0)                 min⁻¹      (Hill form, Hannay et al. 2019)
 *   α(I)  = α0 · (I / I0)^p · I / (I + I1)        min⁻¹      (power form with a low-light threshold, St Hilaire et al. 2007 J Theor Biol)
 *   dn/dt = 60 · [α(I)·(1 − n) − β·n]             h⁻¹        (n = fraction of used photoreceptor elements)
 *   B̂     = G · α(I) · (1 − n)                    dimensionless (G in min)
 *
 * I is photopic lux of the calibration source (native input, see calibration.ts), after sleep
 * gating and the per-person light-sensitivity factor. Time inside the models is in hours; the
 * per-minute rates α and β are converted by the factor 60.
 */
export type LightResponseForm = 'power' | 'hill' | 'power-threshold';

export interface ProcessLParams {
  readonly form: LightResponseForm;
  /** min⁻¹ */
  readonly alpha0_per_min: number;
  readonly p: number;
  /** lx (power form) or lx^p (Hill form, as published) */
  readonly I0: number;
  /** lx, threshold of the 'power-threshold' form (I1 = 100 lx in SH07); unused otherwise */
  readonly I1?: number;
  /** min⁻¹ (δ in Hannay 2019) */
  readonly beta_per_min: number;
  /** min */
  readonly G_min: number;
  /** Citation of the parameter set. */
  readonly source: string;
}

/**
 * K99: Kronauer 1999, as restated by St Hilaire 2007 J Pineal Res (α0, p, I0, β from the paper;
 * G = 33.75 from memory, consistent with its re-use in Serkh & Forger 2014 and Hannay 2019 code).
 */
export const PROCESS_L_K99: ProcessLParams = {
  form: 'power', alpha0_per_min: 0.05, p: 0.5, I0: 9500, beta_per_min: 0.0075, G_min: 33.75,
  source: 'Kronauer, Forger & Jewett 1999 J Biol Rhythms 14:500 via St Hilaire et al. 2007 J Pineal Res 43:294 Eqs 4–6; G = 33.75 from memory',
};

/** F99: original fit of the Forger 1999 simpler model (public implementations write G = 19.9). */
export const PROCESS_L_F99: ProcessLParams = {
  form: 'power', alpha0_per_min: 0.16, p: 0.6, I0: 9500, beta_per_min: 0.013, G_min: 19.875,
  source: 'Forger, Jewett & Kronauer 1999 J Biol Rhythms 14:532 (values as used in public research code, not read in the paper)',
};

/** SF14: K99 constants re-used with the cubic oscillator by Serkh & Forger 2014 (PLoS Comput Biol 10:e1003523). */
export const PROCESS_L_SF14: ProcessLParams = { ...PROCESS_L_K99, source: 'Serkh & Forger 2014 PLoS Comput Biol 10:e1003523 (K99 constants with the cubic oscillator)' };

/**
 * SH07: St Hilaire et al. 2007 J Theor Biol 247:583 (values as in one public implementation;
 * α0, β, G also match Postnova 2018 ports): α = 0.1·(I/9500)^½·I/(I + 100).
 */
export const PROCESS_L_SH07: ProcessLParams = {
  form: 'power-threshold', alpha0_per_min: 0.1, p: 0.5, I0: 9500, I1: 100, beta_per_min: 0.007, G_min: 37,
  source: 'St Hilaire et al. 2007 J Theor Biol 247:583 (values as used in public research code)',
};

/** H19: Hannay, Booth & Forger 2019 J Biol Rhythms 34:658 (Hill form). */
export const PROCESS_L_H19: ProcessLParams = {
  form: 'hill', alpha0_per_min: 0.05, p: 1.5, I0: 9325, beta_per_min: 0.0075, G_min: 33.75,
  source: 'Hannay, Booth & Forger 2019 J Biol Rhythms 34:658 (values as used in public research code)',
};

/** α(I) in min⁻¹ for native lux I ≥ 0. */
export function lightActivation_per_min(P: ProcessLParams, I_lx: number): number {
  if (!(I_lx > 0)) return 0;
  if (P.form === 'power') return P.alpha0_per_min * Math.pow(I_lx / P.I0, P.p);
  if (P.form === 'power-threshold') return P.alpha0_per_min * Math.pow(I_lx / P.I0, P.p) * (I_lx / (I_lx + (P.I1 ?? 100)));
  const ip = Math.pow(I_lx, P.p);
  return (P.alpha0_per_min * ip) / (ip + P.I0);
}

/** dn/dt in h⁻¹ for a given α (min⁻¹). */
export function processLRate_per_h(P: ProcessLParams, alpha_per_min: number, n: number): number {
  return 60 * (alpha_per_min * (1 - n) - P.beta_per_min * n);
}

/** Photic drive B̂ = G·α·(1 − n). */
export function photicDrive(P: ProcessLParams, alpha_per_min: number, n: number): number {
  return P.G_min * alpha_per_min * (1 - n);
}

/**
 * α(I) with a one-entry cache: inside a constant-light segment every right-hand-side call has
 * the same I, so the power/Hill function is evaluated once per segment.
 */
export function cachedLightActivation(P: ProcessLParams): (I_lx: number) => number {
  let lastI = Number.NaN;
  let lastAlpha = 0;
  return (I_lx: number) => {
    if (I_lx !== lastI) {
      lastI = I_lx;
      lastAlpha = lightActivation_per_min(P, I_lx);
    }
    return lastAlpha;
  };
}
