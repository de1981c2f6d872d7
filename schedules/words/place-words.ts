/**
 * A place in one plain sentence for "what was modelled": size, windows and where they face,
 * where the person sits, the lights (by name, with what they give at the eye), screens and how
 * the blinds are used; vehicles and outdoor places by what matters for light.
 */
import type { ScenarioInput } from '../schema/scenario-types.js';
import { blindsWords, DEVICE_WORDS, VEHICLE_WORDS } from './scenario-terms.js';
import { luminaireLabel } from './scenario-names.js';

type PlaceIn = ScenarioInput['places'][number];

const COMPASS = ['north', 'north-east', 'east', 'south-east', 'south', 'south-west', 'west', 'north-west'] as const;

/** "south-east" for 140°: the nearest of eight compass points. */
export function compassWords(azimuth_deg: number): string {
  return COMPASS[Math.round((((azimuth_deg % 360) + 360) % 360) / 45) % 8] ?? 'north';
}

const count = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

export function placeWords(place: PlaceIn): string {
  if (place.kind === 'room') {
    const windows = place.windows ?? [];
    const facing = [...new Set(windows.map((w) => compassWords(w.facadeAzimuth_deg)))];
    const win = windows.length === 0 ? 'no windows' : `${count(windows.length, 'window')} facing ${facing.join(' and ')}`;
    const seat = place.viewingPosition === undefined ? '' : `; the seat modelled is ${place.viewingPosition.distanceFromWindow_m} m from the window wall`;
    const lights = (place.luminaires ?? []).map((l) => `${luminaireLabel(l)} (${l.eyeIlluminance_lx} lx at the eye at full output)`);
    const screens = (place.screens ?? []).map((s) => `a ${DEVICE_WORDS[s.device]}`);
    const blinds = place.blinds === undefined || place.blinds.rule === 'none' ? '' : `; ${blindsWords(place.blinds)}`;
    return `Room ${place.width_m} × ${place.depth_m} m, ${place.height_m} m high, ${win}${seat}; ${lights.length === 0 ? 'no electric light' : `lights: ${lights.join(', ')}`}${screens.length === 0 ? '' : `; screens: ${screens.join(', ')}`}${blinds}.`;
  }
  if (place.kind === 'vehicle') {
    const cabin = (place.interiorIlluminance_lx ?? 0) > 0 ? `, cabin light ${place.interiorIlluminance_lx} lx at the eye after dark` : '';
    return `A ${VEHICLE_WORDS[place.mode ?? 'car']}; its windows pass ${Math.round((place.windowTransmittance ?? 0.7) * 100)} % of daylight${cabin}.`;
  }
  const shade = place.shade ?? 'open';
  return `Outdoors, ${shade === 'open' ? 'under open sky' : shade === 'partial' ? 'partly shaded' : 'fully shaded'}; street lighting ${place.streetLighting_lx ?? 5} lx at the eye after dark.`;
}
