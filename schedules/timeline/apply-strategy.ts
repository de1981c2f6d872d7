/**
 * Strategies as overlays: applies a strategy's place, luminaire, blinds and screen changes to a
 * copy of the scenario, and describes every change in plain language. Behaviour changes
 * (added or modified segments) are applied when timelines are expanded.
 */
import type { Room, Scenario, Strategy, StrategyChange } from '../schema/scenario-types.js';

function room(s: Scenario, id: string): Room | undefined {
  const p = s.places.find((x) => x.id === id);
  return p?.kind === 'room' ? p : undefined;
}

/** A copy of `baseline` with the strategy's changes to places and devices. The input is not modified. */
export function applyStrategyToPlaces(baseline: Scenario, strategy: Strategy): Scenario {
  const s = structuredClone(baseline);
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
      case 'add-segment':
      case 'modify-segments':
        break;
    }
  }
  return s;
}

function listDays(days: readonly string[] | undefined): string {
  return days === undefined ? 'every day' : days.join(', ');
}

/** One plain-language line for a change. */
export function describeChange(c: StrategyChange): string {
  const note = c.note !== undefined ? ` (${c.note})` : '';
  switch (c.op) {
    case 'set-luminaire': {
      const parts: string[] = [];
      if (c.eyeIlluminance_lx !== undefined) parts.push(`${c.eyeIlluminance_lx} lx at the eye at full output`);
      if (c.spectrum !== undefined) parts.push(c.spectrum.kind === 'cct' ? `${c.spectrum.cct_K} K` : c.spectrum.kind === 'tunable' ? `tunable ${c.spectrum.warm_K}–${c.spectrum.cool_K} K` : `spectrum "${c.spectrum.sourceId}"`);
      if (c.schedule !== undefined) parts.push(c.schedule.length === 0 ? 'switched off' : `schedule ${c.schedule.map((e) => `${e.start}–${e.end} at ${Math.round(e.level * 100)} %${e.cct_K !== undefined ? ` ${e.cct_K} K` : ''}`).join(', ')}`);
      return `Luminaire "${c.luminaire}" in ${c.place}: ${parts.join('; ') || 'unchanged'}${note}`;
    }
    case 'add-luminaire':
      return `Adds luminaire "${c.luminaire.id}" in ${c.place}: ${c.luminaire.eyeIlluminance_lx} lx at the eye, ${c.luminaire.schedule.map((e) => `${e.start}–${e.end}`).join(', ') || 'never on'}${note}`;
    case 'remove-luminaire':
      return `Removes luminaire "${c.luminaire}" from ${c.place}${note}`;
    case 'set-blinds':
      return `Blinds in ${c.place}: ${c.blinds.rule}, ${Math.round(c.blinds.loweredTransmittance * 100)} % of daylight through when lowered${note}`;
    case 'set-screen': {
      const parts: string[] = [];
      if (c.luminance_cd_m2 !== undefined) parts.push(`${c.luminance_cd_m2} cd/m²`);
      if (c.nightMode === null) parts.push('night mode off');
      else if (c.nightMode !== undefined) parts.push(`night mode ${c.nightMode.start}–${c.nightMode.end} at ${c.nightMode.cct_K} K`);
      return `Screen "${c.screen}"${c.persona !== undefined ? ` of ${c.persona}` : ` in ${c.place ?? ''}`}: ${parts.join('; ') || 'unchanged'}${note}`;
    }
    case 'add-segment':
      return `${c.persona}: ${c.segment.activity} at ${c.segment.place} ${c.segment.start}–${c.segment.end} on ${listDays(c.days)}${c.shiftKind !== undefined ? ` (${c.shiftKind.join('/')} days)` : ''}${note}`;
    case 'modify-segments': {
      const where: string[] = [];
      const m = c.match;
      if (m.activity !== undefined) where.push(m.activity.join('/'));
      if (m.commute !== undefined) where.push(m.commute === 'to-work' ? 'journey to work' : 'journey home');
      if (m.shiftKind !== undefined) where.push(`on ${m.shiftKind.join('/')} days`);
      if (m.place !== undefined) where.push(`at ${m.place.join('/')}`);
      if (m.days !== undefined) where.push(`on ${m.days.join(', ')}`);
      if (m.from !== undefined || m.to !== undefined) where.push(`${m.from ?? '00:00'}–${m.to ?? '24:00'}`);
      const what = Object.entries(c.set).map(([k, v]) => `${k} → ${v === null ? 'none' : String(v)}`);
      return `${c.persona}: ${what.join(', ')} (${where.join(' ') || 'whole timeline'})${note}`;
    }
  }
}

export function describeStrategy(strategy: Strategy): string[] {
  return strategy.changes.map(describeChange);
}
