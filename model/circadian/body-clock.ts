/**
 * The body-clock entry point for the rest of the product (scenario pipeline, CLI, cohorts):
 * light at the eye over days → phase markers, melatonin, sleep, sleep pressure and KSS, for one
 * person and one pacemaker model.
 *
 * Phase markers per day: the x minimum (model's own variable), CBTmin = x-min + the model's
 * offset (x⁷: 0.8 h; cubic: 0; Hannay: ψ ≡ π). DLMO: the dim-light melatonin onset as a clinic
 * measures it, read from the modelled melatonin curve without light suppression (what the person
 * would show in dim light) rising through 10 pg/mL plasma; the 25 %-of-peak rule beside it
 * (melatonin-nights.ts). Melatonin suppression per night: over the awake hours of the dim-light
 * biological night (a fixed window; never from one onset to the next).
 */
import type { Integrator } from '../solver/integrator.js';
import { daySleepSpec, entrain, type EntrainResult } from './entrain.js';
import type { LightSeries } from './light-series.js';
import type { MelatoninNight } from './melatonin-pass.js';
import { DLMO_25PCT_DEFINITION, DLMO_DEFINITION, dlmoTimes, nightlySuppression, SUPPRESSION_DEFINITION } from './melatonin-nights.js';
import type { PersonParams } from './pacemaker.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID, type PacemakerId } from './registry.js';
import { KSS_SLEEPY } from './sleepiness-postnova.js';
import { PMOL_L_PER_PG_ML } from './melatonin-sthilaire.js';
import type { SleepEpisode, SleepSpec } from './sleep-input.js';
import { simulate, stateFromPacemaker, type SimState, type SimulationRun } from './simulate.js';

/**
 * DLMO ≈ CBTmin − 7 h: the Hannay 2019 marker convention (DLMO at ψ = 5π/12, CBTmin at ψ = π; the
 * ~7 h itself is from memory). Not the product's DLMO; a fallback where a night has no DLMO.
 */
export const DLMO_BEFORE_CBTMIN_H = 7;

/** What each melatonin output of a body-clock result means (printed beside it by the CLI). */
export const MELATONIN_OUTPUT_DEFINITIONS = {
  dlmo_h: DLMO_DEFINITION,
  dlmo_25pct_h: DLMO_25PCT_DEFINITION,
  melatonin_suppression_pct: SUPPRESSION_DEFINITION,
  melatonin_pg_ml_hourly: 'plasma melatonin as lit (with light suppression; St Hilaire et al. 2007) at each whole hour since t = 0, pg/mL',
  dim_melatonin_pg_ml_hourly: 'plasma melatonin in dim light (the same person without light suppression; the curve the DLMO is read from) at each whole hour since t = 0, pg/mL',
} as const;

export type InitialCondition =
  | { readonly kind: 'entrained' }
  /** Explicit pacemaker variables (x, xc, n; for hfb19-sp: R, ψ, n) at t = 0. */
  | { readonly kind: 'state'; readonly pacemaker: readonly number[]; readonly asleep?: boolean }
  /** Continue from a saved simulation state (rebased to t = 0). */
  | { readonly kind: 'continue'; readonly state: SimState };

export interface BodyClockInput {
  readonly modelId?: PacemakerId;
  /** Light at the eye from t = 0 (local midnight of day 0); the last value holds to the end. */
  readonly light: LightSeries;
  /** Light behind closed eyelids on the same axis, read while asleep (default light × eyelid transmission). */
  readonly lightEyesClosed?: LightSeries;
  readonly days: number;
  /** Prescribed sleep or free (predicted) sleep; default free without alarm. */
  readonly sleep?: SleepSpec;
  /** Default entrained to day 0 of the light and sleep. */
  readonly init?: InitialCondition;
  readonly person?: PersonParams;
  /** Melanopic transmittance of the closed eyelids without `lightEyesClosed` (default that of CIE FL2, 0.30 %). */
  readonly eyelidTransmission?: number;
  readonly integrator?: Integrator;
  /** Sample spacing for curves (h, default 0.25). */
  readonly sampleStep_h?: number;
}

export interface BodyClockResult {
  readonly model: PacemakerId;
  readonly xmin_h: number[];
  readonly cbtmin_h: number[];
  /** Dim-light melatonin onset per night (10 pg/mL of the curve without suppression), h. */
  readonly dlmo_h: number[];
  /** The same nights by the 25 %-of-peak rule (NaN where the peak lies after the end of the run), h. */
  readonly dlmo_25pct_h: number[];
  /** Suppression per night over the awake hours of the dim-light biological night (%); null for a night cut off by the end of the run. */
  readonly melatonin_suppression_pct: (number | null)[];
  /** Mean KSS of each clock hour while awake; null for hours spent asleep. */
  readonly kss_hourly: (number | null)[];
  /** Hour indices with KSS ≥ 7 (sleepy, common practice). */
  readonly kss_sleepy_hours: number[];
  readonly sleep_episodes: SleepEpisode[];
  readonly melatonin_nights: MelatoninNight[];
  /** Plasma melatonin at each whole hour since t = 0 (pg/mL), as lit (with light suppression). */
  readonly melatonin_pg_ml_hourly: number[];
  /** The same without light suppression: the dim-light curve the DLMO is read from (pg/mL). */
  readonly dim_melatonin_pg_ml_hourly: number[];
  readonly entrainment?: { readonly days: number; readonly converged: boolean };
  /** The full run (samples, final state, solver counts). */
  readonly run: SimulationRun;
}

export function hourlyKss(run: SimulationRun, hours: number): (number | null)[] {
  const out: (number | null)[] = new Array<number | null>(hours).fill(null);
  const sum = new Array<number>(hours).fill(0);
  const count = new Array<number>(hours).fill(0);
  run.samples.t_h.forEach((t, i) => {
    const k = Math.floor(t - run.start_h + 1e-9);
    const v = run.samples.kss[i] as number;
    if (k >= 0 && k < hours && Number.isFinite(v) && t < run.start_h + k + 1 - 1e-9) {
      sum[k] = (sum[k] as number) + v;
      count[k] = (count[k] as number) + 1;
    }
  });
  for (let k = 0; k < hours; k++) if ((count[k] as number) > 0) out[k] = (sum[k] as number) / (count[k] as number);
  return out;
}

/** Sample values at whole hours since the start (linear interpolation between samples). */
export function hourlyValues(run: SimulationRun, values: readonly number[], hours: number): number[] {
  const t = run.samples.t_h;
  const out: number[] = [];
  let i = 0;
  for (let k = 0; k < hours; k++) {
    const tq = run.start_h + k;
    while (i + 1 < t.length && (t[i + 1] as number) <= tq) i++;
    const t0 = t[i] as number;
    const t1 = t[i + 1];
    const v0 = values[i] as number;
    out.push(t1 === undefined || t1 === t0 ? v0 : v0 + (((values[i + 1] as number) - v0) * (tq - t0)) / (t1 - t0));
  }
  return out;
}

export function runBodyClock(input: BodyClockInput): BodyClockResult {
  if (!(Number.isInteger(input.days) && input.days >= 1)) throw new Error(`days must be a whole number ≥ 1 (got ${input.days})`);
  const modelId = input.modelId ?? DEFAULT_PACEMAKER_ID;
  const model = createPacemaker(modelId, input.person ?? {});
  const sleep: SleepSpec = input.sleep ?? { mode: 'free' };
  const init = input.init ?? { kind: 'entrained' };
  let initial: SimState;
  let entrainment: EntrainResult | undefined;
  if (init.kind === 'entrained') {
    entrainment = entrain({
      model,
      light: input.light,
      ...(input.lightEyesClosed === undefined ? {} : { lightEyesClosed: input.lightEyesClosed }),
      sleep: daySleepSpec(sleep),
      ...(input.eyelidTransmission === undefined ? {} : { eyelidTransmission: input.eyelidTransmission }),
      ...(input.integrator === undefined ? {} : { integrator: input.integrator }),
    });
    initial = entrainment.state;
  } else if (init.kind === 'state') {
    initial = stateFromPacemaker(model, init.pacemaker, sleep, 0, init.asleep !== true);
  } else initial = init.state;

  const run = simulate({
    model,
    light: input.light,
    ...(input.lightEyesClosed === undefined ? {} : { lightEyesClosed: input.lightEyesClosed }),
    sleep,
    initial,
    end_h: 24 * input.days,
    ...(input.eyelidTransmission === undefined ? {} : { eyelidTransmission: input.eyelidTransmission }),
    ...(input.integrator === undefined ? {} : { integrator: input.integrator }),
    ...(input.sampleStep_h === undefined ? {} : { sampleStep_h: input.sampleStep_h }),
  });
  const kss = hourlyKss(run, 24 * input.days);
  return {
    model: modelId,
    xmin_h: run.xmin_h,
    cbtmin_h: run.cbtmin_h,
    dlmo_h: dlmoTimes(run.nights),
    dlmo_25pct_h: run.nights.map((n) => n.dlmo25_h),
    melatonin_suppression_pct: nightlySuppression(run.nights),
    kss_hourly: kss,
    kss_sleepy_hours: kss.flatMap((v, k) => (v !== null && v >= KSS_SLEEPY ? [k] : [])),
    sleep_episodes: run.sleepEpisodes,
    melatonin_nights: run.nights,
    melatonin_pg_ml_hourly: hourlyValues(run, run.samples.plasmaMelatonin_pmol_L, 24 * input.days).map((v) => v / PMOL_L_PER_PG_ML),
    dim_melatonin_pg_ml_hourly: hourlyValues(run, run.samples.dimMelatonin_pmol_L, 24 * input.days).map((v) => v / PMOL_L_PER_PG_ML),
    ...(entrainment === undefined ? {} : { entrainment: { days: entrainment.days, converged: entrainment.converged } }),
    run,
  };
}
