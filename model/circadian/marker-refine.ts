/**
 * Precise location of a minimum of one state variable found inside an accepted solver step.
 *
 * Under a bright pulse the light drive flattens the cycle and the minimum of x becomes shallow:
 * the adaptive solver's state error (tolerance 1e-4) and its cubic interpolant then move the
 * minimum by up to a few hundredths of an hour. Here the piece of constant light is integrated
 * again from its start state (where light last changed; or from the step start when the piece
 * began more than MARKER_REFINE_MAX_SPAN_H earlier) with the classical fourth-order Runge–Kutta
 * method at MARKER_REFINE_STEP_H; the derivative of the component is evaluated on those states
 * (the right-hand side itself, no interpolated state) and its − to + sign change is interpolated
 * linearly. Cost: about 5 right-hand-side evaluations per 3 min re-integrated, once per marker.
 */
import type { RightHandSide } from '../solver/integrator.js';

/** Substep of the re-integration (h; 3 min). */
export const MARKER_REFINE_STEP_H = 0.05;
/** Longest span re-integrated from the start of a piece (h). */
export const MARKER_REFINE_MAX_SPAN_H = 12;

function rk4Step(rhs: RightHandSide, t: number, y: readonly number[], h: number): number[] {
  const k1 = [...rhs(t, y)];
  const a = y.map((v, i) => v + 0.5 * h * (k1[i] as number));
  const k2 = [...rhs(t + 0.5 * h, a)];
  const b = y.map((v, i) => v + 0.5 * h * (k2[i] as number));
  const k3 = [...rhs(t + 0.5 * h, b)];
  const c = y.map((v, i) => v + h * (k3[i] as number));
  const k4 = [...rhs(t + h, c)];
  return y.map((v, i) => v + (h / 6) * ((k1[i] as number) + 2 * (k2[i] as number) + 2 * (k3[i] as number) + (k4[i] as number)));
}

/**
 * First time in (from, tb] where d y[component]/dt turns from negative to non-negative,
 * integrating from (ta, ya), ta ≤ from; undefined when it does not.
 */
export function refinedMinimum(rhs: RightHandSide, ta: number, ya: readonly number[], tb: number, component: number, from = ta): number | undefined {
  const n = Math.max(2, Math.ceil((tb - ta) / MARKER_REFINE_STEP_H - 1e-9));
  const h = (tb - ta) / n;
  let y: readonly number[] = ya;
  let dPrev = rhs(ta, y)[component] as number;
  for (let k = 0; k < n; k++) {
    const t = ta + k * h;
    y = rk4Step(rhs, t, y, h);
    const d = rhs(t + h, y)[component] as number;
    if (dPrev < 0 && d >= 0 && t + h > from) return t + (h * dPrev) / (dPrev - d);
    dPrev = d;
  }
  return undefined;
}
