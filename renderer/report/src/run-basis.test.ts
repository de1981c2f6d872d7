// What a run rests on, as the app and the briefing show it (the pipeline's side, with a real
// weather file: tests/report/run-basis.test.ts):
//  - a weather file far from the site: its warning (schedules/run/run-basis.ts) stands in the app's
//    notes from the run, in the briefing's summary notes and in its "Site and weather";
//  - a measured light log: the briefing's "What was modelled" lists the days with measured light
//    and each gap with how it was filled, in plain words (no fill-rule value), and the notes do not
//    repeat the gaps.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { validateScenarioValue, type Scenario } from '../../../schedules/index.js';
import { demoPart } from '../../../schedules/demo/demo-part.js';
import { runScenario, type RunResults } from '../../../schedules/run/index.js';
import { weatherBasis, weatherSiteWarning } from '../../../schedules/run/run-basis.js';
import { viewFromRun } from '../../src/results/results-adapter.js';
import { RunNotes } from '../../src/views/ResultsFrame.js';
import { Modelled, Summary } from './components/sections.js';
import { scenarioFacts } from './scenario-facts.js';
import { summariesFromResults } from './results-view.js';

const text = (el: ReturnType<typeof createElement>) =>
  renderToStaticMarkup(el).replace(/&#x27;|&#39;/g, "'").replace(/&quot;/g, '"').replace(/&amp;/g, '&').replace(/\s+/g, ' ');

function validated(doc: unknown): Scenario {
  const v = validateScenarioValue(doc);
  if (v.scenario === undefined) throw new Error(v.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return v.scenario;
}

describe('a weather file far from the site', () => {
  const doc = { ...demoPart(['desk-worker'], []), run: { startDate: '2026-03-23', days: 1 } };
  const scenario = validated(doc);
  const out = runScenario({ scenario });
  // The run's own weather basis for a file 6° west of the site (its warning is the pipeline's).
  const basis = weatherBasis({ ...scenario, site: { ...scenario.site, weather: { kind: 'file', file: 'far.epw', format: 'epw', snowFromFile: true } } }, 'far.epw', { city: 'FAR', country: 'NLD', latitude_deg: 52.3, longitude_deg: 4.77, timeZone_h: 1 });
  const warning = weatherSiteWarning(basis, scenario.site) ?? '';
  const results: RunResults = { ...out.results, warnings: [...out.results.warnings, warning], basis: { weather: basis, measured_light: [] } };

  it('is named in the app’s notes from the run', () => {
    expect(warning).toMatch(/^The weather file far\.epw was recorded for a place \(FAR, NLD\) at 52\.30° N, 4\.77° E, 6\.0° away from the site/);
    const view = viewFromRun({ ...out, results }, scenario);
    expect(text(createElement(RunNotes, { view }))).toContain(warning);
  });

  it('is named in the briefing’s summary notes and in its site and weather', () => {
    const facts = scenarioFacts(doc);
    if (!facts.ok) throw new Error(facts.message);
    expect(text(createElement(Summary, { summaries: summariesFromResults(results), warnings: results.warnings, basis: results.basis }))).toContain(warning);
    const modelled = text(createElement(Modelled, { facts: facts.facts, basis: results.basis, site: scenario.site }));
    expect(modelled).toContain(`<p class="warning">${warning}`);
  });
});

/** One reading a minute 08:00–20:00 local time (UTC+1) on 2026-03-23, none from 12:00 to 13:00. */
function logText(): string {
  const lines = ['timestamp,lux'];
  const t0 = Date.UTC(2026, 2, 23, 7, 0);
  for (let m = 0; m < 12 * 60; m++) if (m < 240 || m >= 300) lines.push(`${new Date(t0 + m * 60_000).toISOString()},300`);
  return lines.join('\n') + '\n';
}

describe('a measured light log in the briefing', () => {
  const part = demoPart(['desk-worker'], []);
  const doc = { ...part, run: { startDate: '2026-03-23', days: 2 }, personas: [{ ...part.personas[0], measuredLight: [{ log: 'wear' }] }], lightLogs: [{ id: 'wear', file: 'wear.csv', timestampFormat: 'iso', quantity: { kind: 'photopic-lux' }, fill: 'linear' }] };
  const scenario = validated(doc);
  const results = JSON.parse(JSON.stringify(runScenario({ scenario, lightLogTexts: { wear: logText() } }).results)) as RunResults;
  const facts = scenarioFacts(doc);
  if (!facts.ok) throw new Error(facts.message);

  it('lists the day with measured light and the filled gap in plain words', () => {
    const modelled = text(createElement(Modelled, { facts: facts.facts, basis: results.basis, site: scenario.site }));
    expect(modelled).toContain('<h3>Measured light</h3>');
    expect(modelled).toContain('Light at the eye measured with a light logger (file wear.csv) on 1 day: Mon 23 Mar (12.0 h); the rest of the run is modelled. One gap was filled:');
    expect(modelled).toContain('23 Mar 12:00 to 23 Mar 13:00 (60 min, no readings): filled with a straight line between the readings either side.');
    expect(modelled).not.toContain('"linear"');
  });

  it('does not repeat the gap among the notes from the run', () => {
    expect(results.warnings.some((w) => w.includes('gap from 2026-03-23 12:00'))).toBe(true);
    expect(text(createElement(Summary, { summaries: summariesFromResults(results), warnings: results.warnings, basis: results.basis }))).not.toContain('gap from');
  });
});
