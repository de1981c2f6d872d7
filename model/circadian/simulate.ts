/**
 * Body-clock simulation driver.
 *
 * Pass 1 — pacemaker + its Process L (and, for free sleep, the HCL homeostat). By default the
 * time axis is split where sleep state changes (prescribed sleep/wake, alarms, wake windows,
 * predicted sleep switches); a stretch whose light changes often (more than 10 times an hour on
 * average: measured logs, daylight) is integrated through every change of light (through-light.ts:
 * Process L in closed form, the oscillator by the drive-moment stepper), a stretch of few changes
 * is split at each and integrated by odex piece by piece, which is then cheaper. With
 * an explicit integrator (odex at other tolerances, RK4) or `method: 'restart-at-light-changes'`
 * the axis is also split at every light breakpoint, so the right-hand side is smooth in each
 * piece (the reference method). Phase events are located on the dense output by bisection: the
 * x minimum (root of dx/dt; one per cycle, the deepest), the melatonin synthesis angles and, for
 * free sleep, the threshold crossings.
 * Pass 2 — plasma melatonin from the synthesis switch times (melatonin-pass.ts).
 * Pass 3 — sleepiness states and the KSS of every sleepiness model on the sample grid
 * (sleepiness-pass.ts; models in sleepiness-registry.ts). Neither feeds
 * back on the pacemaker, so the split is exact up to the passes' own discretisation.
 *
 * Times in h since t = 0 (local midnight of day 0); light in native lux after conversion.
 */
import type { Integrator } from '../solver/integrator.js';
import { createOdexIntegrator } from '../solver/odex-integrator.js';
import { nativeLightSeries } from './calibration.js';
import { calibrationEyelidTransmission, receivedLightSeries } from './eyes-closed-light.js';
import { scaledLightSeries, segmentIndexAt, type LightSeries } from './light-series.js';
import { cycleAngleAtTime, cycleTimeAtAngle, darkLimitCycle, equivalentState, type LimitCycleTable } from './limit-cycle.js';
import { MARKER_REFINE_MAX_SPAN_H, refinedMinimum } from './marker-refine.js';
import { integrateThroughLight, minimumThroughLight, type ThroughLightPiece } from './through-light.js';
import { melatoninPass, type MelatoninNight, type MelatoninState, type SynthesisSwitch } from './melatonin-pass.js';
import { ST_HILAIRE_MELATONIN as MEL } from './melatonin-sthilaire.js';
import type { Pacemaker } from './pacemaker.js';
import { createFjkCubic } from './fjk-cubic.js';
import { createJfkX7 } from './jfk-x7.js';
import { createPacemaker, isPacemakerId } from './registry.js';
import { HCL_PRESETS, hclCircadianModulation, type HclParams } from './sleep-switch-hcl.js';
import { HOMEOSTAT_SEED_NM, postnovaCircadianDrive } from './sleepiness-postnova.js';
import { sleepinessPass } from './sleepiness-pass.js';
import { HEADLINE_SLEEPINESS_ID, type SleepinessModelId } from './sleepiness-registry.js';
import { TPM_S_SEED } from './sleepiness-tpm.js';
import { normalisedEpisodes, type SleepEpisode, type SleepSpec } from './sleep-input.js';

const DEG = Math.PI / 180;
const BISECTION_ITERATIONS = 40;
/** Tolerance for landing on a light breakpoint (h, ≈ 4 ns). */
const BREAK_TOL_H = 1e-12;
/**
 * Minima of x closer than this belong to one cycle, and the deepest is the day's marker (h).
 * Light in the biological night (a bright break on a night shift) can make x turn up for a few
 * minutes and down again, a local minimum hours before or after the cycle's lowest point;
 * consecutive cycles' minima are about 24 h apart (at most a few hours less after a shift).
 */
const MARKER_CYCLE_H = 8;
/**
 * Light changes per hour above which a stretch is integrated through light rather than restarted
 * at every change. Measured on the 2-core machine (docs/performance/circadian.md): a restart of
 * the reference solver costs about 6 µs, a day through light about 1.5–2 ms, so restarts cost more
 * from roughly 12 changes an hour (per-minute logs and daylight: 40–60; a routine with a few
 * lighting changes a day: under 3).
 */
const THROUGH_LIGHT_MIN_CHANGES_PER_H = 10;

/** Average number of light breakpoints per hour in [t0, t1) (a periodic series repeats its day). */
function lightChangesPerHour(series: LightSeries, t0: number, t1: number, periodic: boolean): number {
  const span = t1 - t0;
  if (!(span > 0)) return 0;
  if (periodic) return series.start_h.length / 24;
  const a = segmentIndexAt(series, t0);
  const b = segmentIndexAt(series, t1);
  return (b - a) / span;
}

export interface SimulationOptions {
  readonly model: Pacemaker;
  /** Light at the open eye (melanopic EDI or native lux), read while awake. */
  readonly light: LightSeries;
  /**
   * Light behind the closed eyelids (melanopic EDI or native lux), read while asleep; same time
   * axis and periodicity as `light`. Default: `light` × `eyelidTransmission`.
   */
  readonly lightEyesClosed?: LightSeries;
  /** When true, light(t) = light(t mod 24) (a repeated day, used for entrainment). */
  readonly periodicLight?: boolean;
  readonly sleep: SleepSpec;
  readonly start_h?: number;
  readonly end_h: number;
  /** Continue from this state (its time is the start). Default: the model's seed. */
  readonly initial?: SimState;
  /** Overrides the pacemaker's own light-sensitivity multiplier. */
  readonly lightSensitivity?: number;
  /**
   * Melanopic transmittance of the closed eyelids (0–1) used without `lightEyesClosed`; default
   * that of the calibration source CIE FL2 (0.30 %, eyes-closed-light.ts).
   */
  readonly eyelidTransmission?: number;
  /**
   * Integrator of the restart-at-every-light-change method. When given (odex at other
   * tolerances, fixed-step RK4), the body clock restarts it at every change of light; by
   * default the body clock is integrated through light (through-light.ts).
   */
  readonly integrator?: Integrator;
  /** 'through-light' (default without `integrator`) or 'restart-at-light-changes' (the reference). */
  readonly method?: 'through-light' | 'restart-at-light-changes';
  /** Spacing of stored samples (h); default 0.25. */
  readonly sampleStep_h?: number;
  /** Sleepiness model whose KSS fills `samples.kss` (default the headline model). */
  readonly sleepinessModel?: SleepinessModelId;
}

/** Everything needed to continue a simulation (times in h since t = 0). */
export interface SimState {
  readonly t_h: number;
  /** Pacemaker variables (x, xc, n or R, ψ, n), then the HCL homeostat in free-sleep mode. */
  readonly y: readonly number[];
  readonly awake: boolean;
  readonly melatonin: MelatoninState;
  /** Synthesis switches found before t_h that fall after it (0.97 h delay). */
  readonly pendingSwitches: readonly SynthesisSwitch[];
  /** Postnova 2018 homeostatic sleep pressure H (nM). */
  readonly homeostat_nM: number;
  /** Three-process model S (alertness units). */
  readonly alertnessS: number;
  /** Hours since the last awakening (Infinity if none known; 0 while asleep). */
  readonly sinceWake_h: number;
}

export interface SimulationSamples {
  readonly t_h: number[];
  /** First two pacemaker variables (x, xc or R, ψ). */
  readonly s0: number[];
  readonly s1: number[];
  readonly awake: boolean[];
  /** HCL homeostat (free sleep only; NaN otherwise). */
  readonly hclPressure: number[];
  readonly plasmaMelatonin_pmol_L: number[];
  readonly dimMelatonin_pmol_L: number[];
  /** Postnova 2018 sleep pressure H (nM) and circadian drive C. */
  readonly sleepPressure_nM: number[];
  readonly circadianDrive: number[];
  /** KSS of the chosen sleepiness model (default the headline) while awake; NaN asleep. */
  readonly kss: number[];
  /** KSS of every sleepiness model (sleepiness-registry.ts) while awake; NaN asleep. */
  readonly kssByModel: Record<SleepinessModelId, number[]>;
}

export interface SimulationRun {
  readonly model: Pacemaker;
  readonly start_h: number;
  readonly end_h: number;
  readonly xmin_h: number[];
  readonly cbtmin_h: number[];
  readonly synOn_h: number[];
  readonly synOff_h: number[];
  readonly nights: MelatoninNight[];
  readonly sleepEpisodes: SleepEpisode[];
  readonly samples: SimulationSamples;
  readonly final: SimState;
  readonly rhsEvaluations: number;
  readonly steps: number;
  readonly integrations: number;
}

function wrap(a: number): number {
  let d = a % (2 * Math.PI);
  if (d > Math.PI) d -= 2 * Math.PI;
  if (d <= -Math.PI) d += 2 * Math.PI;
  return d;
}

export interface PhaseTools {
  /** Synthesis on/off angles of this pacemaker (rad, clockwise convention). */
  readonly synOn: number;
  readonly synOff: number;
  readonly own: LimitCycleTable;
  readonly cubic: LimitCycleTable;
  readonly x7: LimitCycleTable;
}

const toolsCache = new Map<string, PhaseTools>();

/**
 * St Hilaire's synthesis angles (−65.3°, −166.2°, x⁷ oscillator) and, for the other pacemakers,
 * the angles at the same time since CBTmin on their own darkness cycle.
 */
export function phaseTools(model: Pacemaker): PhaseTools {
  const key = model.id;
  let t = toolsCache.get(key);
  if (t === undefined) {
    const reference = isPacemakerId(model.id) ? createPacemaker(model.id) : model;
    const x7 = darkLimitCycle(createJfkX7());
    const own = darkLimitCycle(reference);
    let on = MEL.synOnAngle_deg * DEG;
    let off = MEL.synOffAngle_deg * DEG;
    if (model.oscillator !== 'x7') {
      const carry = (a: number) => cycleAngleAtTime(own, (cycleTimeAtAngle(x7, a) / x7.period_h) * own.period_h);
      on = carry(on);
      off = carry(off);
    }
    t = { synOn: on, synOff: off, own, cubic: darkLimitCycle(createFjkCubic()), x7 };
    toolsCache.set(key, t);
  }
  return t;
}

/** Cubic-oscillator (x, xc) equivalent to a pacemaker state (identity for the cubic models). */
export function cubicEquivalent(model: Pacemaker, tools: PhaseTools, y: ArrayLike<number>): [number, number] {
  if (model.oscillator === 'cubic') return [y[0] as number, y[1] as number];
  return equivalentState(model, tools.own, y, tools.cubic);
}

/** x⁷-oscillator (x, xc) equivalent to a pacemaker state (identity for the x⁷ models). */
export function x7Equivalent(model: Pacemaker, tools: PhaseTools, y: ArrayLike<number>): [number, number] {
  if (model.oscillator === 'x7') return [y[0] as number, y[1] as number];
  return equivalentState(model, tools.own, y, tools.x7);
}

/** Number of ODE variables for a model and sleep mode. */
export function odeSize(model: Pacemaker, sleep: SleepSpec): number {
  return model.stateSize + (sleep.mode === 'free' ? 1 : 0);
}

/**
 * A state from pacemaker variables (x, xc, n …): melatonin empty, synthesis branch from the
 * angle (on inside the synthesis arc), n of the suppression Process L at 0 (dark-adapted).
 */
export function stateFromPacemaker(model: Pacemaker, pacemaker: readonly number[], sleep: SleepSpec, t_h: number, awake: boolean): SimState {
  if (pacemaker.length !== model.stateSize) throw new Error(`${model.id} needs ${model.stateSize} state variables (${model.stateNames.join(', ')}), got ${pacemaker.length}`);
  const tools = phaseTools(model);
  const a = model.angle(pacemaker);
  const on = wrap(a - tools.synOn) <= 0 && wrap(a - tools.synOff) > 0;
  const y = [...pacemaker];
  if (sleep.mode === 'free') y.push(sleep.initialPressure ?? 13);
  return {
    t_h,
    y,
    awake,
    melatonin: { h1: 0, h2: 0, h1Dim: 0, h2Dim: 0, nSuppression: 0, on, since_h: -Infinity, atSwitch: on ? MEL.A_pmol_L_min : 0 },
    pendingSwitches: [],
    homeostat_nM: HOMEOSTAT_SEED_NM,
    alertnessS: TPM_S_SEED,
    sinceWake_h: awake ? Infinity : 0,
  };
}

function prescribedAwake(episodes: readonly SleepEpisode[], t: number): boolean {
  for (const e of episodes) if (t >= e.start_h && t < e.end_h) return false;
  return true;
}

function nextPrescribedTransition(episodes: readonly SleepEpisode[], t: number): { t_h: number; awake: boolean } | undefined {
  for (const e of episodes) {
    if (e.start_h > t + 1e-12) return { t_h: e.start_h, awake: false };
    if (e.end_h > t + 1e-12) return { t_h: e.end_h, awake: true };
  }
  return undefined;
}

type Dense = (component: number, t: number) => number;

/** Runs the simulation. Throws on inconsistent input (the message names the field). */
export function simulate(opts: SimulationOptions): SimulationRun {
  const model = opts.model;
  const light = nativeLightSeries(opts.light);
  const periodic = opts.periodicLight === true;
  const free = opts.sleep.mode === 'free';
  const hcl: HclParams = opts.sleep.mode === 'free' ? (opts.sleep.hcl ?? HCL_PRESETS.age30) : HCL_PRESETS.age30;
  const alarm = opts.sleep.mode === 'free' ? opts.sleep.alarm_h : undefined;
  const episodes = opts.sleep.mode === 'prescribed' ? normalisedEpisodes(opts.sleep.episodes) : [];
  const tools = phaseTools(model);
  const sens = opts.lightSensitivity ?? model.lightSensitivity;
  if (!(sens > 0)) throw new Error(`lightSensitivity must be > 0 (got ${sens})`);
  const eyelid = opts.eyelidTransmission ?? calibrationEyelidTransmission();
  if (!(eyelid >= 0 && eyelid <= 1)) throw new Error(`eyelidTransmission must be within 0–1 (got ${eyelid})`);
  const lightClosed = opts.lightEyesClosed === undefined ? scaledLightSeries(light, eyelid, 'native_lx') : nativeLightSeries(opts.lightEyesClosed);
  // Wake windows (free sleep): held awake inside, a possible sleep onset at each end.
  const wakeWindows = opts.sleep.mode === 'free' ? normalisedEpisodes(opts.sleep.wakeWindows ?? [], 'wake window') : [];
  const integrator = opts.integrator ?? createOdexIntegrator();
  const throughLight = (opts.method ?? (opts.integrator === undefined ? 'through-light' : 'restart-at-light-changes')) === 'through-light';
  let throughLightStep: number | undefined;
  const sampleStep = opts.sampleStep_h ?? 0.25;
  const t0 = opts.initial?.t_h ?? opts.start_h ?? 0;
  const tEnd = opts.end_h;
  if (!(tEnd > t0)) throw new Error(`end (${tEnd} h) must be after start (${t0} h)`);
  const size = odeSize(model, opts.sleep);
  const hclIndex = free ? model.stateSize : -1;

  const initial = opts.initial ?? stateFromPacemaker(model, model.seedState, opts.sleep, t0, prescribedAwake(episodes, t0));
  if (initial.y.length !== size) throw new Error(`initial state has ${initial.y.length} variables, expected ${size} for ${model.id} (${opts.sleep.mode} sleep)`);

  const xmin: number[] = [];
  const cbtmin: number[] = [];
  const synOn: number[] = [];
  const synOff: number[] = [];
  const switches: SynthesisSwitch[] = [...initial.pendingSwitches];
  const sleepEpisodes: SleepEpisode[] = [];
  const samples = { t_h: [] as number[], s0: [] as number[], s1: [] as number[], awake: [] as boolean[], hclPressure: [] as number[] };
  let awake = free ? initial.awake : prescribedAwake(episodes, t0);
  let sleepStart = awake ? Number.NaN : t0;
  let rhsEvals = 0;
  let steps = 0;
  let integrations = 0;
  let nextSample = Math.ceil(t0 / sampleStep - 1e-9) * sampleStep;
  let lastDxSign = 0;

  // Times within BREAK_TOL_H of a breakpoint count as on it: a breakpoint shifted by whole days
  // (24 k + s − 24 k) may come back a few ulps off.
  const dayStartOf = (t: number) => (periodic ? 24 * Math.floor((t + BREAK_TOL_H) / 24) : 0);
  const segmentAt = (series: LightSeries, t: number, d0: number) => segmentIndexAt(series, t - d0 + BREAK_TOL_H);
  const nextLightBreak = (series: LightSeries, t: number): number => {
    const d0 = dayStartOf(t);
    const idx = segmentAt(series, t, d0);
    const nxt = series.start_h[idx + 1];
    if (!periodic) return nxt ?? Infinity;
    return nxt !== undefined && nxt < 24 ? d0 + nxt : d0 + 24;
  };
  const nextAlarm = (t: number): number => (alarm === undefined ? Infinity : alarm + 24 * (Math.floor((t - alarm) / 24 + 1e-12) + 1));
  const heldAwakeAt = (t: number): boolean => wakeWindows.some((w) => t >= w.start_h - 1e-9 && t < w.end_h - 1e-9);
  const windowEndsAt = (t: number): boolean => wakeWindows.some((w) => Math.abs(w.end_h - t) < 1e-9);
  const nextWindowEdge = (t: number): number => {
    for (const w of wakeWindows) {
      if (w.start_h > t + 1e-9) return w.start_h;
      if (w.end_h > t + 1e-9) return w.end_h;
    }
    return Infinity;
  };
  /** ≥ 0 once the HCL state y has reached the threshold that ends the sleep/wake state `awakeNow`. */
  const hclGapOf = (yv: readonly number[], awakeNow: boolean): number => {
    const [cx, cxc] = cubicEquivalent(model, tools, yv);
    const c = hclCircadianModulation(hcl, cx, cxc);
    const h = yv[hclIndex] as number;
    return awakeNow ? h - (hcl.upper + c) : hcl.lower + c - h;
  };
  /** Candidate x minima (time, x there); one per cycle is kept, the deepest (MARKER_CYCLE_H). */
  const minima: { t: number; x: number }[] = [];
  const addMarker = (tm: number, depth = 0) => {
    const last = minima[minima.length - 1];
    if (last !== undefined && tm - last.t < MARKER_CYCLE_H) {
      if (depth < last.x) minima[minima.length - 1] = { t: tm, x: depth };
      return;
    }
    minima.push({ t: tm, x: depth });
  };
  const addSample = (t: number, get: (i: number) => number) => {
    samples.t_h.push(t);
    samples.s0.push(get(0));
    samples.s1.push(get(1));
    samples.awake.push(awake);
    samples.hclPressure.push(hclIndex >= 0 ? get(hclIndex) : Number.NaN);
  };

  if (free && !awake && heldAwakeAt(t0)) {
    awake = true;
    sleepStart = Number.NaN;
  }
  let t = t0;
  let y = [...initial.y];
  if (Math.abs(nextSample - t) < 1e-9) {
    const y0 = y;
    addSample(t, (i) => y0[i] as number);
    nextSample += sampleStep;
  }
  const dydt = new Array<number>(size).fill(0);

  while (t < tEnd - 1e-12) {
    const d0 = dayStartOf(t);
    // open eyes awake, closed eyelids asleep
    const lit = awake ? light : lightClosed;
    const idx = segmentAt(lit, t, d0);
    const smooth = lit.smooth?.[idx];
    const level = lit.level[idx] as number;
    const gate = sens;
    const wake = awake ? 1 : 0;
    const held = free && awake && heldAwakeAt(t);
    const nextEp = free ? undefined : nextPrescribedTransition(episodes, t);
    let tStop = Math.min(tEnd, nextEp?.t_h ?? Infinity);
    if (free && !awake) tStop = Math.min(tStop, nextAlarm(t));
    if (free) tStop = Math.min(tStop, nextWindowEdge(t));
    // Through light only where light changes often enough to make restarts the larger cost.
    const throughThisPiece = throughLight && lightChangesPerHour(lit, t, tStop, periodic) > THROUGH_LIGHT_MIN_CHANGES_PER_H;
    if (!throughThisPiece) tStop = Math.min(tStop, nextLightBreak(lit, t));

    const rhs = (tq: number, yq: readonly number[]): number[] => {
      const I = gate * (smooth === undefined ? level : Math.max(0, smooth(tq - d0)));
      // odex and the RK4 integrator copy the derivative out at once, so one array is reused
      model.derivatives(yq, I, dydt);
      if (hclIndex >= 0) dydt[hclIndex] = (hcl.mu * wake - (yq[hclIndex] as number)) / hcl.chi_h;
      return dydt;
    };
    // Only a stretch integrated through light needs it (restarted pieces are many and short).
    const piece: ThroughLightPiece | null = throughThisPiece
      ? {
          model,
          light: lit,
          gain: sens,
          ...(periodic ? { period_h: 24 } : {}),
          size,
          homeostatRate: hclIndex >= 0 ? (yq) => (hcl.mu * wake - (yq[hclIndex] as number)) / hcl.chi_h : null,
        }
      : null;
    const pair = [0, 0];
    const angleAt = (dense: Dense, tq: number) => {
      pair[0] = dense(0, tq);
      pair[1] = dense(1, tq);
      return model.angle(pair);
    };
    /** Crossing of a clockwise target angle inside [ta, tb], given the angles at both ends. */
    const crossing = (dense: Dense, ta: number, tb: number, angleA: number, angleB: number, target: number): number | undefined => {
      const da = wrap(angleA - target);
      const db = wrap(angleB - target);
      if (!(da > 0 && db <= 0 && da - db < Math.PI)) return undefined;
      let lo = ta;
      let hi = tb;
      for (let k = 0; k < BISECTION_ITERATIONS; k++) {
        const mid = 0.5 * (lo + hi);
        if (wrap(angleAt(dense, mid) - target) > 0) lo = mid;
        else hi = mid;
      }
      return 0.5 * (lo + hi);
    };
    /** ≥ 0 once the state has crossed the threshold that ends the current sleep/wake state. */
    const yAt = new Array<number>(size).fill(0);
    const hclGap = (dense: Dense, tq: number): number => {
      for (let i = 0; i < size; i++) yAt[i] = dense(i, tq);
      return hclGapOf(yAt, awake);
    };

    let switchAt: number | undefined;
    let angleOld = model.angle(y);
    let yStepStart: readonly number[] = [...y];
    const tPiece = t;
    const yPiece = [...y];
    const observer = (tOld: number, tNew: number, yEnd: readonly number[], dense: Dense): number | undefined => {
      steps++;
      const yA = yStepStart;
      yStepStart = [...yEnd];
      const angleA = angleOld;
      const angleB = model.angle(yEnd);
      angleOld = angleB;
      while (nextSample <= tNew + 1e-9 && nextSample <= tEnd + 1e-9) {
        const ts = nextSample;
        addSample(ts, (i) => dense(i, ts));
        nextSample += sampleStep;
      }
      if (model.marker.kind === 'x-min') {
        // sign changes of the interpolant's slope (one-sided differences inside the step).
        // Not the right-hand side at interpolated states: under bright light n of Process L
        // relaxes within minutes, its interpolant is poor and so would be dx/dt = f(x, xc, n).
        const delta = Math.min(1e-4, (tNew - tOld) / 4);
        const sa = Math.sign(dense(0, tOld + delta) - dense(0, tOld));
        const sb = Math.sign(dense(0, tNew) - dense(0, tNew - delta));
        if (lastDxSign < 0 && sa > 0 && dense(0, tOld) < 0) addMarker(tOld, dense(0, tOld));
        else if (sa < 0 && sb > 0) {
          const der = (tq: number) => dense(0, tq + delta) - dense(0, tq - delta);
          let lo = tOld + delta;
          let hi = tNew - delta;
          for (let k = 0; k < BISECTION_ITERATIONS; k++) {
            const mid = 0.5 * (lo + hi);
            if (der(mid) < 0) lo = mid;
            else hi = mid;
          }
          // the interpolant finds the step; the piece integrated again places the minimum
          const fromPiece = tOld - tPiece <= MARKER_REFINE_MAX_SPAN_H;
          let tm: number;
          let depth: number;
          if (piece !== null) {
            const refined = minimumThroughLight(piece, tOld, yA, tNew, 0);
            tm = refined?.t ?? 0.5 * (lo + hi);
            depth = refined?.value ?? dense(0, tm);
          } else {
            tm = (fromPiece ? refinedMinimum(rhs, tPiece, yPiece, tNew, 0, tOld) : refinedMinimum(rhs, tOld, yA, tNew, 0)) ?? 0.5 * (lo + hi);
            depth = dense(0, tm);
          }
          if (depth < 0) addMarker(tm, depth);
        }
        lastDxSign = sb;
      } else {
        const tc = crossing(dense, tOld, tNew, angleA, angleB, model.marker.angle_rad);
        if (tc !== undefined) addMarker(tc);
      }
      const on = crossing(dense, tOld, tNew, angleA, angleB, tools.synOn);
      if (on !== undefined) {
        synOn.push(on + MEL.synDelay_h);
        switches.push({ t_h: on + MEL.synDelay_h, on: true });
      }
      const off = crossing(dense, tOld, tNew, angleA, angleB, tools.synOff);
      if (off !== undefined) {
        synOff.push(off + MEL.synDelay_h);
        switches.push({ t_h: off + MEL.synDelay_h, on: false });
      }
      if (hclIndex >= 0 && !held && hclGap(dense, tNew) >= 0 && hclGap(dense, tOld) < 0) {
        let lo = tOld;
        let hi = tNew;
        for (let k = 0; k < BISECTION_ITERATIONS; k++) {
          const mid = 0.5 * (lo + hi);
          if (hclGap(dense, mid) < 0) lo = mid;
          else hi = mid;
        }
        switchAt = hi;
        return hi;
      }
      return undefined;
    };

    const dense = free ? undefined : [0, 1];
    let res;
    if (piece !== null) {
      const through = integrateThroughLight(piece, t, y, tStop, observer, throughLightStep);
      throughLightStep = through.nextStep;
      res = through;
    } else res = integrator.integrate(rhs, t, y, tStop, observer, dense);
    integrations++;
    rhsEvals += res.rhsEvaluations;
    const tNew = res.t;
    y = res.y;
    let awakeNext = awake;
    if (free) {
      if (switchAt !== undefined && res.stoppedEarly) awakeNext = !awake;
      if (!awake && Math.abs(nextAlarm(t) - tNew) < 1e-9) awakeNext = true;
      // a wake window starts: wake; one ends with the pressure already past the threshold: sleep
      if (!awakeNext && heldAwakeAt(tNew)) awakeNext = true;
      else if (awakeNext && !heldAwakeAt(tNew) && windowEndsAt(tNew) && hclGapOf(y, true) >= 0) awakeNext = false;
    } else if (nextEp !== undefined && Math.abs(nextEp.t_h - tNew) < 1e-9) awakeNext = nextEp.awake;
    if (awakeNext !== awake) {
      if (!awakeNext) sleepStart = tNew;
      else if (tNew > sleepStart) sleepEpisodes.push({ start_h: sleepStart, end_h: tNew });
      awake = awakeNext;
    }
    if (!(tNew > t)) throw new Error(`simulation made no progress at t = ${t} h`);
    t = tNew;
  }
  if (!awake && tEnd > sleepStart) sleepEpisodes.push({ start_h: sleepStart, end_h: tEnd });
  for (const m of minima) {
    xmin.push(m.t);
    cbtmin.push(m.t + model.marker.cbtminOffset_h);
  }

  // Pass 2: melatonin over the same period, with the light received under the sleep just found
  // (open eyes awake, closed eyelids asleep).
  const mel = melatoninPass({
    light: receivedLightSeries(light, lightClosed, sleepEpisodes, t0, tEnd, periodic),
    periodicLight: false,
    lightSensitivity: sens,
    eyelidTransmission: 1,
    sleep: sleepEpisodes,
    switches: switches.filter((s) => s.t_h <= tEnd),
    start_h: t0,
    end_h: tEnd,
    initial: initial.melatonin,
    sampleStep_h: sampleStep,
  });

  // Pass 3: sleepiness states and KSS on the sample grid.
  const C = samples.t_h.map((_t, i) => {
    const [X, Y] = x7Equivalent(model, tools, [samples.s0[i] as number, samples.s1[i] as number]);
    return postnovaCircadianDrive(X, Y);
  });
  const xy = [0, 0];
  const phase_h = samples.t_h.map((_t, i) => {
    xy[0] = samples.s0[i] as number;
    xy[1] = samples.s1[i] as number;
    return (24 * cycleTimeAtAngle(tools.own, model.angle(xy))) / tools.own.period_h;
  });
  const sleepy = sleepinessPass({
    t_h: samples.t_h,
    circadianDrive: C,
    phase_h,
    sleepEpisodes,
    start_h: t0,
    end_h: tEnd,
    initial: { homeostat_nM: initial.homeostat_nM, alertnessS: initial.alertnessS, sinceWake_h: initial.sinceWake_h },
  });

  const final: SimState = {
    t_h: tEnd,
    y,
    awake,
    melatonin: mel.final,
    pendingSwitches: switches.filter((s) => s.t_h > tEnd),
    homeostat_nM: sleepy.final.homeostat_nM,
    alertnessS: sleepy.final.alertnessS,
    sinceWake_h: sleepy.final.sinceWake_h,
  };
  return {
    model,
    start_h: t0,
    end_h: tEnd,
    xmin_h: xmin,
    cbtmin_h: cbtmin,
    synOn_h: synOn,
    synOff_h: synOff,
    nights: mel.nights,
    sleepEpisodes,
    samples: {
      ...samples,
      plasmaMelatonin_pmol_L: mel.plasma_pmol_L,
      dimMelatonin_pmol_L: mel.plasmaDim_pmol_L,
      sleepPressure_nM: sleepy.sleepPressure_nM,
      circadianDrive: C,
      kss: sleepy.kssByModel[opts.sleepinessModel ?? HEADLINE_SLEEPINESS_ID],
      kssByModel: sleepy.kssByModel,
    },
    final,
    rhsEvaluations: rhsEvals,
    steps,
    integrations,
  };
}
