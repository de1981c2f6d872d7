/**
 * Shift rosters → work, commute and sleep segments in wall minutes.
 *
 * Sleep rules (planning conventions of our own, documented in docs/methods/scenarios.md):
 *  - Night sleep after a day, evening or rest day starts at the usual bedtime, or after the
 *    journey home plus wind-down when a late shift ends later. It lasts mainSleep_h unless the
 *    next shift forces an earlier wake (journey + get-ready time before the shift); then bedtime
 *    moves up to 1 h earlier and the rest of the loss shortens the sleep.
 *  - After a night shift, sleep starts after the journey home plus wind-down: afterNightSleep_h
 *    when another night follows ("morning"), or a shorter morning sleep plus an afternoon nap
 *    ending before the next journey ("split"); after the last night of a block, a short recovery
 *    sleep of recoveryAfterLastNight_h, and the normal night sleep that evening.
 *  - Before the first night of a block, an optional nap ends at the get-ready time.
 */
import type { Persona, Roster, Shift } from '../schema/scenario-types.js';
import { REST_DAY } from '../schema/roster-schema.js';
import { clockSpan, clockTimeToMinutes } from '../time/clock-time.js';
import { daysBetween } from '../time/local-calendar.js';
import type { DayKind } from './exposure-types.js';
import { dateOfDay, WALL_DAY_MIN, type WallState } from './wall-state.js';

export interface WallSegment {
  readonly start: number;
  readonly end: number;
  readonly state: WallState;
}

export interface RosterDay {
  readonly shift: Shift | undefined;
  readonly kind: DayKind;
}

export function rosterDay(roster: Roster, offsetDays: number, date: string): RosterDay {
  const n = roster.cycle.length;
  const k = (((daysBetween(roster.anchorDate, date) + offsetDays) % n) + n) % n;
  const id = roster.cycle[k] ?? REST_DAY;
  const shift = id === REST_DAY ? undefined : roster.shifts.find((s) => s.id === id);
  return { shift, kind: shift?.kind ?? 'rest' };
}

/** Segments for days firstDay…lastDay (day indices relative to the run start; may be negative). */
export function rosterSegments(persona: Persona, roster: Roster, offsetDays: number, startDate: string, firstDay: number, lastDay: number): { segments: WallSegment[]; dayKind: (d: number) => DayKind } {
  const cache = new Map<number, RosterDay>();
  const day = (d: number): RosterDay => {
    let r = cache.get(d);
    if (r === undefined) {
      r = rosterDay(roster, offsetDays, dateOfDay(startDate, d));
      cache.set(d, r);
    }
    return r;
  };
  const rules = roster.sleep;
  const commute_min = roster.commute?.minutes ?? 0;
  const bedroom = rules.place ?? persona.home;
  const shiftSpan = (d: number): { start: number; end: number } | undefined => {
    const sh = day(d).shift;
    if (sh === undefined) return undefined;
    const s = clockSpan(sh.start, sh.end);
    return { start: d * WALL_DAY_MIN + s.start_min, end: d * WALL_DAY_MIN + s.end_min };
  };
  const base = (kind: DayKind): Omit<WallState, 'placeId' | 'activity' | 'posture' | 'gaze'> => ({
    gazeAzimuth_deg: null,
    screenId: null,
    screenBrightness: 1,
    eyewearId: null,
    shiftKind: kind,
    commute: null,
    origin: 'roster',
  });
  const sleepState = (kind: DayKind, activity: 'sleep' | 'nap'): WallState => ({ ...base(kind), placeId: bedroom, activity, posture: 'lying', gaze: 'room' });

  const sleeps: WallSegment[] = [];
  const work: WallSegment[] = [];
  const mainSleep_min = rules.mainSleep_h * 60;
  const bedtime = clockTimeToMinutes(rules.usualBedtime);
  const usualBed_offset = bedtime < 12 * 60 ? bedtime + WALL_DAY_MIN : bedtime; // a bedtime after midnight belongs to the evening before

  for (let d = firstDay; d <= lastDay; d++) {
    const today = day(d);
    const span = shiftSpan(d);
    if (today.shift !== undefined && span !== undefined) {
      const sh = today.shift;
      work.push({ start: span.start, end: span.end, state: { ...base(today.kind), placeId: sh.place, activity: 'work', posture: sh.posture, gaze: sh.gaze, screenId: sh.screen ?? null } });
      if (roster.commute !== undefined && commute_min > 0) {
        const c = roster.commute;
        const journey = (dir: 'to-work' | 'from-work'): WallState => ({ ...base(today.kind), placeId: c.place, activity: 'commute', posture: c.posture, gaze: 'ahead', commute: dir });
        work.push({ start: span.start - commute_min, end: span.start, state: journey('to-work') });
        work.push({ start: span.end, end: span.end + commute_min, state: journey('from-work') });
      }
    }
    const next = day(d + 1);
    const nextSpan = shiftSpan(d + 1);
    const latestWake = next.shift !== undefined && next.kind !== 'night' && nextSpan !== undefined ? nextSpan.start - commute_min - rules.prepare_min : undefined;
    if (today.kind !== 'night') {
      const bed0 = d * WALL_DAY_MIN + usualBed_offset;
      const earliestBed = span !== undefined ? span.end + commute_min + rules.windDown_min : -Infinity;
      let bed = Math.max(bed0, earliestBed);
      let wake = bed + mainSleep_min;
      if (latestWake !== undefined && wake > latestWake) {
        wake = latestWake;
        bed = Math.max(Math.min(bed, wake - mainSleep_min), bed0 - 60, earliestBed);
      }
      if (wake - bed >= 60) sleeps.push({ start: bed, end: wake, state: sleepState(today.kind, 'sleep') });
    } else if (span !== undefined) {
      const start = span.end + commute_min + rules.windDown_min;
      if (next.kind === 'night' && nextSpan !== undefined) {
        const napEnd = nextSpan.start - commute_min - rules.prepare_min;
        if (rules.afterNight === 'split') {
          const morning_min = Math.max(60, (rules.afterNightSleep_h - rules.splitNap_h) * 60);
          sleeps.push({ start, end: start + morning_min, state: sleepState('night', 'sleep') });
          const napStart = Math.max(start + morning_min + 60, napEnd - rules.splitNap_h * 60);
          if (napEnd > napStart) sleeps.push({ start: napStart, end: napEnd, state: sleepState('night', 'nap') });
        } else {
          sleeps.push({ start, end: Math.min(start + rules.afterNightSleep_h * 60, napEnd), state: sleepState('night', 'sleep') });
        }
      } else if (rules.recoveryAfterLastNight_h > 0) {
        const end = Math.min(start + rules.recoveryAfterLastNight_h * 60, latestWake ?? Infinity);
        if (end > start) sleeps.push({ start, end, state: sleepState('night', 'sleep') });
      }
    }
    if (next.kind === 'night' && today.kind !== 'night' && rules.napBeforeFirstNight_h > 0 && nextSpan !== undefined) {
      const end = nextSpan.start - commute_min - rules.prepare_min;
      sleeps.push({ start: end - rules.napBeforeFirstNight_h * 60, end, state: sleepState('night', 'nap') });
    }
  }
  // Work and journeys win over sleep where a rule would overlap them.
  return { segments: [...sleeps, ...work], dayKind: (d) => day(d).kind };
}
