/**
 * Per-minute melanopic EDI merged into segments for the body-clock solver: consecutive minutes
 * join while each stays within ±`relTol` of the segment's running mean (or within `absTol_lx`
 * of it, for dim light); a segment's level is the mean of its minutes, so the melanopic dose
 * (lx·h) is kept exactly. Fewer breakpoints let the adaptive solver take long steps; the
 * effect on the phase markers is checked in schedules/run/light-segments.test.ts and recorded
 * in docs/validation/pipeline.md.
 */
import type { LightSeries } from '../../model/circadian/light-series.js';

export const DEFAULT_SEGMENT_REL_TOL = 0.1;

/**
 * Times handed to the body-clock solver are rounded to 1/1024 h (3.5 s): such values are exact
 * in binary floating point, so a day's breakpoints shifted by whole days (24 h + t − 24 h, as in
 * the solver's repeated-day entrainment) land exactly on themselves.
 */
export function dyadicHours(minutes: number): number {
  return Math.round((minutes / 60) * 1024) / 1024;
}
export const DEFAULT_SEGMENT_ABS_TOL_LX = 1;

export function mergedLightSeries(mel_lx: ArrayLike<number>, relTol = DEFAULT_SEGMENT_REL_TOL, absTol_lx = DEFAULT_SEGMENT_ABS_TOL_LX): LightSeries {
  const n = mel_lx.length;
  if (n === 0) throw new Error('light series: no minutes');
  const starts: number[] = [];
  const levels: number[] = [];
  let segStart = 0;
  let sum = Math.max(0, mel_lx[0] ?? 0);
  for (let i = 1; i <= n; i++) {
    const v = i < n ? Math.max(0, mel_lx[i] ?? 0) : Number.NaN;
    const mean = sum / (i - segStart);
    const tol = Math.max(absTol_lx, relTol * mean);
    if (i < n && Math.abs(v - mean) <= tol) {
      sum += v;
      continue;
    }
    starts.push(dyadicHours(segStart));
    levels.push(mean);
    segStart = i;
    sum = v;
  }
  return { unit: 'mel_edi_lx', start_h: Float64Array.from(starts), level: Float64Array.from(levels), end_h: dyadicHours(n) };
}
