/**
 * The one place `zeitlight run --pdf` and `zeitlight demo` ask for the PDF briefing
 * (cli/report/). It needs headless Chromium; when Chromium is missing or printing fails the run
 * still keeps its JSON and CSV files and this returns a message saying what is missing and how
 * to get it.
 */
import { join } from 'node:path';
import { HOW_TO_GET_CHROMIUM, writeBriefingPdf, type PaperSize } from '../report/index.js';

export const CHROMIUM_HINT = `To write the briefing, ${HOW_TO_GET_CHROMIUM}.`;

export async function writeBriefing(
  dir: string,
  results: unknown,
  scenario: unknown,
  chromiumPath: string | undefined,
  paper: PaperSize = 'A4',
): Promise<{ ok: true; path: string } | { ok: false; message: string }> {
  try {
    const r = await writeBriefingPdf({ results, scenario, outPath: join(dir, 'report.pdf'), paper, ...(chromiumPath !== undefined ? { chromiumPath } : {}) });
    return { ok: true, path: r.path };
  } catch (err) {
    const text = err instanceof Error ? err.message : String(err);
    const hint = /chrom/i.test(text) && !/apt-get/.test(text) ? ` ${CHROMIUM_HINT}` : '';
    return { ok: false, message: `no PDF briefing written (${text}); results.json, exposure.csv and summary.csv were written.${hint}` };
  }
}
