// Adding, copying and removing strategies (pure; each returns a new scenario).
import type { ScenarioInput } from './scenario-types.js';

function uniqueId(taken: ReadonlySet<string>, base: string): string {
  const stem = base.slice(0, 58);
  for (let n = 1; ; n++) {
    const id = n === 1 ? `${stem}-copy` : `${stem}-copy${n}`;
    if (!taken.has(id)) return id;
  }
}

export function duplicateStrategy(scenario: ScenarioInput, strategyId: string): ScenarioInput {
  const list = scenario.strategies ?? [];
  const index = list.findIndex((s) => s.id === strategyId);
  const original = list[index];
  if (original === undefined) return scenario;
  const copy = { ...structuredClone(original), id: uniqueId(new Set(list.map((s) => s.id)), original.id), name: `${original.name} (copy)` };
  return { ...scenario, strategies: [...list.slice(0, index + 1), copy, ...list.slice(index + 1)] };
}

export function removeStrategy(scenario: ScenarioInput, strategyId: string): ScenarioInput {
  return { ...scenario, strategies: (scenario.strategies ?? []).filter((s) => s.id !== strategyId) };
}
