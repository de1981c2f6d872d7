// Chart data for "Body clock": CBTmin and DLMO clock times day by day for each strategy,
// as the local wall clock shows them (wall-clock.ts), unwrapped across midnight, and the phase
// shift of each strategy against the baseline (in real time: the body clock sees no clock change).
// Convention (common practice in circadian research): an advance is a move to an earlier clock
// time and is reported as a positive shift.
import type { DayPhase, NamedItem, RunView } from '../results/view-model.js';
import { clockHourOf, unwrapClockHours } from './clock.js';
import { STEADY_CLOCK, type WallClock } from './wall-clock.js';

export type PhaseMarker = 'dlmo' | 'cbtmin';

export type PhaseRow = { day: number } & Record<string, number | null>;

export function phaseKey(strategyId: string, marker: PhaseMarker): string {
  return `${strategyId}:${marker}`;
}

function clockOfDay(phase: DayPhase, marker: PhaseMarker, clock: WallClock): number | null {
  const t = marker === 'dlmo' ? phase.dlmo_h : phase.cbtmin_h;
  return t === null ? null : clock.clockOf(t);
}

/** One row per day; columns `${strategy}:${marker}` hold unwrapped wall-clock hours. */
export function phaseByDayRows(runs: readonly RunView[], strategies: readonly NamedItem[], days: number, marker: PhaseMarker, clock: WallClock = STEADY_CLOCK): PhaseRow[] {
  const rows: PhaseRow[] = Array.from({ length: days }, (_, day) => ({ day }) as PhaseRow);
  let reference: number | null = null;
  for (const strategy of strategies) {
    const run = runs.find((r) => r.strategyId === strategy.id);
    if (run === undefined) continue;
    const byDay = Array.from({ length: days }, (_, day) => {
      const p = run.phases.find((x) => x.day === day);
      return p === undefined ? null : clockOfDay(p, marker, clock);
    });
    const firstKnown = byDay.find((v) => v !== null) ?? null;
    reference ??= firstKnown;
    const unwrapped = unwrapClockHours(byDay, reference);
    unwrapped.forEach((v, day) => {
      const row = rows[day];
      if (row !== undefined) row[phaseKey(strategy.id, marker)] = v;
    });
  }
  return rows;
}

/**
 * Phase shift of `run` versus `baseline` on the last day both have the marker, in hours;
 * positive = advance (earlier). Null when no common day exists.
 */
export function phaseShiftVsBaseline_h(run: RunView, baseline: RunView, marker: PhaseMarker): number | null {
  for (let i = run.phases.length - 1; i >= 0; i--) {
    const p = run.phases[i];
    if (p === undefined) continue;
    const b = baseline.phases.find((x) => x.day === p.day);
    const a = marker === 'dlmo' ? p.dlmo_h : p.cbtmin_h;
    const c = b === undefined ? null : marker === 'dlmo' ? b.dlmo_h : b.cbtmin_h;
    if (a === null || c === null) continue;
    let diff = clockHourOf(c) - clockHourOf(a);
    if (diff > 12) diff -= 24;
    if (diff < -12) diff += 24;
    return diff;
  }
  return null;
}
