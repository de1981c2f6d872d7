/**
 * One stretch of the body-clock simulation integrated through light: between two changes of
 * sleep state (or alarms, wake windows, the end), however often the light changes.
 *
 * The pacemakers' oscillator rates are affine in the photic drive B̂ of Process L (every model
 * here: B enters as B̂ times a function of the oscillator state), so the system splits as
 *   dy/dt = F(y) + B̂(t)·g(y),
 * F = the rates in darkness, g = the rates per unit of B̂. Process L itself does not depend on the
 * oscillator: its n and B̂ are evolved in closed form over each minute of constant light
 * (process-l-drive.ts), and the oscillator (plus the HCL homeostat when sleep is free) is
 * integrated by the second-order drive-moment stepper (model/solver/drive-moment-stepper.ts),
 * which uses the exact ∫B̂ dt and ∫B̂·t dt of every step. The step observer of simulate.ts sees
 * the same calls as with the restart-at-every-change integrators, with a cubic Hermite dense
 * solution per step.
 *
 * F and g come from the pacemaker's own right-hand side: F(y) with no light (B̂ = 0), g(y) as
 * the difference quotient at a reference light with n = 0 — exact, since the rates are affine
 * in B̂. Units: hours; light in native lux.
 */
import {
  DRIVE_STEPPER_DEFAULT_TOLERANCES,
  DriveStepperWork,
  hermiteAt,
  integrateDriven,
  type AcceptedStep,
  type DriveStepperTolerances,
  type DrivenSystem,
} from '../solver/drive-moment-stepper.js';
import type { DenseSolution, IntegrationResult, StepObserver } from '../solver/integrator.js';
import type { LightSeries } from './light-series.js';
import type { Pacemaker } from './pacemaker.js';
import { ProcessLDrive } from './process-l-drive.js';

/** Light (native lux) at which g is read off; any level with α > 0 gives the same g. */
const REFERENCE_LIGHT_LX = 1000;

/** Tolerances of the body clock through light: CBTmin within 0.005 h of a tight reference on per-minute light (docs/performance). */
export const THROUGH_LIGHT_TOLERANCES: DriveStepperTolerances = { ...DRIVE_STEPPER_DEFAULT_TOLERANCES, relative: 1e-5, absolute: 1e-5, maxStep: 0.5, initialStep: 0.05 };

/** Substep when an x minimum is placed precisely inside an accepted step (h; 1 min). */
const MARKER_SUBSTEP_H = 1 / 60;

export interface ThroughLightPiece {
  readonly model: Pacemaker;
  /** Light received in this piece (open eyes or behind the eyelids), native lux. */
  readonly light: LightSeries;
  /** Multiplies the light before Process L (the person's light sensitivity). */
  readonly gain: number;
  /** Set to 24 when the series is one day repeated (entrainment); the series is read at t mod 24. */
  readonly period_h?: number;
  /** Size of the whole state (pacemaker, then the HCL homeostat when sleep is free). */
  readonly size: number;
  /** The HCL homeostat's rate, or null when sleep is prescribed. */
  readonly homeostatRate: ((y: ArrayLike<number>) => number) | null;
  readonly tolerances?: DriveStepperTolerances;
}

/** The split right-hand side of a pacemaker (+ homeostat). */
function splitSystem(piece: ThroughLightPiece): DrivenSystem {
  const { model, size, homeostatRate } = piece;
  const nIndex = model.nIndex;
  const d0 = new Array<number>(model.stateSize).fill(0);
  const d1 = new Array<number>(model.stateSize).fill(0);
  const noLight = new Array<number>(model.stateSize).fill(0);
  // The dark rates at the last state `free` saw: the stepper asks for F and g at the same state
  // after every accepted step, and F does not depend on n, so g can reuse them there.
  const lastFreeAt = new Array<number>(model.stateSize).fill(Number.NaN);
  const sameAsLastFree = (y: ArrayLike<number>): boolean => {
    for (let i = 0; i < model.stateSize; i++) if (i !== nIndex && lastFreeAt[i] !== y[i]) return false;
    return true;
  };
  return {
    size,
    free(y, out) {
      model.derivatives(y, 0, d0);
      for (let i = 0; i < model.stateSize; i++) {
        out[i] = i === nIndex ? 0 : (d0[i] as number);
        lastFreeAt[i] = y[i] as number;
      }
      if (homeostatRate !== null) out[model.stateSize] = homeostatRate(y);
    },
    coupling(y, out) {
      for (let i = 0; i < model.stateSize; i++) noLight[i] = i === nIndex ? 0 : (y[i] as number);
      if (!sameAsLastFree(y)) {
        model.derivatives(noLight, 0, d0);
        for (let i = 0; i < model.stateSize; i++) lastFreeAt[i] = y[i] as number;
      }
      const drive = model.derivatives(noLight, REFERENCE_LIGHT_LX, d1);
      for (let i = 0; i < model.stateSize; i++) out[i] = i === nIndex || !(drive > 0) ? 0 : ((d1[i] as number) - (d0[i] as number)) / drive;
      if (homeostatRate !== null) out[model.stateSize] = 0;
    },
  };
}

function driveFrom(piece: ThroughLightPiece, t: number, n: number): ProcessLDrive {
  return new ProcessLDrive(piece.model.processL, piece.light, piece.gain, t, n, piece.period_h);
}

function denseOf(step: AcceptedStep): DenseSolution {
  return (i, t) => hermiteAt(step, i, t);
}

/**
 * Integrates the piece from (t0, y0) to t1, calling `observe` after every accepted step like the
 * restart-at-every-change integrators do; an observer's stop time ends the piece there.
 */
export function integrateThroughLight(piece: ThroughLightPiece, t0: number, y0: readonly number[], t1: number, observe: StepObserver, firstStep?: number): IntegrationResult & { readonly nextStep: number } {
  const system = splitSystem(piece);
  const nIndex = piece.model.nIndex;
  const drive = driveFrom(piece, t0, y0[nIndex] as number);
  const work = new DriveStepperWork(piece.size);
  const tol = piece.tolerances ?? THROUGH_LIGHT_TOLERANCES;
  let stopStep: AcceptedStep | null = null;
  const result = integrateDriven(
    system,
    drive,
    t0,
    y0,
    t1,
    tol,
    firstStep ?? tol.initialStep,
    (step) => {
      const stop = observe(step.t0, step.t1, Array.from(step.y1), denseOf(step));
      if (stop === undefined) return undefined;
      stopStep = step;
      return stop;
    },
    work,
    (y) => (y[nIndex] = drive.processL),
  );
  const evaluations = result.evaluations;
  const accepted = result.steps;
  if (result.stopAt === undefined || stopStep === null) {
    return { t: t1, y: Array.from(result.y), stoppedEarly: false, rhsEvaluations: evaluations, steps: accepted, nextStep: result.nextStep };
  }
  const step: AcceptedStep = stopStep;
  const ts = result.stopAt;
  const y = Array.from({ length: piece.size }, (_, i) => hermiteAt(step, i, ts));
  const replay = driveFrom(piece, step.t0, step.y0[nIndex] as number);
  replay.advance(ts);
  y[nIndex] = replay.processL;
  return { t: ts, y, stoppedEarly: true, rhsEvaluations: evaluations, steps: accepted, nextStep: result.nextStep };
}

/**
 * First time in (tA, tB] at which d y[component]/dt turns from negative to non-negative, and the
 * component's value there, found by integrating the step again from (tA, yA) in 1-minute
 * substeps and reading the full derivative F + B̂·g at each substep end (linear interpolation
 * between them; the value from the substep's cubic Hermite); undefined when it does not.
 */
export function minimumThroughLight(piece: ThroughLightPiece, tA: number, yA: readonly number[], tB: number, component: number): { readonly t: number; readonly value: number } | undefined {
  const system = splitSystem(piece);
  const nIndex = piece.model.nIndex;
  const drive = driveFrom(piece, tA, yA[nIndex] as number);
  let found: { t: number; value: number } | undefined;
  let previous: number | undefined;
  integrateDriven(
    system,
    drive,
    tA,
    yA,
    tB,
    { relative: 1e9, absolute: 1e9, maxStep: MARKER_SUBSTEP_H, initialStep: MARKER_SUBSTEP_H },
    MARKER_SUBSTEP_H,
    (step) => {
      const dA = previous ?? (step.dy0[component] as number);
      const dB = step.dy1[component] as number;
      previous = dB;
      if (dA < 0 && dB >= 0) {
        const t = step.t0 + ((step.t1 - step.t0) * dA) / (dA - dB);
        found = { t, value: hermiteAt(step, component, t) };
        return step.t1;
      }
      return undefined;
    },
    undefined,
    (y) => (y[nIndex] = drive.processL),
  );
  return found;
}
