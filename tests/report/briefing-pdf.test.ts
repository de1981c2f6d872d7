// The client briefing read back from its PDF with poppler-utils (an outside reader): sections in
// order, the summary's numbers, cautions on the summary page and at the end, page count, every page
// drawn, fonts embedded, paper sizes, repeatable text, and a clear message without Chromium.
// Results: the run pipeline on the built-in demo scenario (the same results.json `zeitlight demo`
// writes); a second briefing from the renderer's synthetic layout view checks the view path.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { build } from 'vite';
import { writeBriefingPdf } from '../../cli/report/write-briefing-pdf.js';
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';
import { validateScenarioValue } from '../../schedules/validation/validate-scenario.js';
import { runScenario } from '../../schedules/run/run-scenario.js';
import { withEnsemble } from '../../schedules/run/ensemble.js';
import type { RunResults } from '../../schedules/run/results-types.js';
import { demoSyntheticView } from './synthetic-briefing.js';
import { pageVariances, pdfFonts, pdfImageCount, pdfInfo, pdfText } from './pdf-tools.js';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const work = mkdtempSync(path.join(tmpdir(), 'zeitlight-briefing-test-'));
const pageFolder = path.join(work, 'page');
let results: RunResults;
const common = { scenario: DEMO_SCENARIO, generatedOn: '2026-12-01', reportFolder: pageFolder } as const;
const a4 = path.join(work, 'a.pdf');
const synthetic = path.join(work, 'synthetic.pdf');
const a4Again = path.join(work, 'b.pdf');
const letter = path.join(work, 'letter.pdf');

beforeAll(async () => {
  // A private build of the report page, so a stale or concurrent dist/report cannot affect this.
  await build({ configFile: path.join(ROOT, 'vite.report.config.ts'), logLevel: 'warn', build: { outDir: pageFolder, emptyOutDir: true } });
  const validated = validateScenarioValue(DEMO_SCENARIO);
  if (validated.scenario === undefined) throw new Error('demo scenario does not validate');
  // through JSON, exactly as results.json is read back
  // with the model ensemble, as `zeitlight demo` runs it by default
  results = JSON.parse(JSON.stringify(withEnsemble(runScenario({ scenario: validated.scenario })))) as RunResults;
  await writeBriefingPdf({ ...common, results, outPath: a4, paper: 'A4' });
  await writeBriefingPdf({ ...common, results, outPath: a4Again, paper: 'A4' });
  await writeBriefingPdf({ ...common, results, outPath: letter, paper: 'Letter' });
  // invented cohort ranges, only to check the section is drawn from the document
  const cohort = { occupants: 64, seed: 7, ranges: [{ personaId: 'desk-worker', strategyId: 'baseline', label: 'Melatonin suppression per night', unit: '%', decimals: 0, p05: 12.4, median: 31.6, p95: 58.2 }] };
  await writeBriefingPdf({ ...common, results: demoSyntheticView(), synthetic: true, cohort, outPath: synthetic, paper: 'A4' });
}, 300_000);

afterAll(() => {
  // For looking at the pages by eye: ZEITLIGHT_BRIEFING_COPY=/some/file.pdf keeps a copy.
  const keep = process.env.ZEITLIGHT_BRIEFING_COPY;
  if (keep !== undefined && keep !== '' && existsSync(a4)) copyFileSync(a4, keep);
  rmSync(work, { recursive: true, force: true });
});

/** The text of the pages from the one that starts with `first` up to (not including) the one that starts with `next`. */
function sectionText(file: string, first: string, next: string): string {
  const pages = Number(pdfInfo(file).Pages);
  const texts = Array.from({ length: pages }, (_, i) => pdfText(file, i + 1));
  const starts = (t: string, heading: string) => t.split('\n').slice(1, 6).some((l) => l.trim() === heading);
  const from = texts.findIndex((t) => starts(t, first));
  const to = texts.findIndex((t, i) => i > from && starts(t, next));
  return texts.slice(from, to).join('\n');
}

describe('briefing PDF of the demo scenario', () => {
  it('has the sections in order: cover, summary and recommendation, what was modelled, results per person, ranges, methods, how the numbers were checked, cautions', () => {
    // lower case: the cover's kicker is set in capitals by the style sheet
    const text = pdfText(a4).toLowerCase();
    const order = ['lighting and body-clock briefing', 'Summary and recommendation', 'What was modelled', ...DEMO_SCENARIO.personas.map((p) => `Results: ${p.name}`), 'Ranges across models and people', 'Methods and assumptions', 'How these numbers were checked', 'Cautions\n'];
    let at = -1;
    for (const heading of order) {
      const found = text.indexOf(heading.toLowerCase(), at + 1);
      expect(found, `"${heading.trim()}" after position ${at}`).toBeGreaterThan(at);
      at = found;
    }
  });

  it('has the cover facts: scenario title, site, date, Zeitlight and scenario format versions', () => {
    const cover = pdfText(a4, 1).replace(/\s+/g, ' ');
    expect(cover).toContain('Lindenhafen demo: night-shift ward and open-plan office');
    expect(cover).toContain('Lindenhafen (invented town)');
    expect(cover).toContain('1 December 2026');
    expect(cover).toContain('Zeitlight 0.1.0');
    expect(cover).toContain('scenario file format version 2');
    expect(cover).not.toContain('not a simulation result');
    expect(pdfText(synthetic, 1)).toContain('not a simulation result');
  });

  it('shows the recommendation and every strategy’s three numbers from results.json on the summary page', () => {
    // pdftotext's layout mode may close up "9 %" to "9%" in tight columns; compare without that space
    const squeeze = (t: string) => t.replace(/\s+/g, ' ').replace(/(\d) %/g, '$1%');
    const summaryPages = squeeze(sectionText(a4, 'Summary and recommendation', 'What was modelled'));
    for (const persona of results.personas) {
      expect(summaryPages).toContain(persona.name);
      expect(summaryPages).toContain(squeeze(persona.recommendation.reason));
      const rec = persona.strategies.find((s) => s.id === persona.recommendation.strategy_id);
      for (const h of rec?.headlines ?? []) expect(summaryPages).toContain(squeeze(h.sentence));
      const table = summaryPages.slice(summaryPages.indexOf(persona.name));
      for (const s of persona.strategies) {
        // long strategy names wrap inside their cell, so the row is found by the name's start
        const start = table.indexOf(s.name.slice(0, 24));
        expect(start, s.name).toBeGreaterThanOrEqual(0);
        const row = table.slice(start);
        if (s.summary.mean_melatonin_suppression_pct !== null) expect(row).toContain(`${Math.round(s.summary.mean_melatonin_suppression_pct)}%`);
        if (s.summary.work_hours_kss_ge_7_share !== null) expect(row).toContain(`${Math.round(s.summary.work_hours_kss_ge_7_share * 100)}%`);
      }
    }
  });

  it('draws the view-model path too: a synthetic layout view gives every section, with cohort ranges when given', () => {
    const text = pdfText(synthetic);
    for (const heading of ['Summary and recommendation', 'What was modelled', 'Across people: virtual occupants', 'Methods and assumptions', 'Cautions']) expect(text).toContain(heading);
    const squeezed = text.replace(/\s+/g, ' ');
    expect(squeezed).toContain('64 virtual occupants');
    expect(squeezed).toMatch(/12 %.*32 %.*58 %/);
    expect(pdfText(a4)).not.toContain('virtual occupants');
  });

  it('carries the cautions on the summary page and again at the end', () => {
    const pages = Number(pdfInfo(a4).Pages);
    for (const page of [2, pages]) {
      const text = pdfText(a4, page).replace(/\s+/g, ' ');
      expect(text).toContain('not diagnosis or treatment');
      expect(text).toContain('Consult qualified clinicians');
    }
  });

  it('has between 8 and 24 pages, each with the scenario name in the header and "Page N of M"', () => {
    const pages = Number(pdfInfo(a4).Pages);
    expect(pages).toBeGreaterThanOrEqual(8);
    expect(pages).toBeLessThanOrEqual(24);
    for (let p = 1; p <= pages; p++) {
      const text = pdfText(a4, p);
      expect(text).toContain('Lindenhafen demo: night-shift ward and open-plan office');
      expect(text).toContain(`Page ${p} of ${pages}`);
    }
  });

  it('draws every page: pdftoppm renders no blank page (grey-level variance well above zero)', () => {
    const dir = path.join(work, 'pages');
    rmSync(dir, { recursive: true, force: true });
    mkdirSync(dir);
    const variances = pageVariances(a4, dir);
    expect(variances.length).toBe(Number(pdfInfo(a4).Pages));
    // A blank white page has variance 0; header and footer alone give about 23 at 30 dpi
    // (measured: summary page with its body painted white); the demo's pages measure 103–1474.
    for (const v of variances) expect(v).toBeGreaterThan(40);
  });

  it('embeds its fonts (DejaVu Sans)', () => {
    const fonts = pdfFonts(a4);
    expect(fonts.length).toBeGreaterThan(0);
    expect(fonts.every((f) => f.embedded)).toBe(true);
    expect(fonts.some((f) => /DejaVuSans/.test(f.name))).toBe(true);
  });

  it('prints on A4 (595 × 842 pt) or US Letter (612 × 792 pt) as asked (ISO 216; ANSI/ASME Y14.1)', () => {
    expect(pdfInfo(a4)['Page size']).toMatch(/^595\.\d+ x 84[12]\.\d+ pts \(A4\)/);
    expect(pdfInfo(letter)['Page size']).toMatch(/^612(\.0+)? x 792(\.0+)? pts \(letter\)/);
  });

  it('gives the same text when the same scenario is exported twice', () => {
    expect(pdfText(a4Again)).toBe(pdfText(a4));
  });

  it('keeps charts as vectors: pdfimages finds no raster image in the PDF', () => {
    expect(pdfImageCount(a4)).toBe(0);
  });
});

describe('briefing PDF without Chromium', () => {
  it('names how to get Chromium and writes nothing', async () => {
    const out = path.join(work, 'none.pdf');
    const attempt = writeBriefingPdf({ ...common, results: demoSyntheticView(), outPath: out, paper: 'A4', chromiumPath: path.join(work, 'no-such-chromium') });
    await expect(attempt).rejects.toThrow(/apt-get install chromium.*ZEITLIGHT_CHROMIUM/);
    expect(existsSync(out)).toBe(false);
    expect(readdirSync(work).filter((f) => f.includes('partial'))).toEqual([]);
  });
});
