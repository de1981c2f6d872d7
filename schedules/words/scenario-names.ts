/**
 * The names people gave things in a scenario, looked up by id for client texts. Where the
 * scenario gives no name, a plain description stands in (the kind of place, the light's colour,
 * the device), never the id.
 */
import type { ScenarioInput } from '../schema/scenario-types.js';
import { DEVICE_WORDS, EYEWEAR_WORDS, spectrumWords, VEHICLE_WORDS, type ScreenDevice } from './scenario-terms.js';

type PlaceIn = ScenarioInput['places'][number];
type PersonaIn = ScenarioInput['personas'][number];
type RoomIn = Extract<PlaceIn, { kind: 'room' }>;
type LuminaireIn = NonNullable<RoomIn['luminaires']>[number];

/** A persona's name without a trailing note in brackets ("Mara Quellbrook (invented)" → "Mara Quellbrook"). */
export function shortName(name: string): string {
  return name.replace(/\s*\([^)]*\)\s*$/, '');
}

/** A place as named, or "a room (10 × 7 m)", "the car", "outdoors" when unnamed. */
export function placeLabel(place: PlaceIn): string {
  if (place.name !== undefined && place.name !== '') return place.name;
  if (place.kind === 'room') return `a room (${place.width_m} × ${place.depth_m} m)`;
  if (place.kind === 'vehicle') return `the ${VEHICLE_WORDS[place.mode ?? 'car']}`;
  return 'outdoors';
}

export function placeName(scenario: ScenarioInput, id: string): string {
  const place = scenario.places.find((p) => p.id === id);
  return place === undefined ? 'a place not in the scenario' : placeLabel(place);
}

export function personaOf(scenario: ScenarioInput, id: string): PersonaIn | undefined {
  return scenario.personas.find((p) => p.id === id);
}

/** A person's short name (without the note in brackets). */
export function personName(scenario: ScenarioInput, id: string): string {
  const p = personaOf(scenario, id);
  return p === undefined ? 'a person not in the scenario' : shortName(p.name);
}

/** A luminaire as named, or "the 2700 K light", "the tunable-white light". */
export function luminaireLabel(l: Pick<LuminaireIn, 'name' | 'spectrum'>): string {
  if (l.name !== undefined && l.name !== '') return l.name;
  return l.spectrum.kind === 'tunable' ? 'the tunable-white light' : `the ${spectrumWords(l.spectrum)} light`;
}

export function luminaireName(scenario: ScenarioInput, placeId: string, luminaireId: string): string {
  const place = scenario.places.find((p) => p.id === placeId);
  const l = place?.kind === 'room' ? place.luminaires?.find((x) => x.id === luminaireId) : undefined;
  return l === undefined ? 'a light not in the scenario' : luminaireLabel(l);
}

/** "the phone", "the monitor": a screen by its device (screens carry no name). */
export function screenName(scenario: ScenarioInput, screenId: string, where: { readonly place?: string | undefined; readonly persona?: string | undefined }): string {
  const list = where.place !== undefined ? (() => {
    const p = scenario.places.find((x) => x.id === where.place);
    return p?.kind === 'room' ? (p.screens ?? []) : [];
  })() : (personaOf(scenario, where.persona ?? '')?.devices ?? []);
  const s = list.find((x) => x.id === screenId);
  return s === undefined ? 'a screen' : `the ${DEVICE_WORDS[s.device as ScreenDevice]}`;
}

/** Any screen a persona may use by id (own devices first, then the screens of every room). */
export function anyScreenName(scenario: ScenarioInput, personaId: string, screenId: string): string {
  const own = personaOf(scenario, personaId)?.devices?.find((d) => d.id === screenId);
  if (own !== undefined) return `the ${DEVICE_WORDS[own.device]}`;
  for (const p of scenario.places) {
    if (p.kind !== 'room') continue;
    const s = p.screens?.find((x) => x.id === screenId);
    if (s !== undefined) return `the ${DEVICE_WORDS[s.device]}`;
  }
  return 'a screen';
}

/** "amber blue-blocking glasses": a persona's eyewear by its kind (eyewear carries no name). */
export function eyewearName(scenario: ScenarioInput, personaId: string, eyewearId: string): string {
  const e = personaOf(scenario, personaId)?.eyewear?.find((x) => x.id === eyewearId);
  return e === undefined ? 'glasses' : EYEWEAR_WORDS[e.kind];
}

export function rosterName(scenario: ScenarioInput, id: string): string {
  const r = scenario.rosters?.find((x) => x.id === id);
  return r?.name !== undefined && r.name !== '' ? r.name : 'a shift roster';
}
