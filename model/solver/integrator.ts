/**
 * The integrator contract shared by the adaptive (odex, GBS extrapolation) and the fixed-step
 * RK4 integrators, so the same right-hand sides and the same event logic run on both.
 * Time unit: whatever the right-hand side uses (hours in model/circadian).
 */

/** dy/dt at (t, y). Must not keep references to y; may return the same array on every call (integrators copy it before the next call). */
export type RightHandSide = (t: number, y: readonly number[]) => number[];

/** Continuous solution of component i inside the step just accepted. */
export type DenseSolution = (component: number, t: number) => number;

/**
 * Called after every accepted step [tOld, t] with the state at t. Return a time in (tOld, t]
 * to end the integration there (the state is then taken from the dense solution, which must
 * then cover every component), or undefined to go on. `denseComponents` limits the dense
 * solution to the components the observer reads (cheaper); stopping before t then fails.
 */
export type StepObserver = (tOld: number, t: number, y: readonly number[], dense: DenseSolution) => number | undefined;

export interface IntegrationResult {
  readonly t: number;
  readonly y: number[];
  /** True when an observer ended the integration before t1. */
  readonly stoppedEarly: boolean;
  readonly rhsEvaluations: number;
  readonly steps: number;
}

export interface Integrator {
  readonly name: string;
  /**
   * Integrates from (t0, y0) to t1 (> t0). The right-hand side must be smooth on [t0, t1]:
   * callers split the time axis at every discontinuity of the input and call again.
   */
  integrate(rhs: RightHandSide, t0: number, y0: readonly number[], t1: number, observe?: StepObserver, denseComponents?: readonly number[]): IntegrationResult;
}
