import { describe, expect, it } from 'vitest';
import type { ResultsView } from '../results/view-model.js';
import { EnsembleStore } from './ensemble-store.js';

const view = (name: string): ResultsView => ({ scenarioName: name, startDate: '2026-03-23', days: 1, baselineId: 'baseline', strategies: [], personas: [], runs: [], cautions: [] });
const ensemble = { models: [{ role: 'body clock' as const, name: 'M1', source: 'Author 1999' }], pairs: 1, rankings: [], cells: [] };

describe('ensemble ranges for the results on screen', () => {
  it('belong to the view they were run for, and a newer view shows without them', () => {
    const store = new EnsembleStore();
    const first = view('first');
    const newer = view('newer');
    let notified = 0;
    store.subscribe(() => notified++);
    expect(store.viewWithEnsemble(first)).toBe(first);
    store.set(first, ensemble);
    expect(notified).toBe(1);
    expect(store.viewWithEnsemble(first).ensemble?.models[0]?.name).toBe('M1');
    expect(store.viewWithEnsemble(newer)).toBe(newer);
  });
});
