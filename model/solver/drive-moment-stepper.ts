/**
 * Adaptive integration of a system driven by a rough, known input:
 *
 *   dy/dt = F(y) + b(t) · g(y)
 *
 * where b(t) may jump every minute (light at the eye through Process L) but its integral
 * W = ∫ b dt and first moment M = ∫ b(t)·(t − t0) dt over any interval are known exactly (from
 * closed forms, e.g. process-l-drive.ts). Restarting a solver at every jump of b costs a restart
 * per minute of measured light; this stepper instead takes steps across many jumps.
 *
 * Method (our derivation, written from the Taylor expansion of the exact flow). Over one step
 * [t0, t0 + H] the exact solution expands as
 *   y1 = y0 + H F + W g + (H²/2) F′F + (W²/2) g′g + (H W − M) F′g + M g′F + O(3),
 * for any shape of b (the g′g term is W²/2 because ∫ b(t) ∫_{t0}^{t} b ds dt = W²/2). With the
 * drive's normalised centre τ = M / (H W) ∈ [0, 1], the two-stage scheme
 *   y_a = y0 + (H/2) F(y0) + (1 − τ) W g(y0)
 *   y_b = y0 + τ H F(y0) + (W/2) g(y0)
 *   y1  = y0 + H F(y_a) + W g(y_b)
 * reproduces every second-order term, so it is second order whatever b does inside the step
 * (for b smooth and constant it is the explicit midpoint rule). The embedded first-order
 * solution y0 + H F(y0) + W g(y0) gives the local error estimate; the step size is chosen from
 * it in the usual way for a (1, 2) pair (Hairer, Nørsett & Wanner, Solving ODEs I, §II.4): accept
 * when ‖err‖ ≤ 1, with ‖·‖ the RMS of err_i / (atol + rtol·|y_i|), and scale H by
 * min(3, max(0.2, 0.9 / √‖err‖)).
 *
 * Units are the caller's (hours in model/circadian).
 */

/** The two parts of the right-hand side. Neither may keep a reference to `y` or `out`. */
export interface DrivenSystem {
  readonly size: number;
  /** F(y): the rate without drive. */
  free(y: ArrayLike<number>, out: Float64Array): void;
  /** g(y): the rate per unit of drive. */
  coupling(y: ArrayLike<number>, out: Float64Array): void;
}

/** ∫ b dt and ∫ b(t)·(t − t0) dt over a step starting at t0. */
export interface DriveMoments {
  readonly integral: number;
  readonly firstMoment: number;
}

/** The drive as the stepper reads it: moments of trial steps from the committed time, then commit. */
export interface Drive {
  /** Moments over [committed time, t1]; does not commit. */
  moments(t1: number): DriveMoments;
  /** Moves the committed time to t1 (after an accepted step). */
  advance(t1: number): void;
  /** b just after the committed time (for derivatives at step ends). */
  valueNow(): number;
}

export interface DriveStepperTolerances {
  readonly relative: number;
  readonly absolute: number;
  /** Longest step (time unit of the system). */
  readonly maxStep: number;
  /** First trial step. */
  readonly initialStep: number;
}

export const DRIVE_STEPPER_DEFAULT_TOLERANCES: DriveStepperTolerances = { relative: 1e-5, absolute: 1e-5, maxStep: 0.5, initialStep: 0.1 };

/** One accepted step [t0, t1] with the states and the full derivatives at both ends. */
export interface AcceptedStep {
  readonly t0: number;
  readonly t1: number;
  readonly y0: Float64Array;
  readonly y1: Float64Array;
  readonly dy0: Float64Array;
  readonly dy1: Float64Array;
}

export interface DrivenIntegration {
  /** State at the end (t1, or the end of the step in which `onStep` asked to stop). */
  readonly y: Float64Array;
  /** The time `onStep` asked to stop at, if it did (inside the last accepted step). */
  readonly stopAt?: number;
  readonly steps: number;
  readonly rejected: number;
  /** Evaluations of F plus evaluations of g. */
  readonly evaluations: number;
  /** The step size to try next (carry it into the next interval). */
  readonly nextStep: number;
}

/** Work arrays for one system size, reused across calls. */
export class DriveStepperWork {
  readonly f0: Float64Array;
  readonly g0: Float64Array;
  readonly fa: Float64Array;
  readonly gb: Float64Array;
  readonly ya: Float64Array;
  readonly yb: Float64Array;
  readonly y1: Float64Array;
  readonly dy0: Float64Array;
  readonly dy1: Float64Array;
  readonly f1: Float64Array;
  readonly g1: Float64Array;
  constructor(size: number) {
    this.f0 = new Float64Array(size);
    this.g0 = new Float64Array(size);
    this.fa = new Float64Array(size);
    this.gb = new Float64Array(size);
    this.ya = new Float64Array(size);
    this.yb = new Float64Array(size);
    this.y1 = new Float64Array(size);
    this.dy0 = new Float64Array(size);
    this.dy1 = new Float64Array(size);
    this.f1 = new Float64Array(size);
    this.g1 = new Float64Array(size);
  }
}

/**
 * One step of the scheme from y0 with F(y0) = f0 and g(y0) = g0 already in `work`; the new
 * state goes to work.y1. Returns the scaled error norm (≤ 1: acceptable).
 */
export function driveMomentStep(system: DrivenSystem, y0: ArrayLike<number>, H: number, m: DriveMoments, tol: DriveStepperTolerances, work: DriveStepperWork): number {
  const n = system.size;
  const W = m.integral;
  const tau = W !== 0 && H > 0 ? Math.min(1, Math.max(0, m.firstMoment / (H * W))) : 0.5;
  const { f0, g0, fa, gb, ya, yb, y1 } = work;
  for (let i = 0; i < n; i++) {
    const yi = y0[i] as number;
    ya[i] = yi + 0.5 * H * (f0[i] as number) + (1 - tau) * W * (g0[i] as number);
    yb[i] = yi + tau * H * (f0[i] as number) + 0.5 * W * (g0[i] as number);
  }
  system.free(ya, fa);
  system.coupling(yb, gb);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const yi = y0[i] as number;
    const next = yi + H * (fa[i] as number) + W * (gb[i] as number);
    y1[i] = next;
    const low = yi + H * (f0[i] as number) + W * (g0[i] as number);
    const scale = tol.absolute + tol.relative * Math.max(Math.abs(yi), Math.abs(next));
    const e = (next - low) / scale;
    sum += e * e;
  }
  return Math.sqrt(sum / n);
}

/**
 * Integrates from t0 to t1 (> t0) across every jump of the drive, with adaptive steps. The
 * drive must be committed at t0; it is committed at the end on return. `onStep` sees every
 * accepted step with both end states and derivatives (for dense output and event location); it
 * may return a time inside that step to stop the integration there (the caller then takes the
 * state at that time from the step). `exact` overwrites, after each accepted step, the components
 * that the caller evolves in closed form alongside the drive (F and g are zero for them).
 */
export function integrateDriven(
  system: DrivenSystem,
  drive: Drive,
  t0: number,
  y0: ArrayLike<number>,
  t1: number,
  tol: DriveStepperTolerances = DRIVE_STEPPER_DEFAULT_TOLERANCES,
  firstStep = tol.initialStep,
  onStep?: (step: AcceptedStep) => number | undefined | void,
  work: DriveStepperWork = new DriveStepperWork(system.size),
  exact?: (y: Float64Array) => void,
): DrivenIntegration {
  const n = system.size;
  const y = Float64Array.from(y0);
  let t = t0;
  let H = Math.min(Math.max(firstStep, 1e-9), tol.maxStep);
  let steps = 0;
  let rejected = 0;
  let evaluations = 0;
  const { f0, g0, dy0, dy1, f1, g1, y1 } = work;
  system.free(y, f0);
  system.coupling(y, g0);
  evaluations += 2;
  const span = t1 - t0;
  while (t < t1) {
    const last = t + H >= t1 - 1e-12 * Math.max(1, Math.abs(t1));
    const h = last ? t1 - t : H;
    const tEnd = last ? t1 : t + h;
    const m = drive.moments(tEnd);
    const err = driveMomentStep(system, y, h, m, tol, work);
    evaluations += 2;
    if (err > 1 && h > 1e-7 * Math.max(1, span)) {
      rejected += 1;
      H = h * Math.max(0.2, 0.9 / Math.sqrt(err));
      continue;
    }
    const b0 = drive.valueNow();
    if (onStep !== undefined) for (let i = 0; i < n; i++) dy0[i] = (f0[i] as number) + b0 * (g0[i] as number);
    drive.advance(tEnd);
    exact?.(y1);
    system.free(y1, f1);
    system.coupling(y1, g1);
    evaluations += 2;
    if (onStep !== undefined) {
      const b1 = drive.valueNow();
      for (let i = 0; i < n; i++) dy1[i] = (f1[i] as number) + b1 * (g1[i] as number);
      const stop = onStep({ t0: t, t1: tEnd, y0: y.slice(), y1: y1.slice(), dy0: dy0.slice(), dy1: dy1.slice() });
      if (typeof stop === 'number') {
        y.set(y1);
        return { y, stopAt: stop, steps: steps + 1, rejected, evaluations, nextStep: H };
      }
    }
    y.set(y1);
    f0.set(f1);
    g0.set(g1);
    t = tEnd;
    steps += 1;
    const grow = err > 0 ? Math.min(3, Math.max(0.2, 0.9 / Math.sqrt(err))) : 3;
    if (!last) H = Math.min(tol.maxStep, h * grow);
    else H = Math.min(tol.maxStep, Math.max(H, h * grow));
  }
  return { y, steps, rejected, evaluations, nextStep: H };
}

/** Cubic Hermite value of component i at time t inside an accepted step. */
export function hermiteAt(step: AcceptedStep, i: number, t: number): number {
  const h = step.t1 - step.t0;
  const s = (t - step.t0) / h;
  const s2 = s * s;
  const s3 = s2 * s;
  const h00 = 2 * s3 - 3 * s2 + 1;
  const h10 = s3 - 2 * s2 + s;
  const h01 = -2 * s3 + 3 * s2;
  const h11 = s3 - s2;
  return h00 * (step.y0[i] as number) + h10 * h * (step.dy0[i] as number) + h01 * (step.y1[i] as number) + h11 * h * (step.dy1[i] as number);
}
