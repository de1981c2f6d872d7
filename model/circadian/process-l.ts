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

/*
 * Provenance of the parameter sets. The parameter tables of Kronauer 1999, Forger 1999,
 * St Hilaire 2007 J Theor Biol and Hannay 2019 could not be read (the reference search reaches
 * the abstracts of the last two only); where a value rests on public research code or on
 * memory, the set says so. St Hilaire et al. 2007 J Pineal Res 43:294 restates K99 in its
 * Eqs 4–6 (full text checked).
 */

/**
 * K99: Kronauer, Forger & Jewett 1999 J Biol Rhythms 14:500, the front end published with the
 * x⁷ oscillator. α0 = 0.05 min⁻¹, p = 0.5, I0 = 9500 lx, β = 0.0075 min⁻¹: St Hilaire et al. 2007
 * J Pineal Res 43:294 Eqs 4–6 (paper). G = 33.75 min: from memory (the same value stands beside
 * α0 = 0.05, β = 0.0075 in the Serkh & Forger 2014 and Hannay 2019 re-uses in public code).
 */
export const PROCESS_L_K99: ProcessLParams = {
  form: 'power', alpha0_per_min: 0.05, p: 0.5, I0: 9500, beta_per_min: 0.0075, G_min: 33.75,
  source: 'Kronauer, Forger & Jewett 1999 J Biol Rhythms 14:500: α0, p, I0, β as restated in St Hilaire et al. 2007 J Pineal Res 43:294 Eqs 4–6; G = 33.75 from memory',
};

/**
 * F99: the original fit of the Forger, Jewett & Kronauer 1999 simpler model (J Biol Rhythms
 * 14:532): α0 = 0.16 min⁻¹, p = 0.6, I0 = 9500 lx, β = 0.013 min⁻¹, G = 19.875 min (written 19.9
 * there), as in three agreeing public research implementations; the paper was not read.
 */
export const PROCESS_L_F99: ProcessLParams = {
  form: 'power', alpha0_per_min: 0.16, p: 0.6, I0: 9500, beta_per_min: 0.013, G_min: 19.875,
  source: 'Forger, Jewett & Kronauer 1999 J Biol Rhythms 14:532 (values as in three agreeing public research implementations; the paper was not read)',
};

/** SF14: K99 constants re-used with the cubic oscillator by Serkh & Forger 2014 (PLoS Comput Biol 10:e1003523; two public implementations). */
export const PROCESS_L_SF14: ProcessLParams = { ...PROCESS_L_K99, source: 'Serkh & Forger 2014 PLoS Comput Biol 10:e1003523 (K99 constants with the cubic oscillator, as in two public implementations)' };

/**
 * SH07: St Hilaire, Klerman, Khalsa, Wright, Czeisler & Kronauer 2007 J Theor Biol 247:583, the
 * refit of Process L published with the x⁷ oscillator and a non-photic sleep–wake drive:
 * α = α0·(I/I0)^p·I/(I + I1), α0 = 0.1 min⁻¹, p = 0.5, I0 = 9500 lx, I1 = 100 lx,
 * β = 0.007 min⁻¹, G = 37 min. Values as in one public implementation of that paper; α0, β and
 * G (ν_Xp = 37 min) also appear in two public implementations of Postnova et al. 2018, which
 * builds on it. The paper's abstract was read; its tables were not.
 */
export const PROCESS_L_SH07: ProcessLParams = {
  form: 'power-threshold', alpha0_per_min: 0.1, p: 0.5, I0: 9500, I1: 100, beta_per_min: 0.007, G_min: 37,
  source: 'St Hilaire et al. 2007 J Theor Biol 247:583 (values as in one public implementation of that paper; α0, β, G also in two of Postnova et al. 2018)',
};

/**
 * H19: Hannay, Booth & Forger 2019 J Biol Rhythms 34:658 (Hill form): α0 = 0.05 min⁻¹, p = 1.5,
 * I0 = 9325 lx^p, δ = 0.0075 min⁻¹, G = 33.75 min, as in two public implementations (the
 * authors' group and a melatonin study); the paper's abstract was read.
 */
export const PROCESS_L_H19: ProcessLParams = {
  form: 'hill', alpha0_per_min: 0.05, p: 1.5, I0: 9325, beta_per_min: 0.0075, G_min: 33.75,
  source: 'Hannay, Booth & Forger 2019 J Biol Rhythms 34:658 (values as in two public implementations)',
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
