/**
 * Pass 3 of the body-clock simulation: the slow sleepiness states over the sample grid and the
 * KSS of every sleepiness model (sleepiness-registry.ts).
 *
 * - Postnova 2018 H: Heun's method on the sample grid, split at every sleep/wake transition
 *   (homeostatPass in sleepiness-postnova.ts).
 * - Three-process model S and the time since waking: exact (S is exponential within a state), split
 *   at the same transitions.
 * Neither feeds back on the pacemaker. KSS is NaN while asleep. Times in h since t = 0.
 */
import type { SleepEpisode } from './sleep-input.js';
import { homeostatPass } from './sleepiness-postnova.js';
import { SLEEPINESS_MODEL_IDS, SLEEPINESS_MODELS, type SleepinessModelId } from './sleepiness-registry.js';
import { tpmSAsleep, tpmSAwake } from './sleepiness-tpm.js';

/** The sleepiness part of a simulation state. */
export interface SleepinessState {
  /** Postnova 2018 homeostatic sleep pressure H (nM). */
  readonly homeostat_nM: number;
  /** Three-process model S (alertness units). */
  readonly alertnessS: number;
  /** Hours since the last awakening at the state's time (Infinity if none known; 0 asleep). */
  readonly sinceWake_h: number;
}

export interface SleepinessPassInput {
  /** Sample times (h), non-decreasing. */
  readonly t_h: readonly number[];
  /** Postnova circadian drive C at the samples. */
  readonly circadianDrive: readonly number[];
  /** Body-clock phase at the samples (h since CBTmin, 24 h scale). */
  readonly phase_h: readonly number[];
  /** Sleep episodes of the run, sorted and not overlapping. */
  readonly sleepEpisodes: readonly SleepEpisode[];
  readonly start_h: number;
  readonly end_h: number;
  readonly initial: SleepinessState;
}

export interface SleepinessPassResult {
  readonly kssByModel: Record<SleepinessModelId, number[]>;
  readonly sleepPressure_nM: number[];
  readonly alertnessS: number[];
  readonly final: SleepinessState;
}

/** Sleep state at non-decreasing query times (a moving pointer over sorted episodes). */
function asleepScanner(episodes: readonly SleepEpisode[]): (t: number) => boolean {
  let k = 0;
  return (tq) => {
    while (k < episodes.length && (episodes[k] as SleepEpisode).end_h <= tq) k++;
    const e = episodes[k];
    return e !== undefined && tq >= e.start_h;
  };
}

/** Advances (S, time since waking) from ta to tb across the transitions inside (ta, tb). */
function advanceTpm(S: number, sinceWake: number, ta: number, tb: number, transitions: readonly number[], from: number, asleepAt: (t: number) => boolean): { S: number; sinceWake: number; next: number } {
  let k = from;
  while (k < transitions.length && (transitions[k] as number) <= ta) k++;
  let a = ta;
  let s = S;
  let w = sinceWake;
  while (a < tb) {
    const b = k < transitions.length && (transitions[k] as number) < tb ? (transitions[k] as number) : tb;
    if (b > a) {
      if (asleepAt(0.5 * (a + b))) {
        s = tpmSAsleep(s, b - a);
        w = 0;
      } else {
        w += b - a;
        s = tpmSAwake(s, b - a);
      }
    }
    if (b < tb) k++;
    a = b;
  }
  return { S: s, sinceWake: w, next: k };
}

export function sleepinessPass(inp: SleepinessPassInput): SleepinessPassResult {
  const { t_h, sleepEpisodes } = inp;
  const transitions = sleepEpisodes.flatMap((e) => [e.start_h, e.end_h]).sort((a, b) => a - b);
  const inEpisode = (tq: number) => sleepEpisodes.some((e) => tq >= e.start_h && tq < e.end_h);

  const homAsleep = asleepScanner(sleepEpisodes);
  const hom = homeostatPass(t_h, inp.circadianDrive, (tq) => !homAsleep(tq), transitions, inp.initial.homeostat_nM);
  let finalH = hom.final_nM;
  const lastT = t_h[t_h.length - 1] ?? inp.start_h;
  if (inp.end_h > lastT + 1e-9) {
    const c = inp.circadianDrive[inp.circadianDrive.length - 1] ?? 0.3;
    finalH = homeostatPass([lastT, inp.end_h], [c, c], (tq) => !inEpisode(tq), transitions, finalH).final_nM;
  }

  // three-process S and time since waking at each sample
  const S: number[] = [];
  const sinceWake: number[] = [];
  let s = inp.initial.alertnessS;
  let w = inp.initial.sinceWake_h;
  let tPrev = inp.start_h;
  let k = 0;
  for (const t of t_h) {
    const r = advanceTpm(s, w, tPrev, t, transitions, k, inEpisode);
    s = r.S;
    w = r.sinceWake;
    k = r.next;
    tPrev = t;
    S.push(s);
    sinceWake.push(w);
  }
  const tail = advanceTpm(s, w, tPrev, Math.max(tPrev, inp.end_h), transitions, k, inEpisode);

  // an episode cut off by the end of the run still covers its end (no awakening there)
  const kssAsleep = asleepScanner(sleepEpisodes);
  const last = sleepEpisodes[sleepEpisodes.length - 1];
  const asleepAtEnd = last !== undefined && last.end_h >= inp.end_h - 1e-9;
  const asleep = t_h.map((tq) => kssAsleep(tq) || (asleepAtEnd && tq >= inp.end_h - 1e-9));
  const kssByModel = {} as Record<SleepinessModelId, number[]>;
  for (const id of SLEEPINESS_MODEL_IDS) {
    const m = SLEEPINESS_MODELS[id];
    kssByModel[id] = t_h.map((_t, i) =>
      asleep[i] === true
        ? Number.NaN
        : m.kss({
            H_nM: hom.H_nM[i] as number,
            postnovaC: inp.circadianDrive[i] as number,
            tpmS: S[i] as number,
            phase_h: inp.phase_h[i] as number,
            sinceWake_h: sinceWake[i] as number,
          }),
    );
  }
  return {
    kssByModel,
    sleepPressure_nM: hom.H_nM,
    alertnessS: S,
    final: { homeostat_nM: finalH, alertnessS: tail.S, sinceWake_h: asleepAtEnd ? 0 : tail.sinceWake },
  };
}
