import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { handleRunRequest } from './run-in-worker.js';
import type { WorkerToPage } from './simulation-protocol.js';

/** The demo's office part for 3 days (its strategies and the people they are for): a quick scenario. */
function smallScenario(): unknown {
  const s = structuredClone(DEMO_SCENARIO);
  const strategies = (s.strategies ?? []).filter((x) => x.id.startsWith('office-'));
  return { ...s, run: { ...s.run, days: 3 }, personas: s.personas.filter((p) => strategies.some((x) => x.personas?.includes(p.id))), strategies };
}

describe('model ensemble in the simulation worker', () => {
  it('posts the default model’s results first, then the ranges across the ensemble for the same run', async () => {
    const messages: WorkerToPage[] = [];
    await handleRunRequest({ type: 'run', runId: 11, scenario: smallScenario() }, (m) => messages.push(m), () => Promise.resolve());
    const types = messages.map((m) => m.type);
    expect(types.filter((t) => t === 'results' || t === 'ensemble')).toEqual(['results', 'ensemble']);
    const e = messages.find((m) => m.type === 'ensemble');
    if (e?.type !== 'ensemble') throw new Error('no ensemble message');
    expect(e.runId).toBe(11);
    expect(e.ensemble.models.filter((m) => m.role === 'body clock').length).toBeGreaterThanOrEqual(3);
    const shift = e.ensemble.cells.find((c) => c.strategyId === 'office-tunable-white' && c.metricId === 'phase-shift');
    expect(shift?.models).toBe(e.ensemble.models.filter((m) => m.role === 'body clock').length);
    expect(shift!.min).toBeLessThanOrEqual(shift!.max);
  });

  it('drops the ensemble of a run when a newer run is asked for meanwhile', async () => {
    const messages: WorkerToPage[] = [];
    let newer: Promise<void> | undefined;
    // the first pause between ensemble jobs is where a newer request gets in
    const pause = () => {
      newer ??= handleRunRequest({ type: 'run', runId: 13, scenario: { broken: true } }, (m) => messages.push(m), () => Promise.resolve());
      return Promise.resolve();
    };
    await handleRunRequest({ type: 'run', runId: 12, scenario: smallScenario() }, (m) => messages.push(m), pause);
    await newer;
    expect(messages.some((m) => m.runId === 12 && m.type === 'results')).toBe(true);
    expect(messages.some((m) => m.type === 'ensemble')).toBe(false);
  });
});
