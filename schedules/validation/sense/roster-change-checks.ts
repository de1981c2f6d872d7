/**
 * Sense checks for a strategy's roster change: the persona and roster exist, and the cycle,
 * pattern and shift changes name shifts of the roster the persona works after the change.
 * Changes of one strategy apply in order, so a later change is checked against the roster an
 * earlier one switched to. The changed roster gets the roster timing checks; warnings it did not
 * have before the change are reported at the change.
 */
import type { Place, Roster, Scenario, StrategyChange } from '../../schema/scenario-types.js';
import { REST_DAY } from '../../schema/roster-schema.js';
import { parseRosterPattern, RosterPatternError } from '../../roster/roster-pattern.js';
import { problem, type PathPart, type ScenarioProblem } from '../problem.js';
import { didYouMean } from '../suggest.js';
import { changedRoster } from '../../timeline/roster-change.js';
import { rosterTimingChecks } from './timing-checks.js';
import type { SetAsideIds } from './reference-checks.js';

type RosterChange = Extract<StrategyChange, { op: 'set-roster' }>;
type CheckPlace = (id: string, path: readonly PathPart[], kinds?: readonly Place['kind'][]) => void;

function listIds(ids: Iterable<string>): string {
  const all = [...ids];
  return all.length === 0 ? 'none defined' : all.map((s) => `"${s}"`).join(', ');
}

/** "day 4 of the cycle", "shift \"night\"": where in the changed roster a timing warning points (`cycle[3]`, `shifts[2].kind`). */
function placeInRoster(path: string, roster: Roster): string {
  const day = /^cycle\[(\d+)\]/.exec(path);
  if (day !== null) return `day ${Number(day[1]) + 1} of the cycle`;
  const shift = /^shifts\[(\d+)\]/.exec(path);
  return shift === null ? 'the roster' : `shift "${roster.shifts[Number(shift[1])]?.id ?? ''}"`;
}

/**
 * Problems of one roster change at `path`. `rosterNow` maps each persona to the roster it works
 * after the strategy's earlier changes; it is updated with this change.
 */
export function rosterChangeChecks(s: Scenario, c: RosterChange, path: readonly PathPart[], rosterNow: Map<string, string>, setAside: SetAsideIds, checkPlace: CheckPlace): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  const persona = s.personas.find((p) => p.id === c.persona);
  if (persona === undefined) {
    if (!setAside.personas.has(c.persona)) out.push(problem('error', [...path, 'persona'], `there is no persona "${c.persona}"`, `${didYouMean(c.persona, s.personas.map((p) => p.id))}Use one of: ${listIds(s.personas.map((p) => p.id))}.`));
    return out;
  }
  const rosterIds = s.rosters.map((r) => r.id);
  if (c.roster !== undefined && !rosterIds.includes(c.roster)) {
    if (!setAside.rosters.has(c.roster)) out.push(problem('error', [...path, 'roster'], `there is no roster "${c.roster}"`, `${didYouMean(c.roster, rosterIds)}Use one of: ${listIds(rosterIds)}.`));
    return out;
  }
  const targetId = c.roster ?? rosterNow.get(persona.id) ?? persona.roster?.roster;
  if (targetId === undefined) {
    out.push(problem('error', path, `${persona.name} works no roster, so there is none to change`, 'Give "roster": the roster of the scenario they should work instead.'));
    return out;
  }
  rosterNow.set(persona.id, targetId);
  const target = s.rosters.find((r) => r.id === targetId);
  if (target === undefined) return out;
  const shiftIds = target.shifts.map((sh) => sh.id);
  const fixShift = `Use "${REST_DAY}" or one of the shifts of roster "${target.id}": ${listIds(shiftIds)}.`;

  if (c.cycle !== undefined && c.pattern !== undefined) {
    out.push(problem('error', [...path, 'pattern'], 'the change gives both a cycle and a pattern', 'Keep one: "cycle" as a list, or "pattern" as a roster pattern.'));
  }
  c.cycle?.forEach((id, j) => {
    if (id !== REST_DAY && !shiftIds.includes(id)) out.push(problem('error', [...path, 'cycle', j], `"${id}" is not a shift of roster "${target.id}"`, `${didYouMean(id, shiftIds)}${fixShift}`));
  });
  if (c.pattern !== undefined) {
    try {
      parseRosterPattern(c.pattern, { shiftIds });
    } catch (err) {
      if (!(err instanceof RosterPatternError)) throw err;
      out.push(problem('error', [...path, 'pattern'], `the pattern cannot be read at character ${err.position + 1}: expected ${err.expected}, found ${err.found}`, 'Write one code per day, as in "2D 2E 3N 4rest" (a count touching its code, "rest" or "." for a day off; see the scenario format guide).'));
    }
  }
  c.shifts?.forEach((sh, j) => {
    if (!shiftIds.includes(sh.shift)) out.push(problem('error', [...path, 'shifts', j, 'shift'], `roster "${target.id}" has no shift "${sh.shift}"`, `${didYouMean(sh.shift, shiftIds)}Use one of: ${listIds(shiftIds)}.`));
    if (sh.place !== undefined) checkPlace(sh.place, [...path, 'shifts', j, 'place']);
  });
  if (c.sleep?.place !== undefined) checkPlace(c.sleep.place, [...path, 'sleep', 'place'], ['room']);
  if (!out.some((p) => p.severity === 'error')) {
    // Timing warnings the change brings (quick returns, shift kinds), not those the roster had already.
    const before = new Set(rosterTimingChecks(target, []).map((p) => p.message));
    for (const p of rosterTimingChecks(changedRoster(target, c), [])) {
      if (!before.has(p.message)) out.push(problem('warning', path, `with this change, ${p.message} (${placeInRoster(p.path, target)})`, p.fix));
    }
  }
  const changes = [c.roster, c.offsetDays, c.cycle, c.pattern, c.shifts, c.sleep].filter((x) => x !== undefined);
  if (changes.length === 0) out.push(problem('warning', path, 'this change changes nothing', 'Give a roster, offsetDays, cycle or pattern, shifts or sleep rules.'));
  return out;
}
