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

type StrategyChangeInput = NonNullable<ScenarioInput['strategies']>[number]['changes'][number];

/** Kinds of change the workspace can add; each starts from the named room (and luminaire). */
export type NewChangeKind = 'set-luminaire' | 'add-luminaire' | 'remove-luminaire' | 'set-blinds';

export const NEW_CHANGE_LABELS: Readonly<Record<NewChangeKind, string>> = {
  'set-luminaire': 'Change a luminaire',
  'add-luminaire': 'Add a luminaire',
  'remove-luminaire': 'Switch a luminaire off for good',
  'set-blinds': 'Change the blinds rule',
};

/** Targets a new change can name: rooms, and rooms' luminaires as "room/luminaire". */
export function changeTargets(scenario: ScenarioInput, kind: NewChangeKind): { value: string; label: string }[] {
  const rooms = scenario.places.filter((p) => p.kind === 'room');
  if (kind === 'add-luminaire' || kind === 'set-blinds') return rooms.map((r) => ({ value: r.id, label: r.name ?? r.id }));
  return rooms.flatMap((r) => (r.kind === 'room' ? (r.luminaires ?? []) : []).map((l) => ({ value: `${r.id}/${l.id}`, label: `${r.name ?? r.id}: ${l.name ?? l.id}` })));
}

/** A first version of a change, to be adjusted in the editor. */
export function newChange(scenario: ScenarioInput, kind: NewChangeKind, target: string): StrategyChangeInput | null {
  if (!changeTargets(scenario, kind).some((t) => t.value === target)) return null;
  const [place, luminaire] = target.split('/') as [string, string | undefined];
  switch (kind) {
    case 'set-luminaire': {
      const room = scenario.places.find((p) => p.id === place);
      const current = room?.kind === 'room' ? room.luminaires?.find((l) => l.id === luminaire) : undefined;
      return { op: 'set-luminaire', place, luminaire: luminaire ?? '', eyeIlluminance_lx: Math.round(2 * (current?.eyeIlluminance_lx ?? 250)) };
    }
    case 'remove-luminaire':
      return { op: 'remove-luminaire', place, luminaire: luminaire ?? '' };
    case 'add-luminaire': {
      const room = scenario.places.find((p) => p.id === place);
      const taken = room?.kind === 'room' ? (room.luminaires ?? []).map((l) => l.id) : [];
      let n = 1;
      while (taken.includes(`added-${n}`)) n++;
      // A 6500 K desk lamp giving 500 lx at the eye in the morning: a common bright-light starting point (common practice).
      return { op: 'add-luminaire', place, luminaire: { id: `added-${n}`, name: 'Added luminaire', spectrum: { kind: 'cct', cct_K: 6500 }, eyeIlluminance_lx: 500, schedule: [{ start: '08:00', end: '11:00', level: 1 }] } };
    }
    case 'set-blinds':
      return { op: 'set-blinds', place, blinds: { rule: 'always-down', loweredTransmittance: 0.25 } };
  }
}

function mapStrategy(scenario: ScenarioInput, strategyId: string, change: (s: NonNullable<ScenarioInput['strategies']>[number]) => NonNullable<ScenarioInput['strategies']>[number]): ScenarioInput {
  return { ...scenario, strategies: (scenario.strategies ?? []).map((s) => (s.id === strategyId ? change(s) : s)) };
}

export function addChange(scenario: ScenarioInput, strategyId: string, change: StrategyChangeInput): ScenarioInput {
  return mapStrategy(scenario, strategyId, (s) => ({ ...s, changes: [...s.changes, change] }));
}

/** Removes one change; the last change of a strategy stays (a strategy changes at least one thing — remove the strategy instead). */
export function removeChange(scenario: ScenarioInput, strategyId: string, changeIndex: number): ScenarioInput {
  return mapStrategy(scenario, strategyId, (s) => (s.changes.length <= 1 ? s : { ...s, changes: s.changes.filter((_, i) => i !== changeIndex) }));
}

/** A new strategy with one first change (the first kind that has a target), or the scenario unchanged when there is no room. */
export function addStrategy(scenario: ScenarioInput): ScenarioInput {
  const list = scenario.strategies ?? [];
  for (const kind of ['set-luminaire', 'set-blinds'] as const) {
    const target = changeTargets(scenario, kind)[0];
    const change = target === undefined ? null : newChange(scenario, kind, target.value);
    if (change !== null) {
      let n = 1;
      while (list.some((s) => s.id === `strategy-${n}`)) n++;
      return { ...scenario, strategies: [...list, { id: `strategy-${n}`, name: `New strategy ${n}`, changes: [change] }] };
    }
  }
  return scenario;
}
