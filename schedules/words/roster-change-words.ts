/**
 * Plain words for a strategy's roster change: "Mara's roster: the Birch rotation instead of the
 * Ward rotation, from day 4 of its cycle; cycle 2early 2late 3night 3rest; the night shift
 * 21:00–07:00; split sleep after night shifts". Cycles are written as roster patterns
 * (schedules/roster/roster-pattern.ts), the notation the scenario format documents.
 */
import type { ScenarioInput } from '../schema/scenario-types.js';
import { formatRosterPattern, parseRosterPattern } from '../roster/roster-pattern.js';
import { SHIFT_KIND_WORDS } from './scenario-terms.js';
import { personaOf, personName, placeName, rosterName } from './scenario-names.js';

type StrategyChangeIn = NonNullable<ScenarioInput['strategies']>[number]['changes'][number];
export type RosterChangeIn = Extract<StrategyChangeIn, { op: 'set-roster' }>;
type SleepPatchIn = NonNullable<RosterChangeIn['sleep']>;

const hours = (h: number): string => `${h} h`;

function sleepWords(scenario: ScenarioInput, s: SleepPatchIn): string[] {
  const out: string[] = [];
  if (s.afterNight === 'split') out.push('split sleep after night shifts (a morning sleep and an afternoon nap)');
  if (s.afterNight === 'morning') out.push('one morning sleep after night shifts');
  if (s.mainSleep_h !== undefined) out.push(`a main sleep of ${hours(s.mainSleep_h)}`);
  if (s.usualBedtime !== undefined) out.push(`bedtime ${s.usualBedtime}`);
  if (s.place !== undefined) out.push(`sleeps at ${placeName(scenario, s.place)}`);
  if (s.prepare_min !== undefined) out.push(`${s.prepare_min} min from waking to leaving`);
  if (s.windDown_min !== undefined) out.push(`${s.windDown_min} min from getting home to bed`);
  if (s.afterNightSleep_h !== undefined) out.push(`${hours(s.afterNightSleep_h)} of sleep between two nights`);
  if (s.splitNap_h !== undefined) out.push(`an afternoon nap of ${hours(s.splitNap_h)} in split sleep`);
  if (s.napBeforeFirstNight_h !== undefined) out.push(s.napBeforeFirstNight_h === 0 ? 'no nap before the first night' : `a nap of ${hours(s.napBeforeFirstNight_h)} before the first night`);
  if (s.recoveryAfterLastNight_h !== undefined) out.push(`${hours(s.recoveryAfterLastNight_h)} of recovery sleep after the last night`);
  return out;
}

function cycleWords(c: RosterChangeIn): string | undefined {
  if (c.pattern !== undefined) {
    try {
      return `cycle ${formatRosterPattern(parseRosterPattern(c.pattern))}`;
    } catch {
      return `cycle ${c.pattern.trim()}`;
    }
  }
  return c.cycle === undefined || c.cycle.length === 0 ? undefined : `cycle ${formatRosterPattern(c.cycle)}`;
}

/** The parts of the sentence, without the person: "the Birch rotation instead of …", "cycle 2D 3N 2rest", … */
export function rosterChangeParts(scenario: ScenarioInput, c: RosterChangeIn): string[] {
  const parts: string[] = [];
  const current = personaOf(scenario, c.persona)?.roster?.roster;
  let switchTo = '';
  if (c.roster !== undefined && c.roster !== current) {
    switchTo = `${rosterName(scenario, c.roster).replace(/^a /, 'another ')} instead of ${current === undefined ? 'a weekly routine' : rosterName(scenario, current)}`;
  }
  const start = c.offsetDays === undefined ? '' : `from day ${c.offsetDays + 1} of ${switchTo === '' ? 'the' : 'its'} cycle`;
  if (switchTo !== '' || start !== '') parts.push([switchTo, start].filter((x) => x !== '').join(', '));
  const cycle = cycleWords(c);
  if (cycle !== undefined) parts.push(cycle);
  for (const sh of c.shifts ?? []) {
    const what: string[] = [];
    if (sh.start !== undefined || sh.end !== undefined) what.push(`${sh.start ?? 'same start'}–${sh.end ?? 'same end'}`);
    if (sh.kind !== undefined) what.push(`counted as ${SHIFT_KIND_WORDS[sh.kind].replace(/s$/, '')}`);
    if (sh.place !== undefined) what.push(`at ${placeName(scenario, sh.place)}`);
    if (what.length > 0) parts.push(`the "${sh.shift}" shift ${what.join(', ')}`);
  }
  if (c.sleep !== undefined) parts.push(...sleepWords(scenario, c.sleep));
  return parts;
}

/** "Mara's roster: …" (the sentence ending is added by the caller). */
export function rosterChangeText(scenario: ScenarioInput, c: RosterChangeIn): string {
  const parts = rosterChangeParts(scenario, c);
  return `${personName(scenario, c.persona)}'s roster: ${parts.length === 0 ? 'unchanged' : parts.join('; ')}`;
}
