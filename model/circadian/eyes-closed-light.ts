/**
 * Light behind closed eyelids for the body-clock models. While a person sleeps, the light that
 * reaches the eye has passed the eyelids (model/photometry/eyelid-transmittance.ts), so the
 * simulation reads two series: light at the open eye while awake and light behind the closed
 * eyelids while asleep. The scenario pipeline computes the closed-eye series per source from
 * each source's spectrum; a bare light series (the `simulate` command, tests) gets the eyelid's
 * melanopic transmittance for the models' calibration source, CIE FL2 (0.30 %; calibration.ts).
 *
 * receivedLightSeries() joins the two into the light actually received over a period once the
 * sleep episodes are known (open eye awake, closed eyelids asleep), for the passes that run after
 * the sleep/wake pass (melatonin).
 */
import { datasetColumn } from '../data/datasets.js';
import { eyelidMelanopicTransmittance } from '../photometry/eyelid-transmittance.js';
import { resampleLinear } from '../photometry/resample.js';
import { spectrum } from '../photometry/spectrum.js';
import { CALIBRATION_ILLUMINANT } from './calibration.js';
import { segmentIndexAt, type LightSeries, type SmoothLight } from './light-series.js';
import type { SleepEpisode } from './sleep-input.js';

let calibrationLid: number | undefined;

/** Melanopic transmittance of the closed eyelids for the calibration source (CIE FL2), 0–1. */
export function calibrationEyelidTransmission(): number {
  if (calibrationLid === undefined) {
    const t = 'spectra/cie_fluorescent_FL1_FL12_1nm.csv';
    calibrationLid = eyelidMelanopicTransmittance(spectrum(resampleLinear(datasetColumn(t, 'wavelength_nm'), datasetColumn(t, CALIBRATION_ILLUMINANT)).values, false));
  }
  return calibrationLid;
}

/**
 * The light received over [start_h, end_h): `open` outside the sleep episodes, `closed` inside
 * (both in the same unit). With `periodic`, both series repeat their [0, 24) h every day, as in
 * the entrainment runs; the result is not periodic. Pieces of equal constant level are joined.
 */
export function receivedLightSeries(open: LightSeries, closed: LightSeries, sleep: readonly SleepEpisode[], start_h: number, end_h: number, periodic: boolean): LightSeries {
  if (open.unit !== closed.unit) throw new Error(`open-eye light is in ${open.unit}, closed-eye light in ${closed.unit}`);
  const cuts: number[] = [start_h];
  const inside = (t: number) => t > start_h && t < end_h;
  for (const s of [open, closed]) {
    if (periodic) {
      for (let d = Math.floor(start_h / 24); d * 24 < end_h; d++) {
        if (inside(d * 24)) cuts.push(d * 24);
        for (const b of s.start_h) if (b < 24 && inside(d * 24 + b)) cuts.push(d * 24 + b);
      }
    } else for (const b of s.start_h) if (inside(b)) cuts.push(b);
  }
  for (const e of sleep) {
    if (inside(e.start_h)) cuts.push(e.start_h);
    if (inside(e.end_h)) cuts.push(e.end_h);
  }
  cuts.sort((a, b) => a - b);
  const times = cuts.filter((t, i) => i === 0 || t > (cuts[i - 1] as number));

  const starts: number[] = [];
  const levels: number[] = [];
  const smooth: (SmoothLight | undefined)[] = [];
  let anySmooth = false;
  let ep = 0;
  for (let i = 0; i < times.length; i++) {
    const a = times[i] as number;
    const b = times[i + 1] ?? end_h;
    const mid = b > a ? 0.5 * (a + b) : a;
    while (ep < sleep.length && (sleep[ep] as SleepEpisode).end_h <= mid) ep++;
    const e = sleep[ep];
    const series = e !== undefined && e.start_h <= mid && mid < e.end_h ? closed : open;
    const dayOffset = periodic ? 24 * Math.floor(mid / 24) : 0;
    const idx = segmentIndexAt(series, mid - dayOffset);
    const f = series.smooth?.[idx];
    const level = series.level[idx] as number;
    const last = starts.length - 1;
    if (f === undefined && last >= 0 && smooth[last] === undefined && levels[last] === level) continue;
    starts.push(a);
    levels.push(level);
    if (f !== undefined) anySmooth = true;
    smooth.push(f === undefined ? undefined : dayOffset === 0 ? f : (t: number) => f(t - dayOffset));
  }
  const out = { unit: open.unit, start_h: Float64Array.from(starts), level: Float64Array.from(levels), end_h };
  return anySmooth ? { ...out, smooth } : out;
}
