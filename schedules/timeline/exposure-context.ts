/**
 * What the light models need to know about a moment of a timeline, resolved from the scenario
 * variant: the place object, the screen in use and its colour mode, the eyewear filter, and the
 * level of each luminaire at that local time.
 *
 * Eyewear defaults by kind (from memory — replace with the lens data sheet when known):
 *   clear 0.92 / 0.90 (photopic / melanopic; surface reflections of an uncoated lens),
 *   sunglasses 0.15 / 0.12 (ISO 12312-1 filter category 3 is 8–18 % luminous transmittance),
 *   blue-blocking (amber) 0.60 / 0.10.
 */
import type { Eyewear, Luminaire, Persona, Place, Scenario, Screen } from '../schema/scenario-types.js';
import type { Weekday } from '../schema/primitives.js';
import { clockSpan, MINUTES_PER_DAY } from '../time/clock-time.js';
import type { ExposureState } from './exposure-types.js';

export const EYEWEAR_DEFAULTS: Readonly<Record<Eyewear['kind'], { photopic: number; melanopic: number }>> = {
  clear: { photopic: 0.92, melanopic: 0.9 },
  sunglasses: { photopic: 0.15, melanopic: 0.12 },
  'blue-blocking': { photopic: 0.6, melanopic: 0.1 },
  custom: { photopic: 1, melanopic: 1 },
};

export interface EyewearFilter {
  readonly photopicTransmittance: number;
  readonly melanopicTransmittance: number;
}

export function eyewearFilter(e: Eyewear): EyewearFilter {
  const d = EYEWEAR_DEFAULTS[e.kind];
  return { photopicTransmittance: e.photopicTransmittance ?? d.photopic, melanopicTransmittance: e.melanopicTransmittance ?? d.melanopic };
}

/** True when a "HH:MM"–"HH:MM" window (possibly across midnight) holds the minute of day. */
export function clockWindowHolds(start: string, end: string, minuteOfDay: number): boolean {
  const { start_min, end_min } = clockSpan(start, end);
  return (minuteOfDay >= start_min && minuteOfDay < end_min) || (minuteOfDay + MINUTES_PER_DAY >= start_min && minuteOfDay + MINUTES_PER_DAY < end_min);
}

const PREVIOUS_DAY: Readonly<Record<Weekday, Weekday>> = { mon: 'sun', tue: 'mon', wed: 'tue', thu: 'wed', fri: 'thu', sat: 'fri', sun: 'sat' };

/**
 * Output fraction (0–1) and target CCT of a luminaire at a local weekday and minute of day.
 * An entry that runs past midnight keeps its weekday filter from the day it started; where
 * entries overlap, the later one is used.
 */
export function luminaireOutputAt(l: Luminaire, weekday: Weekday, minuteOfDay: number): { level: number; cct_K: number | undefined } {
  let out: { level: number; cct_K: number | undefined } = { level: 0, cct_K: undefined };
  for (const e of l.schedule) {
    const { start_min, end_min } = clockSpan(e.start, e.end);
    const today = minuteOfDay >= start_min && minuteOfDay < end_min && (e.days === undefined || e.days.includes(weekday));
    const fromYesterday = minuteOfDay + MINUTES_PER_DAY < end_min && minuteOfDay + MINUTES_PER_DAY >= start_min && (e.days === undefined || e.days.includes(PREVIOUS_DAY[weekday]));
    if (today || fromYesterday) out = { level: e.level, cct_K: e.cct_K };
  }
  return out;
}

export interface ExposureContext {
  readonly place: Place;
  readonly screen: Screen | null;
  /** True when the screen's night colour setting is on. */
  readonly screenNightMode: boolean;
  readonly eyewear: EyewearFilter | null;
}

/** Resolves a moment of a timeline against its scenario variant. Throws only for a scenario that failed validation. */
export function exposureContext(variant: Scenario, persona: Persona, state: ExposureState, minuteOfDay: number): ExposureContext {
  const place = variant.places.find((p) => p.id === state.placeId);
  if (place === undefined) throw new Error(`unknown place ${state.placeId}`);
  let screen: Screen | null = null;
  if (state.screenId !== null) screen = (place.kind === 'room' ? place.screens.find((s) => s.id === state.screenId) : undefined) ?? persona.devices.find((d) => d.id === state.screenId) ?? null;
  const nightMode = screen?.nightMode !== undefined && clockWindowHolds(screen.nightMode.start, screen.nightMode.end, minuteOfDay);
  const ew = state.eyewearId === null ? undefined : persona.eyewear.find((e) => e.id === state.eyewearId);
  return { place, screen, screenNightMode: nightMode, eyewear: ew === undefined ? null : eyewearFilter(ew) };
}
