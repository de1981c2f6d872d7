/**
 * Strategies as overlays: applies a strategy's place, luminaire, blinds, screen and roster
 * changes to a copy of the scenario. Behaviour changes (added or modified segments) are applied
 * when timelines are expanded. The plain-language description of each change is in schedules/words.
 */
import type { Room, Scenario, Strategy } from '../schema/scenario-types.js';
import { applyRosterChange } from './roster-change.js';

function room(s: Scenario, id: string): Room | undefined {
  const p = s.places.find((x) => x.id === id);
  return p?.kind === 'room' ? p : undefined;
}

/** A copy of `baseline` with the strategy's changes to places, devices and rosters. The input is not modified. */
export function applyStrategyToPlaces(baseline: Scenario, strategy: Strategy): Scenario {
  const s = structuredClone(baseline);
  const ownRosters = new Set<string>();
  for (const c of strategy.changes) {
    switch (c.op) {
      case 'set-luminaire': {
        const l = room(s, c.place)?.luminaires.find((x) => x.id === c.luminaire);
        if (l === undefined) break;
        if (c.eyeIlluminance_lx !== undefined) l.eyeIlluminance_lx = c.eyeIlluminance_lx;
        if (c.spectrum !== undefined) l.spectrum = structuredClone(c.spectrum);
        if (c.schedule !== undefined) l.schedule = structuredClone(c.schedule);
        break;
      }
      case 'add-luminaire':
        room(s, c.place)?.luminaires.push(structuredClone(c.luminaire));
        break;
      case 'remove-luminaire': {
        const r = room(s, c.place);
        if (r !== undefined) r.luminaires = r.luminaires.filter((x) => x.id !== c.luminaire);
        break;
      }
      case 'set-blinds': {
        const r = room(s, c.place);
        if (r !== undefined) r.blinds = structuredClone(c.blinds);
        break;
      }
      case 'set-screen': {
        const screens = c.place !== undefined ? room(s, c.place)?.screens : s.personas.find((p) => p.id === c.persona)?.devices;
        const sc = screens?.find((x) => x.id === c.screen);
        if (sc === undefined) break;
        if (c.luminance_cd_m2 !== undefined) sc.luminance_cd_m2 = c.luminance_cd_m2;
        if (c.nightMode === null) delete sc.nightMode;
        else if (c.nightMode !== undefined) sc.nightMode = structuredClone(c.nightMode);
        break;
      }
      case 'set-roster':
        applyRosterChange(s, c, strategy.id, ownRosters);
        break;
      case 'add-segment':
      case 'modify-segments':
        break;
    }
  }
  return s;
}
