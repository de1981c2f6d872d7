/**
 * Nights of plasma melatonin, read from the fine trace of the melatonin pass (melatonin-pass.ts):
 * two curves of the same person on the same pacemaker trajectory, "as lit" (with light
 * suppression, what the light at the eye does) and "dim light" (without suppression, what the
 * person would show in dim light, as a clinic measures it).
 *
 * Definitions (all times in h since t = 0):
 *  • DLMO, dim-light melatonin onset: the dim-light curve rising through 10 pg/mL plasma
 *    (DLMO_THRESHOLD_PG_ML, a common laboratory threshold for plasma; common practice).
 *    Alternative reported beside it: the dim-light curve rising through 25 % of that night's
 *    dim-light peak (a common amplitude-relative rule; common practice).
 *  • Dim-light biological night: from the DLMO to the dim-light curve falling back through the
 *    same threshold (the dim-light offset).
 *  • Melatonin onset as lit: the as-lit curve rising through the threshold inside that night
 *    (later than the DLMO, or absent, when light suppresses the evening rise).
 *  • Suppression per night, over a fixed window: the hours of the dim-light biological night
 *    spent awake (eyes open, exposed to the light at the eye),
 *      100 · (1 − ∫ as-lit / ∫ dim-light)   over that window;
 *    0 % when the person sleeps through the whole biological night. It is the acute effect of
 *    the light the person is exposed to, as in Zeitzer et al. 2000 (J Physiol 526:695), where
 *    suppression was the melatonin area during the exposure against the same hours in dim light.
 *    The share of the whole biological night's melatonin (`wholeNightSuppression_pct`) is kept
 *    beside it but not reported: a bright evening delays the clock during the same night, the
 *    dim-light night then lasts longer and that share falls as the light gets brighter.
 */
import { PMOL_L_PER_PG_ML } from './melatonin-sthilaire.js';

/** Plasma DLMO threshold, pg/mL (common practice for plasma; saliva thresholds are lower). */
export const DLMO_THRESHOLD_PG_ML = 10;
/** Amplitude-relative DLMO alternative: this fraction of the night's dim-light peak (common practice). */
export const DLMO_PEAK_FRACTION = 0.25;

/** Definitions as printed beside every output that carries them. */
export const DLMO_DEFINITION =
  'dim-light melatonin onset: the modelled plasma melatonin curve without light suppression (what the person would show in dim light) rising through 10 pg/mL';
export const DLMO_25PCT_DEFINITION = 'dim-light melatonin onset, alternative rule: the same curve rising through 25 % of that night’s dim-light peak';
export const SUPPRESSION_DEFINITION =
  'melatonin suppression per night: 100·(1 − as-lit plasma melatonin area / dim-light area) over the hours of the dim-light biological night (DLMO to dim-light offset, 10 pg/mL) spent awake; 0 when the person sleeps through it';

/** Fine trace written by the melatonin pass: values at step ends, sleep state per step. */
export interface MelatoninTrace {
  /** Step boundaries (n + 1 values, increasing). */
  readonly t_h: readonly number[];
  /** Plasma melatonin as lit and in dim light at the boundaries (pmol/L). */
  readonly lit_pmol_L: readonly number[];
  readonly dim_pmol_L: readonly number[];
  /** Awake during step k (between boundaries k and k + 1). */
  readonly awake: readonly boolean[];
}

export interface MelatoninNight {
  /** DLMO (dim-light curve through 10 pg/mL), h. */
  readonly onset_h: number;
  /** Dim-light offset (same curve falling through 10 pg/mL), or the end of the run, h. */
  readonly end_h: number;
  /** False when the run ends before the dim-light offset: the night is cut off. */
  readonly complete: boolean;
  /** DLMO by the 25 %-of-peak rule, h (NaN when the peak is not reached inside the run). */
  readonly dlmo25_h: number;
  /** Melatonin onset as lit (NaN when the as-lit curve stays below 10 pg/mL that night), h. */
  readonly litOnset_h: number;
  /** Synthesis switch-on that started the night (h; NaN when it lies before the run). */
  readonly synthesisOnset_h: number;
  /** Peak of the dim-light curve inside the night (pmol/L). */
  readonly dimPeak_pmol_L: number;
  /** Hours of the night spent awake (the suppression window). */
  readonly exposure_h: number;
  /** Suppression over the awake hours of the night (%); 0 when exposure_h is 0. */
  readonly acuteSuppression_pct: number;
  /** As-lit and dim-light areas over the awake hours of the night (pmol·h/L). */
  readonly auc_pmol_h_L: number;
  readonly dimAuc_pmol_h_L: number;
  /** 100·(1 − as-lit/dim-light area) over the whole dim-light night (not reported, see header). */
  readonly wholeNightSuppression_pct: number;
}

/** Crossing time of level `c` between boundaries i − 1 and i (linear). */
function crossAt(t: readonly number[], v: readonly number[], i: number, c: number): number {
  const t0 = t[i - 1] as number;
  const t1 = t[i] as number;
  const v0 = v[i - 1] as number;
  const v1 = v[i] as number;
  return v1 === v0 ? t1 : t0 + ((c - v0) / (v1 - v0)) * (t1 - t0);
}

/** ∫ v over [a, b] ∩ step k (linear inside the step). */
function stepArea(t: readonly number[], v: readonly number[], k: number, a: number, b: number): number {
  const t0 = t[k] as number;
  const t1 = t[k + 1] as number;
  const lo = Math.max(a, t0);
  const hi = Math.min(b, t1);
  if (!(hi > lo)) return 0;
  const v0 = v[k] as number;
  const v1 = v[k + 1] as number;
  const at = (tq: number) => (t1 > t0 ? v0 + ((v1 - v0) * (tq - t0)) / (t1 - t0) : v0);
  return 0.5 * (at(lo) + at(hi)) * (hi - lo);
}

/** The nights whose DLMO falls inside the trace. `synthesisOnsets_h`: switch-on times, increasing. */
export function melatoninNights(trace: MelatoninTrace, synthesisOnsets_h: readonly number[]): MelatoninNight[] {
  const { t_h: t, lit_pmol_L: lit, dim_pmol_L: dim, awake } = trace;
  const thr = DLMO_THRESHOLD_PG_ML * PMOL_L_PER_PG_ML;
  const nights: MelatoninNight[] = [];
  let i = 1;
  while (i < t.length) {
    if (!((dim[i - 1] as number) < thr && (dim[i] as number) >= thr)) {
      i++;
      continue;
    }
    const iOn = i;
    const onset = crossAt(t, dim, iOn, thr);
    let iOff = iOn + 1;
    while (iOff < t.length && !((dim[iOff - 1] as number) >= thr && (dim[iOff] as number) < thr)) iOff++;
    const complete = iOff < t.length;
    const end = complete ? crossAt(t, dim, iOff, thr) : (t[t.length - 1] as number);
    const last = Math.min(iOff, t.length - 1);
    // peak of the dim-light curve, and the 25 %-of-peak onset found backwards from it
    let iPeak = iOn;
    for (let k = iOn; k <= last; k++) if ((dim[k] as number) > (dim[iPeak] as number)) iPeak = k;
    const peak = dim[iPeak] as number;
    const peakInside = iPeak < last || complete;
    let dlmo25 = Number.NaN;
    if (peakInside) {
      const c = DLMO_PEAK_FRACTION * peak;
      let k = iPeak;
      while (k > 0 && (dim[k - 1] as number) >= c) k--;
      if (k > 0) dlmo25 = crossAt(t, dim, k, c);
    }
    // the as-lit curve never exceeds the dim-light one, so its rise comes at or after the DLMO
    let litOnset = Number.NaN;
    for (let k = iOn; k <= last; k++) {
      if ((lit[k - 1] as number) < thr && (lit[k] as number) >= thr) {
        litOnset = crossAt(t, lit, k, thr);
        break;
      }
    }
    let exposure = 0;
    let a = 0;
    let d = 0;
    let aNight = 0;
    let dNight = 0;
    for (let k = iOn - 1; k < last; k++) {
      const la = stepArea(t, lit, k, onset, end);
      const da = stepArea(t, dim, k, onset, end);
      aNight += la;
      dNight += da;
      if (awake[k] === true) {
        exposure += Math.max(0, Math.min(end, t[k + 1] as number) - Math.max(onset, t[k] as number));
        a += la;
        d += da;
      }
    }
    let synOn = Number.NaN;
    for (const s of synthesisOnsets_h) if (s <= onset && onset - s < 12) synOn = s;
    nights.push({
      onset_h: onset,
      end_h: end,
      complete,
      dlmo25_h: dlmo25,
      litOnset_h: litOnset,
      synthesisOnset_h: synOn,
      dimPeak_pmol_L: peak,
      exposure_h: exposure,
      acuteSuppression_pct: exposure > 0 && d > 0 ? 100 * (1 - a / d) : 0,
      auc_pmol_h_L: a,
      dimAuc_pmol_h_L: d,
      wholeNightSuppression_pct: dNight > 0 ? 100 * (1 - aNight / dNight) : Number.NaN,
    });
    i = iOff + 1;
  }
  return nights;
}

/** DLMO times of the nights (h). */
export function dlmoTimes(nights: readonly MelatoninNight[]): number[] {
  return nights.map((n) => n.onset_h);
}

/** Reported suppression per night (%): null for a night cut off by the end of the run. */
export function nightlySuppression(nights: readonly MelatoninNight[]): (number | null)[] {
  return nights.map((n) => (n.complete && Number.isFinite(n.acuteSuppression_pct) ? n.acuteSuppression_pct : null));
}
