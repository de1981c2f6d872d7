// The client briefing read back from its PDF with poppler-utils (an outside reader): sections in
// order, the summary's numbers, cautions on the summary page and at the end, page count, every page
// drawn, fonts embedded, paper sizes, repeatable text, and a clear message without Chromium.
// Results: a synthetic view of the built-in demo (tests/report/synthetic-briefing.ts) until the
// run pipeline writes results.json.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { build } from 'vite';
import { writeBriefingPdf } from '../../cli/report/write-briefing-pdf.js';
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';
import { personaSummaries } from '../../renderer/report/src/headlines.js';
import { scenarioFacts } from '../../renderer/report/src/scenario-facts.js';
import { formatNumber } from '../../renderer/src/charts/comparison-data.js';
import { demoSyntheticView } from './synthetic-briefing.js';
import { pageVariances, pdfFonts, pdfImageCount, pdfInfo, pdfText } from './pdf-tools.js';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const work = mkdtempSync(path.join(tmpdir(), 'zeitlight-briefing-test-'));
const pageFolder = path.join(work, 'page');
const view = demoSyntheticView();
const common = { results: view, scenario: DEMO_SCENARIO, generatedOn: '2026-12-01', synthetic: true, reportFolder: pageFolder } as const;
const a4 = path.join(work, 'a.pdf');
const a4Again = path.join(work, 'b.pdf');
const letter = path.join(work, 'letter.pdf');

beforeAll(async () => {
  // A private build of the report page, so a stale or concurrent dist/report cannot affect this.
  await build({ configFile: path.join(ROOT, 'vite.report.config.ts'), logLevel: 'warn', build: { outDir: pageFolder, emptyOutDir: true } });
  await writeBriefingPdf({ ...common, outPath: a4, paper: 'A4' });
  await writeBriefingPdf({ ...common, outPath: a4Again, paper: 'A4' });
  await writeBriefingPdf({ ...common, outPath: letter, paper: 'Letter' });
}, 300_000);

afterAll(() => {
  // For looking at the pages by eye: ZEITLIGHT_BRIEFING_COPY=/some/file.pdf keeps a copy.
  const keep = process.env.ZEITLIGHT_BRIEFING_COPY;
  if (keep !== undefined && keep !== '' && existsSync(a4)) copyFileSync(a4, keep);
  rmSync(work, { recursive: true, force: true });
});

describe('briefing PDF of the demo scenario', () => {
  it('has the sections in order: cover, summary, what was modelled, results per person, methods, cautions', () => {
    // lower case: the cover's kicker is set in capitals by the style sheet
    const text = pdfText(a4).toLowerCase();
    const order = ['lighting and body-clock briefing', 'Summary', 'What was modelled', ...DEMO_SCENARIO.personas.map((p) => `Results: ${p.name}`), 'Methods and assumptions', 'Validation summary', 'Cautions\n'];
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
    expect(cover).toContain('zeitlight-scenario version 2');
    expect(cover).toContain('not a simulation result');
  });

  it('shows every strategy’s summary numbers from the results on the summary page', () => {
    // pdftotext's layout mode may close up "9 %" to "9%" in tight columns; compare without that space
    const summaryPage = pdfText(a4, 2).replace(/\s+/g, ' ').replace(/(\d) %/g, '$1%');
    const facts = scenarioFacts(DEMO_SCENARIO);
    if (!facts.ok) throw new Error(facts.message);
    for (const s of personaSummaries(view, facts.facts.workMinutesPerHour)) {
      expect(summaryPage).toContain(s.persona.name);
      expect(summaryPage).toContain(s.sentences.recommendation.replace(/\s+/g, ' ').replace(/(\d) %/g, '$1%'));
      for (const h of s.all) {
        // long strategy names wrap inside their cell, so the row is found by the name's start
        const start = summaryPage.indexOf(h.strategy.name.slice(0, 24));
        expect(start, h.strategy.name).toBeGreaterThanOrEqual(0);
        const row = summaryPage.slice(start);
        expect(row).toContain(`${formatNumber(h.suppression_pct, 0)}%`);
        expect(row).toContain(`${formatNumber(h.sleepyShare_pct, 0)}%`);
      }
    }
    // the suppression values of the results view, not recomputed: 22 % baseline in the synthetic view
    expect(summaryPage).toContain('22%');
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
    // A blank white page has variance 0; a page with only a header line and page number stays
    // below ~20 at 30 dpi (measured on a header-only page); text and charts give hundreds.
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
    const attempt = writeBriefingPdf({ ...common, outPath: out, paper: 'A4', chromiumPath: path.join(work, 'no-such-chromium') });
    await expect(attempt).rejects.toThrow(/apt-get install chromium.*ZEITLIGHT_CHROMIUM/);
    expect(existsSync(out)).toBe(false);
    expect(readdirSync(work).filter((f) => f.includes('partial'))).toEqual([]);
  });
});
