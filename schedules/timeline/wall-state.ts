/**
 * Building blocks of a timeline in local wall-clock time: minutes counted from local midnight of
 * the run's first day as if every day had 1440 minutes ("wall minutes"). They become real
 * minutes only at the end, through the time-zone rules, so a 07:00 alarm stays at 07:00 across
 * a daylight-saving change.
 */
import type { Persona, Segment } from '../schema/scenario-types.js';
import { WEEKDAYS, type Weekday } from '../schema/primitives.js';
import { addDays, isoWeekday } from '../time/local-calendar.js';
import type { ExposureState } from './exposure-types.js';

export type WallState = Omit<ExposureState, 'sleep' | 'measuredLogId'>;

export const WALL_DAY_MIN = 1440;

export function weekdayOf(date: string): Weekday {
  return WEEKDAYS[isoWeekday(date) - 1] ?? 'mon';
}

export function dateOfDay(startDate: string, dayIndex: number): string {
  return addDays(startDate, dayIndex);
}

export function stateFromSegment(seg: Segment, origin: WallState['origin'], extra: Partial<WallState> = {}): WallState {
  return {
    placeId: seg.place,
    activity: seg.activity,
    posture: seg.posture,
    gaze: seg.gaze,
    gazeAzimuth_deg: seg.gazeAzimuth_deg ?? null,
    screenId: seg.screen ?? null,
    screenBrightness: seg.screenBrightness,
    eyewearId: seg.eyewear ?? null,
    shiftKind: null,
    commute: null,
    origin,
    ...extra,
  };
}

/** Where the person is when nothing else is said: at home, awake, looking round the room. */
export function defaultState(persona: Persona, shiftKind: WallState['shiftKind']): WallState {
  return {
    placeId: persona.home,
    activity: 'leisure',
    posture: 'seated',
    gaze: 'room',
    gazeAzimuth_deg: null,
    screenId: null,
    screenBrightness: 1,
    eyewearId: null,
    shiftKind,
    commute: null,
    origin: 'default',
  };
}
