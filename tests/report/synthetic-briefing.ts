// A synthetic results view for the built-in demo scenario — NOT a model output. It re-labels the
// renderer's closed-form layout-check runs (renderer/src/results/synthetic-view.ts) with the demo's
// people and strategies and varies the metrics by strategy so the summary has something to rank.
// Used to test the briefing layout until the run pipeline writes real results.
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';
import { syntheticResultsView } from '../../renderer/src/results/synthetic-view.js';
import type { ResultsView, RunView } from '../../renderer/src/results/view-model.js';

export function demoSyntheticView(): ResultsView {
  const days = DEMO_SCENARIO.run.days;
  const source = syntheticResultsView(days);
  const [plain, boosted] = source.runs;
  if (plain === undefined || boosted === undefined) throw new Error('synthetic view has no runs');
  const strategies = [{ id: 'baseline', name: 'Baseline' }, ...(DEMO_SCENARIO.strategies ?? []).map((s) => ({ id: s.id, name: s.name }))];
  const runs: RunView[] = [];
  for (const persona of DEMO_SCENARIO.personas) {
    let index = 0;
    for (const strategy of strategies) {
      const applies = strategy.id === 'baseline' || ((DEMO_SCENARIO.strategies ?? []).find((s) => s.id === strategy.id)?.personas ?? [persona.id]).includes(persona.id);
      if (!applies) continue;
      const shape = index === 0 ? plain : boosted;
      const kssOffset = index === 0 ? 1.2 : 1.2 - 0.35 * index;
      runs.push({
        ...shape,
        personaId: persona.id,
        strategyId: strategy.id,
        kssHourly: shape.kssHourly.map((k) => (k === null ? null : Math.min(9, Math.max(1, k + kssOffset)))),
        metrics: shape.metrics.map((m) => (m.id === 'suppression' ? { ...m, value: 22 - 4.5 * index } : m)),
      });
      index += 1;
    }
  }
  return { ...source, scenarioName: DEMO_SCENARIO.name, startDate: DEMO_SCENARIO.run.startDate, days, strategies, personas: DEMO_SCENARIO.personas.map((p) => ({ id: p.id, name: p.name })), runs };
}
