/**
 * Alignment figures, shift sentences and the recommendation on the built-in demo: behaviour that
 * must hold whatever the models' numbers (the numbers themselves are recorded in
 * docs/validation/pipeline.md, not pinned here, since the models change).
 */
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { alignmentDirection } from '../../schedules/run/alignment.js';
import { gains, ruleFiguresOf } from '../../schedules/run/recommend.js';
import { summaryCsv } from '../../schedules/run/results-csv.js';
import { demoRun } from './demo-run.js';

describe('alignment on the demo run', () => {
  const results = demoRun().results;

  test('every persona × strategy carries alignment over every run day, the score being the union of its parts', () => {
    for (const p of results.personas) {
      for (const s of p.strategies) {
        const a = s.alignment;
        if (a === null) throw new Error(`${p.id}/${s.id}: no alignment`);
        expect(a.days).toBe(results.scenario.days);
        const parts = [a.work_h_in_biological_night_per_day, a.main_sleep_h_in_biological_day_per_day, a.waking_h_in_biological_night_per_day];
        expect(a.misalignment_h_per_day).toBeGreaterThanOrEqual(Math.max(...parts) - 1e-3);
        expect(a.misalignment_h_per_day).toBeLessThanOrEqual(parts.reduce((x, y) => x + y, 0) + 1e-3);
      }
    }
  });

  test('each phase-shift headline states the direction its numbers give: toward, away from or neither', () => {
    for (const p of results.personas) {
      const base = p.strategies.find((s) => s.is_baseline);
      for (const s of p.strategies) {
        if (s.is_baseline || base?.alignment == null || s.alignment === null) continue;
        const sentence = s.headlines.find((h) => h.metric === 'phase_shift_h')?.sentence ?? '';
        const want = { toward: '— toward alignment with', away: '— away from alignment with', unchanged: '— neither toward nor away from alignment with' }[alignmentDirection(s.alignment, base.alignment)];
        expect(sentence, `${p.id}/${s.id}`).toContain(want);
      }
    }
  });

  test('the recommended strategy is worse than the baseline neither on sleepiness at work nor on alignment', () => {
    for (const p of results.personas) {
      const base = p.strategies.find((s) => s.is_baseline);
      const rec = p.strategies.find((s) => s.id === p.recommendation.strategy_id);
      if (base === undefined || rec === undefined) throw new Error(`${p.id}: missing strategies`);
      const g = gains(ruleFiguresOf(rec), ruleFiguresOf(base));
      expect(g.kss).toBeGreaterThan(-0.01);
      expect(g.misalignment).toBeGreaterThan(-0.25);
    }
  });

  test('summary.csv lists the alignment figures of results.json', () => {
    const rows = Papa.parse<Record<string, string>>(summaryCsv(results), { header: true, skipEmptyLines: true }).data;
    for (const p of results.personas) {
      for (const s of p.strategies) {
        const row = rows.find((r) => r['persona_id'] === p.id && r['strategy_id'] === s.id);
        expect(Number(row?.['misalignment_h_per_day'])).toBe(s.alignment?.misalignment_h_per_day);
        expect(Number(row?.['work_h_in_biological_night_per_day'])).toBe(s.alignment?.work_h_in_biological_night_per_day);
      }
    }
  });
});
