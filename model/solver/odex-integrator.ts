/**
 * Adaptive integration with odex 2.0.4 (Hairer & Wanner's ODEX: Gragg–Bulirsch–Stoer
 * extrapolation with step size and order control and dense output). One Solver per state size
 * is kept and reused. The initial step of each restart is the last accepted step, so restarts
 * at input breakpoints do not fall back to the library's tiny default first step.
 */
import { Solver } from 'odex';
import type { DenseSolution, IntegrationResult, Integrator, RightHandSide, StepObserver } from './integrator.js';

export interface OdexTolerances {
  readonly relative: number;
  readonly absolute: number;
  /** Upper bound on the step (h); keeps event detection (one crossing per step) safe. */
  readonly maxStep: number;
  /**
   * Dense output for the observer: 'odex' uses the solver's own interpolant (order up to 2κ−1);
   * 'hermite' switches the solver's dense output off (cheaper steps, harmonic step-number
   * sequence) and interpolates each step by the cubic Hermite polynomial through its end states
   * and derivatives (one extra right-hand-side evaluation per step; error O(h⁴), so keep
   * maxStep ≲ 1.5 h for hour-scale oscillators).
   */
  readonly dense?: 'odex' | 'hermite';
}

/** Default tolerances for the body-clock models (state variables are O(1); time in h). */
export const ODEX_DEFAULT_TOLERANCES: OdexTolerances = { relative: 1e-4, absolute: 1e-4, maxStep: 1, dense: 'hermite' };
/** Tight tolerances for reference runs. */
export const ODEX_TIGHT_TOLERANCES: OdexTolerances = { relative: 1e-11, absolute: 1e-11, maxStep: 0.5 };

const MAX_STEPS_PER_CALL = 100_000;

export function createOdexIntegrator(tolerances: OdexTolerances = ODEX_DEFAULT_TOLERANCES): Integrator {
  const solvers = new Map<number, Solver>();
  let lastStep = 0.05;
  const solverFor = (n: number): Solver => {
    let s = solvers.get(n);
    if (s === undefined) {
      s = new Solver(n);
      s.relativeTolerance = tolerances.relative;
      s.absoluteTolerance = tolerances.absolute;
      s.maxStepSize = tolerances.maxStep;
      s.maxSteps = MAX_STEPS_PER_CALL;
      s.denseOutput = tolerances.dense !== 'hermite';
      solvers.set(n, s);
    }
    return s;
  };
  return {
    name: `odex(rtol=${tolerances.relative},atol=${tolerances.absolute})`,
    integrate(rhs: RightHandSide, t0: number, y0: readonly number[], t1: number, observe?: StepObserver, denseComponents?: readonly number[]): IntegrationResult {
      const solver = solverFor(y0.length);
      const hermite = tolerances.dense === 'hermite';
      if (!hermite) solver.denseComponents = denseComponents === undefined ? undefined : [...denseComponents];
      solver.initialStepSize = Math.min(lastStep, (t1 - t0) / 2);
      let evals = 0;
      let steps = 0;
      let stopT = Number.NaN;
      let stopY: number[] | undefined;
      const f = (t: number, y: number[]): number[] => {
        evals++;
        return rhs(t, y);
      };
      // Hermite data of the previous step end
      let yPrev: number[] = [...y0];
      let fPrev: number[] = hermite && observe !== undefined ? [...f(t0, yPrev)] : [];
      const result = solver.solve(f, t0, [...y0], t1, (_step, tOld, t, y, odexDense) => {
        if (!(t > tOld)) return true;
        steps++;
        if (t < t1) lastStep = t - tOld;
        if (observe === undefined) return true;
        let dense: DenseSolution;
        if (hermite) {
          const ya = yPrev;
          const fa = fPrev;
          const fb = [...f(t, y)];
          const h = t - tOld;
          dense = (i: number, tq: number): number => {
            const th = (tq - tOld) / h;
            const u = 1 - th;
            return (1 + 2 * th) * u * u * (ya[i] as number) + th * u * u * h * (fa[i] as number) + th * th * (3 - 2 * th) * (y[i] as number) - th * th * u * h * (fb[i] as number);
          };
          yPrev = y; // odex hands out a fresh copy of the state on every call
          fPrev = fb;
        } else dense = odexDense as DenseSolution;
        const ts = observe(tOld, t, y, dense);
        if (ts === undefined) return true;
        stopT = ts;
        if (!hermite && ts < t && denseComponents !== undefined && denseComponents.length < y.length) {
          throw new Error('odex: an early stop inside a step needs dense output of every component');
        }
        stopY = ts >= t ? [...y] : y.map((_v, i) => dense(i, ts));
        return false;
      });
      if (stopY !== undefined) return { t: stopT, y: stopY, stoppedEarly: true, rhsEvaluations: evals, steps };
      if (result.outcome !== 0) throw new Error(`odex: integration failed at t = ${result.xEnd} (outcome ${result.outcome})`);
      return { t: t1, y: result.y, stoppedEarly: false, rhsEvaluations: evals, steps };
    },
  };
}
