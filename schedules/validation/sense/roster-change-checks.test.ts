import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../demo/demo-scenario.js';
import { validateScenarioValue } from '../validate-scenario.js';

/** The demo with one extra strategy holding the given changes; returns the strategy's index. */
function withChanges(changes: unknown[]): { doc: Record<string, unknown>; at: number } {
  const doc = structuredClone(DEMO_SCENARIO) as unknown as { strategies: unknown[]; rosters: { id: string; shifts: { id: string }[] }[] };
  doc.rosters.push({ ...structuredClone(doc.rosters[0] as { id: string; shifts: { id: string }[] }), id: 'twelve-hour', name: 'Twelve-hour days and nights', cycle: ['long-day', 'long-day', 'long-night', 'long-night', 'rest', 'rest', 'rest'], shifts: [
    { id: 'long-day', kind: 'day', start: '07:00', end: '19:00', place: 'ward-station' },
    { id: 'long-night', kind: 'night', start: '19:00', end: '07:00', place: 'ward-station' },
  ] } as never);
  doc.strategies.push({ id: 'roster-option', name: 'Roster option', personas: ['nurse'], changes });
  return { doc: doc as unknown as Record<string, unknown>, at: doc.strategies.length - 1 };
}

function problemsOf(changes: unknown[]): { path: string; message: string; severity: string }[] {
  const { doc } = withChanges(changes);
  return validateScenarioValue(doc).problems.map((p) => ({ path: p.path, message: p.message, severity: p.severity }));
}

describe('roster changes in strategies are validated like every other change', () => {
  it('accepts a switch to another roster with a pattern, shift times and sleep rules of that roster', () => {
    const v = validateScenarioValue(
      withChanges([{ op: 'set-roster', persona: 'nurse', roster: 'twelve-hour', offsetDays: 2, pattern: '2long-day 2long-night 3rest', shifts: [{ shift: 'long-night', start: '20:00' }], sleep: { afterNight: 'split', splitNap_h: 1.5 } }]).doc,
    );
    expect(v.problems).toEqual([]);
    expect(v.ok).toBe(true);
  });

  it('refuses an unknown roster and an unknown persona at their paths', () => {
    const { at } = withChanges([]);
    const roster = problemsOf([{ op: 'set-roster', persona: 'nurse', roster: 'twelve-hours' }]);
    expect(roster).toContainEqual({ path: `strategies[${at}].changes[0].roster`, message: 'there is no roster "twelve-hours"', severity: 'error' });
    const persona = problemsOf([{ op: 'set-roster', persona: 'nurze', offsetDays: 1 }]);
    expect(persona.filter((p) => p.severity === 'error')).toEqual([{ path: `strategies[${at}].changes[0].persona`, message: 'there is no persona "nurze"', severity: 'error' }]);
  });

  it('refuses cycle days and shift changes that name no shift of the roster worked after the change', () => {
    const { at } = withChanges([]);
    const found = problemsOf([
      { op: 'set-roster', persona: 'nurse', cycle: ['early', 'nite', 'rest'] },
      { op: 'set-roster', persona: 'nurse', roster: 'twelve-hour' },
      { op: 'set-roster', persona: 'nurse', shifts: [{ shift: 'night', end: '08:00' }] },
    ]).filter((p) => p.severity === 'error');
    expect(found.map((p) => p.path)).toEqual([`strategies[${at}].changes[0].cycle[1]`, `strategies[${at}].changes[2].shifts[0].shift`]);
    expect(found[1]?.message).toBe('roster "twelve-hour" has no shift "night"');
  });

  it('refuses a pattern that cannot be read with the character where reading stopped', () => {
    const { at } = withChanges([]);
    const found = problemsOf([{ op: 'set-roster', persona: 'nurse', pattern: '2early 3nite rest' }]).filter((p) => p.severity === 'error');
    expect(found).toEqual([
      { path: `strategies[${at}].changes[0].pattern`, message: 'the pattern cannot be read at character 9: expected "rest" or one of the shifts "early", "late", "night", found "nite"', severity: 'error' },
    ]);
  });

  it('refuses a change for someone who works no roster unless it names one', () => {
    const { at } = withChanges([]);
    const found = problemsOf([{ op: 'set-roster', persona: 'desk-worker', offsetDays: 1 }]).filter((p) => p.severity === 'error');
    expect(found.map((p) => p.path)).toEqual([`strategies[${at}].changes[0]`]);
  });

  it('warns at the change about a quick return the change brings, not about those the roster had already', () => {
    const { at } = withChanges([]);
    const found = problemsOf([{ op: 'set-roster', persona: 'nurse', pattern: 'late early 5rest' }]);
    // 11 h minimum daily rest: EU Working Time Directive 2003/88/EC, Art. 3. Late ends 22:30, early starts 06:45, 25 min commute each way.
    expect(found).toEqual([
      { path: `strategies[${at}].changes[0]`, message: 'with this change, only 7.4 h between the end of "late" and the start of "early" (commute included) (day 2 of the cycle)', severity: 'warning' },
    ]);
    expect(problemsOf([{ op: 'set-roster', persona: 'nurse', offsetDays: 3 }])).toEqual([]);
  });

  it('refuses a misspelt field of a roster change at its path (schema)', () => {
    const { at } = withChanges([]);
    const found = problemsOf([{ op: 'set-roster', persona: 'nurse', sleep: { afterNights: 'split' } }]);
    expect(found.some((p) => p.path.startsWith(`strategies[${at}].changes[0].sleep`) && p.severity === 'error')).toBe(true);
  });
});
