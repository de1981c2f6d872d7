/**
 * Two people who work in the same room at different distances from its windows (the same floor
 * described from two desks: equal size, windows and lights, another seat) answer the question a
 * retrofit raises: where does it matter? This sentence compares their daytime light at 250 lx
 * melanopic EDI or more (Brown et al. 2022 daytime level; results.json
 * `mean_daytime_hours_ge_250_lx`) under the baseline and the change each shared strategy makes at
 * each desk, naming the strategies whose effect differs most between the desks, so the two
 * recommendations can be read side by side.
 */
import type { ScenarioInput } from '../schema/scenario-types.js';
import type { PersonaResult, RunResults } from '../run/results-types.js';
import { durationWords } from '../run/phase-words.js';
import { shortName } from './scenario-names.js';

type PlaceIn = ScenarioInput['places'][number];
type RoomIn = Extract<PlaceIn, { kind: 'room' }>;
type PersonaIn = ScenarioInput['personas'][number];

/** Differences in daytime light below this are "about the same" (h a day; 15 min, the recommendation rule's margin for daytime light). */
export const SEAT_MARGIN_H = 0.25;

/** Place ids where a persona works (template segments and roster shifts of activity work), most used first. */
export function workPlaces(scenario: ScenarioInput, persona: PersonaIn): string[] {
  const count = new Map<string, number>();
  for (const segments of Object.values(persona.templates ?? {})) for (const s of segments) if (s.activity === 'work') count.set(s.place, (count.get(s.place) ?? 0) + 1);
  for (const plan of Object.values(persona.week ?? {})) if (Array.isArray(plan)) for (const s of plan) if (s.activity === 'work') count.set(s.place, (count.get(s.place) ?? 0) + 1);
  const roster = persona.roster === undefined ? undefined : scenario.rosters?.find((r) => r.id === persona.roster?.roster);
  for (const sh of roster?.shifts ?? []) count.set(sh.place, (count.get(sh.place) ?? 0) + 1);
  return [...count.entries()].sort((a, b) => b[1] - a[1]).map(([id]) => id);
}

/** The room without its seat, for telling "the same room from another desk". */
function roomWithoutSeat(r: RoomIn): string {
  return JSON.stringify([r.width_m, r.depth_m, r.height_m, r.windows ?? [], r.blinds ?? null, (r.luminaires ?? []).map((l) => [l.id, l.eyeIlluminance_lx, l.spectrum, l.schedule ?? []])]);
}

export interface SeatPair {
  readonly personaIds: readonly [string, string];
  /** Distances of the two desks from the window wall (m), in the order of `personaIds`. */
  readonly distances_m: readonly [number, number];
}

/** Pairs of people whose main work rooms are the same room seen from different seats, nearer desk first. */
export function seatPairs(scenario: ScenarioInput): SeatPair[] {
  const seats = scenario.personas.flatMap((p) => {
    const id = workPlaces(scenario, p)[0];
    const room = scenario.places.find((x) => x.id === id);
    if (room?.kind !== 'room' || room.viewingPosition === undefined || (room.windows ?? []).length === 0) return [];
    return [{ persona: p.id, key: roomWithoutSeat(room), distance: room.viewingPosition.distanceFromWindow_m }];
  });
  const pairs: SeatPair[] = [];
  for (let i = 0; i < seats.length; i++) {
    for (let j = i + 1; j < seats.length; j++) {
      const a = seats[i];
      const b = seats[j];
      if (a === undefined || b === undefined || a.key !== b.key || a.distance === b.distance) continue;
      const [near, far] = a.distance < b.distance ? [a, b] : [b, a];
      pairs.push({ personaIds: [near.persona, far.persona], distances_m: [near.distance, far.distance] });
    }
  }
  return pairs;
}

const hoursWords = (h: number) => `${h.toFixed(1)} h`;

function change(h: number, who: string): string {
  if (Math.abs(h) < SEAT_MARGIN_H) return `about the same for ${who}`;
  return `${durationWords(h)} a day ${h > 0 ? 'more' : 'less'} for ${who}`;
}

/**
 * The comparison sentence for one pair, or null when the results lack either person. Names the
 * (up to two) shared strategies whose effect on daytime light differs most between the desks.
 */
export function seatComparisonSentence(pair: SeatPair, names: ReadonlyMap<string, string>, results: Pick<RunResults, 'personas'>): string | null {
  const [nearId, farId] = pair.personaIds;
  const near = results.personas.find((p) => p.id === nearId);
  const far = results.personas.find((p) => p.id === farId);
  if (near === undefined || far === undefined) return null;
  const nearName = shortName(names.get(nearId) ?? near.name);
  const farName = shortName(names.get(farId) ?? far.name);
  const day = (p: PersonaResult, id: string) => p.strategies.find((s) => s.id === id)?.summary.mean_daytime_hours_ge_250_lx ?? null;
  const baseId = near.strategies.find((s) => s.is_baseline)?.id ?? 'baseline';
  const bNear = day(near, baseId);
  const bFar = day(far, baseId);
  if (bNear === null || bFar === null) return null;
  const shared = near.strategies
    .filter((s) => !s.is_baseline && far.strategies.some((f) => f.id === s.id))
    .map((s) => ({ name: s.name, dNear: (day(near, s.id) ?? bNear) - bNear, dFar: (day(far, s.id) ?? bFar) - bFar }))
    .map((x) => ({ ...x, gap: Math.abs(x.dFar - x.dNear) }))
    .filter((x) => x.gap >= SEAT_MARGIN_H)
    .sort((a, b) => b.gap - a.gap)
    .slice(0, 2);
  const [dn, df] = pair.distances_m;
  const start = `${nearName} and ${farName} work in the same room at desks ${dn} m and ${df} m from the windows. Under the baseline ${nearName} has ${hoursWords(bNear)} a day of light at the eye at 250 lx melanopic EDI or more and ${farName} ${hoursWords(bFar)}`;
  if (shared.length === 0) return `${start}; no strategy changes this differently at the two desks.`;
  const effects = shared.map((x) => `“${x.name}” gives ${change(x.dFar, farName)} and ${change(x.dNear, nearName)}`).join('; ');
  const why = bFar < bNear - SEAT_MARGIN_H ? ` Deep in the room daylight runs short, so the electric light decides what reaches the eye; by the windows daylight does.` : '';
  return `${start}. ${effects}.${why}`;
}

/** Every seat comparison of a run, with the people it concerns. */
export function seatComparisons(scenario: ScenarioInput, results: Pick<RunResults, 'personas'>): { readonly personaIds: readonly string[]; readonly sentence: string }[] {
  const names = new Map(scenario.personas.map((p) => [p.id, p.name]));
  return seatPairs(scenario).flatMap((pair) => {
    const sentence = seatComparisonSentence(pair, names, results);
    return sentence === null ? [] : [{ personaIds: pair.personaIds, sentence }];
  });
}
