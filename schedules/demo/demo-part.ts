/**
 * A part of the demo scenario for small runs and checks: only the named people, the strategies
 * meant for any of them (each narrowed to those people and to the changes that concern them), and
 * only the rosters they follow. Places stay as they are, so every reference holds.
 */
import type { ScenarioInput } from '../schema/scenario-types.js';
import { DEMO_SCENARIO } from './demo-scenario.js';

type StrategyIn = NonNullable<ScenarioInput['strategies']>[number];

export function demoPart(personaIds: readonly string[], strategyIds?: readonly string[]): ScenarioInput {
  const s = structuredClone(DEMO_SCENARIO);
  const keep = new Set(personaIds);
  const personas = s.personas.filter((p) => keep.has(p.id));
  const rosters = (s.rosters ?? []).filter((r) => personas.some((p) => p.roster?.roster === r.id));
  const strategies = (s.strategies ?? []).flatMap((st): StrategyIn[] => {
    if (strategyIds !== undefined && !strategyIds.includes(st.id)) return [];
    const meant = (st.personas ?? s.personas.map((p) => p.id)).filter((id) => keep.has(id));
    if (meant.length === 0) return [];
    const changes = st.changes.filter((c) => !('persona' in c) || c.persona === undefined || keep.has(c.persona));
    return changes.length === 0 ? [] : [{ ...st, personas: meant, changes: changes as StrategyIn['changes'] }];
  });
  return { ...s, personas, rosters, strategies };
}
