import { describe, expect, it } from 'vitest';
import type { EnsembleRange } from '../../../schedules/run/index.js';
import { comparisonRows, ensembleRangeText, formatNumber } from '../charts/comparison-data.js';
import { metricEnsemble, withViewEnsemble, type ViewEnsemble } from './ensemble-view.js';
import type { MetricValue, ResultsView, RunView } from './view-model.js';

const metric = (id: string, value: number, decimals = 2): MetricValue => ({ id, label: id, unit: 'h', value, decimals, better: 'none', increaseWord: 'later', decreaseWord: 'earlier' });
const run = (strategyId: string, shift: number): RunView => ({
  personaId: 'p',
  strategyId,
  light: { start_h: 0, step_h: 1, sources: [] },
  phases: [],
  melatonin: { time_h: [], level: [], unsuppressed: null, unit: 'pmol/L' },
  kssHourly: [],
  sleep: [],
  metrics: [metric('phase-shift', shift), metric('dose', 100, 0)],
});
const view: ResultsView = { scenarioName: 's', startDate: '2026-03-23', days: 1, baselineId: 'baseline', strategies: [{ id: 'baseline', name: 'Baseline' }, { id: 'a', name: 'A' }], personas: [{ id: 'p', name: 'P' }], runs: [run('baseline', 0), run('a', 0.42)], cautions: [] };
const ensemble: ViewEnsemble = {
  models: [
    { role: 'body clock', name: 'M1', source: 'Author 1999' },
    { role: 'body clock', name: 'M2', source: 'Author 2019' },
    { role: 'body clock', name: 'M3', source: 'Author 2007' },
  ],
  pairs: 3,
  rankings: [{ personaId: 'p', sentences: ['“A” ranks first with 2 of 3 body-clock models; with the M2 it ranks second.'] }],
  cells: [{ personaId: 'p', strategyId: 'a', metricId: 'phase-shift', min: 0.3, max: 0.55, models: 3 }],
};

describe('ensemble ranges in the results views', () => {
  it('puts each range on its metric of its persona and strategy, and names the models', () => {
    const v = withViewEnsemble(view, ensemble);
    expect(v.runs[1]?.metrics[0]?.ensemble).toEqual({ min: 0.3, max: 0.55, models: 3 });
    expect(v.runs[1]?.metrics[1]?.ensemble).toBeUndefined();
    expect(v.runs[0]?.metrics[0]?.ensemble).toBeUndefined();
    expect(v.ensemble?.models.map((m) => m.name)).toEqual(['M1', 'M2', 'M3']);
    expect(view.ensemble).toBeUndefined();
  });

  it('shows the range beside the value in the comparison: “0.30–0.55 across 3 models”', () => {
    const rows = comparisonRows(withViewEnsemble(view, ensemble).runs, view.strategies, 'baseline');
    const cell = rows.find((r) => r.metricId === 'phase-shift')?.cells.find((c) => c.strategyId === 'a');
    expect(cell?.ensemble).toEqual({ min: 0.3, max: 0.55, models: 3 });
    expect(ensembleRangeText(cell!.ensemble!, 2)).toBe('0.30–0.55 across 3 models');
    expect(ensembleRangeText({ min: -0.55, max: -0.3, models: 3 }, 2)).toBe(`${formatNumber(-0.55, 2)} to ${formatNumber(-0.3, 2)} across 3 models`);
    expect(ensembleRangeText({ min: 0.301, max: 0.304, models: 3 }, 2)).toBe('same with all 3 models');
  });

  it('converts a results share to the view’s percent and skips figures no model gave', () => {
    const r: EnsembleRange = { default: 0.01, min: 0, max: 0.0164, model_count: 6, models: [] };
    const e = metricEnsemble(r, 100);
    expect([e?.min, e?.models]).toEqual([0, 6]);
    expect(e?.max).toBeCloseTo(1.64, 9);
    expect(metricEnsemble({ ...r, min: null, max: null, model_count: 0 }, 100)).toBeUndefined();
  });
});
