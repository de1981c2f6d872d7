/**
 * Limits on the size of a scenario, checked with the other sense checks, so a run that would take
 * too long or too much memory is refused with a clear message before any work starts. The
 * memory of a run grows with its person-strategy-days (the per-minute light at the eye of every
 * person under every strategy, kept for exposure.csv); the limit keeps the largest allowed run,
 * with the largest allowed light log and weather file, under 1 GB (measured in
 * docs/validation/robustness.md). Documented in docs/scenario-format.md ("Limits").
 */
import type { Scenario } from '../../schema/scenario-types.js';
import { problem, type ScenarioProblem } from '../problem.js';

export const SCENARIO_LIMITS = {
  /** Simulated days (also the schema's bound on run.days). */
  days: 400,
  personas: 20,
  places: 100,
  strategies: 20,
  rosters: 20,
  lightLogs: 10,
  /** Σ over people of (1 + the strategies that apply to them) × days. */
  personStrategyDays: 600,
  /** Luminaires in one room (each up to 100 000 lx at the eye; the body-clock models are solved for up to about 10⁸ lx). */
  luminairesPerRoom: 50,
} as const;

/** Σ over people of (1 + the strategies that apply to them) × days: the runs the scenario asks for, in days. */
export function personStrategyDays(s: Pick<Scenario, 'personas' | 'strategies' | 'run'>): number {
  let runs = 0;
  for (const p of s.personas) runs += 1 + s.strategies.filter((st) => st.personas === undefined || st.personas.includes(p.id)).length;
  return runs * s.run.days;
}

export function limitChecks(s: Scenario): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  const count = (key: 'personas' | 'places' | 'strategies' | 'rosters' | 'lightLogs', what: string, fix: string) => {
    const n = s[key].length;
    const max = SCENARIO_LIMITS[key];
    if (n > max) out.push(problem('error', [key], `${n} ${what}; one scenario holds at most ${max}`, fix));
  };
  count('personas', 'people', 'Split the people over several scenarios, or use one persona with a cohort (zeitlight run --cohort) for a group.');
  count('places', 'places', 'Remove places nobody uses, or split the scenario.');
  count('strategies', 'strategies', 'Compare fewer strategies at a time.');
  count('rosters', 'rosters', 'Remove rosters nobody uses, or split the scenario.');
  count('lightLogs', 'light logs', 'Split the people with measured light over several scenarios.');
  s.places.forEach((p, i) => {
    if (p.kind === 'room' && p.luminaires.length > SCENARIO_LIMITS.luminairesPerRoom) {
      out.push(problem('error', ['places', i, 'luminaires'], `${p.luminaires.length} luminaires in one room; a room holds at most ${SCENARIO_LIMITS.luminairesPerRoom}`, 'Describe groups of luminaires that are switched together as one luminaire with their summed illuminance at the eye.'));
    }
  });
  const psd = personStrategyDays(s);
  if (psd > SCENARIO_LIMITS.personStrategyDays) {
    out.push(
      problem(
        'error',
        ['run', 'days'],
        `the scenario asks for ${psd} person-strategy-days (each person under the baseline and each of their strategies, × ${s.run.days} days); a run holds at most ${SCENARIO_LIMITS.personStrategyDays}`,
        `Shorten the run to at most ${Math.max(1, Math.floor((SCENARIO_LIMITS.personStrategyDays * s.run.days) / psd))} days, or compare fewer people or strategies at a time.`,
      ),
    );
  }
  return out;
}
