/**
 * Second pass of the simulation: plasma melatonin (St Hilaire et al. 2007 J Pineal Res; see
 * melatonin-sthilaire.ts) driven by the synthesis switch times found on the pacemaker trajectory
 * and by its own Process L (MELATONIN_PROCESS_L). Melatonin does not feed back on the pacemaker
 * in this model, so it is integrated after the pacemaker pass.
 *
 * Method: the time axis is split at light breakpoints, sleep/wake and synthesis switches; in
 * each piece the light is constant (or smooth), so n of Process L relaxes exponentially and the
 * linear pineal/plasma pair is advanced by its exact exponential propagator, with the forcing A'(t)
 * taken at the step midpoint (second order in the step): 1-minute steps for the first 30 min of
 * each piece, where the transients are, 6-minute steps after.
 * An unsuppressed "dim-light" pair (m = 0) runs alongside: the curve the person would show in
 * dim light, from which the DLMO and the nights are read (melatonin-nights.ts).
 */
import { segmentIndexAt, type LightSeries } from './light-series.js';
import { ST_HILAIRE_MELATONIN as MEL, synthesisRate } from './melatonin-sthilaire.js';
import { melatoninNights, type MelatoninNight } from './melatonin-nights.js';
import { PROCESS_L_SH07, lightActivation_per_min, type ProcessLParams } from './process-l.js';

/**
 * Process L behind the suppression term m·B̂ (St Hilaire et al. 2007 J Theor Biol, SH07, with the
 * paper's m = 7). The melatonin paper cites Kronauer 1999 (K99) for its Process L; both sets were
 * run in the Zeitzer et al. 2000 protocol (6.5 h centred 3.5 h before CBTmin, suppression over the
 * exposure; tests/circadian/published-checks.test.ts). K99 suppresses 12 % at 1 lx and 32 % at
 * 10 lx, half-maximum 27 lx; SH07, with its I/(I + 100) low-light threshold, suppresses < 1 % at
 * 3 lx, saturates near 200 lx as the data do, half-maximum 48 lx. Zeitzer's data give 106 lx and
 * St Hilaire's model paper reports 98 lx: with either set the model is about twice as sensitive
 * as the data (model limitation, docs/validation/circadian.md). The recalibrated suppression of
 * Tekieh et al. 2020 (half-maximum 0.031 W/m² melanopic, about 38–41 lx of the cool-white
 * calibration source) is no closer and belongs to another melatonin model; it is not used.
 * SH07 is the closer published set, and the front end of the default pacemaker.
 */
export const MELATONIN_PROCESS_L: ProcessLParams = PROCESS_L_SH07;
import type { SleepEpisode } from './sleep-input.js';

/** Step for the first MELATONIN_FINE_SPAN_H of every piece (after a light change, sleep/wake or synthesis switch): 1 min. */
export const MELATONIN_STEP_H = 1 / 60;
/** Span of fine steps at the start of a piece (h); the fastest transients (λ = 35 h⁻¹, bright-light n) are over by then. */
export const MELATONIN_FINE_SPAN_H = 0.5;
/** Step in the rest of a piece (h). */
export const MELATONIN_COARSE_STEP_H = 0.1;

export interface MelatoninState {
  /** Pineal and plasma melatonin with light (pmol/L). */
  readonly h1: number;
  readonly h2: number;
  /** The same without light suppression (pmol/L). */
  readonly h1Dim: number;
  readonly h2Dim: number;
  /** n of the Process L behind the suppression term (MELATONIN_PROCESS_L). */
  readonly nSuppression: number;
  /** Current synthesis branch: on since `since_h`, or decaying from `atSwitch` since `since_h`. */
  readonly on: boolean;
  readonly since_h: number;
  readonly atSwitch: number;
}

export interface SynthesisSwitch {
  readonly t_h: number;
  readonly on: boolean;
}

export interface MelatoninPassInput {
  readonly light: LightSeries; // native lux
  readonly periodicLight: boolean;
  readonly lightSensitivity: number;
  readonly eyelidTransmission: number;
  readonly sleep: readonly SleepEpisode[];
  readonly switches: readonly SynthesisSwitch[];
  readonly start_h: number;
  readonly end_h: number;
  readonly initial: MelatoninState;
  readonly sampleStep_h: number;
}

export type { MelatoninNight } from './melatonin-nights.js';

export interface MelatoninPassResult {
  readonly final: MelatoninState;
  readonly sample_t_h: number[];
  readonly plasma_pmol_L: number[];
  readonly plasmaDim_pmol_L: number[];
  readonly nights: MelatoninNight[];
}

const A_RATE = 60 * MEL.betaIP_per_min; // h⁻¹
const C_RATE = 60 * MEL.betaCP_per_min; // h⁻¹

export function melatoninPass(inp: MelatoninPassInput): MelatoninPassResult {
  const { light, start_h: t0, end_h: tEnd } = inp;
  // breakpoints
  const cuts: number[] = [t0, tEnd];
  const inRange = (t: number) => t > t0 && t < tEnd;
  if (inp.periodicLight) {
    for (let d = Math.floor(t0 / 24); d * 24 < tEnd; d++) for (const s of light.start_h) if (inRange(d * 24 + s)) cuts.push(d * 24 + s);
    for (let d = Math.floor(t0 / 24); d * 24 < tEnd; d++) if (inRange(d * 24)) cuts.push(d * 24);
  } else for (const s of light.start_h) if (inRange(s)) cuts.push(s);
  for (const e of inp.sleep) {
    if (inRange(e.start_h)) cuts.push(e.start_h);
    if (inRange(e.end_h)) cuts.push(e.end_h);
  }
  for (const s of inp.switches) if (inRange(s.t_h)) cuts.push(s.t_h);
  cuts.sort((a, b) => a - b);

  let { h1, h2, h1Dim, h2Dim, nSuppression: n, on, since_h: since, atSwitch } = inp.initial;
  const switches = [...inp.switches].sort((a, b) => a.t_h - b.t_h);
  let sw = 0;
  while (sw < switches.length && (switches[sw] as SynthesisSwitch).t_h <= t0) sw++;
  let ep = 0;
  const sample_t: number[] = [];
  const plasma: number[] = [];
  const plasmaDim: number[] = [];
  let nextSample = Math.ceil(t0 / inp.sampleStep_h - 1e-9) * inp.sampleStep_h;
  const onsets: number[] = [];
  // fine trace for the nights: values at every step boundary, sleep state per step
  const traceT: number[] = [t0];
  const traceLit: number[] = [h2];
  const traceDim: number[] = [h2Dim];
  const traceAwake: boolean[] = [];
  const P = MELATONIN_PROCESS_L;
  const beta = P.beta_per_min;

  const record = (t: number, ta: number, a2: number, a2d: number, b2: number, b2d: number, tb: number) => {
    const f = tb > ta ? (t - ta) / (tb - ta) : 1;
    sample_t.push(t);
    plasma.push(a2 + f * (b2 - a2));
    plasmaDim.push(a2d + f * (b2d - a2d));
  };
  if (Math.abs(nextSample - t0) < 1e-9) {
    record(t0, t0, h2, h2Dim, h2, h2Dim, t0);
    nextSample += inp.sampleStep_h;
  }

  for (let c = 0; c + 1 < cuts.length; c++) {
    const a = cuts[c] as number;
    const b = cuts[c + 1] as number;
    // apply switches due at a
    while (sw < switches.length && (switches[sw] as SynthesisSwitch).t_h <= a + 1e-12) {
      const s = switches[sw] as SynthesisSwitch;
      const value = synthesisRate(on, since, atSwitch, s.t_h);
      if (s.on && !on) onsets.push(s.t_h);
      on = s.on;
      since = s.t_h;
      atSwitch = value;
      sw++;
    }
    if (!(b > a + 1e-12)) continue;
    const mid = 0.5 * (a + b);
    while (ep < inp.sleep.length && (inp.sleep[ep] as SleepEpisode).end_h <= mid) ep++;
    const e = inp.sleep[ep];
    const asleep = e !== undefined && e.start_h <= mid && mid < e.end_h;
    const gate = (asleep ? inp.eyelidTransmission : 1) * inp.lightSensitivity;
    const tt = inp.periodicLight ? mid - 24 * Math.floor(mid / 24) : mid;
    const idx = segmentIndexAt(light, tt);
    const smooth = light.smooth?.[idx];
    const dayOffset = mid - tt;
    const levelAt = (t: number) => gate * (smooth === undefined ? (light.level[idx] as number) : Math.max(0, smooth(t - dayOffset)));
    const rate = on ? 60 * MEL.lambda_per_min : 60 * MEL.alphaM_per_min;
    let alpha = lightActivation_per_min(P, levelAt(mid));
    // fine steps where the transients are (the start of every piece), coarser steps after
    const fineEnd = Math.min(b, a + MELATONIN_FINE_SPAN_H);
    const phases: [number, number, number][] = [[a, fineEnd, MELATONIN_STEP_H]];
    if (b > fineEnd + 1e-12) phases.push([fineEnd, b, MELATONIN_COARSE_STEP_H]);
    for (const [pa, pb, maxStep] of phases) {
      const nSteps = Math.max(1, Math.ceil((pb - pa) / maxStep - 1e-9));
      const h = (pb - pa) / nSteps;
      const ea = Math.exp(-A_RATE * h);
      const ec = Math.exp(-C_RATE * h);
      const k = (A_RATE * (ea - ec)) / (C_RATE - A_RATE);
      let r = 60 * (alpha + beta);
      let nInf = r > 0 ? (60 * alpha) / r : 0;
      let eHalf = Math.exp(-r * 0.5 * h);
      let eFull = eHalf * eHalf;
      // synthesis factor g at the step midpoints, advanced multiplicatively
      let g = Number.isFinite(since) ? Math.exp(-rate * (pa + 0.5 * h - since)) : 0;
      const gStep = Math.exp(-rate * h);
      for (let s = 0; s < nSteps; s++) {
        const ta = pa + s * h;
        if (smooth !== undefined) {
          alpha = lightActivation_per_min(P, levelAt(ta + 0.5 * h));
          r = 60 * (alpha + beta);
          nInf = r > 0 ? (60 * alpha) / r : 0;
          eHalf = Math.exp(-r * 0.5 * h);
          eFull = eHalf * eHalf;
        }
        // Process L: exact relaxation toward n∞ at rate 60(α + β)
        const nMid = nInf + (n - nInf) * eHalf;
        const A = on ? MEL.A_pmol_L_min * (1 - g) : atSwitch * g;
        g *= gStep;
        const bhat = P.G_min * alpha * (1 - nMid);
        const F = 60 * A * Math.max(0, 1 - MEL.m * bhat);
        const Fd = 60 * A;
        // exact propagator of H1' = F − aH1, H2' = aH1 − cH2 with constant F
        const u = h1 - F / A_RATE;
        const v = h2 - F / C_RATE;
        const nh1 = F / A_RATE + u * ea;
        const nh2 = F / C_RATE + v * ec + u * k;
        const ud = h1Dim - Fd / A_RATE;
        const vd = h2Dim - Fd / C_RATE;
        const nh1d = Fd / A_RATE + ud * ea;
        const nh2d = Fd / C_RATE + vd * ec + ud * k;
        const tb = ta + h;
        while (nextSample <= tb + 1e-9 && nextSample <= tEnd + 1e-9) {
          record(nextSample, ta, h2, h2Dim, nh2, nh2d, tb);
          nextSample += inp.sampleStep_h;
        }
        traceT.push(tb);
        traceLit.push(nh2);
        traceDim.push(nh2d);
        traceAwake.push(!asleep);
        h1 = nh1;
        h2 = nh2;
        h1Dim = nh1d;
        h2Dim = nh2d;
        n = nInf + (n - nInf) * eFull;
      }
    }
  }
  const nights = melatoninNights({ t_h: traceT, lit_pmol_L: traceLit, dim_pmol_L: traceDim, awake: traceAwake }, onsets);
  return {
    final: { h1, h2, h1Dim, h2Dim, nSuppression: n, on, since_h: since, atSwitch },
    sample_t_h: sample_t,
    plasma_pmol_L: plasma,
    plasmaDim_pmol_L: plasmaDim,
    nights,
  };
}
