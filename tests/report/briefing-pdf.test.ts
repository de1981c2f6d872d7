// The client briefing read back from its PDF with poppler-utils (an outside reader): sections in
// order, the summary's numbers, cautions on the summary page and at the end, page count, every page
// drawn, fonts embedded, paper sizes, repeatable text, and a clear message without Chromium; and
// what makes it a briefing a consultant can hand over as it is: no internal code, one sign for a
// body-clock shift wherever it is printed, one citation per model, no page left mostly blank
// except where a section ends, document information naming the scenario and the product, the
// numbers of results.json as printed, and the two desks of the demo office compared.
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
import { runScenario, type RunOutput } from '../../schedules/run/run-scenario.js';
import type { Scenario } from '../../schedules/schema/scenario-types.js';
import { withEnsemble } from '../../schedules/run/ensemble.js';
import type { RunResults } from '../../schedules/run/results-types.js';
import { demoSyntheticView } from './synthetic-briefing.js';
import { pageFills, pageVariances, pdfFonts, pdfImageCount, pdfInfo, pdfText } from './pdf-tools.js';
import Papa from 'papaparse';
import { summaryCsv } from '../../schedules/run/results-csv.js';
import { ensembleLines } from '../../cli/run-output/ensemble-lines.js';
import { VERSION } from '../../cli/version.js';
import { viewFromRun } from '../../renderer/src/results/results-adapter.js';
import { comparisonRows, formatMetricDifference, formatMetricValue } from '../../renderer/src/charts/comparison-data.js';
import { headlineText } from '../../renderer/src/views/summary-text.js';
import { viewFromResults } from '../../renderer/report/src/results-view.js';
import { reportModels } from '../../renderer/report/src/report-models.js';
import { PAPERS } from '../../model/circadian/model-citations.js';
import { directionOfShift, PHASE_SHIFT_CONVENTION, signedShift } from '../../schedules/words/shift-sign.js';
import { internalCodesIn } from './client-text-checks.js';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const work = mkdtempSync(path.join(tmpdir(), 'zeitlight-briefing-test-'));
const pageFolder = path.join(work, 'page');
let results: RunResults;
let out: RunOutput;
let scenario: Scenario;
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
  scenario = validated.scenario;
  out = runScenario({ scenario });
  results = JSON.parse(JSON.stringify(withEnsemble(out))) as RunResults;
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

describe('briefing PDF ready to hand over', () => {
  /** The whole text with line breaks and runs of spaces as single spaces (pdftotext's reading order). */
  const flat = () => pdfText(a4).replace(/\s+/g, ' ');

  it('holds no internal code: no id of the scenario, value of the scenario format, model id or repository path', () => {
    expect(internalCodesIn(pdfText(a4), DEMO_SCENARIO)).toEqual([]);
    expect(internalCodesIn(flat(), DEMO_SCENARIO)).toEqual([]);
  });

  it('gives one body-clock shift the same sign in results.json, summary.csv, the command line, the app and the briefing (+ later)', () => {
    const nurse = results.personas.find((p) => p.id === 'nurse');
    const s = nurse?.strategies.find((x) => x.id === 'ward-bright-night-start');
    const shift = s?.summary.mean_phase_shift_h ?? NaN;
    expect(shift).toBeGreaterThan(0.5);
    const signs = new Map<string, 'later' | 'earlier' | null>();
    signs.set('results.json', shift > 0 ? 'later' : 'earlier');
    const csv = Papa.parse<Record<string, string>>(summaryCsv(results), { header: true, skipEmptyLines: true }).data.find((r) => r['persona_id'] === 'nurse' && r['strategy_id'] === 'ward-bright-night-start');
    signs.set('summary.csv', Number(csv?.['mean_phase_shift_h']) > 0 ? 'later' : 'earlier');
    // the line `zeitlight run` prints for the strategy: "phase shift (+ later) +1.45 h (models: …)"
    const cli = ensembleLines(results, nurse!).find((l) => l.includes(s!.name)) ?? '';
    signs.set('command line', directionOfShift(/phase shift \(\+ later\) (\S+)/.exec(cli)?.[1] ?? ''));
    // the app: the Compare view's cell and reading, and the Summary view's headline words
    const view = viewFromRun(out, scenario);
    const row = comparisonRows(view.runs.filter((r) => r.personaId === 'nurse'), view.strategies, view.baselineId).find((r) => r.metricId === 'phase-shift');
    const cell = row?.cells.find((c) => c.strategyId === 'ward-bright-night-start');
    signs.set('app, Compare difference', directionOfShift(formatMetricDifference(row!, cell!.difference!)));
    signs.set('app, Compare reading', directionOfShift(cell!.reading));
    signs.set('app, Summary', directionOfShift(headlineText('phase_shift_h', cell!.value, false)));
    // the briefing: the summary table, the person's metrics table and the ranges across models
    const text = pdfText(a4);
    const summaryRow = sectionText(a4, 'Summary and recommendation', 'What was modelled').split('\n').find((l) => l.trim().startsWith('Bright light early')) ?? '';
    signs.set('briefing, summary table', directionOfShift(/\d\.\d h (later|earlier)/.exec(summaryRow)?.[0] ?? ''));
    const metricsRow = sectionText(a4, `Results: ${nurse!.name}`, `Results: ${results.personas[1]!.name}`).split('\n').find((l) => l.trim().startsWith('Body-clock shift vs baseline')) ?? '';
    const cells = metricsRow.trim().split(/\s{2,}/).slice(1);
    signs.set('briefing, metrics table', directionOfShift(/\(([+−][\d.]+)\)/.exec(cells[1] ?? '')?.[1] ?? ''));
    const rangesRow = sectionText(a4, 'Ranges across models and people', 'Methods and assumptions').split('\n').find((l) => l.trim().startsWith('Bright light early')) ?? '';
    signs.set('briefing, ranges', directionOfShift(/[+−]\d\.\d\d/.exec(rangesRow)?.[0] ?? ''));
    expect(Object.fromEntries(signs)).toEqual(Object.fromEntries([...signs.keys()].map((k) => [k, 'later'])));
    // and the convention is stated once, in the methods
    expect(text.replace(/\s+/g, ' ').split(PHASE_SHIFT_CONVENTION).length - 1).toBe(1);
  });

  it('cites every model once, exactly as the model registry does, and no paper of a model with another journal', () => {
    // in reading order, so that a citation wrapped inside a table cell reads as one
    const text = pdfText(a4, undefined, 'raw').replace(/-\n(?=\d)/g, '-').replace(/\s+/g, ' ');
    for (const m of reportModels(results)) expect(text.split(m.citation).length - 1, m.name).toBe(1);
    for (const p of Object.values(PAPERS)) {
      // a paper cited with its authors, year and a journal has its own journal (the two St Hilaire et al. 2007 papers stay apart);
      // authors and year without a journal are a model's name ("… (Åkerstedt & Folkard 1997) KSS")
      const cited = text.split(`${p.authors} ${p.year},`).slice(1);
      for (const after of cited) expect(after.startsWith(` ${p.journal}`), `${p.authors} ${p.year},${after.slice(0, 30)}`).toBe(true);
      const surname = p.authors.split(/[ ,]/)[0] ?? '';
      // every place a paper's first author and year are followed by a journal names the registry's journal
      for (const m of text.matchAll(new RegExp(`${surname}[^;()]{0,90}?${p.year}[,)]?\\s+\\(?((?:J|Chronobiol|PLoS|Aviat|Science|Solar)[A-Za-z ]*?)\\s\\d`, 'g'))) {
        const journals = Object.values(PAPERS).filter((q) => q.authors.startsWith(surname) && q.year === p.year).map((q) => q.journal.replace(/\s\d.*$/, ''));
        expect(journals, m[0]).toContain(m[1]);
      }
    }
  });

  it('leaves no page less than about a third full except where a section ends', () => {
    const fills = pageFills(a4);
    const headings = ['Summary and recommendation', 'What was modelled', ...results.personas.map((p) => `Results: ${p.name}`), 'Ranges across models and people', 'Methods and assumptions', 'How these numbers were checked', 'Cautions'];
    fills.forEach((f, i) => {
      const next = fills[i + 1];
      const endsSection = next === undefined || headings.includes(next.firstLine.trim());
      if (!endsSection) expect(f.fill, `page ${f.page} (next starts “${next?.firstLine ?? ''}”)`).toBeGreaterThan(1 / 3);
    });
    // "How these numbers were checked" is one page: the page after it starts the cautions
    const checked = fills.findIndex((f) => f.firstLine.trim() === 'How these numbers were checked');
    expect(fills[checked + 1]?.firstLine.trim()).toBe('Cautions');
  });

  it('names the scenario as the PDF’s title and subject and Zeitlight as its creator', () => {
    const info = pdfInfo(a4);
    expect(info.Title).toBe(`${DEMO_SCENARIO.name} — lighting and body-clock briefing`);
    expect(info.Subject).toBe(DEMO_SCENARIO.name);
    expect(info.Creator).toBe(`Zeitlight ${VERSION}`);
    expect(info.Producer).not.toMatch(/Mozilla|HeadlessChrome/);
  });

  it('prints every value of each person’s metrics table as results.json gives it, to the decimals shown', () => {
    const view = viewFromResults(results, []);
    results.personas.forEach((p, k) => {
      const next = results.personas[k + 1];
      const section = sectionText(a4, `Results: ${p.name}`, next === undefined ? 'Ranges across models and people' : `Results: ${next.name}`).split('\n');
      const runs = view.runs.filter((r) => r.personaId === p.id);
      const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
      for (const row of comparisonRows(runs, strategies, view.baselineId)) {
        // the row's first line: it starts with the label and has a cell per strategy
        const cellsOf = (l: string) => l.trim().split(/\s{2,}/).slice(1);
        const line = section.find((l) => l.trim().startsWith(row.label.slice(0, 22)) && cellsOf(l).length === strategies.length);
        expect(line, `${p.name}: ${row.label}`).toBeDefined();
        const printed = cellsOf(line ?? '').map((c) => c.replace(/\s*\(.*\)$/, ''));
        expect(printed, `${p.name}: ${row.label}`).toEqual(row.cells.map((c) => formatMetricValue(row, c.value)));
      }
    });
  });

  it('gives each strategy’s body-clock shift range across the models as results.json has it', () => {
    const ranges = sectionText(a4, 'Ranges across models and people', 'Methods and assumptions').split('\n');
    for (const p of results.personas) {
      for (const s of p.strategies.filter((x) => !x.is_baseline)) {
        const e = s.ensemble?.mean_phase_shift_h;
        if (e === undefined || e.min === null || e.max === null) continue;
        const lo = signedShift(e.min);
        const hi = signedShift(e.max);
        if (lo === hi) continue;
        expect(ranges.some((l) => l.includes(`${lo} to ${hi}`)), `${p.name}, ${s.name}: ${lo} to ${hi}`).toBe(true);
      }
    }
  });

  it('shows the office retrofit’s effect at the deep desk and names the two desks’ difference beside its recommendation', () => {
    const deep = results.personas.find((p) => p.id === 'deep-desk-worker');
    const day = (id: string) => deep?.strategies.find((s) => s.id === id)?.summary.mean_daytime_hours_ge_250_lx ?? NaN;
    expect(day('office-tunable-white') - day('baseline')).toBeGreaterThan(0.5);
    const summary = sectionText(a4, 'Summary and recommendation', 'What was modelled').replace(/\s+/g, ' ');
    const block = summary.slice(summary.indexOf(deep!.name));
    expect(block).toMatch(/Tove Arnhelm and Jonas Brenner work in the same room at desks 2 m and 15 m from the windows\./);
    expect(block).toMatch(/“Tunable white: brighter day, warmer afternoon” gives \d h \d\d min a day more for Jonas Brenner and about the same for Tove Arnhelm/);
  });
});
