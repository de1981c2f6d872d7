/**
 * Classical fixed-step fourth-order Runge–Kutta, for cross-checks of the adaptive solver on the
 * same right-hand sides. The step is shortened to land exactly on t1 (callers split at input
 * breakpoints, so the grid is aligned with them). Dense output between steps is the cubic
 * Hermite interpolant from the end states and their derivatives (error O(h⁴), consistent with RK4).
 */
import type { IntegrationResult, Integrator, RightHandSide, StepObserver } from './integrator.js';

/** One-minute steps in hours. */
export const RK4_DEFAULT_STEP_H = 1 / 60;

export function createRk4Integrator(step: number = RK4_DEFAULT_STEP_H): Integrator {
  return {
    name: `rk4(h=${step})`,
    integrate(rhs: RightHandSide, t0: number, y0: readonly number[], t1: number, observe?: StepObserver, _denseComponents?: readonly number[]): IntegrationResult {
      const n = y0.length;
      let t = t0;
      let y = [...y0];
      let f0 = [...rhs(t, y)];
      let evals = 1;
      let steps = 0;
      const tmp = new Array<number>(n);
      const nSteps = Math.max(1, Math.ceil((t1 - t0) / step - 1e-9));
      const h = (t1 - t0) / nSteps;
      for (let s = 0; s < nSteps; s++) {
        const tn = s === nSteps - 1 ? t1 : t0 + (s + 1) * h;
        const hh = tn - t;
        for (let i = 0; i < n; i++) tmp[i] = (y[i] as number) + 0.5 * hh * (f0[i] as number);
        const k2 = [...rhs(t + 0.5 * hh, tmp)];
        for (let i = 0; i < n; i++) tmp[i] = (y[i] as number) + 0.5 * hh * (k2[i] as number);
        const k3 = [...rhs(t + 0.5 * hh, tmp)];
        for (let i = 0; i < n; i++) tmp[i] = (y[i] as number) + hh * (k3[i] as number);
        const k4 = rhs(tn, tmp);
        // k4 is used before the next call; every other derivative is copied (the rhs may reuse its array)
        const yn = new Array<number>(n);
        for (let i = 0; i < n; i++) {
          yn[i] = (y[i] as number) + (hh / 6) * ((f0[i] as number) + 2 * (k2[i] as number) + 2 * (k3[i] as number) + (k4[i] as number));
        }
        const f1 = [...rhs(tn, yn)];
        evals += 4;
        steps++;
        if (observe !== undefined) {
          const ya = y;
          const fa = f0;
          const ta = t;
          const dense = (i: number, tq: number): number => {
            const th = (tq - ta) / hh;
            const h00 = (1 + 2 * th) * (1 - th) * (1 - th);
            const h10 = th * (1 - th) * (1 - th);
            const h01 = th * th * (3 - 2 * th);
            const h11 = th * th * (th - 1);
            return h00 * (ya[i] as number) + h10 * hh * (fa[i] as number) + h01 * (yn[i] as number) + h11 * hh * (f1[i] as number);
          };
          const ts = observe(t, tn, yn, dense);
          if (ts !== undefined) {
            const ys = ts >= tn ? yn : yn.map((_v, i) => dense(i, ts));
            return { t: ts, y: ys, stoppedEarly: true, rhsEvaluations: evals, steps };
          }
        }
        t = tn;
        y = yn;
        f0 = f1;
      }
      return { t: t1, y, stoppedEarly: false, rhsEvaluations: evals, steps };
    },
  };
}
