/**
 * The darkness limit cycle of a pacemaker, tabulated over one period starting at its CBTmin
 * marker (fixed-step RK4, 0.01 h, after 40 days in darkness). Used to carry a phase between
 * models that do not share state variables: melatonin synthesis angles published for the x⁷
 * oscillator, the sleep-switch thresholds written for the cubic oscillator and the circadian
 * drive of the KSS model (x⁷ letters) are evaluated at the same time-since-CBTmin on the other
 * model's cycle. Design choice, documented in docs/methods/circadian.md.
 */
import type { Pacemaker } from './pacemaker.js';

const STEP_H = 0.01;
const SETTLE_DAYS = 40;

export interface LimitCycleTable {
  readonly period_h: number;
  /** Unwrapped clockwise angle at time-since-CBTmin k·STEP_H (decreasing). */
  readonly angle: Float64Array;
  readonly c0: Float64Array;
  readonly c1: Float64Array;
  readonly amplitude: Float64Array;
}

function rk4Dark(model: Pacemaker, y: number[], h: number): number[] {
  const n = y.length;
  const d1 = new Array<number>(n).fill(0);
  const d2 = new Array<number>(n).fill(0);
  const d3 = new Array<number>(n).fill(0);
  const d4 = new Array<number>(n).fill(0);
  model.derivatives(y, 0, d1);
  const a = y.map((v, i) => v + 0.5 * h * (d1[i] as number));
  model.derivatives(a, 0, d2);
  const b = y.map((v, i) => v + 0.5 * h * (d2[i] as number));
  model.derivatives(b, 0, d3);
  const c = y.map((v, i) => v + h * (d3[i] as number));
  model.derivatives(c, 0, d4);
  return y.map((v, i) => v + (h / 6) * ((d1[i] as number) + 2 * (d2[i] as number) + 2 * (d3[i] as number) + (d4[i] as number)));
}

const cache = new Map<string, LimitCycleTable>();

function wrap(a: number): number {
  let d = a % (2 * Math.PI);
  if (d > Math.PI) d -= 2 * Math.PI;
  if (d <= -Math.PI) d += 2 * Math.PI;
  return d;
}

/**
 * Tabulated darkness limit cycle, cached per model id. Pass the model with its default
 * parameters: the table is used as a phase map (fraction of the cycle since CBTmin), which a
 * per-person τ changes only negligibly, so cohorts do not pay for one table per person.
 */
export function darkLimitCycle(model: Pacemaker): LimitCycleTable {
  const key = model.id;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  let y = [...model.seedState];
  for (let t = 0; t < SETTLE_DAYS * 24; t += STEP_H) y = rk4Dark(model, y, STEP_H);
  // advance to the raw marker (x-min or the marker angle), then by the CBTmin offset
  const isMarker = (prev: number[], next: number[]): boolean => {
    if (model.marker.kind === 'x-min') {
      const d = [0, 0, 0];
      const dn = [0, 0, 0];
      model.derivatives(prev, 0, d);
      model.derivatives(next, 0, dn);
      return (d[0] as number) < 0 && (dn[0] as number) >= 0;
    }
    const a = wrap(model.angle(prev) - model.marker.angle_rad);
    const b = wrap(model.angle(next) - model.marker.angle_rad);
    return a > 0 && b <= 0 && a - b < Math.PI;
  };
  for (let guard = 0; guard < 40 * 24 / STEP_H; guard++) {
    const next = rk4Dark(model, y, STEP_H);
    const found = isMarker(y, next);
    y = next;
    if (found) break;
  }
  for (let t = 0; t < model.marker.cbtminOffset_h - 1e-9; t += STEP_H) y = rk4Dark(model, y, STEP_H);
  // one full period: until the angle has turned by 2π
  const angle: number[] = [];
  const c0: number[] = [];
  const c1: number[] = [];
  const amp: number[] = [];
  let unwrapped = model.angle(y);
  const start = unwrapped;
  let prev = unwrapped;
  while (start - unwrapped < 2 * Math.PI + 0.2) {
    angle.push(unwrapped);
    c0.push(y[0] as number);
    c1.push(y[1] as number);
    amp.push(model.amplitude(y));
    y = rk4Dark(model, y, STEP_H);
    const a = model.angle(y);
    unwrapped += wrap(a - prev);
    prev = a;
  }
  // period from the turn of exactly 2π
  let k = 0;
  while (k < angle.length - 1 && start - (angle[k + 1] as number) < 2 * Math.PI) k++;
  const a0 = angle[k] as number;
  const a1 = angle[k + 1] as number;
  const period = (k + (start - 2 * Math.PI - a0) / (a1 - a0)) * STEP_H;
  const table: LimitCycleTable = {
    period_h: period,
    angle: Float64Array.from(angle),
    c0: Float64Array.from(c0),
    c1: Float64Array.from(c1),
    amplitude: Float64Array.from(amp),
  };
  cache.set(key, table);
  return table;
}

/** Time since CBTmin (h, in [0, period)) at which the cycle passes a clockwise angle (rad). */
export function cycleTimeAtAngle(table: LimitCycleTable, angle_rad: number): number {
  const a = table.angle;
  const start = a[0] as number;
  // bring the target into (start − 2π, start]
  let target = angle_rad;
  while (target > start) target -= 2 * Math.PI;
  while (target <= start - 2 * Math.PI) target += 2 * Math.PI;
  let lo = 0;
  let hi = a.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((a[mid] as number) > target) lo = mid;
    else hi = mid;
  }
  const f = ((a[lo] as number) - target) / ((a[lo] as number) - (a[hi] as number));
  return Math.min(table.period_h, (lo + f) * STEP_H);
}

function sampleAt(arr: Float64Array, table: LimitCycleTable, time_h: number): number {
  let t = time_h % table.period_h;
  if (t < 0) t += table.period_h;
  const u = t / STEP_H;
  const i = Math.min(arr.length - 2, Math.floor(u));
  const f = u - i;
  return (arr[i] as number) * (1 - f) + (arr[i + 1] as number) * f;
}

/** Clockwise angle of the cycle at a time since CBTmin (wrapped to (−π, π]). */
export function cycleAngleAtTime(table: LimitCycleTable, time_h: number): number {
  return wrap(sampleAt(table.angle, table, time_h));
}

/**
 * The state of `target` (first two variables) equivalent to `source`'s state: same fraction of
 * the cycle since CBTmin, amplitude scaled by the source's amplitude relative to its cycle.
 * Identity (up to table interpolation) when source and target are the same model.
 */
export function equivalentState(source: Pacemaker, sourceTable: LimitCycleTable, y: ArrayLike<number>, targetTable: LimitCycleTable): [number, number] {
  const ts = cycleTimeAtAngle(sourceTable, source.angle(y));
  const ratio = source.amplitude(y) / sampleAt(sourceTable.amplitude, sourceTable, ts);
  const tt = (ts / sourceTable.period_h) * targetTable.period_h;
  return [ratio * sampleAt(targetTable.c0, targetTable, tt), ratio * sampleAt(targetTable.c1, targetTable, tt)];
}
