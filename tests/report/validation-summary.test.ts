// The plain-language validation page (docs/validation/summary.md), which the briefing prints as
// "How these numbers were checked", stays true to the detailed records: every figure in its "how
// close" column appears in the record the row names, every row names a record that exists, and the
// page fits one printed page (at most 16 rows, at most 4 short-fall notes).
import { describe, expect, it } from 'vitest';
import { existsSync, readFileSync } from 'node:fs';
import * as path from 'node:path';
import { plainValidation } from '../../renderer/report/src/validation-summary.js';

const DIR = path.resolve(import.meta.dirname, '..', '..', 'docs', 'validation');
const page = plainValidation(readFileSync(path.join(DIR, 'summary.md'), 'utf8'));

/** Figures in a text: numbers with their decimals and clock times ("4.63", "06:12:43", "60–240" gives 60 and 240). */
const figures = (text: string) => [...text.matchAll(/\d+(?:[.:]\d+)*/g)].map((m) => m[0]);

describe('plain-language validation page', () => {
  it('has rows with what was checked, the published data and how close the models came', () => {
    expect(page.checks.length).toBeGreaterThanOrEqual(10);
    for (const c of page.checks) for (const v of [c.what, c.against, c.close]) expect(v.length).toBeGreaterThan(3);
  });

  it('takes every figure of "how close" from the record the row names', () => {
    for (const c of page.checks) {
      const file = path.join(DIR, c.record);
      expect(existsSync(file), c.record).toBe(true);
      const record = readFileSync(file, 'utf8');
      for (const f of figures(c.close)) expect(record, `${c.what}: ${f}`).toContain(f);
    }
  });

  it('lists where the models fall short, and fits one page', () => {
    expect(page.shortfalls.length).toBeGreaterThanOrEqual(2);
    expect(page.shortfalls.length).toBeLessThanOrEqual(4);
    expect(page.checks.length).toBeLessThanOrEqual(16);
    expect(page.shortfalls.join(' ')).toMatch(/Melatonin suppression/);
  });
});
