/**
 * Three-process model of alertness (TPM): Åkerstedt & Folkard 1997 (Chronobiol Int 14:115), with
 * the 12 h circadian harmonic and the alertness → KSS transformation used with it by Åkerstedt,
 * Folkard & Portin 2004 (Aviat Space Environ Med 75:A75) and Ingre et al. 2014 (PLoS ONE
 * 9:e108679). Alertness A is in the model's own units (higher = more alert):
 *
 *   A = S + C + U + W
 *   S awake  = L_a + (S_w − L_a)·e^{−d·t}             t since waking, S_w = S at waking
 *   S asleep = H_a − (H_a − S_s)·e^{−g·t}             t since sleep onset, S_s = S at sleep onset
 *   C        = C_a·cos(2π(φ − φ_C)/24)                φ: circadian phase (h), φ_C: acrophase
 *   U        = U_m + U_a·cos(2π(φ − φ_C − 3 h)/12)     12 h harmonic
 *   W        = W_c·e^{−w·t}                           sleep inertia, t since waking
 *   KSS      = k_0 + k_A·A                            on the 1–9 scale (clamped to it)
 *
 * Source status: only the abstracts of the three papers could be read (the stored full texts
 * were not reachable); every value below is from memory, as in the project's model notes §7.3,
 * and marked so. The recovery rate g is the one that takes S from 7.96 to 14 in 8 h of sleep,
 * g = ln((14.3 − 7.96)/(14.3 − 14))/8 (from memory). The 2004 version's change of the recovery
 * curve near its top is not implemented.
 *
 * Circadian phase (design choice): the TPM states C in clock time, acrophase 16.8 h for day
 * workers. Here φ is the simulated body clock's time since CBTmin (the pacemaker's angle on its
 * darkness limit cycle, scaled to 24 h), and φ_C is placed so that a day worker entrained to the
 * reference routine (sleep 23:00–07:00, 150 lx awake) has C's acrophase at 16.8 h clock time
 * (TPM_ACROPHASE_AFTER_CBTMIN_H, derived in its comment). C and U thus follow light-induced phase
 * shifts.
 */

export const TPM = {
  /** Lower asymptote of S while awake (alertness units); Åkerstedt & Folkard 1997, from memory. */
  La: 2.4,
  /** Decay rate of S while awake, h⁻¹; Åkerstedt & Folkard 1997, from memory (0.0353). */
  d_per_h: 0.0353,
  /** Upper asymptote of S while asleep; Åkerstedt & Folkard 1997, from memory. */
  Ha: 14.3,
  /** Recovery rate of S while asleep, h⁻¹: ln((14.3 − 7.96)/(14.3 − 14))/8 = 0.3814; from memory. */
  g_per_h: Math.log((14.3 - 7.96) / (14.3 - 14)) / 8,
  /** Amplitude of the 24 h circadian component; Åkerstedt & Folkard 1997, from memory. */
  Ca: 2.5,
  /** Acrophase of C in clock time for day workers (h); Åkerstedt & Folkard 1997, from memory. */
  acrophaseClock_h: 16.8,
  /** Mean and amplitude of the 12 h component, acrophase 3 h after C's; 2004 version, from memory. */
  Um: -0.5,
  Ua: 0.5,
  UlagAfterC_h: 3,
  /** Sleep inertia at waking (alertness units) and its decay rate (h⁻¹); 1997, from memory. */
  Wc: -5.72,
  w_per_h: 1.51,
  /** KSS = k0 + kA·A; transformation of Åkerstedt et al. 2004 / Ingre et al. 2014, from memory. */
  kss0: 10.6,
  kssA: -0.6,
} as const;

/**
 * Phase of C's acrophase after CBTmin (h): 16.8 h (clock time, above) − 4.0 h, the CBTmin clock
 * time (04:02) of the default pacemaker (jfk99-x7-sh07) entrained to the reference routine (sleep
 * 23:00–07:00, 150 lx native while awake), pinned in sleepiness-tpm.test.ts.
 */
export const TPM_ACROPHASE_AFTER_CBTMIN_H = 12.8;

/** KSS scale limits (Åkerstedt & Gillberg 1990: 1 = extremely alert … 9 = very sleepy). */
export const KSS_MIN = 1;
export const KSS_MAX = 9;

/** S after `dt_h` hours awake (decays towards L_a). */
export function tpmSAwake(S0: number, dt_h: number): number {
  return TPM.La + (S0 - TPM.La) * Math.exp(-TPM.d_per_h * dt_h);
}

/** S after `dt_h` hours asleep (recovers towards H_a). */
export function tpmSAsleep(S0: number, dt_h: number): number {
  return TPM.Ha - (TPM.Ha - S0) * Math.exp(-TPM.g_per_h * dt_h);
}

/** C + U at circadian phase φ (h since CBTmin on a 24 h scale). */
export function tpmCircadian(phase_h: number): number {
  const fromAcro = phase_h - TPM_ACROPHASE_AFTER_CBTMIN_H;
  return TPM.Ca * Math.cos((2 * Math.PI * fromAcro) / 24) + TPM.Um + TPM.Ua * Math.cos((2 * Math.PI * (fromAcro - TPM.UlagAfterC_h)) / 12);
}

/** Sleep inertia W (alertness units, ≤ 0) `sinceWake_h` hours after waking (0 if never woken). */
export function tpmInertia(sinceWake_h: number): number {
  return Number.isFinite(sinceWake_h) && sinceWake_h >= 0 ? TPM.Wc * Math.exp(-TPM.w_per_h * sinceWake_h) : 0;
}

/** KSS from TPM alertness, clamped to the 1–9 scale. */
export function tpmKss(alertness: number): number {
  return Math.min(KSS_MAX, Math.max(KSS_MIN, TPM.kss0 + TPM.kssA * alertness));
}

/** Seed for S (alertness units): the middle of its daily range; entrainment settles it. */
export const TPM_S_SEED = 11;
