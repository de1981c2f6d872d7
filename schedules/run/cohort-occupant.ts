/**
 * Cohort runs without recomputing light: the light at the eye of a persona under each strategy
 * depends on the scenario, the strategy and the observer's age, not on the body-clock traits. So
 * a persona is prepared once (the whole pipeline, `runScenario`, for that persona only) and each
 * virtual occupant then runs just the body-clock models and the metrics for every strategy, with
 * its own intrinsic period, light sensitivity and habitual sleep timing. An occupant of another
 * age needs its own preparation (lens transmission differs per source spectrum, CIE S 026).
 * With the persona's own traits and no sleep shift the strategy summaries equal runScenario's
 * bit for bit (same calls in the same order).
 */
import type { PacemakerId } from '../../model/circadian/registry.js';
import { DEFAULT_PACEMAKER_ID } from '../../model/circadian/registry.js';
import type { SleepSpec } from '../../model/circadian/sleep-input.js';
import type { SimState, SimulationSamples } from '../../model/circadian/simulate.js';
import { HEADLINE_SLEEPINESS_ID, type SleepinessModelId } from '../../model/circadian/sleepiness-registry.js';
import type { Persona } from '../schema/scenario-types.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import { closedEyeLightSeries, entrainedStart, pacemakerFor, runBodyClockFor, sleepSpecFor, type BodyClockOutcome } from './body-clock-run.js';
import { fixedAwakeMinutes, shiftedSleepSpec } from './cohort-sleep-shift.js';
import type { EyeSeries } from './eye-series.js';
import { mergedLightSeries } from './light-segments.js';
import type { LocalClock } from './local-clock.js';
import { strategyMetrics } from './metrics.js';
import type { StrategyResult, StrategySummary } from './results-types.js';
import { RunInputError } from './run-input-error.js';
import { outcomeWithSleepiness } from './sleepiness-outcome.js';
import { runScenario, type RunInput, type RunOutput } from './run-scenario.js';

interface PreparedStrategy {
  readonly id: string;
  readonly name: string;
  readonly changes: readonly string[];
  readonly isBaseline: boolean;
  readonly timeline: ExposureTimeline;
  readonly eye: EyeSeries;
  readonly sleep: SleepSpec;
  readonly fixedAwake: Uint8Array;
}

/** One persona's light at the eye per strategy, ready for many occupants. */
export interface CohortPersonaBase {
  readonly persona: Persona;
  readonly modelId: PacemakerId;
  readonly clock: LocalClock;
  /** In pipeline order, baseline first. */
  readonly strategies: readonly PreparedStrategy[];
}

/** The body-clock traits of one occupant (model/cohort OccupantTraits, clamped to the scenario's limits). */
export interface CohortPerson {
  readonly intrinsicPeriod_h: number;
  readonly lightSensitivity: number;
  readonly habitualMidSleepShift_h: number;
}

export function prepareCohortPersona(input: RunInput, personaId: string, age_y?: number): CohortPersonaBase {
  const persona0 = input.scenario.personas.find((p) => p.id === personaId);
  if (persona0 === undefined) throw new RunInputError('personas', `no persona "${personaId}"`);
  const persona = age_y === undefined ? persona0 : { ...persona0, age_y };
  const scenario = age_y === undefined ? input.scenario : { ...input.scenario, personas: input.scenario.personas.map((p) => (p.id === personaId ? persona : p)) };
  const { onProgress: _drop, ...rest } = input;
  void _drop;
  const out = runScenario({ ...rest, scenario, personaIds: [personaId] });
  return cohortPersonaFromRun(out, persona, input.modelId ?? DEFAULT_PACEMAKER_ID);
}

/**
 * A persona's strategies prepared from a finished run (its light at the eye, reused), for runs of
 * the body-clock models under `modelId` (cohort occupants; the model ensemble, ensemble.ts).
 */
export function cohortPersonaFromRun(out: RunOutput, persona: Persona, modelId: PacemakerId): CohortPersonaBase {
  const result = out.results.personas.find((p) => p.id === persona.id);
  if (result === undefined) throw new RunInputError('personas', `persona "${persona.id}" has no baseline to compare with`);
  const strategies = result.strategies.map((s) => {
    const light = out.light.find((l) => l.personaId === persona.id && l.strategyId === s.id);
    if (light === undefined) throw new RunInputError('strategies', `no light series for strategy "${s.id}"`);
    return { id: s.id, name: s.name, changes: s.changes, isBaseline: s.is_baseline, timeline: light.timeline, eye: light.eye, sleep: sleepSpecFor(persona, light.timeline), fixedAwake: fixedAwakeMinutes(light.timeline) };
  });
  return { persona, modelId, clock: out.clock, strategies };
}

/** Strategy summaries (as in results.json) of one occupant, by strategy id. */
export function runCohortOccupant(base: CohortPersonaBase, person: CohortPerson): Record<string, StrategySummary> {
  const byStrategy = occupantResults(base, person, [HEADLINE_SLEEPINESS_ID]).get(HEADLINE_SLEEPINESS_ID) ?? {};
  return Object.fromEntries(Object.entries(byStrategy).map(([id, r]) => [id, r.summary]));
}

/** What an occupant run keeps per strategy: the summary and the alignment with work and sleep hours. */
export type OccupantResult = Pick<StrategyResult, 'summary' | 'alignment'>;

/**
 * An occupant's strategy results under each of the named sleepiness models, by model and strategy
 * id: one body-clock run per strategy, which every sleepiness model reads (sleepiness-outcome.ts).
 */
export function occupantResults(
  base: CohortPersonaBase,
  person: CohortPerson,
  sleepiness: readonly SleepinessModelId[],
  /** Called with each strategy's body-clock run (markers and model samples) as it is made. */
  onClock?: (strategyId: string, outcome: BodyClockOutcome, samples: SimulationSamples, end_h: number) => void,
): Map<SleepinessModelId, Record<string, OccupantResult>> {
  const persona: Persona = { ...base.persona, intrinsicPeriod_h: person.intrinsicPeriod_h, lightSensitivity: person.lightSensitivity };
  const model = pacemakerFor(persona, base.modelId);
  const out = new Map<SleepinessModelId, Record<string, OccupantResult>>(sleepiness.map((id) => [id, {}]));
  let initial: SimState | undefined;
  let baselineCbt: number[] | undefined;
  for (const s of base.strategies) {
    const sleep = shiftedSleepSpec(s.sleep, s.timeline, person.habitualMidSleepShift_h, s.fixedAwake);
    if (s.isBaseline) initial = entrainedStart(model, mergedLightSeries(s.eye.mel_edi_lx), sleep, closedEyeLightSeries(s.eye.melClosed_edi_lx));
    const bc = runBodyClockFor(model, s.eye.mel_edi_lx, sleep, initial, s.timeline.total_min, s.eye.melClosed_edi_lx);
    if (s.isBaseline) baselineCbt = bc.outcome.cbtmin_h;
    onClock?.(s.id, bc.outcome, bc.run.samples, s.timeline.total_min / 60);
    for (const id of sleepiness) {
      const m = strategyMetrics({ id: s.id, name: s.name, changes: s.changes, timeline: s.timeline, clock: base.clock, eye: s.eye, clockOutcome: outcomeWithSleepiness(bc.outcome, bc.run, id), rhsEvaluations: bc.run.rhsEvaluations, baselineCbtmin_h: s.isBaseline ? undefined : baselineCbt });
      const byStrategy = out.get(id);
      if (byStrategy !== undefined) byStrategy[s.id] = { summary: m.summary, alignment: m.alignment };
    }
  }
  return out;
}

/** Spacing of an occupant's melatonin curve kept for cohort bands on charts, h (20 min). */
export const OCCUPANT_MELATONIN_STEP_H = 1 / 3;

/** One occupant's body clock under one strategy over the run, for cohort bands on day-by-day charts. */
export interface OccupantClockSeries {
  /** Dim-light melatonin onsets and core-body-temperature minima, real hours since the run start. */
  readonly dlmo_h: readonly number[];
  readonly cbtmin_h: readonly number[];
  /** Modelled plasma melatonin with light (pmol/L) every `melatonin_step_h` from 0 h (linear between the model's samples; NaN outside them). */
  readonly melatonin_pmol_L: Float32Array;
  readonly melatonin_step_h: number;
}

/** Linear interpolation of samples (t ascending) on a regular grid from 0 h to end_h; NaN outside the samples. */
export function onRegularGrid(t_h: readonly number[], values: readonly number[], step_h: number, end_h: number): Float32Array {
  const n = Math.floor(end_h / step_h + 1e-9) + 1;
  const out = new Float32Array(n).fill(Number.NaN);
  let k = 0;
  for (let i = 0; i < n; i++) {
    const t = i * step_h;
    while (k + 1 < t_h.length && (t_h[k + 1] ?? Infinity) <= t) k++;
    const t0 = t_h[k];
    const v0 = values[k];
    if (t0 === undefined || v0 === undefined || t < t0) continue;
    const t1 = t_h[k + 1];
    const v1 = values[k + 1];
    if (t1 === undefined || v1 === undefined) {
      if (t === t0) out[i] = v0;
      continue;
    }
    out[i] = t1 === t0 ? v0 : v0 + ((v1 - v0) * (t - t0)) / (t1 - t0);
  }
  return out;
}

/** An occupant's strategy summaries and, per strategy, its body-clock markers and melatonin curve (one body-clock run per strategy, as runCohortOccupant). */
export function runCohortOccupantWithSeries(base: CohortPersonaBase, person: CohortPerson): { summaries: Record<string, StrategySummary>; series: Record<string, OccupantClockSeries> } {
  const series: Record<string, OccupantClockSeries> = {};
  const byStrategy =
    occupantResults(base, person, [HEADLINE_SLEEPINESS_ID], (strategyId, outcome, samples, end_h) => {
      series[strategyId] = { dlmo_h: outcome.dlmo_h, cbtmin_h: outcome.cbtmin_h, melatonin_pmol_L: onRegularGrid(samples.t_h, samples.plasmaMelatonin_pmol_L, OCCUPANT_MELATONIN_STEP_H, end_h), melatonin_step_h: OCCUPANT_MELATONIN_STEP_H };
    }).get(HEADLINE_SLEEPINESS_ID) ?? {};
  return { summaries: Object.fromEntries(Object.entries(byStrategy).map(([id, r]) => [id, r.summary])), series };
}
