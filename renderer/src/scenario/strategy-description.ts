// Plain-language lines saying what a strategy changes versus the baseline, one per change.
import type { ScenarioInput, StrategyChangeInput } from './scenario-types.js';

function placeName(scenario: ScenarioInput, id: string): string {
  return scenario.places.find((p) => p.id === id)?.name ?? id;
}

function personaName(scenario: ScenarioInput, id: string): string {
  return scenario.personas.find((p) => p.id === id)?.name ?? id;
}

function scheduleText(schedule: readonly { start: string; end: string; level?: number }[]): string {
  return schedule.map((e) => `${e.start}–${e.end}${e.level !== undefined && e.level !== 1 ? ` at ${Math.round(e.level * 100)} %` : ''}`).join(', ');
}

export function describeChange(scenario: ScenarioInput, change: StrategyChangeInput): string {
  switch (change.op) {
    case 'set-luminaire': {
      const parts: string[] = [];
      if (change.eyeIlluminance_lx !== undefined) parts.push(`${change.eyeIlluminance_lx} lx at the eye`);
      if (change.spectrum !== undefined) parts.push(change.spectrum.kind === 'cct' ? `${change.spectrum.cct_K} K` : `${change.spectrum.kind} spectrum`);
      if (change.schedule !== undefined) parts.push(change.schedule.length === 0 ? 'switched off' : `on ${scheduleText(change.schedule)}`);
      return `${placeName(scenario, change.place)}: luminaire “${change.luminaire}” — ${parts.join(', ') || 'unchanged'}.`;
    }
    case 'add-luminaire':
      return `${placeName(scenario, change.place)}: adds luminaire “${change.luminaire.name ?? change.luminaire.id}”${change.luminaire.eyeIlluminance_lx !== undefined ? `, ${change.luminaire.eyeIlluminance_lx} lx at the eye` : ''}${change.luminaire.schedule !== undefined ? `, on ${scheduleText(change.luminaire.schedule)}` : ''}.`;
    case 'remove-luminaire':
      return `${placeName(scenario, change.place)}: removes luminaire “${change.luminaire}”.`;
    case 'set-blinds':
      return `${placeName(scenario, change.place)}: blinds rule becomes “${change.blinds.rule}”.`;
    case 'set-screen': {
      const where = change.place !== undefined ? placeName(scenario, change.place) : change.persona !== undefined ? personaName(scenario, change.persona) : 'everywhere';
      const parts: string[] = [];
      if (change.luminance_cd_m2 !== undefined) parts.push(`${change.luminance_cd_m2} cd/m²`);
      if (change.nightMode !== undefined) parts.push(change.nightMode === null ? 'night colour off' : 'night colour on');
      return `${where}: screen “${change.screen}” set to ${parts.join(', ') || 'its stated values'}.`;
    }
    case 'add-segment':
      return `${personaName(scenario, change.persona)}: adds ${change.segment.activity ?? 'time'} at ${placeName(scenario, change.segment.place)} ${change.segment.start}–${change.segment.end}${change.days !== undefined ? ` on ${change.days.join(', ')}` : ' every day'}.`;
    case 'modify-segments': {
      const what = Object.entries(change.set)
        .map(([k, v]) => `${k} → ${v === null ? 'none' : String(v)}`)
        .join(', ');
      const when = [change.match.activity?.join('/'), change.match.commute, change.match.shiftKind?.map((k) => `${k} shifts`).join('/'), change.match.from !== undefined ? `from ${change.match.from}` : undefined, change.match.to !== undefined ? `to ${change.match.to}` : undefined]
        .filter((x) => x !== undefined)
        .join(', ');
      return `${personaName(scenario, change.persona)}: ${what}${when === '' ? '' : ` (${when})`}.`;
    }
  }
}
