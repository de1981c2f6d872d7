/**
 * What a strategy changes against the baseline, one plain sentence per change, with the names
 * people gave places, lights and persons (scenario-names.ts) and plain words for the format's
 * values (scenario-terms.ts): "Ceiling panels in Fernbrook office: 450 lx at the eye at full
 * output, tunable white 3000–6500 K, on 07:00–13:00 at full output and 6000 K …". The run's
 * results (results.json `changes`), the app's strategy list and the briefing all print these.
 */
import type { ScenarioInput } from '../schema/scenario-types.js';
import type { Activity } from '../schema/personas-schema.js';
import {
  ACTIVITY_DURING,
  ACTIVITY_NOUN,
  blindsWords,
  GAZE_WORDS,
  POSTURE_WORDS,
  scheduleWords,
  SHIFT_KIND_WORDS,
  spectrumWords,
  weekdaysWords,
} from './scenario-terms.js';
import { anyScreenName, eyewearName, luminaireLabel, luminaireName, personName, placeName, screenName } from './scenario-names.js';
import { rosterChangeText } from './roster-change-words.js';

export type StrategyIn = NonNullable<ScenarioInput['strategies']>[number];
export type StrategyChangeIn = StrategyIn['changes'][number];
type ModifyIn = Extract<StrategyChangeIn, { op: 'modify-segments' }>;

const sentence = (text: string, note: string | undefined) => `${text.charAt(0).toUpperCase()}${text.slice(1)}${note !== undefined && note !== '' ? ` (${note})` : ''}.`;

/** "on the journey home after night shifts", "in free time from 21:00 to 23:00": where a behaviour change applies. */
function matchWords(scenario: ScenarioInput, m: ModifyIn['match']): string {
  const parts: string[] = [];
  const acts = (m.activity ?? []) as readonly Activity[];
  const nights = m.shiftKind?.map((k) => SHIFT_KIND_WORDS[k]).join(' and ');
  if (m.commute !== undefined) {
    const journey = m.commute === 'to-work' ? 'on the journey to work' : 'on the journey home';
    parts.push(nights === undefined ? journey : `${journey} ${m.commute === 'to-work' ? 'before' : 'after'} ${nights}`);
  } else {
    if (acts.length > 0) parts.push(acts.map((a) => ACTIVITY_DURING[a]).join(' or '));
    if (nights !== undefined) parts.push(`on days of ${nights}`);
  }
  if (m.place !== undefined && m.place.length > 0) parts.push(`at ${m.place.map((p) => placeName(scenario, p)).join(' or ')}`);
  if (m.days !== undefined) parts.push(weekdaysWords(m.days));
  if (m.from !== undefined || m.to !== undefined) parts.push(`from ${m.from ?? '00:00'} to ${m.to ?? '24:00'}`);
  return parts.length === 0 ? 'all the time' : parts.join(' ');
}

/** "wears amber blue-blocking glasses", "puts the screen away and looks around the room". */
function patchWords(scenario: ScenarioInput, personaId: string, set: ModifyIn['set']): string {
  const parts: string[] = [];
  if (set.place !== undefined) parts.push(`is at ${placeName(scenario, set.place)}`);
  if (set.posture !== undefined) parts.push(`is ${POSTURE_WORDS[set.posture]}`);
  if (set.screen === null) parts.push('puts the screen away');
  else if (set.screen !== undefined) parts.push(`uses ${anyScreenName(scenario, personaId, set.screen)}`);
  if (set.screenBrightness !== undefined) parts.push(`sets the screen to ${Math.round(set.screenBrightness * 100)} % brightness`);
  if (set.gaze !== undefined) parts.push(GAZE_WORDS[set.gaze]);
  if (set.eyewear === null) parts.push('wears no glasses');
  else if (set.eyewear !== undefined) parts.push(`wears ${eyewearName(scenario, personaId, set.eyewear)}`);
  if (parts.length === 0) return 'keeps the same routine';
  return parts.length === 1 ? (parts[0] as string) : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
}

/** One plain sentence for one change. */
export function changeWords(scenario: ScenarioInput, c: StrategyChangeIn): string {
  switch (c.op) {
    case 'set-luminaire': {
      const parts: string[] = [];
      if (c.eyeIlluminance_lx !== undefined) parts.push(`${c.eyeIlluminance_lx} lx at the eye at full output`);
      if (c.spectrum !== undefined) parts.push(spectrumWords(c.spectrum));
      if (c.schedule !== undefined) parts.push(scheduleWords(c.schedule));
      return sentence(`${luminaireName(scenario, c.place, c.luminaire)} in ${placeName(scenario, c.place)}: ${parts.join(', ') || 'unchanged'}`, c.note);
    }
    case 'add-luminaire': {
      const l = c.luminaire;
      return sentence(`adds a light, ${luminaireLabel(l)}, in ${placeName(scenario, c.place)}: ${spectrumWords(l.spectrum)}, ${l.eyeIlluminance_lx} lx at the eye at full output, ${scheduleWords(l.schedule ?? [])}`, c.note);
    }
    case 'remove-luminaire':
      return sentence(`removes ${luminaireName(scenario, c.place, c.luminaire)} from ${placeName(scenario, c.place)}`, c.note);
    case 'set-blinds':
      return sentence(`${placeName(scenario, c.place)}: ${blindsWords(c.blinds)}`, c.note);
    case 'set-screen': {
      const whose = c.persona !== undefined ? `${personName(scenario, c.persona)}'s ${screenName(scenario, c.screen, { persona: c.persona }).replace(/^the /, '')}` : `${screenName(scenario, c.screen, { place: c.place })} in ${placeName(scenario, c.place ?? '')}`;
      const parts: string[] = [];
      if (c.luminance_cd_m2 !== undefined) parts.push(`brightness ${c.luminance_cd_m2} cd/m²`);
      if (c.nightMode === null) parts.push('warm night colour switched off');
      else if (c.nightMode !== undefined) parts.push(`warm night colour (${c.nightMode.cct_K ?? 3000} K) from ${c.nightMode.start} to ${c.nightMode.end}`);
      return sentence(`${whose}: ${parts.join(', ') || 'unchanged'}`, c.note);
    }
    case 'add-segment': {
      const s = c.segment;
      const what = s.activity === 'exercise' && s.posture === 'walking' ? 'a walk' : ACTIVITY_NOUN[s.activity ?? 'other'];
      const kinds = c.shiftKind === undefined ? '' : ` on days of ${c.shiftKind.map((k) => SHIFT_KIND_WORDS[k]).join(' and ')}`;
      const days = weekdaysWords(c.days);
      return sentence(`${personName(scenario, c.persona)} adds ${what} at ${placeName(scenario, s.place)} from ${s.start} to ${s.end}, ${days}${kinds}`, c.note);
    }
    case 'modify-segments':
      return sentence(`${personName(scenario, c.persona)} ${patchWords(scenario, c.persona, c.set)} ${matchWords(scenario, c.match)}`, c.note);
    case 'set-roster':
      return sentence(rosterChangeText(scenario, c), c.note);
  }
}

export function strategyChangeWords(scenario: ScenarioInput, strategy: Pick<StrategyIn, 'changes'>): string[] {
  return strategy.changes.map((c) => changeWords(scenario, c));
}
