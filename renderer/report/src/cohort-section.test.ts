import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { CohortSection } from './components/sections.js';
import { BRIEFING_DOCUMENT_KIND, type BriefingDocument } from './briefing-document.js';
import type { ResultsView } from '../../src/results/view-model.js';

const view: ResultsView = { scenarioName: 'Test office', startDate: '2026-03-23', days: 2, baselineId: 'baseline', strategies: [{ id: 'baseline', name: 'Baseline' }, { id: 'daylight', name: 'Desk by the window' }], personas: [{ id: 'desk-worker', name: 'Desk worker' }], runs: [], cautions: [] };
const d = (p05: number, q25: number, median: number, q75: number, p95: number) => ({ n: 20, missing: 0, median, q25, q75, iqr: q75 - q25, p05, p95, min: p05, max: p95, mean: median });

describe('briefing cohort section', () => {
  it('is printed from results.json\'s cohort with quartiles and a band per row', () => {
    const doc: BriefingDocument = {
      kind: BRIEFING_DOCUMENT_KIND,
      paper: 'A4',
      generatedOn: '2026-12-01',
      zeitlightVersion: 'test',
      scenario: {},
      results: { format: 'zeitlight-results', cohort: { size: 20, seed: 4, metrics: ['mean_phase_shift_h'], personas: [{ id: 'desk-worker', summary: { occupants: 20, strategies: { daylight: { mean_phase_shift_h: d(-0.9, -0.6, -0.45, -0.3, -0.1) } } } }] } },
    };
    const html = renderToStaticMarkup(createElement(CohortSection, { doc, view }));
    expect(html).toContain('Desk by the window');
    expect(html).toContain('Phase shift vs baseline');
    expect(html).toContain('seed 4');
    expect(html).toContain('<svg');
    expect(html).toMatch(/\u22120\.60 h/);
  });

  it('is left out when the results have no cohort', () => {
    const doc: BriefingDocument = { kind: BRIEFING_DOCUMENT_KIND, paper: 'A4', generatedOn: '2026-12-01', zeitlightVersion: 'test', scenario: {}, results: { format: 'zeitlight-results' } };
    expect(renderToStaticMarkup(createElement(CohortSection, { doc, view }))).toBe('');
  });
});
