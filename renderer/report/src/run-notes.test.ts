// The briefing prints the run's notes: a gap in a measured light log appears under "Notes from the
// run" with its start, end and fill rule, from results.json's warnings.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, validateScenarioValue } from '../../../schedules/index.js';
import { runScenario, type RunResults } from '../../../schedules/run/index.js';
import { BRIEFING_DOCUMENT_KIND } from './briefing-document.js';
import { Summary } from './components/sections.js';
import { reportData } from './report-data.js';
import type { ScenarioFacts } from './scenario-facts.js';

function logWithGap(): string {
  const lines = ['timestamp,lux'];
  const t0 = Date.UTC(2026, 2, 23, 7, 0);
  for (let m = 0; m < 12 * 60; m++) if (m < 240 || m >= 300) lines.push(`${new Date(t0 + m * 60_000).toISOString()},300`);
  return lines.join('\n');
}

describe('briefing notes from the run', () => {
  it('list a filled gap of a measured light log with its start, end and fill rule', () => {
    const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
    const doc = {
      ...DEMO_SCENARIO,
      run: { startDate: '2026-03-23', days: 1 },
      personas: [{ ...desk, measuredLight: [{ log: 'wear' }] }],
      rosters: [],
      strategies: [],
      lightLogs: [{ id: 'wear', file: 'wear.csv', quantity: { kind: 'photopic-lux' }, fill: 'linear' }],
    };
    const v = validateScenarioValue(doc);
    if (v.scenario === undefined) throw new Error('scenario does not validate');
    // through JSON, as results.json is read back
    const results = JSON.parse(JSON.stringify(runScenario({ scenario: v.scenario, lightLogTexts: { wear: logWithGap() } }).results)) as RunResults;
    const data = reportData({ kind: BRIEFING_DOCUMENT_KIND, paper: 'A4', generatedOn: '2026-12-01', zeitlightVersion: 'test', scenario: doc, results }, {} as ScenarioFacts);
    if ('error' in data) throw new Error(data.error);
    const html = renderToStaticMarkup(createElement(Summary, { summaries: data.summaries, warnings: data.warnings })).replace(/&quot;/g, '"');
    expect(html).toContain('Notes from the run');
    expect(html).toMatch(/wear\.csv line 241: gap from 2026-03-23 12:00 to 2026-03-23 13:00 \(60 min, no readings\).*straight line.*"linear" rule/);
  });
});
