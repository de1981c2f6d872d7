/**
 * A measured log on the run's minute grid. Each reading stands for the interval up to the next
 * reading, at most one usual sampling interval (loggers report the mean or a spot value per
 * interval); a minute's value is the time-weighted mean of the readings covering it.
 * Minutes no reading covers are gaps, filled by the log's rule:
 *   model  → left to the light models (measured = 0),
 *   dark   → 0 lx,
 *   hold   → the last reading before the gap,
 *   linear → straight line between the readings either side.
 * Outside the logged period the modelled light is always used.
 */
import type { ImportedLightLog } from './import-light-log.js';

export interface MinuteLightSeries {
  /** Photopic illuminance per minute (NaN where not measured or not logged). */
  readonly photopic_lx: Float64Array;
  /** Melanopic EDI per minute (NaN where not measured or not logged). */
  readonly melanopicEdi_lx: Float64Array;
  /** 1 where the log gives the light at the eye (reading or filled gap), 0 where the model does. */
  readonly measured: Uint8Array;
}

const MS_PER_MIN = 60_000;

export function logToMinuteSeries(log: ImportedLightLog, runStartUtc_ms: number, total_min: number): MinuteLightSeries {
  const sumLux = new Float64Array(total_min);
  const sumMel = new Float64Array(total_min);
  const wLux = new Float64Array(total_min);
  const wMel = new Float64Array(total_min);
  const interval_ms = log.interval_s * 1000;
  const s = log.samples;
  for (let i = 0; i < s.length; i++) {
    const cur = s[i];
    if (cur === undefined) continue;
    const next = s[i + 1];
    const a = (cur.utc_ms - runStartUtc_ms) / MS_PER_MIN;
    const b = (Math.min(cur.utc_ms + interval_ms, next?.utc_ms ?? Infinity) - runStartUtc_ms) / MS_PER_MIN;
    const m0 = Math.max(0, Math.floor(a));
    const m1 = Math.min(total_min, Math.ceil(b));
    for (let m = m0; m < m1; m++) {
      const w = Math.min(b, m + 1) - Math.max(a, m);
      if (w <= 0) continue;
      if (cur.photopic_lx !== null) {
        sumLux[m] = (sumLux[m] ?? 0) + w * cur.photopic_lx;
        wLux[m] = (wLux[m] ?? 0) + w;
      }
      if (cur.melanopicEdi_lx !== null) {
        sumMel[m] = (sumMel[m] ?? 0) + w * cur.melanopicEdi_lx;
        wMel[m] = (wMel[m] ?? 0) + w;
      }
    }
  }
  const lux = new Float64Array(total_min).fill(Number.NaN);
  const mel = new Float64Array(total_min).fill(Number.NaN);
  const measured = new Uint8Array(total_min);
  // A minute at least half covered by readings counts as measured.
  for (let m = 0; m < total_min; m++) {
    const w = Math.max(wLux[m] ?? 0, wMel[m] ?? 0);
    if (w >= 0.5) {
      measured[m] = 1;
      if ((wLux[m] ?? 0) > 0) lux[m] = (sumLux[m] ?? 0) / (wLux[m] ?? 1);
      if ((wMel[m] ?? 0) > 0) mel[m] = (sumMel[m] ?? 0) / (wMel[m] ?? 1);
    }
  }
  if (log.fill !== 'model') {
    const first = Math.max(0, Math.floor((log.start_ms - runStartUtc_ms) / MS_PER_MIN));
    const last = Math.min(total_min, Math.ceil((log.end_ms - runStartUtc_ms) / MS_PER_MIN));
    for (const arr of [lux, mel]) fillGaps(arr, measured, first, last, log.fill);
    for (let m = first; m < last; m++) measured[m] = 1;
  }
  return { photopic_lx: lux, melanopicEdi_lx: mel, measured };
}

function fillGaps(values: Float64Array, measured: Uint8Array, first: number, last: number, rule: 'dark' | 'hold' | 'linear'): void {
  let m = first;
  while (m < last) {
    if (measured[m] === 1) {
      m++;
      continue;
    }
    let end = m;
    while (end < last && measured[end] !== 1) end++;
    const before = m > 0 ? (values[m - 1] ?? Number.NaN) : Number.NaN;
    const after = end < values.length ? (values[end] ?? Number.NaN) : Number.NaN;
    for (let k = m; k < end; k++) {
      if (rule === 'dark') values[k] = 0;
      else if (rule === 'hold') values[k] = Number.isNaN(before) ? after : before;
      else if (Number.isNaN(before) || Number.isNaN(after)) values[k] = Number.isNaN(before) ? after : before;
      else values[k] = before + ((after - before) * (k - m + 1)) / (end - m + 1);
    }
    m = end;
  }
}
