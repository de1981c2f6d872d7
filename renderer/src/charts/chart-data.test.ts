import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { syntheticResultsView } from '../results/synthetic-view.js';
import { findRun, type Episode } from '../results/view-model.js';
import { formatClock, formatDayLabel, unwrapClockHours } from './clock.js';
import { lightAtEyeRows, recommendationBands, bandCompliance } from './light-at-eye-data.js';
import { phaseByDayRows, phaseKey, phaseShiftVsBaseline_h } from './phase-data.js';
import { melatoninKey, melatoninNightRows, sampleAt } from './melatonin-data.js';
import { kssGrid, sleepyHours } from './kss-grid-data.js';
import { comparisonRows } from './comparison-data.js';
import { comparisonCsv, COMPARISON_CSV_HEADER } from './comparison-csv.js';

const view = syntheticResultsView(7);
const baseline = findRun(view, 'desk', 'baseline')!;
const brighter = findRun(view, 'desk', 'brighter-morning')!;

describe('clock helpers', () => {
  it('formats clock hours and calendar days', () => {
    expect(formatClock(21.5)).toBe('21:30');
    expect(formatClock(24.25)).toBe('00:15');
    expect(formatClock(-0.5)).toBe('23:30');
    // 23 March 2026 is a Monday (proleptic Gregorian calendar, common knowledge).
    expect(formatDayLabel('2026-03-23', 0)).toBe('Mon 23 Mar');
    expect(formatDayLabel('2026-03-23', 9)).toBe('Wed 1 Apr');
  });

  it('keeps a series continuous across midnight', () => {
    expect(unwrapClockHours([23.5, 24.2, 0.9, null, 1.5])).toEqual([23.5, 24.2, 24.9, null, 25.5]);
    expect(unwrapClockHours([1, 23], 23)).toEqual([25, 23]);
  });
});

describe('light at the eye', () => {
  it('stacks sources so the total is their sum, per 5-minute row over one day', () => {
    const rows = lightAtEyeRows(baseline.light, 2);
    expect(rows).toHaveLength(288);
    for (const r of rows) expect(r.total_lx).toBeCloseTo((r.daylight ?? 0) + (r.ceiling ?? 0) + (r.phone ?? 0), 9);
    const noon = rows.find((r) => r.clock_h === 12)!;
    expect(noon.ceiling).toBe(120);
  });

  it('draws the Brown et al. 2022 bands: night while asleep, evening 3 h before sleep, day otherwise', () => {
    const sleep: Episode[] = [
      { start_h: -1, end_h: 7, kind: 'sleep' },
      { start_h: 23, end_h: 31, kind: 'sleep' },
      { start_h: 14, end_h: 14.5, kind: 'nap' },
    ];
    expect(recommendationBands(sleep, 0)).toEqual([
      { kind: 'night', from_h: 0, to_h: 7, from_clock_h: 0, to_clock_h: 7, limit_lx: 1, rule: 'at most' },
      { kind: 'day', from_h: 7, to_h: 20, from_clock_h: 7, to_clock_h: 20, limit_lx: 250, rule: 'at least' },
      { kind: 'evening', from_h: 20, to_h: 23, from_clock_h: 20, to_clock_h: 23, limit_lx: 10, rule: 'at most' },
      { kind: 'night', from_h: 23, to_h: 24, from_clock_h: 23, to_clock_h: 24, limit_lx: 1, rule: 'at most' },
    ]);
  });

  it('places a night-shift sleep by day as a night band in the daytime', () => {
    const bands = recommendationBands([{ start_h: 8, end_h: 15, kind: 'sleep' }], 0);
    expect(bands.map((b) => [b.kind, b.from_h, b.to_h])).toEqual([
      ['day', 0, 5],
      ['evening', 5, 8],
      ['night', 8, 15],
      ['day', 15, 24],
    ]);
  });

  it('counts the share of each band meeting its recommendation from the total light', () => {
    const rows = [0, 6, 12, 18, 21, 23].map((h) => ({ x_h: h, clock_h: h, total_lx: h === 6 ? 3 : h === 12 ? 400 : h === 18 ? 100 : h === 21 ? 5 : 0 }));
    const bands = recommendationBands([{ start_h: -1, end_h: 7, kind: 'sleep' }, { start_h: 23, end_h: 31, kind: 'sleep' }], 0);
    expect(bandCompliance(rows, bands).map((c) => [c.band.kind, c.met])).toEqual([
      ['night', 0.5],
      ['day', 0.5],
      ['evening', 1],
      ['night', 1],
    ]);
  });
});

describe('body clock', () => {
  it('reports an earlier DLMO as a positive (advancing) shift', () => {
    const shift = phaseShiftVsBaseline_h(brighter, baseline, 'dlmo')!;
    expect(shift).toBeCloseTo(1.05, 9);
    expect(phaseShiftVsBaseline_h(baseline, brighter, 'dlmo')!).toBeCloseTo(-1.05, 9);
  });

  it('handles shifts across midnight', () => {
    const late = { ...baseline, phases: [{ day: 0, dlmo_h: 23.8, cbtmin_h: null }] };
    const early = { ...baseline, phases: [{ day: 0, dlmo_h: 24.3, cbtmin_h: null }] };
    expect(phaseShiftVsBaseline_h(early, late, 'dlmo')!).toBeCloseTo(-0.5, 9);
  });

  it('gives one row per day with a column per strategy', () => {
    const rows = phaseByDayRows([baseline, brighter], view.strategies, 7, 'dlmo');
    expect(rows).toHaveLength(7);
    expect(rows[0]![phaseKey('baseline', 'dlmo')]).toBeCloseTo(21.5, 9);
    expect(rows[6]![phaseKey('brighter-morning', 'dlmo')]).toBeCloseTo(20.45, 9);
  });
});

describe('melatonin', () => {
  it('interpolates linearly and is undefined outside the series', () => {
    expect(sampleAt([0, 1, 2], [0, 10, 30], 1.5)).toBe(20);
    expect(sampleAt([0, 1], [0, 10], 3)).toBeNull();
  });

  it('shows the night from 18:00 to 12:00 with suppressed and dark curves', () => {
    const rows = melatoninNightRows([baseline], view.strategies, 1);
    expect(rows[0]!.x_h).toBe(18);
    expect(rows[rows.length - 1]!.x_h).toBeCloseTo(36, 9);
    expect(rows[rows.length - 1]!.clock_h).toBeCloseTo(12, 9);
    const at22 = rows.find((r) => Math.abs(r.x_h - 22) < 1e-9)!;
    expect(at22[melatoninKey('baseline')]!).toBeLessThan(at22[melatoninKey('baseline', true)]!);
  });
});

describe('sleepiness', () => {
  it('lays KSS out day × hour and flags KSS ≥ 7 (Åkerstedt & Gillberg 1990 scale)', () => {
    const grid = kssGrid([5, 7, null, 9], 1);
    expect(grid[0]!.slice(0, 4).map((c) => c.sleepy)).toEqual([false, true, false, true]);
    expect(grid[0]).toHaveLength(24);
    expect(sleepyHours([5, 7, null, 9, 6.99])).toBe(2);
  });
});

describe('comparison table', () => {
  const rows = comparisonRows([baseline, brighter], view.strategies, 'baseline');

  it('gives the difference versus baseline and a plain reading with the favourable direction', () => {
    const dlmo = rows.find((r) => r.metricId === 'dlmo')!;
    const cell = dlmo.cells[1]!;
    expect(cell.difference).toBeCloseTo(-1.05, 9);
    expect(cell.reading).toBe('DLMO (last day) 1 h 03 min earlier than baseline with Brighter morning.');
    const day = rows.find((r) => r.metricId === 'day-above-250')!.cells[1]!;
    expect(day.verdict).toBe('better');
    expect(day.reading).toContain('(favourable)');
    expect(rows[0]!.cells[0]!.reading).toBe('Baseline.');
  });

  it('exports CSV that a general CSV parser reads back to the same table (papaparse)', () => {
    const csv = comparisonCsv('Desk worker, "A"', rows, view.strategies);
    const parsed = Papa.parse<string[]>(csv.trim());
    expect(parsed.errors).toEqual([]);
    expect(parsed.data[0]).toEqual([...COMPARISON_CSV_HEADER]);
    expect(parsed.data).toHaveLength(1 + rows.length * 2);
    const dlmo = parsed.data.find((r) => r[1] === 'DLMO (last day)' && r[3] === 'Brighter morning')!;
    // clock times as local HH:MM, their difference in decimal hours with an ASCII minus for spreadsheets
    expect(dlmo).toEqual(['Desk worker, "A"', 'DLMO (last day)', 'local time (difference in h)', 'Brighter morning', '20:27', '-1.05', 'DLMO (last day) 1 h 03 min earlier than baseline with Brighter morning.']);
  });
});

describe('clock axis', () => {
  it('rounds the domain out to whole half hours and ticks on them', async () => {
    const { clockAxis } = await import('./clock.js');
    expect(clockAxis([20.45, 21.5, null])).toEqual({ domain: [20, 21.5], ticks: [20, 20.5, 21, 21.5] });
    expect(clockAxis([21, 21])).toEqual({ domain: [20.5, 21.5], ticks: [20.5, 21, 21.5] });
  });
});
