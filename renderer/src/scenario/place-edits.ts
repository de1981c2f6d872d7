// Adding and removing places and luminaires (pure; each returns a new scenario). A place or
// luminaire that something still refers to is not removed: `placeReferences` and
// `luminaireReferences` say what refers to it, so the workspace can explain why.
import type { PlaceInput, ScenarioInput } from './scenario-types.js';

export type PlaceKind = PlaceInput['kind'];
type RoomInput = Extract<PlaceInput, { kind: 'room' }>;
export type LuminaireInput = NonNullable<RoomInput['luminaires']>[number];

/** First free id of the form `${stem}-n`. */
export function freeId(taken: Iterable<string>, stem: string): string {
  const used = new Set(taken);
  for (let n = 1; ; n++) {
    const id = `${stem}-${n}`;
    if (!used.has(id)) return id;
  }
}

const NEW_PLACE_NAME: Record<PlaceKind, string> = { room: 'New room', vehicle: 'New vehicle', outdoors: 'New outdoor place' };

/** Plain starting values, chosen as a typical small office room / car / open street (common practice). */
export function newPlace(kind: PlaceKind, id: string): PlaceInput {
  if (kind === 'room') return { kind, id, name: NEW_PLACE_NAME.room, width_m: 5, depth_m: 4, height_m: 2.7, windows: [], luminaires: [] };
  if (kind === 'vehicle') return { kind, id, name: NEW_PLACE_NAME.vehicle, mode: 'car' };
  return { kind, id, name: NEW_PLACE_NAME.outdoors, shade: 'open' };
}

export function addPlace(scenario: ScenarioInput, kind: PlaceKind): ScenarioInput {
  const id = freeId(scenario.places.map((p) => p.id), kind);
  return { ...scenario, places: [...scenario.places, newPlace(kind, id)] };
}

/** Where a value equal to `id` sits under one of `keys`, as readable paths ("personas.0.home"). */
function referencesTo(value: unknown, keys: ReadonlySet<string>, id: string, path: string, found: string[]): void {
  if (Array.isArray(value)) value.forEach((v, i) => referencesTo(v, keys, id, `${path}.${i}`, found));
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      if (keys.has(k) && v === id) found.push(`${path}.${k}`.replace(/^\./, ''));
      else referencesTo(v, keys, id, `${path}.${k}`, found);
    }
  }
}

/** Paths in people, rosters and strategies that name the place (as home, segment place or change target). */
export function placeReferences(scenario: ScenarioInput, placeId: string): string[] {
  const found: string[] = [];
  const keys = new Set(['place', 'home']);
  referencesTo(scenario.personas, keys, placeId, 'personas', found);
  referencesTo((scenario as { rosters?: unknown }).rosters, keys, placeId, 'rosters', found);
  referencesTo(scenario.strategies, keys, placeId, 'strategies', found);
  return found;
}

/** Who uses the place, in words: people (by name), rosters and strategies (by name). */
export function placeUsers(scenario: ScenarioInput, placeId: string): string[] {
  const keys = new Set(['place', 'home']);
  const uses = (value: unknown) => {
    const found: string[] = [];
    referencesTo(value, keys, placeId, '', found);
    return found.length > 0;
  };
  const rosters = ((scenario as { rosters?: readonly { id: string }[] }).rosters ?? []).filter(uses).map((r) => `roster ${r.id}`);
  return [...scenario.personas.filter(uses).map((p) => p.name), ...rosters, ...(scenario.strategies ?? []).filter(uses).map((s) => `strategy “${s.name}”`)];
}

export function removePlace(scenario: ScenarioInput, placeId: string): ScenarioInput {
  if (placeReferences(scenario, placeId).length > 0) return scenario;
  return { ...scenario, places: scenario.places.filter((p) => p.id !== placeId) };
}

export function newLuminaire(id: string): LuminaireInput {
  // 300 lx vertical at the eye at 4000 K, on 08:00–18:00: a plain office starting point (common practice).
  return { id, name: 'New luminaire', spectrum: { kind: 'cct', cct_K: 4000 }, eyeIlluminance_lx: 300, schedule: [{ start: '08:00', end: '18:00', level: 1 }] };
}

function mapRoom(scenario: ScenarioInput, placeId: string, change: (room: RoomInput) => RoomInput): ScenarioInput {
  return { ...scenario, places: scenario.places.map((p) => (p.id === placeId && p.kind === 'room' ? change(p) : p)) };
}

export function addLuminaire(scenario: ScenarioInput, placeId: string): ScenarioInput {
  return mapRoom(scenario, placeId, (room) => {
    const list = room.luminaires ?? [];
    return { ...room, luminaires: [...list, newLuminaire(freeId(list.map((l) => l.id), 'luminaire'))] };
  });
}

/** Strategy changes that name this luminaire of this room. */
export function luminaireReferences(scenario: ScenarioInput, placeId: string, luminaireId: string): string[] {
  const found: string[] = [];
  (scenario.strategies ?? []).forEach((s, si) =>
    s.changes.forEach((c, ci) => {
      if ((c.op === 'set-luminaire' || c.op === 'remove-luminaire') && c.place === placeId && c.luminaire === luminaireId) found.push(`strategies.${si}.changes.${ci} (${s.name})`);
    }),
  );
  return found;
}

export function removeLuminaire(scenario: ScenarioInput, placeId: string, luminaireId: string): ScenarioInput {
  if (luminaireReferences(scenario, placeId, luminaireId).length > 0) return scenario;
  return mapRoom(scenario, placeId, (room) => ({ ...room, luminaires: (room.luminaires ?? []).filter((l) => l.id !== luminaireId) }));
}
