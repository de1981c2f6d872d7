// Cohort bands for the day-by-day charts: the spread of the body-clock markers and of melatonin
// across a cohort's virtual occupants, as a 5–95 % band and an interquartile band around each
// strategy's own curve. Quantiles: Hyndman & Fan 1996 definition 7 (model/cohort/quantiles.ts).
//
// Markers: each day, every occupant's marker nearest the strategy's own marker that day (within
// 12 h, so a marker drifting across midnight is matched to the same night) is taken as an offset
// from the strategy's own; the band is the drawn curve plus the quantiles of those offsets, so it
// sits on the curve's unwrapped clock axis. Melatonin: each occupant's curve (a regular 20-minute
// grid from 0 h) is read at every chart row's real time.
import { quantileOfSorted } from '../../../model/cohort/quantiles.js';
import type { RunView } from '../results/view-model.js';
import type { PhaseMarker } from './phase-data.js';

/** What the bands need of an occupant's body clock under one strategy (schedules/run OccupantClockSeries). */
export interface OccupantBodyClock {
  readonly dlmo_h: readonly number[];
  readonly cbtmin_h: readonly number[];
  readonly melatonin_pmol_L: ArrayLike<number>;
  /** Spacing of the melatonin grid, h. */
  readonly melatonin_step_h: number;
}

/** A band at one point: 5–95 % and interquartile range as [low, high] pairs (recharts range areas). */
export interface BandPoint {
  readonly outer: [number, number];
  readonly inner: [number, number];
  readonly median: number;
  readonly n: number;
}

/** Occupants needed before a band is drawn (fewer say little about a spread). */
export const MIN_BAND_OCCUPANTS = 5;

export function bandOf(values: readonly number[]): BandPoint | null {
  const sorted = values.filter((v) => Number.isFinite(v)).sort((a, b) => a - b);
  if (sorted.length < MIN_BAND_OCCUPANTS) return null;
  const q = (p: number) => quantileOfSorted(sorted, p);
  return { outer: [q(0.05), q(0.95)], inner: [q(0.25), q(0.75)], median: q(0.5), n: sorted.length };
}

function nearest(times: readonly number[], reference: number, within_h: number): number | null {
  let best: number | null = null;
  for (const t of times) if (Math.abs(t - reference) <= within_h && (best === null || Math.abs(t - reference) < Math.abs(best - reference))) best = t;
  return best;
}

/**
 * Bands of a marker day by day for one strategy: for each day with the strategy's own marker
 * (`run`) and its drawn value (`drawn[day]`, the chart's unwrapped clock hours), the band in the
 * same clock hours; null where either is missing.
 */
export function markerBands(occupants: readonly OccupantBodyClock[], run: RunView, marker: PhaseMarker, drawn: readonly (number | null | undefined)[]): (BandPoint | null)[] {
  return drawn.map((value, day) => {
    const own = run.phases.find((p) => p.day === day);
    const reference = own === undefined ? null : marker === 'dlmo' ? own.dlmo_h : own.cbtmin_h;
    if (reference === null || value === null || value === undefined) return null;
    const offsets = occupants.flatMap((o) => {
      const t = nearest(marker === 'dlmo' ? o.dlmo_h : o.cbtmin_h, reference, 12);
      return t === null ? [] : [t - reference];
    });
    const band = bandOf(offsets);
    if (band === null) return null;
    const at = (d: number) => value + d;
    return { outer: [at(band.outer[0]), at(band.outer[1])], inner: [at(band.inner[0]), at(band.inner[1])], median: at(band.median), n: band.n };
  });
}

/** Linear interpolation in a regular grid from 0 h; NaN outside it or between missing samples. */
export function gridValueAt(grid: ArrayLike<number>, step_h: number, t_h: number): number {
  const f = t_h / step_h;
  const i = Math.floor(f);
  if (i < 0 || i >= grid.length) return Number.NaN;
  const a = grid[i] ?? Number.NaN;
  if (i + 1 >= grid.length) return f === i ? a : Number.NaN;
  const b = grid[i + 1] ?? Number.NaN;
  return a + (b - a) * (f - i);
}

/** Bands of melatonin at each real time (hours since the run start). */
export function melatoninBands(occupants: readonly OccupantBodyClock[], times_h: readonly number[]): (BandPoint | null)[] {
  return times_h.map((t) => bandOf(occupants.map((o) => gridValueAt(o.melatonin_pmol_L, o.melatonin_step_h, t))));
}

/** Chart keys of a strategy's bands. */
export function bandKeys(strategyId: string): { outer: string; inner: string } {
  return { outer: `${strategyId}:band-outer`, inner: `${strategyId}:band-inner` };
}
