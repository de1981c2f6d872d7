/**
 * Sleep pressure and sleepiness (KSS) after Postnova, Lockley & Robinson 2018 (J Biol Rhythms
 * 33:203–218), arousal-dynamics model. Equation numbers are the paper's as two independent public
 * re-implementations label them (one records corrections supplied by the authors); the paper's
 * full text could not be read here (its abstract was), so every value below is as those two
 * agree, with the table or equation they cite:
 *
 *   Eq 1  τ_v dV_v/dt = ν_vm·Q_m − V_v + D_v                 sleep-active (VLPO) group, mV
 *   Eq 2  τ_m dV_m/dt = ν_mv·Q_v − V_m + D_m + W             wake-active (MA) group, mV
 *   Eq 3  τ_H dH/dt   = ν_Hm·Q_m − H                         homeostatic sleep pressure, nM
 *   Eq 7  Q(V) = Q_max / (1 + e^{(θ − V)/σ'})                 mean firing rate, s⁻¹
 *   Eq 8  W = F_w·max(0, V_WE − ν_mv·Q_v − D_m)               wake effort, F_w = 1 in imposed wake
 *   Eq 9  D_v = ν_vH·H + ν_vC·C + A_v                         sleep drive, mV
 *   Eq 10 C = 0.1·(1 + X)/2 + [(3.1X − 2.5Y + 4.2)/(3.7(X + 2))]²   circadian drive (Postnova 2016)
 *   KSS   = Θ0 + Θ_H·H + Θ_C·C   (awake only; Table 3 / Eq 23 as both ports cite them)
 *
 * Reduction (design choice, checked): τ_v = τ_m = 50 s ≪ τ_H = 59 h, so the flip-flop sits at its
 * steady state and Q_m is an algebraic function of D_v and of the prescribed state: awake, the
 * highest solution of Eqs 1–2 at steady state with the wake effort of Eq 8 (which makes
 * V_m = max(ν_mv·Q_v + D_m, V_WE)); asleep, the lowest. Q_m(D_v) is tabulated once for both states.
 * sleepiness-postnova.test.ts integrates the full fast system (Eqs 1–3, 5 s steps) through a night
 * of imposed wake and finds the same H and KSS, so the reduction is faithful; in particular the
 * wake effort holds Q_m at Q(V_WE) = 3.37 s⁻¹, so H approaches ν_Hm·Q(V_WE) = 15.4 nM with the
 * 59 h time constant during sleep deprivation. That is the published model's behaviour, not the
 * reduction's: it caps KSS after one night awake near 6.6 (model limitation, recorded in
 * docs/validation/circadian.md).
 *
 * Sleep inertia (added, not in Postnova 2018): the three-process model's W term (sleepiness-tpm.ts,
 * Åkerstedt & Folkard 1997) carried onto the KSS scale with the TPM's own alertness → KSS slope:
 * ΔKSS = −0.6·(−5.72)·e^{−1.51 t} = 3.43·e^{−1.51 t}, t in h since waking.
 *
 * X, Y are the x⁷ oscillator's (x, xc): used directly for the x⁷ pacemakers and carried over by
 * time since CBTmin for the others (limit-cycle.ts). This keeps the KSS coefficients applicable:
 * they were fitted to this H and C; feeding H from another model would void the fit.
 */
import { TPM, tpmInertia } from './sleepiness-tpm.js';

export const POSTNOVA_2018 = {
  /** Table 1: time constants of the sleep- and wake-active groups (s) and of H (h). */
  tauV_s: 50,
  tauM_s: 50,
  tauH_h: 59,
  /** Table 1: ν_Hm, nM s. */
  nuHm_nM_s: 4.57,
  /** Table 1 (Eq 7): Q_max (s⁻¹), θ (mV), σ' (mV). */
  Qmax_per_s: 100,
  theta_mV: 10,
  sigma_mV: 3,
  /** Table 1: mutual inhibition ν_vm, ν_mv (mV s). */
  nuVm_mV_s: -2.1,
  nuMv_mV_s: -1.8,
  /** Table 1: drive to the MA group D_m (mV). */
  Dm_mV: 1.3,
  /** Table 1 (Eq 9): ν_vH (mV/nM), ν_vC (mV), A_v (mV). */
  nuVH_mV_per_nM: 1.0,
  nuVC_mV: -0.5,
  Av_mV: -10.3,
  /** Table 1 (Eq 8): wake-effort threshold V_WE (mV). */
  VWE_mV: -0.07,
  /** Table 3 / Eq 23: KSS intercept Θ0, homeostatic weight Θ_H (nM⁻¹), circadian weight Θ_C. */
  kss0: -24.34,
  kssH_per_nM: 2.28,
  kssC: -1.74,
} as const;

/** Sleepiness threshold: KSS ≥ 7 is "sleepy" (common practice). */
export const KSS_SLEEPY = 7;

const P = POSTNOVA_2018;
const Q = (v: number) => P.Qmax_per_s / (1 + Math.exp((P.theta_mV - v) / P.sigma_mV));

/** Postnova 2016 circadian drive C(X, Y). */
export function postnovaCircadianDrive(X: number, Y: number): number {
  const r = (3.1 * X - 2.5 * Y + 4.2) / (3.7 * (X + 2));
  return (0.1 * (1 + X)) / 2 + r * r;
}

const DV_MIN = -30;
const DV_MAX = 20;
const DV_STEP = 0.02;
let tables: { wake: Float64Array; sleep: Float64Array } | undefined;

function solveQm(dv: number, awake: boolean): number {
  const g = (vm: number) => {
    const vv = P.nuVm_mV_s * Q(vm) + dv;
    let target = P.nuMv_mV_s * Q(vv) + P.Dm_mV;
    if (awake) target = Math.max(target, P.VWE_mV);
    return vm - target;
  };
  // scan for sign changes of g on [−200, 30] mV; pick the highest (awake) or lowest (asleep) root
  let prevV = -200;
  let prevG = g(prevV);
  let root = Number.NaN;
  for (let v = -199.5; v <= 30; v += 0.5) {
    const gv = g(v);
    if ((prevG < 0) !== (gv < 0)) {
      let lo = prevV;
      let hi = v;
      for (let k = 0; k < 50; k++) {
        const mid = 0.5 * (lo + hi);
        if ((g(mid) < 0) === (prevG < 0)) lo = mid;
        else hi = mid;
      }
      root = 0.5 * (lo + hi);
      if (!awake) break;
    }
    prevV = v;
    prevG = gv;
  }
  return Q(root);
}

function qmTables(): { wake: Float64Array; sleep: Float64Array } {
  if (tables === undefined) {
    const n = Math.round((DV_MAX - DV_MIN) / DV_STEP) + 1;
    const wake = new Float64Array(n);
    const sleep = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const dv = DV_MIN + i * DV_STEP;
      wake[i] = solveQm(dv, true);
      sleep[i] = solveQm(dv, false);
    }
    tables = { wake, sleep };
  }
  return tables;
}

/** Quasi-steady mean firing rate of the wake-active group, s⁻¹. */
export function wakeActiveRate_per_s(dv_mV: number, awake: boolean): number {
  const t = awake ? qmTables().wake : qmTables().sleep;
  const u = Math.min(Math.max((dv_mV - DV_MIN) / DV_STEP, 0), t.length - 1.000001);
  const i = Math.floor(u);
  const f = u - i;
  return (t[i] as number) * (1 - f) + (t[i + 1] as number) * f;
}

/** dH/dt (nM/h) for pressure H, circadian drive C and state. */
export function homeostatRate_nM_per_h(H: number, C: number, awake: boolean): number {
  const dv = P.nuVH_mV_per_nM * H + P.nuVC_mV * C + P.Av_mV;
  return (P.nuHm_nM_s * wakeActiveRate_per_s(dv, awake) - H) / P.tauH_h;
}

/** KSS of Table 3 / Eq 23 from H (nM) and C, without sleep inertia. */
export function kss(H: number, C: number): number {
  return P.kss0 + P.kssH_per_nM * H + P.kssC * C;
}

/** Sleep inertia on the KSS scale `sinceWake_h` hours after waking (TPM W × TPM KSS slope). */
export function postnovaInertiaKss(sinceWake_h: number): number {
  return TPM.kssA * tpmInertia(sinceWake_h);
}

/** Largest Heun step for H (h); τ_H = 59 h, so the local error is ~(0.5/59)³ relative. */
export const HOMEOSTAT_MAX_STEP_H = 0.5;

/** Seed for H (nM), from a public port of Skeldon et al. 2017 (H = 14.6). */
export const HOMEOSTAT_SEED_NM = 14.6;

export interface HomeostatTrace {
  /** H at each sample time (nM). */
  readonly H_nM: number[];
  readonly C: number[];
  readonly final_nM: number;
}

/**
 * Integrates H over the sample grid with Heun's method, splitting each interval at sleep/wake
 * transitions (C interpolated linearly between samples). `awakeAt` is queried at
 * non-decreasing times.
 */
export function homeostatPass(t_h: readonly number[], C: readonly number[], awakeAt: (t: number) => boolean, transitions: readonly number[], H0: number): HomeostatTrace {
  const H: number[] = [];
  let h = H0;
  if (t_h.length > 0) H.push(h);
  let tr = 0;
  for (let i = 0; i + 1 < t_h.length; i++) {
    const ta = t_h[i] as number;
    const tb = t_h[i + 1] as number;
    const ca = C[i] as number;
    const cb = C[i + 1] as number;
    const cAt = (t: number) => ca + ((cb - ca) * (t - ta)) / (tb - ta);
    const cuts = [ta];
    while (tr < transitions.length && (transitions[tr] as number) <= ta) tr++;
    let k = tr;
    while (k < transitions.length && (transitions[k] as number) < tb) cuts.push(transitions[k++] as number);
    cuts.push(tb);
    for (let j = 0; j + 1 < cuts.length; j++) {
      const a = cuts[j] as number;
      const b = cuts[j + 1] as number;
      if (!(b > a)) continue;
      const aw = awakeAt(0.5 * (a + b));
      const nSub = Math.max(1, Math.ceil((b - a) / HOMEOSTAT_MAX_STEP_H));
      const dt = (b - a) / nSub;
      for (let s = 0; s < nSub; s++) {
        const t0 = a + s * dt;
        const k1 = homeostatRate_nM_per_h(h, cAt(t0), aw);
        const k2 = homeostatRate_nM_per_h(h + dt * k1, cAt(t0 + dt), aw);
        h += 0.5 * dt * (k1 + k2);
      }
    }
    H.push(h);
  }
  return { H_nM: H, C: [...C], final_nM: h };
}
