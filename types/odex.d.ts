// Hand-written declarations for odex 2.0.4 (Hairer's GBS extrapolation solver, ODEX).
// The package ships TypeScript source that does not pass strict checking, so the
// module is mapped here through tsconfig "paths". Only what Zeitlight uses is declared.

export type Derivative = (t: number, y: number[]) => number[];

/** Called after every accepted step; `dense(i, t)` interpolates component i inside [tOld, t]. */
export type OutputFunction = (
  step: number,
  tOld: number,
  t: number,
  y: number[],
  dense: (component: number, t: number) => number,
) => boolean | void;

export enum Outcome {
  Converged = 0,
  MaxStepsExceeded = 1,
  EarlyReturn = 2,
}

export interface SolverResult {
  y: number[];
  outcome: Outcome;
  nStep: number;
  xEnd: number;
  nAccept: number;
  nReject: number;
  nEval: number;
}

export class Solver {
  constructor(n: number);
  n: number;
  maxSteps: number;
  initialStepSize: number;
  maxStepSize: number;
  denseOutput: boolean;
  denseComponents: number[] | undefined;
  relativeTolerance: number | number[];
  absoluteTolerance: number | number[];
  solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): SolverResult;
  grid(dt: number, out: (t: number, y: number[]) => boolean | void): OutputFunction;
}
