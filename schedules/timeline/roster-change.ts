/**
 * Applies a roster change of a strategy to a copy of the scenario: the persona is given its own
 * copy of the roster (the one it works, or the one the change names), with the new cycle, shift
 * times and sleep rules, so people who share the roster in the baseline are not affected. The
 * timeline is then laid out from that copy like any roster (roster-plan.ts).
 */
import type { Roster, Scenario, StrategyChange } from '../schema/scenario-types.js';
import { parseRosterPattern } from '../roster/roster-pattern.js';

export type RosterChange = Extract<StrategyChange, { op: 'set-roster' }>;

/** An identifier not yet used by any roster of the scenario. */
function freshRosterId(s: Scenario, base: string): string {
  const taken = new Set(s.rosters.map((r) => r.id));
  let id = base;
  for (let n = 2; taken.has(id); n++) id = `${base}-${n}`;
  return id;
}

/** `source` with the change's cycle, shift and sleep edits (a new object; the source is not modified). */
export function changedRoster(source: Roster, c: RosterChange): Roster {
  const roster = structuredClone(source);
  if (c.pattern !== undefined) roster.cycle = parseRosterPattern(c.pattern);
  else if (c.cycle !== undefined) roster.cycle = [...c.cycle];
  for (const patch of c.shifts ?? []) {
    const sh = roster.shifts.find((x) => x.id === patch.shift);
    if (sh === undefined) continue;
    if (patch.start !== undefined) sh.start = patch.start;
    if (patch.end !== undefined) sh.end = patch.end;
    if (patch.kind !== undefined) sh.kind = patch.kind;
    if (patch.place !== undefined) sh.place = patch.place;
  }
  if (c.sleep !== undefined) {
    const rules = Object.fromEntries(Object.entries(c.sleep).filter(([, v]) => v !== undefined));
    roster.sleep = { ...roster.sleep, ...rules };
  }
  return roster;
}

/**
 * Changes `s` in place (it is the strategy's own copy). `owned` holds the ids of roster copies
 * made for this strategy, so a second change for the same persona edits the same copy.
 * A change whose references do not hold (validation refuses those) leaves the scenario as it is.
 */
export function applyRosterChange(s: Scenario, c: RosterChange, strategyId: string, owned: Set<string>): void {
  const persona = s.personas.find((p) => p.id === c.persona);
  if (persona === undefined) return;
  const sourceId = c.roster ?? persona.roster?.roster;
  const source = s.rosters.find((r) => r.id === sourceId);
  if (source === undefined) return;
  let roster: Roster;
  if (owned.has(source.id) && c.roster === undefined) roster = source;
  else {
    roster = { ...structuredClone(source), id: freshRosterId(s, `${source.id}-${strategyId}-${persona.id}`) };
    s.rosters.push(roster);
    owned.add(roster.id);
  }
  Object.assign(roster, changedRoster(roster, c), { id: roster.id });
  persona.roster = { roster: roster.id, offsetDays: c.offsetDays ?? persona.roster?.offsetDays ?? 0 };
  delete persona.week;
}
