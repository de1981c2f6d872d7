/**
 * The photic drive B̂(t) of Process L (process-l.ts) over piecewise-constant light, in closed
 * form, for the drive-moment stepper (model/solver/drive-moment-stepper.ts).
 *
 * Process L does not depend on the oscillator, so for a constant light I over a piece of
 * length Δ (h) its state relaxes exactly:
 *   n(s)   = n∞ + (n_a − n∞)·e^{−λs},   λ = 60·(α + β) h⁻¹,   n∞ = α / (α + β)
 *   B̂(s)   = G·α·(1 − n(s)) = G·α·(c + d·e^{−λs}),   c = 1 − n∞,  d = n∞ − n_a
 *   ∫ B̂ ds           = G·α·(c·Δ + d·E1),              E1 = (1 − e^{−λΔ}) / λ
 *   ∫ B̂·(s + s0) ds  = G·α·(c·(Δ²/2 + s0·Δ) + d·(s0·E1 + E2)),   E2 = ∫₀^Δ s·e^{−λs} ds
 * (α, β per minute, G in minutes: the published units; s, Δ in hours). In darkness α = 0, B̂ = 0
 * and n decays as e^{−60βs}. Light is taken piece by piece from the series, multiplied by a
 * constant gain (sleep gating and light sensitivity, constant between the caller's breakpoints);
 * a smooth piece of the series is read at the middle of each minute; a series of one repeated
 * day is read at t mod 24 h.
 *
 * Units: light in native lux of the model's calibration source; time in hours since t = 0.
 */
import type { Drive, DriveMoments } from '../solver/drive-moment-stepper.js';
import { segmentIndexAt, type LightSeries } from './light-series.js';
import { lightActivation_per_min, type ProcessLParams } from './process-l.js';

const MINUTE_H = 1 / 60;

/**
 * Relaxation integrals of one piece, for rate λ (h⁻¹) and length Δ (h): E1 = ∫₀^Δ e^{−λs} ds,
 * E2 = ∫₀^Δ s·e^{−λs} ds and the decay e^{−λΔ}; by series when λΔ is small. Written into `out`
 * (no allocation per piece: this runs for every minute of measured light).
 */
function relaxationIntegrals(lambda: number, delta: number, out: { e1: number; e2: number; decay: number }): void {
  const x = lambda * delta;
  if (x < 1e-3) {
    // Series: E1 = Δ(1 − x/2 + x²/6 − x³/24), E2 = Δ²(1/2 − x/3 + x²/8 − x³/30).
    out.e1 = delta * (1 - x / 2 + (x * x) / 6 - (x * x * x) / 24);
    out.e2 = delta * delta * (0.5 - x / 3 + (x * x) / 8 - (x * x * x) / 30);
    out.decay = Math.exp(-x);
    return;
  }
  const decay = Math.exp(-x);
  out.e1 = (1 - decay) / lambda;
  out.e2 = (out.e1 - delta * decay) / lambda;
  out.decay = decay;
}

export class ProcessLDrive implements Drive {
  private t: number;
  private n: number;
  /** Result of the last `moments` call, reused when `advance` goes to the same time. */
  private lastEnd = Number.NaN;
  private lastN = Number.NaN;
  /** Scratch of the piece look-up and the relaxation integrals (hot loop, no allocation). */
  private pieceEnd = 0;
  private pieceAlpha = 0;
  private readonly relax = { e1: 0, e2: 0, decay: 1 };

  constructor(
    private readonly params: ProcessLParams,
    private readonly light: LightSeries,
    /** Multiplies every light level (gating × sensitivity). */
    private readonly gain: number,
    t0: number,
    n0: number,
    /** When set, the series describes one period (a repeated day of 24 h) read at t mod period. */
    private readonly period_h?: number,
  ) {
    this.t = t0;
    this.n = n0;
  }

  /** n of Process L at the committed time. */
  get processL(): number {
    return this.n;
  }

  get time(): number {
    return this.t;
  }

  /** Time in the series for simulation time t (t mod period, with a small tolerance at the edge). */
  private readOffset(t: number): number {
    const p = this.period_h;
    return p === undefined ? t : t - p * Math.floor((t + 1e-12) / p);
  }

  /**
   * The constant piece that starts at t: its end (next breakpoint, the minute's end for a smooth
   * piece, the period's end; capped at tEnd) and α (min⁻¹) of its light, from one look-up.
   */
  private piece(t: number, tEnd: number): void {
    const tr = this.readOffset(t);
    const s = this.light.start_h;
    const i = segmentIndexAt(this.light, tr);
    const f = this.light.smooth?.[i];
    const level = f === undefined ? (this.light.level[i] as number) : Math.max(0, f(tr + 0.5 * MINUTE_H));
    let next = i + 1 < s.length ? (s[i + 1] as number) : Number.POSITIVE_INFINITY;
    if (next <= tr) next = Number.POSITIVE_INFINITY;
    if (f !== undefined) next = Math.min(next, tr + MINUTE_H);
    if (this.period_h !== undefined) next = Math.min(next, this.period_h);
    this.pieceEnd = Math.min(tEnd, t + (next - tr));
    this.pieceAlpha = lightActivation_per_min(this.params, this.gain * level);
  }

  moments(t1: number): DriveMoments {
    const P = this.params;
    const beta = P.beta_per_min;
    let t = this.t;
    let n = this.n;
    let integral = 0;
    let moment = 0;
    let guard = 0;
    while (t < t1) {
      this.piece(t, t1);
      let end = this.pieceEnd;
      if (!(end > t)) end = Math.min(t1, t + MINUTE_H); // a breakpoint within rounding of t
      const delta = end - t;
      const alpha = this.pieceAlpha;
      if (alpha > 0) {
        const lambda = 60 * (alpha + beta);
        const nInf = alpha / (alpha + beta);
        const c = 1 - nInf;
        const d = nInf - n;
        relaxationIntegrals(lambda, delta, this.relax);
        const { e1, e2, decay } = this.relax;
        const s0 = t - this.t;
        const ga = P.G_min * alpha;
        integral += ga * (c * delta + d * e1);
        moment += ga * (c * (0.5 * delta * delta + s0 * delta) + d * (s0 * e1 + e2));
        n = nInf + (n - nInf) * decay;
      } else {
        n *= Math.exp(-60 * beta * delta);
      }
      t = end;
      if (++guard > 10_000_000) throw new Error('Process L drive: light series does not advance');
    }
    this.lastEnd = t1;
    this.lastN = n;
    return { integral, firstMoment: moment };
  }

  advance(t1: number): void {
    if (t1 !== this.lastEnd) this.moments(t1);
    this.t = t1;
    this.n = this.lastN;
    this.lastEnd = Number.NaN;
  }

  valueNow(): number {
    this.piece(this.t, Number.POSITIVE_INFINITY);
    return this.params.G_min * this.pieceAlpha * (1 - this.n);
  }
}
