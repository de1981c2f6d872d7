/**
 * Light at the eye as the body-clock models read it: a series in hours since t = 0 (local
 * midnight of day 0) with explicit breakpoints. Segment i covers [start_h[i], start_h[i+1])
 * (the last one runs to end_h and, for later times, holds its value). Each segment is either
 * a constant level or, optionally, a smooth function of time (daylight) so that the adaptive
 * solver can take long steps inside it and restarts only at the breakpoints.
 *
 * Units: `mel_edi_lx` is CIE S 026 melanopic EDI at the eye; `native_lx` is photopic lux of the
 * model's calibration source (cool-white fluorescent, see calibration.ts). Conversion happens
 * once, in nativeLightSeries().
 */
export type LightUnit = 'mel_edi_lx' | 'native_lx';

/** A smooth light level (same unit as the series) valid inside one segment, t in hours since t = 0. */
export type SmoothLight = (t_h: number) => number;

export interface LightSeries {
  readonly unit: LightUnit;
  /** Segment starts, strictly increasing, h since t = 0. */
  readonly start_h: Float64Array;
  /** Constant level of each segment (lx, in `unit`); ignored where `smooth[i]` is given. */
  readonly level: Float64Array;
  /** Optional smooth pieces: `smooth[i]` replaces `level[i]` inside segment i. */
  readonly smooth?: ReadonlyArray<SmoothLight | undefined>;
  /** End of the described period (h). Beyond it the last segment's value holds. */
  readonly end_h: number;
}

/**
 * Merging of nearly equal minutes (for light that varies a little every minute, e.g. daylight at
 * the eye): a run of minutes becomes one segment at its mean level while
 * max − min ≤ relative · max + absolute_lx over the run. Default: exact (only equal values merge).
 */
export interface PerMinuteMerge {
  readonly relative?: number;
  readonly absolute_lx?: number;
}

/**
 * Builds a series from per-minute levels (e.g. 1440 values per day of light at the eye).
 * Consecutive equal values merge into one segment, so a day with four light changes gives
 * five segments and the solver restarts only four times. O(n), no allocation per value
 * beyond the output arrays. With `merge`, nearly equal minutes merge too (see PerMinuteMerge):
 * each restart costs about as much as several solver steps, so light that changes every minute
 * should be merged (or given as smooth pieces) rather than passed minute by minute.
 */
export function lightFromPerMinute(values: ArrayLike<number>, unit: LightUnit, start_h = 0, merge?: PerMinuteMerge): LightSeries {
  const n = values.length;
  if (n === 0) throw new Error('light series: no values');
  const rel = merge?.relative ?? 0;
  const abs = merge?.absolute_lx ?? 0;
  const starts: number[] = [];
  const levels: number[] = [];
  let segStart = 0;
  let lo = checkedLevel(values[0] as number, 0);
  let hi = lo;
  let sum = lo;
  const close = (end: number) => {
    starts.push(start_h + segStart / 60);
    levels.push(lo === hi ? lo : sum / (end - segStart));
  };
  for (let i = 1; i < n; i++) {
    const v = checkedLevel(values[i] as number, i);
    const nlo = v < lo ? v : lo;
    const nhi = v > hi ? v : hi;
    if (nhi - nlo <= rel * nhi + abs) {
      lo = nlo;
      hi = nhi;
      sum += v;
      continue;
    }
    close(i);
    segStart = i;
    lo = v;
    hi = v;
    sum = v;
  }
  close(n);
  return { unit, start_h: Float64Array.from(starts), level: Float64Array.from(levels), end_h: start_h + n / 60 };
}

function checkedLevel(v: number, index: number): number {
  if (!Number.isFinite(v) || v < 0) throw new Error(`light series: value ${index} is ${v}; light must be a finite number ≥ 0 lx`);
  return v;
}

/** Builds a series from (time, level) breakpoints; each level holds until the next time. */
export function lightFromSteps(times_h: ArrayLike<number>, levels: ArrayLike<number>, unit: LightUnit, end_h?: number): LightSeries {
  const n = times_h.length;
  if (n === 0 || levels.length !== n) throw new Error('light series: times and levels must be non-empty and equally long');
  const start = new Float64Array(n);
  const level = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const t = times_h[i] as number;
    if (!Number.isFinite(t)) throw new Error(`light series: time ${i} is not a finite number`);
    if (i > 0 && !(t > (start[i - 1] as number))) throw new Error(`light series: time ${i} (${t} h) is not after the previous one`);
    start[i] = t;
    level[i] = checkedLevel(levels[i] as number, i);
  }
  const last = start[n - 1] as number;
  return { unit, start_h: start, level, end_h: end_h ?? last };
}

/** Constant light over [0, end_h). */
export function constantLight(level: number, unit: LightUnit, end_h = 24): LightSeries {
  return lightFromSteps([0], [level], unit, end_h);
}

/** Index of the segment containing t (first segment for t before the start). */
export function segmentIndexAt(series: LightSeries, t_h: number): number {
  const s = series.start_h;
  let lo = 0;
  let hi = s.length - 1;
  if (t_h < (s[0] as number)) return 0;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if ((s[mid] as number) <= t_h) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Light level of segment i at time t. */
export function segmentLevel(series: LightSeries, i: number, t_h: number): number {
  const f = series.smooth?.[i];
  return f === undefined ? (series.level[i] as number) : Math.max(0, f(t_h));
}

export function lightAt(series: LightSeries, t_h: number): number {
  return segmentLevel(series, segmentIndexAt(series, t_h), t_h);
}

/** The same series with every level (and smooth piece) multiplied by `factor`, in a new unit. */
export function scaledLightSeries(series: LightSeries, factor: number, unit: LightUnit): LightSeries {
  const level = series.level.map((v) => v * factor);
  const smooth = series.smooth?.map((f) => (f === undefined ? undefined : (t: number) => factor * f(t)));
  return smooth === undefined
    ? { unit, start_h: series.start_h, level, end_h: series.end_h }
    : { unit, start_h: series.start_h, level, smooth, end_h: series.end_h };
}
