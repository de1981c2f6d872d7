/** Sense checks: every identifier is unique where it must be, and every reference points at something. */
import type { Persona, Place, Scenario, Segment, SegmentPatch } from '../../schema/scenario-types.js';
import { REST_DAY } from '../../schema/roster-schema.js';
import { WEEKDAYS } from '../../schema/primitives.js';
import { problem, type PathPart, type ScenarioProblem } from '../problem.js';
import { didYouMean } from '../suggest.js';
import { parseDateTimeAtSite } from '../../timeline/expand-scenario.js';
import { rosterChangeChecks } from './roster-change-checks.js';

function duplicates<T extends { id: string }>(items: readonly T[], path: readonly PathPart[], what: string, out: ScenarioProblem[]): void {
  const seen = new Map<string, number>();
  items.forEach((item, i) => {
    const first = seen.get(item.id);
    if (first !== undefined) {
      out.push(problem('error', [...path, i, 'id'], `${what} "${item.id}" is defined twice (also at ${path.join('.')}[${first}])`, `Give each ${what} its own identifier.`));
    } else seen.set(item.id, i);
  });
}

function listIds(ids: Iterable<string>): string {
  const all = [...ids];
  return all.length === 0 ? 'none defined' : all.map((s) => `"${s}"`).join(', ');
}

/** Screens a persona can use in a place: the room's fixed screens plus the persona's devices. */
function screenIdsFor(place: Place | undefined, persona: Persona): Set<string> {
  const ids = new Set(persona.devices.map((d) => d.id));
  if (place?.kind === 'room') for (const s of place.screens) ids.add(s.id);
  return ids;
}

/**
 * Identifiers of items that failed the schema and were left out of a partial check: references
 * to them are not reported again.
 */
export interface SetAsideIds {
  readonly places: ReadonlySet<string>;
  readonly personas: ReadonlySet<string>;
  readonly rosters: ReadonlySet<string>;
  readonly lightLogs: ReadonlySet<string>;
}

const NONE: SetAsideIds = { places: new Set(), personas: new Set(), rosters: new Set(), lightLogs: new Set() };

export function referenceChecks(s: Scenario, setAside: SetAsideIds = NONE): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  const places = new Map(s.places.map((p) => [p.id, p]));
  const personas = new Map(s.personas.map((p) => [p.id, p]));
  const rosters = new Map(s.rosters.map((r) => [r.id, r]));
  const logs = new Set(s.lightLogs.map((l) => l.id));

  duplicates(s.places, ['places'], 'place', out);
  duplicates(s.personas, ['personas'], 'persona', out);
  duplicates(s.rosters, ['rosters'], 'roster', out);
  duplicates(s.strategies, ['strategies'], 'strategy', out);
  duplicates(s.lightLogs, ['lightLogs'], 'light log', out);
  s.strategies.forEach((st, i) => {
    if (st.id === 'baseline') out.push(problem('error', ['strategies', i, 'id'], '"baseline" is the name of the unchanged scenario', 'Choose another identifier for this strategy.'));
  });
  s.places.forEach((p, i) => {
    if (p.kind !== 'room') return;
    duplicates(p.luminaires, ['places', i, 'luminaires'], 'luminaire', out);
    duplicates(p.windows, ['places', i, 'windows'], 'window', out);
    duplicates(p.screens, ['places', i, 'screens'], 'screen', out);
  });

  const checkPlace = (id: string, path: readonly PathPart[], kinds?: readonly Place['kind'][]): void => {
    const p = places.get(id);
    if (p === undefined && setAside.places.has(id)) return;
    if (p === undefined) {
      out.push(problem('error', path, `there is no place "${id}"`, `${didYouMean(id, places.keys())}Use one of the places: ${listIds(places.keys())}, or add a place with this identifier.`));
    } else if (kinds !== undefined && !kinds.includes(p.kind)) {
      out.push(problem('error', path, `place "${id}" is a ${p.kind}, but a ${kinds.join(' or ')} is needed here`, `Refer to a ${kinds.join(' or ')}.`));
    }
  };
  const checkSegment = (seg: { place: string; screen?: string | undefined; eyewear?: string | undefined }, persona: Persona, path: readonly PathPart[]): void => {
    checkPlace(seg.place, [...path, 'place']);
    if (seg.screen !== undefined && !setAside.places.has(seg.place)) {
      const ids = screenIdsFor(places.get(seg.place), persona);
      if (!ids.has(seg.screen)) out.push(problem('error', [...path, 'screen'], `screen "${seg.screen}" is neither in place "${seg.place}" nor one of ${persona.name}'s devices`, `Use one of: ${listIds(ids)}, or add the screen to the room or to the persona's devices.`));
    }
    if (seg.eyewear !== undefined && !persona.eyewear.some((e) => e.id === seg.eyewear)) {
      out.push(problem('error', [...path, 'eyewear'], `eyewear "${seg.eyewear}" is not one of ${persona.name}'s eyewear`, `Add it to personas[…].eyewear or use one of: ${listIds(persona.eyewear.map((e) => e.id))}.`));
    }
  };
  const checkPatch = (patch: SegmentPatch, persona: Persona, path: readonly PathPart[]): void => {
    if (patch.place !== undefined) checkPlace(patch.place, [...path, 'place']);
    if (typeof patch.eyewear === 'string' && !persona.eyewear.some((e) => e.id === patch.eyewear)) {
      out.push(problem('error', [...path, 'eyewear'], `eyewear "${patch.eyewear}" is not one of ${persona.name}'s eyewear`, `Add it to the persona's eyewear or use one of: ${listIds(persona.eyewear.map((e) => e.id))}.`));
    }
    if (typeof patch.screen === 'string') {
      const all = new Set(persona.devices.map((d) => d.id));
      for (const p of s.places) if (p.kind === 'room') for (const sc of p.screens) all.add(sc.id);
      if (!all.has(patch.screen)) out.push(problem('error', [...path, 'screen'], `there is no screen "${patch.screen}"`, `Use one of: ${listIds(all)}.`));
    }
  };

  s.personas.forEach((persona, i) => {
    const base: PathPart[] = ['personas', i];
    duplicates(persona.devices, [...base, 'devices'], 'device', out);
    duplicates(persona.eyewear, [...base, 'eyewear'], 'eyewear item', out);
    checkPlace(persona.home, [...base, 'home'], ['room', 'outdoors']);
    if (persona.week === undefined && persona.roster === undefined) {
      out.push(problem('error', base, `${persona.name} has neither a week nor a roster`, 'Add a "week" of day plans, or a "roster" assignment.'));
    }
    if (persona.week !== undefined && persona.roster !== undefined) {
      out.push(problem('error', [...base, 'roster'], `${persona.name} has both a week and a roster`, 'Keep one: "week" for a regular routine, "roster" for shift work.'));
    }
    for (const [name, segs] of Object.entries(persona.templates)) segs.forEach((seg: Segment, k) => checkSegment(seg, persona, [...base, 'templates', name, k]));
    if (persona.week !== undefined) {
      for (const day of WEEKDAYS) {
        const plan = persona.week[day];
        if (typeof plan === 'string') {
          if (!(plan in persona.templates)) out.push(problem('error', [...base, 'week', day], `there is no day template "${plan}"`, `${didYouMean(plan, Object.keys(persona.templates))}Use one of the templates: ${listIds(Object.keys(persona.templates))}, or write the day's segments here.`));
        } else plan.forEach((seg, k) => checkSegment(seg, persona, [...base, 'week', day, k]));
      }
    }
    if (persona.roster !== undefined && !rosters.has(persona.roster.roster) && !setAside.rosters.has(persona.roster.roster)) {
      out.push(problem('error', [...base, 'roster', 'roster'], `there is no roster "${persona.roster.roster}"`, `Use one of: ${listIds(rosters.keys())}.`));
    }
    persona.measuredLight.forEach((m, k) => {
      const zone = s.site.timeZone;
      const from = m.from === undefined ? undefined : parseDateTimeAtSite(m.from, zone);
      const to = m.to === undefined ? undefined : parseDateTimeAtSite(m.to, zone);
      if (m.from !== undefined && from === undefined) out.push(problem('error', [...base, 'measuredLight', k, 'from'], `${m.from} is not a real date-time`, 'Write an existing date and time.'));
      if (m.to !== undefined && to === undefined) out.push(problem('error', [...base, 'measuredLight', k, 'to'], `${m.to} is not a real date-time`, 'Write an existing date and time.'));
      if (from !== undefined && to !== undefined && to <= from) out.push(problem('error', [...base, 'measuredLight', k, 'to'], 'the period ends before it starts', 'Make "to" later than "from".'));
      if (!logs.has(m.log) && !setAside.lightLogs.has(m.log)) out.push(problem('error', [...base, 'measuredLight', k, 'log'], `there is no light log "${m.log}"`, `Add it to "lightLogs" or use one of: ${listIds(logs)}.`));
    });
  });

  s.rosters.forEach((r, i) => {
    const base: PathPart[] = ['rosters', i];
    duplicates(r.shifts, [...base, 'shifts'], 'shift', out);
    const shiftIds = new Set(r.shifts.map((sh) => sh.id));
    r.shifts.forEach((sh, k) => {
      if (sh.id === REST_DAY) out.push(problem('error', [...base, 'shifts', k, 'id'], `"${REST_DAY}" is reserved for days off`, 'Give the shift another identifier.'));
      checkPlace(sh.place, [...base, 'shifts', k, 'place']);
    });
    r.cycle.forEach((c, k) => {
      if (c !== REST_DAY && !shiftIds.has(c)) out.push(problem('error', [...base, 'cycle', k], `"${c}" is not a shift of this roster`, `${didYouMean(c, shiftIds)}Use "${REST_DAY}" or one of: ${listIds(shiftIds)}.`));
    });
    if (r.commute !== undefined) checkPlace(r.commute.place, [...base, 'commute', 'place'], ['vehicle', 'outdoors']);
    if (r.sleep.place !== undefined) checkPlace(r.sleep.place, [...base, 'sleep', 'place'], ['room']);
  });

  s.strategies.forEach((st, i) => {
    st.personas?.forEach((id, k) => {
      if (!personas.has(id) && !setAside.personas.has(id)) out.push(problem('error', ['strategies', i, 'personas', k], `there is no persona "${id}"`, `Use one of: ${listIds(personas.keys())}.`));
    });
    const rosterNow = new Map<string, string>();
    st.changes.forEach((c, k) => {
      const path: PathPart[] = ['strategies', i, 'changes', k];
      switch (c.op) {
        case 'set-luminaire':
        case 'remove-luminaire': {
          checkPlace(c.place, [...path, 'place'], ['room']);
          const room = places.get(c.place);
          if (room?.kind === 'room' && !room.luminaires.some((l) => l.id === c.luminaire)) {
            out.push(problem('error', [...path, 'luminaire'], `room "${c.place}" has no luminaire "${c.luminaire}"`, `Use one of: ${listIds(room.luminaires.map((l) => l.id))}, or use "add-luminaire".`));
          }
          break;
        }
        case 'add-luminaire': {
          checkPlace(c.place, [...path, 'place'], ['room']);
          const room = places.get(c.place);
          if (room?.kind === 'room' && room.luminaires.some((l) => l.id === c.luminaire.id)) {
            out.push(problem('error', [...path, 'luminaire', 'id'], `room "${c.place}" already has a luminaire "${c.luminaire.id}"`, 'Use "set-luminaire" to change it, or pick a new identifier.'));
          }
          break;
        }
        case 'set-blinds':
          checkPlace(c.place, [...path, 'place'], ['room']);
          break;
        case 'set-screen': {
          if ((c.place === undefined) === (c.persona === undefined)) {
            out.push(problem('error', path, 'a screen change needs either "place" (a room\'s screen) or "persona" (a carried device)', 'Give exactly one of "place" or "persona".'));
            break;
          }
          if (c.place !== undefined) {
            checkPlace(c.place, [...path, 'place'], ['room']);
            const room = places.get(c.place);
            if (room?.kind === 'room' && !room.screens.some((sc) => sc.id === c.screen)) out.push(problem('error', [...path, 'screen'], `room "${c.place}" has no screen "${c.screen}"`, `Use one of: ${listIds(room.screens.map((sc) => sc.id))}.`));
          } else if (c.persona !== undefined) {
            const p = personas.get(c.persona);
            if (p === undefined && setAside.personas.has(c.persona)) break;
            if (p === undefined) out.push(problem('error', [...path, 'persona'], `there is no persona "${c.persona}"`, `Use one of: ${listIds(personas.keys())}.`));
            else if (!p.devices.some((d) => d.id === c.screen)) out.push(problem('error', [...path, 'screen'], `${p.name} carries no device "${c.screen}"`, `Use one of: ${listIds(p.devices.map((d) => d.id))}.`));
          }
          break;
        }
        case 'add-segment':
        case 'modify-segments': {
          const p = personas.get(c.persona);
          if (p === undefined && setAside.personas.has(c.persona)) break;
          if (p === undefined) {
            out.push(problem('error', [...path, 'persona'], `there is no persona "${c.persona}"`, `Use one of: ${listIds(personas.keys())}.`));
            break;
          }
          if (c.op === 'add-segment') checkSegment(c.segment, p, [...path, 'segment']);
          else {
            checkPatch(c.set, p, [...path, 'set']);
            c.match.place?.forEach((id, j) => checkPlace(id, [...path, 'match', 'place', j]));
          }
          break;
        }
        case 'set-roster':
          out.push(...rosterChangeChecks(s, c, path, rosterNow, setAside, checkPlace));
          break;
      }
    });
  });
  return out;
}
