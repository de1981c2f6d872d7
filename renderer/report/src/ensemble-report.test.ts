import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { runScenario, withEnsemble, type RunResults } from '../../../schedules/run/index.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { EnsembleMethods } from './components/EnsembleMethods.js';
import { Methods } from './components/sections.js';
import { reportViewWithEnsemble } from './ensemble-report.js';
import { viewFromResults } from './results-view.js';

/** The demo's desk worker alone for 3 days with the dimmer-evening strategy, run with the model ensemble. */
function ensembleResults(): RunResults {
  const s = structuredClone(DEMO_SCENARIO);
  const desk = { ...s, run: { ...s.run, days: 3 }, personas: s.personas.filter((p) => p.id === 'desk-worker'), strategies: (s.strategies ?? []).filter((x) => x.id === 'office-dim-evening') };
  const v = validateScenarioValue(desk);
  if (v.scenario === undefined) throw new Error('scenario does not validate');
  return withEnsemble(runScenario({ scenario: v.scenario }));
}

describe('model ensemble in the briefing', () => {
  const results = ensembleResults();
  const view = reportViewWithEnsemble(results, viewFromResults(results, []));

  it('gives the results table’s headline and sleep-timing rows their range across the models, in the table’s units', () => {
    const run = view.runs.find((r) => r.strategyId === 'office-dim-evening');
    const s = results.personas[0]?.strategies.find((x) => x.id === 'office-dim-evening');
    const range = (id: string) => run?.metrics.find((m) => m.id === id)?.ensemble;
    expect(range('phase-shift')).toEqual({ min: s?.ensemble?.mean_phase_shift_h.min, max: s?.ensemble?.mean_phase_shift_h.max, models: 3 });
    expect(range('suppression')?.models).toBe(3);
    expect(range('sleep-timing')?.max).toBe(s?.ensemble?.mean_phase_angle_dlmo_to_sleep_h.max);
    // shares are printed in percent
    expect(range('work-kss7-share')?.max).toBeCloseTo((s?.ensemble?.work_hours_kss_ge_7_share.max ?? NaN) * 100, 9);
    expect(range('work-kss7-share')?.models).toBe(results.ensemble?.members.length);
    expect(range('daytime-250')).toBeUndefined();
  });

  it('lists every ensemble model once on the methods page with its citation, the defaults marked', () => {
    const html = renderToStaticMarkup(createElement(EnsembleMethods, { ensemble: view.ensemble }));
    for (const m of results.ensemble?.models ?? []) {
      expect(html).toContain(m.name.replace(/&/g, '&amp;'));
      expect(html).toContain(m.source.replace(/&/g, '&amp;'));
    }
    expect(html.match(/\(default\)/g)?.length).toBe(2);
    const methods = renderToStaticMarkup(createElement(Methods, { records: [], runModels: null, ensemble: view.ensemble }));
    expect(methods).toContain('Model ensemble');
    expect(renderToStaticMarkup(createElement(EnsembleMethods, { ensemble: undefined }))).toBe('');
  });
});
