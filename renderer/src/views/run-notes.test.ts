// The app lists the run's notes beside the results: a gap in a measured light log appears with its
// start, end and fill rule (the pipeline's warning, schedules/lightlog/gap-notes.ts).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, validateScenarioValue } from '../../../schedules/index.js';
import { runScenario } from '../../../schedules/run/index.js';
import { viewFromRun } from '../results/results-adapter.js';
import { RunNotes, runNotes } from './ResultsFrame.js';

/** Readings each minute 08:00–12:00 and 13:00–20:00 local time (UTC+1) on 2026-03-23. */
function logWithGap(): string {
  const lines = ['timestamp,lux'];
  const t0 = Date.UTC(2026, 2, 23, 7, 0);
  for (let m = 0; m < 12 * 60; m++) if (m < 240 || m >= 300) lines.push(`${new Date(t0 + m * 60_000).toISOString()},300`);
  return lines.join('\n');
}

describe('notes from the run in the results frame', () => {
  it('show a filled gap of a measured light log with its start, end and fill rule', () => {
    const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
    const v = validateScenarioValue({
      ...DEMO_SCENARIO,
      run: { startDate: '2026-03-23', days: 1 },
      personas: [{ ...desk, measuredLight: [{ log: 'wear' }] }],
      rosters: [],
      strategies: [],
      lightLogs: [{ id: 'wear', file: 'wear.csv', quantity: { kind: 'photopic-lux' }, fill: 'model' }],
    });
    if (v.scenario === undefined) throw new Error('scenario does not validate');
    const view = viewFromRun(runScenario({ scenario: v.scenario, lightLogTexts: { wear: logWithGap() } }), v.scenario);
    expect(runNotes(view)).toEqual([expect.stringMatching(/^wear\.csv line 241: gap from 2026-03-23 12:00 to 2026-03-23 13:00 \(60 min, no readings\).*modelled light.*"model" rule/)]);
    const html = renderToStaticMarkup(createElement(RunNotes, { view }));
    expect(html).toContain('Notes from the run');
    expect(html).toContain('gap from 2026-03-23 12:00 to 2026-03-23 13:00');
  });

  it('are left out when the run has none', () => {
    const v = validateScenarioValue({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 1 }, personas: DEMO_SCENARIO.personas.filter((p) => p.id === 'desk-worker'), rosters: [], strategies: [] });
    if (v.scenario === undefined) throw new Error('scenario does not validate');
    const view = viewFromRun(runScenario({ scenario: v.scenario }), v.scenario);
    expect(renderToStaticMarkup(createElement(RunNotes, { view }))).toBe('');
  });
});
