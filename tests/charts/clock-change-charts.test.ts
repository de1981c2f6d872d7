/**
 * The charts put every exposure at the local clock time that exposure.csv gives, on the day the
 * clocks go forward and on the day they go back, in the app (its results view built in the worker)
 * and in the briefing (its view read from results.json). The demo's site is in Europe/Berlin: EU
 * rule (Directive 2000/84/EC, art. 2 and 3) — summer time from 01:00 UTC on the last Sunday of
 * March to 01:00 UTC on the last Sunday of October; in 2026 on 29 March (02:00 CET → 03:00 CEST,
 * a 23-hour day) and 25 October (03:00 CEST → 02:00 CET, a 25-hour day).
 */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, validateScenarioValue, type Scenario } from '../../schedules/index.js';
import { exposureCsv, runScenario, type RunOutput, type RunResults } from '../../schedules/run/index.js';
import { viewFromRun } from '../../renderer/src/results/results-adapter.js';
import { viewFromResults } from '../../renderer/report/src/results-view.js';
import { findRun, type ResultsView } from '../../renderer/src/results/view-model.js';
import { lightAtEyeRows } from '../../renderer/src/charts/light-at-eye-data.js';
import { kssGrid } from '../../renderer/src/charts/kss-grid-data.js';
import { formatClock } from '../../renderer/src/charts/clock.js';
import { offsetsFromHourStarts, wallClockOf } from '../../renderer/src/charts/wall-clock.js';

const PERSONA = 'nurse';
const SOURCES = ['daylight', 'electric', 'screen', 'outdoor', 'measured'] as const;

/** The demo with the nurse only, baseline only, over four days from the Friday before the change. */
function scenarioFrom(startDate: string): Scenario {
  const input = structuredClone(DEMO_SCENARIO) as unknown as { run: { startDate: string; days: number }; strategies: unknown[] };
  input.run = { startDate, days: 4 };
  input.strategies = [];
  const checked = validateScenarioValue(input);
  if (checked.scenario === undefined) throw new Error('the trimmed demo does not validate');
  return checked.scenario;
}

type CsvRow = Record<string, string>;

interface Case {
  readonly name: string;
  readonly date: string;
  readonly day: number;
  readonly hours: number;
  readonly out: RunOutput;
  readonly scenario: Scenario;
  readonly csv: CsvRow[];
}

function caseOf(name: string, startDate: string, date: string, hours: number): Case {
  const scenario = scenarioFrom(startDate);
  const out = runScenario({ scenario, personaIds: [PERSONA] });
  const csv = Papa.parse<CsvRow>(exposureCsv(out.light, out.clock), { header: true, skipEmptyLines: true }).data.filter((r) => r['persona_id'] === PERSONA && r['strategy_id'] === 'baseline');
  return { name, date, day: 2, hours, out, scenario, csv };
}

const CASES = [caseOf('spring forward', '2026-03-27', '2026-03-29', 23), caseOf('fall back', '2026-10-23', '2026-10-25', 25)];

const hhmm = (local: string | undefined) => (local ?? '').slice(11, 16);
const mel = (r: CsvRow, key: string) => Number(r[key] ?? 'NaN');

function views(c: Case): { name: string; view: ResultsView; step: 'ten-minute' | 'hourly' }[] {
  const results = JSON.parse(JSON.stringify(c.out.results)) as RunResults;
  const { local_clock: _dropped, ...older } = results;
  void _dropped;
  return [
    { name: 'app', view: viewFromRun(c.out, c.scenario), step: 'ten-minute' },
    { name: 'briefing', view: viewFromResults(results, []), step: 'hourly' },
    // results written before the local clock was recorded: read back from the hour starts
    { name: 'briefing, older results', view: viewFromResults(older as RunResults, []), step: 'hourly' },
  ];
}

describe.each(CASES)('charts on the day the clocks $name', (c) => {
  const onDay = c.csv.filter((r) => (r['local_time'] ?? '').startsWith(c.date));

  it(`exposure.csv has ${c.name === 'spring forward' ? 23 : 25} real hours that day (the reference)`, () => {
    expect(onDay.length).toBe(c.hours * 6);
    expect(c.out.results.days[c.day]?.length_h).toBe(c.hours);
  });

  it.each(views(c))('$name: the Light at the eye rows span the day’s real length and sit at the csv’s local times with its values', ({ view, step }) => {
    const clock = wallClockOf(view);
    expect(clock.dayLength_h(c.day)).toBe(c.hours);
    const run = findRun(view, PERSONA, 'baseline');
    if (run === undefined) throw new Error('no baseline run');
    const rows = lightAtEyeRows(run.light, c.day, 10, clock);
    const axis = clock.dayAxis(c.day);
    expect(axis.domain).toEqual([0, c.hours]);
    const per = step === 'hourly' ? 6 : 1;
    expect(rows.length).toBe(onDay.length / per);
    rows.forEach((row, i) => {
      const group = onDay.slice(i * per, (i + 1) * per);
      const first = group[0];
      // the drawn position's label, the row's clock time and the csv's local time agree
      expect({ i, at: formatClock(row.clock_h) }).toEqual({ i, at: hhmm(first?.['local_time']) });
      expect(axis.labelOf(row.x_h)).toBe(hhmm(first?.['local_time']));
      for (const source of SOURCES) {
        const want = group.reduce((s, r) => s + mel(r, `mel_${source}_lx`), 0) / group.length;
        // both sides are means rounded to 0.01 lx
        expect(Math.abs((row[source] ?? 0) - want)).toBeLessThanOrEqual(0.011);
      }
    });
    const labels = rows.map((r) => formatClock(r.clock_h));
    if (c.hours === 23) expect(labels.filter((l) => l.startsWith('02:'))).toEqual([]);
    else expect(labels.filter((l) => l === '02:00').length).toBe(2);
  });

  it.each(views(c))('$name: the KSS grid puts each real hour under the local hour results.json gives it', ({ view }) => {
    const clock = wallClockOf(view);
    const run = findRun(view, PERSONA, 'baseline');
    if (run === undefined) throw new Error('no baseline run');
    const starts = c.out.results.hours.start_local;
    const grid = kssGrid(run.kssHourly, view.days, clock);
    const placed = grid.flatMap((row) => row.flatMap((cell) => cell.parts.map((p) => ({ index: p.index, local: `${c.out.results.days[cell.day]?.date}T${String(cell.hour).padStart(2, '0')}` }))));
    expect(placed.map((p) => p.index).sort((a, b) => a - b)).toEqual(starts.map((_, k) => k));
    for (const p of placed) expect(starts[p.index]?.slice(0, 13)).toBe(p.local);
    const changeDay = grid[c.day] ?? [];
    expect(changeDay[2]?.parts.length).toBe(c.hours === 23 ? 0 : 2);
  });

  it('reads the same clock from older results (hour starts) as from the recorded offsets', () => {
    expect(offsetsFromHourStarts(c.out.results.hours.start_local)).toEqual(c.out.results.local_clock?.utc_offsets);
  });
});
