import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { runScenario, withEnsemble, type RunResults } from '../../../schedules/run/index.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { Methods, RangesSection } from './components/sections.js';
import { BRIEFING_DOCUMENT_KIND } from './briefing-document.js';
import { reportModels } from './report-models.js';
import { signedShift } from '../../../schedules/words/shift-sign.js';
import { pacemakerCitation, sleepinessCitation } from '../../../model/circadian/model-citations.js';
import type { PacemakerId } from '../../../model/circadian/registry.js';
import type { SleepinessModelId } from '../../../model/circadian/sleepiness-registry.js';
import { reportViewWithEnsemble } from './ensemble-report.js';
import { viewFromResults } from './results-view.js';

/** The demo's dimmer-evening strategy for 3 days with the people it is for, run with the model ensemble. */
function ensembleResults(): RunResults {
  const s = structuredClone(DEMO_SCENARIO);
  const strategies = (s.strategies ?? []).filter((x) => x.id === 'office-dim-evening');
  const desk = { ...s, run: { ...s.run, days: 3 }, personas: s.personas.filter((p) => strategies.some((x) => x.personas?.includes(p.id))), strategies };
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

  it('lists every ensemble model once on the methods page with its one citation from the model registry, the defaults marked as giving the figures', () => {
    const models = reportModels(results);
    const html = renderToStaticMarkup(createElement(Methods, { models, rule: 'The rule.' })).replace(/&amp;/g, '&');
    for (const m of results.ensemble?.models ?? []) {
      const citation = m.role === 'body clock' ? pacemakerCitation(m.id as PacemakerId) : sleepinessCitation(m.id as SleepinessModelId);
      expect(html.split(citation).length - 1, m.id).toBe(1);
      expect(html).not.toContain(m.id);
    }
    expect(models.filter((m) => m.use === 'figures').map((m) => m.part)).toEqual(['Body clock and its response to light', 'Melatonin and its suppression by light', 'Sleepiness (KSS)']);
  });

  it('gives each strategy’s headline figures with their range across the models on the ranges page', () => {
    const doc = { kind: BRIEFING_DOCUMENT_KIND, paper: 'A4', generatedOn: '2026-12-01', zeitlightVersion: 'test', scenario: {}, results } as const;
    const html = renderToStaticMarkup(createElement(RangesSection, { doc, view }));
    const s = results.personas[0]?.strategies.find((x) => x.id === 'office-dim-evening');
    const shift = s?.ensemble?.mean_phase_shift_h;
    expect(html).toContain('Across published models');
    expect(html).toContain(`${signedShift(shift?.min ?? NaN)} to ${signedShift(shift?.max ?? NaN)}`);
  });
});
