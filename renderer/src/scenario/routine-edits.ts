// Edits of a persona's routine (the week of timeline segments). Pure functions returning a new
// scenario; the input is never changed. A weekday that names a day template is copied inline
// before its first edit, so changing Tuesday never silently changes every workday.
import type { PersonaInput, ScenarioInput, SegmentInput, Weekday } from './scenario-types.js';
import { clockOf, durationMin, MINUTES_PER_DAY, minutesOf } from './clock-minutes.js';

export const WEEKDAY_ORDER: readonly Weekday[] = ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'];
export const WEEKDAY_NAMES: Record<Weekday, string> = { mon: 'Monday', tue: 'Tuesday', wed: 'Wednesday', thu: 'Thursday', fri: 'Friday', sat: 'Saturday', sun: 'Sunday' };

/** The segments a persona follows on a weekday (templates resolved); [] without a week. */
export function daySegments(persona: PersonaInput, day: Weekday): readonly SegmentInput[] {
  const plan = persona.week?.[day];
  if (plan === undefined) return [];
  if (typeof plan === 'string') return persona.templates?.[plan] ?? [];
  return plan;
}

/** Name of the template a weekday uses, or null when its plan is written inline. */
export function dayTemplateName(persona: PersonaInput, day: Weekday): string | null {
  const plan = persona.week?.[day];
  return typeof plan === 'string' ? plan : null;
}

function withPersona(scenario: ScenarioInput, personaId: string, change: (p: PersonaInput) => PersonaInput): ScenarioInput {
  return { ...scenario, personas: scenario.personas.map((p) => (p.id === personaId ? change(p) : p)) };
}

function sortedByStart(segments: readonly SegmentInput[]): SegmentInput[] {
  return [...segments].sort((a, b) => minutesOf(a.start) - minutesOf(b.start));
}

/** Replaces a weekday's segments (written inline, sorted by start). */
export function setDaySegments(scenario: ScenarioInput, personaId: string, day: Weekday, segments: readonly SegmentInput[]): ScenarioInput {
  return withPersona(scenario, personaId, (p) => {
    const week = p.week ?? { mon: [], tue: [], wed: [], thu: [], fri: [], sat: [], sun: [] };
    return { ...p, week: { ...week, [day]: sortedByStart(segments) } };
  });
}

function persona(scenario: ScenarioInput, personaId: string): PersonaInput | undefined {
  return scenario.personas.find((p) => p.id === personaId);
}

export function addSegment(scenario: ScenarioInput, personaId: string, day: Weekday, segment: SegmentInput): ScenarioInput {
  const p = persona(scenario, personaId);
  if (p === undefined) return scenario;
  return setDaySegments(scenario, personaId, day, [...daySegments(p, day), segment]);
}

export function removeSegment(scenario: ScenarioInput, personaId: string, day: Weekday, index: number): ScenarioInput {
  const p = persona(scenario, personaId);
  if (p === undefined) return scenario;
  return setDaySegments(scenario, personaId, day, daySegments(p, day).filter((_, i) => i !== index));
}

export function updateSegment(scenario: ScenarioInput, personaId: string, day: Weekday, index: number, patch: Partial<SegmentInput>): ScenarioInput {
  const p = persona(scenario, personaId);
  if (p === undefined) return scenario;
  return setDaySegments(scenario, personaId, day, daySegments(p, day).map((s, i) => (i === index ? { ...s, ...patch } : s)));
}

/**
 * Moves a segment by `delta_min`, keeping its length. The start stays within the day
 * (00:00..23:59); the end may run past midnight as the format allows.
 */
export function moveSegment(scenario: ScenarioInput, personaId: string, day: Weekday, index: number, delta_min: number): ScenarioInput {
  const p = persona(scenario, personaId);
  const seg = p === undefined ? undefined : daySegments(p, day)[index];
  if (seg === undefined) return scenario;
  const length = durationMin(seg.start, seg.end);
  const start = Math.max(0, Math.min(MINUTES_PER_DAY - 1, minutesOf(seg.start) + delta_min));
  const end = (start + length) % MINUTES_PER_DAY;
  return updateSegment(scenario, personaId, day, index, { start: clockOf(start), end: end === 0 ? '24:00' : clockOf(end) });
}

/** Moves one edge of a segment; the segment keeps at least `minLength_min`. */
export function resizeSegment(scenario: ScenarioInput, personaId: string, day: Weekday, index: number, edge: 'start' | 'end', delta_min: number, minLength_min = 5): ScenarioInput {
  const p = persona(scenario, personaId);
  const seg = p === undefined ? undefined : daySegments(p, day)[index];
  if (seg === undefined) return scenario;
  const length = durationMin(seg.start, seg.end);
  const newLength = Math.max(minLength_min, Math.min(MINUTES_PER_DAY - minLength_min, length + (edge === 'end' ? delta_min : -delta_min)));
  if (edge === 'end') {
    const end = (minutesOf(seg.start) + newLength) % MINUTES_PER_DAY;
    return updateSegment(scenario, personaId, day, index, { end: end === 0 ? '24:00' : clockOf(end) });
  }
  const start = (((minutesOf(seg.end) - newLength) % MINUTES_PER_DAY) + MINUTES_PER_DAY) % MINUTES_PER_DAY;
  return updateSegment(scenario, personaId, day, index, { start: clockOf(start) });
}

/** Pieces of a weekday's segments as drawn on a 24 h row (past-midnight parts go to the next row). */
export interface TimelinePiece {
  readonly day: Weekday;
  readonly index: number;
  readonly from_min: number;
  readonly to_min: number;
  readonly continued: boolean;
  readonly segment: SegmentInput;
}

export function timelinePieces(persona: PersonaInput): TimelinePiece[] {
  const pieces: TimelinePiece[] = [];
  WEEKDAY_ORDER.forEach((day, d) => {
    daySegments(persona, day).forEach((segment, index) => {
      const a = minutesOf(segment.start);
      const b = minutesOf(segment.end);
      if (b > a) {
        pieces.push({ day, index, from_min: a, to_min: b, continued: false, segment });
      } else {
        pieces.push({ day, index, from_min: a, to_min: MINUTES_PER_DAY, continued: false, segment });
        const next = WEEKDAY_ORDER[(d + 1) % 7] ?? 'mon';
        if (b > 0) pieces.push({ day: next, index, from_min: 0, to_min: b, continued: true, segment });
      }
    });
  });
  return pieces;
}
