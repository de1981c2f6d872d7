/** A strategy's behaviour changes — added segments and modified segments — on a wall-time timeline. */
import type { SegmentMatch, SegmentPatch, Strategy } from '../schema/scenario-types.js';
import { clockTimeToMinutes } from '../time/clock-time.js';
import type { Painted } from './interval-painter.js';
import { IntervalPainter } from './interval-painter.js';
import type { DayKind } from './exposure-types.js';
import { stateFromSegment, WALL_DAY_MIN, weekdayOf, dateOfDay, type WallState } from './wall-state.js';
import { clockSpan } from '../time/clock-time.js';

export interface DayInfo {
  readonly startDate: string;
  readonly firstDay: number;
  readonly lastDay: number;
  readonly dayKind: (d: number) => DayKind | null;
}

function matches(state: WallState, m: SegmentMatch): boolean {
  if (m.activity !== undefined && !m.activity.includes(state.activity)) return false;
  if (m.place !== undefined && !m.place.includes(state.placeId)) return false;
  if (m.commute !== undefined && state.commute !== m.commute) return false;
  if (m.shiftKind !== undefined && (state.shiftKind === null || !m.shiftKind.includes(state.shiftKind))) return false;
  return true;
}

function patched(state: WallState, p: SegmentPatch): WallState {
  return {
    ...state,
    placeId: p.place ?? state.placeId,
    posture: p.posture ?? state.posture,
    gaze: p.gaze ?? state.gaze,
    screenId: p.screen === undefined ? state.screenId : p.screen,
    screenBrightness: p.screenBrightness ?? state.screenBrightness,
    eyewearId: p.eyewear === undefined ? state.eyewearId : p.eyewear,
    origin: 'strategy',
  };
}

/** Applies the strategy's behaviour changes for one persona, in the order written. */
export function applyBehaviour(painter: IntervalPainter<WallState>, strategy: Strategy | undefined, personaId: string, days: DayInfo): void {
  if (strategy === undefined) return;
  for (const c of strategy.changes) {
    if (c.op === 'add-segment' && c.persona === personaId) {
      const span = clockSpan(c.segment.start, c.segment.end);
      for (let d = days.firstDay; d <= days.lastDay; d++) {
        if (c.days !== undefined && !c.days.includes(weekdayOf(dateOfDay(days.startDate, d)))) continue;
        const kind = days.dayKind(d);
        if (c.shiftKind !== undefined && (kind === null || !c.shiftKind.includes(kind))) continue;
        painter.paint(d * WALL_DAY_MIN + span.start_min, d * WALL_DAY_MIN + span.end_min, stateFromSegment(c.segment, 'strategy', { shiftKind: kind }));
      }
    } else if (c.op === 'modify-segments' && c.persona === personaId) {
      const m = c.match;
      const from = m.from === undefined ? 0 : clockTimeToMinutes(m.from);
      let to = m.to === undefined ? WALL_DAY_MIN : clockTimeToMinutes(m.to);
      if (to <= from) to += WALL_DAY_MIN;
      const repaint: Painted<WallState>[] = [];
      const current = painter.intervals();
      for (let d = days.firstDay; d <= days.lastDay; d++) {
        if (m.days !== undefined && !m.days.includes(weekdayOf(dateOfDay(days.startDate, d)))) continue;
        const w0 = d * WALL_DAY_MIN + from;
        const w1 = d * WALL_DAY_MIN + to;
        for (const it of current) {
          if (it.end <= w0 || it.start >= w1 || !matches(it.value, m)) continue;
          repaint.push({ start: Math.max(it.start, w0), end: Math.min(it.end, w1), value: patched(it.value, c.set) });
        }
      }
      for (const r of repaint) painter.paint(r.start, r.end, r.value);
    }
  }
}
