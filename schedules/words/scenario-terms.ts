/**
 * Plain words for the scenario format's fixed values (blinds rules, activities, gaze, posture,
 * eyewear kinds, screen devices, shift kinds, weekdays) and for the small structures built from
 * them (spectra, luminaire schedules). Client texts print these words, never the values
 * themselves.
 */
import type { Activity, Gaze, Posture } from '../schema/personas-schema.js';
import type { Weekday } from '../schema/primitives.js';
import { sourceInfo } from '../../model/sources/source-library.js';

export type BlindsRule = 'none' | 'always-down' | 'down-at-night' | 'manual-sun' | 'auto-solar';
export type EyewearKind = 'clear' | 'sunglasses' | 'blue-blocking' | 'custom';
export type ScreenDevice = 'monitor' | 'laptop' | 'tablet' | 'phone' | 'tv' | 'e-reader';
export type ShiftKind = 'day' | 'evening' | 'night' | 'rest';
export type VehicleMode = 'car' | 'bus' | 'train' | 'tram';

/** How blinds are used, as a phrase after "blinds". */
export const BLINDS_RULE_WORDS: Readonly<Record<BlindsRule, string>> = {
  none: 'never lowered',
  'always-down': 'kept down all the time',
  'down-at-night': 'lowered from dusk to dawn',
  'manual-sun': 'lowered by hand when the sun reaches the desk and raised again on the next arrival',
  'auto-solar': 'lowered automatically while strong sun falls on the windows',
};

/** "blinds lowered by hand when the sun reaches the desk …, letting 20 % of daylight through when down". */
export function blindsWords(b: { readonly rule: BlindsRule; readonly threshold_W_m2?: number | undefined; readonly loweredTransmittance?: number | undefined }): string {
  const threshold = b.rule === 'auto-solar' && b.threshold_W_m2 !== undefined ? ` (more than ${b.threshold_W_m2} W/m²)` : '';
  const through = b.rule === 'none' || b.loweredTransmittance === undefined ? '' : `, letting ${Math.round(b.loweredTransmittance * 100)} % of daylight through when down`;
  return `blinds ${BLINDS_RULE_WORDS[b.rule]}${threshold}${through}`;
}

/** Activities as labels (timeline keys) and as phrases ("during work"). */
export const ACTIVITY_LABELS: Readonly<Record<Activity, string>> = {
  sleep: 'sleep',
  nap: 'nap',
  work: 'work',
  commute: 'travel',
  leisure: 'free time',
  meal: 'meals',
  exercise: 'exercise',
  other: 'other',
};

export const ACTIVITY_DURING: Readonly<Record<Activity, string>> = {
  sleep: 'during sleep',
  nap: 'during naps',
  work: 'at work',
  commute: 'while travelling',
  leisure: 'in free time',
  meal: 'at meals',
  exercise: 'while exercising',
  other: 'at other times',
};

/** Nouns for an added stretch of time ("adds a walk …"). */
export const ACTIVITY_NOUN: Readonly<Record<Activity, string>> = {
  sleep: 'a sleep',
  nap: 'a nap',
  work: 'work',
  commute: 'a journey',
  leisure: 'free time',
  meal: 'a meal',
  exercise: 'exercise',
  other: 'time',
};

export const GAZE_WORDS: Readonly<Record<Gaze, string>> = {
  room: 'looks around the room',
  window: 'looks toward the window',
  screen: 'looks at a screen',
  desk: 'looks down at the desk',
  ahead: 'looks straight ahead',
};

export const POSTURE_WORDS: Readonly<Record<Posture, string>> = {
  seated: 'seated',
  standing: 'standing',
  walking: 'walking',
  lying: 'lying down',
};

export const EYEWEAR_WORDS: Readonly<Record<EyewearKind, string>> = {
  clear: 'clear glasses',
  sunglasses: 'sunglasses',
  'blue-blocking': 'amber glasses that block blue light',
  custom: 'tinted glasses',
};

export const DEVICE_WORDS: Readonly<Record<ScreenDevice, string>> = {
  monitor: 'monitor',
  laptop: 'laptop',
  tablet: 'tablet',
  phone: 'phone',
  tv: 'television',
  'e-reader': 'e-book reader',
};

export const VEHICLE_WORDS: Readonly<Record<VehicleMode, string>> = { car: 'car', bus: 'bus', train: 'train', tram: 'tram' };

export const SHIFT_KIND_WORDS: Readonly<Record<ShiftKind, string>> = { day: 'day shifts', evening: 'evening shifts', night: 'night shifts', rest: 'days off' };

const DAY_NAMES: Readonly<Record<Weekday, string>> = { mon: 'Monday', tue: 'Tuesday', wed: 'Wednesday', thu: 'Thursday', fri: 'Friday', sat: 'Saturday', sun: 'Sunday' };
const ORDER: readonly Weekday[] = ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'];

/** "Monday to Friday", "weekends", "every day", "Mondays and Thursdays". */
export function weekdaysWords(days: readonly Weekday[] | undefined): string {
  if (days === undefined) return 'every day';
  const set = new Set(days);
  const sorted = ORDER.filter((d) => set.has(d));
  if (sorted.length === 7) return 'every day';
  if (sorted.length === 0) return 'on no day';
  if (sorted.length === 2 && set.has('sat') && set.has('sun')) return 'at weekends';
  const first = ORDER.indexOf(sorted[0] as Weekday);
  const consecutive = sorted.every((d, i) => ORDER.indexOf(d) === first + i);
  if (consecutive && sorted.length >= 3) return `${DAY_NAMES[sorted[0] as Weekday]} to ${DAY_NAMES[sorted[sorted.length - 1] as Weekday]}`;
  const names = sorted.map((d) => `${DAY_NAMES[d]}s`);
  return `on ${names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`}`;
}

export type SpectrumIn =
  | { readonly kind: 'cct'; readonly cct_K: number }
  | { readonly kind: 'library'; readonly sourceId: string }
  | { readonly kind: 'tunable'; readonly warm_K: number; readonly cool_K: number };

/** "4000 K", "tunable white 2700–6500 K", or the library spectrum's own name. */
export function spectrumWords(s: SpectrumIn): string {
  if (s.kind === 'cct') return `${s.cct_K} K`;
  if (s.kind === 'tunable') return `tunable white ${s.warm_K}–${s.cool_K} K`;
  try {
    return sourceInfo(s.sourceId).name;
  } catch {
    return 'a spectrum from the source library';
  }
}

export interface ScheduleEntryIn {
  readonly start: string;
  readonly end: string;
  readonly level?: number | undefined;
  readonly cct_K?: number | undefined;
  readonly days?: readonly Weekday[] | undefined;
}

/** "07:00–17:00 at full output (6000 K), 17:00–21:30 at 60 % …" with the days when not every day; "switched off" for none. */
export function scheduleWords(entries: readonly ScheduleEntryIn[]): string {
  if (entries.length === 0) return 'switched off';
  const days = new Set(entries.map((e) => weekdaysWords(e.days)));
  const shared = days.size === 1;
  const parts = entries.map((e) => {
    const level = e.level === undefined || e.level >= 1 ? 'full output' : `${Math.round(e.level * 100)} %`;
    const cct = e.cct_K === undefined ? '' : ` and ${e.cct_K} K`;
    const own = shared || e.days === undefined ? '' : ` ${weekdaysWords(e.days)}`;
    return `${e.start}–${e.end} at ${level}${cct}${own}`;
  });
  const when = shared ? ([...days][0] ?? 'every day') : 'every day';
  return `on ${parts.join(', ')}${when === 'every day' ? '' : `, ${when}`}`;
}
