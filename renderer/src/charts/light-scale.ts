// Scales for light at the eye. Daylight outdoors reaches thousands to tens of thousands of lux
// while indoor and evening light sit between 1 and a few hundred, so one bright spell on a linear
// axis flattens the rest of the day. Two readable choices: a linear axis capped at a round value
// above most of the day's light (taller peaks cut, their maximum stated), or a log axis of the
// total with decade ticks.
import { MINUS } from './number-format.js';

export type LightScale = 'capped' | 'log';

/** Lowest value drawn on the log axis (lx); darker moments are drawn at this floor. */
export const LOG_FLOOR_LX = 0.1;

/**
 * Top of a capped light axis: a round value above the 90th percentile of the day's lit values
 * (at least 400 lx, so the 250 lx line shows); taller peaks are cut and their maximum reported.
 */
export function lightAxisTop_lx(totals: readonly number[]): { top: number; peak: number } {
  const lit = totals.filter((v) => v > 0.5).sort((a, b) => a - b);
  const peak = lit[lit.length - 1] ?? 0;
  const p90 = lit[Math.floor(0.9 * (lit.length - 1))] ?? 0;
  const want = Math.max(400, 1.25 * p90);
  const step = want <= 1000 ? 100 : want <= 5000 ? 500 : 1000;
  const top = Math.ceil(want / step) * step;
  return { top: peak <= top ? Math.max(top, Math.ceil(peak / step) * step) : top, peak };
}

/** Decade ticks of a log light axis from the floor to the first decade at or above the peak. */
export function logLightTicks(peak_lx: number): { domain: [number, number]; ticks: number[] } {
  const top = 10 ** Math.max(1, Math.ceil(Math.log10(Math.max(peak_lx, 10))));
  const ticks: number[] = [];
  for (let v = LOG_FLOOR_LX; v <= top * 1.0001; v *= 10) ticks.push(Number(v.toPrecision(1)));
  return { domain: [LOG_FLOOR_LX, top], ticks };
}

/** Lux for an axis or a tooltip: "0.1", "10", "1 500", "12 000" (thin-spaced thousands, as SI writes them). */
export function formatLux(value: number): string {
  if (!Number.isFinite(value)) return '—';
  const sign = value < 0 ? MINUS : '';
  const v = Math.abs(value);
  if (v < 10) return `${sign}${Number(v.toPrecision(2))}`;
  return `${sign}${Math.round(v)
    .toString()
    .replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009')}`;
}
