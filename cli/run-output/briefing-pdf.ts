/**
 * The one place `zeitlight run --pdf` asks for the PDF briefing. The briefing writer lives in
 * cli/report/ and needs headless Chromium; when either is missing the run still writes its
 * JSON and CSV files and this returns a message saying what is missing and how to get it.
 */
import { join } from 'node:path';

export const CHROMIUM_HINT =
  'Install Chromium (e.g. "apt-get install chromium" on Debian/Ubuntu) or point ZEITLIGHT_CHROMIUM (or --chromium) at a Chrome/Chromium executable, then run again with --pdf.';

interface BriefingModule {
  writeBriefingPdf(options: { results: unknown; scenario: unknown; outPath: string; paper: 'A4' | 'Letter'; chromiumPath?: string }): Promise<{ path: string; bytes: number }>;
}

async function loadBriefingWriter(): Promise<BriefingModule | undefined> {
  for (const spec of ['../report/index.js', '../report/write-briefing-pdf.js']) {
    try {
      const m = (await import(spec)) as Partial<BriefingModule>;
      if (typeof m.writeBriefingPdf === 'function') return m as BriefingModule;
    } catch {
      // try the next entry point
    }
  }
  return undefined;
}

export async function writeBriefing(dir: string, results: unknown, scenario: unknown, chromiumPath: string | undefined): Promise<{ ok: true; path: string } | { ok: false; message: string }> {
  const writer = await loadBriefingWriter();
  if (writer === undefined) return { ok: false, message: 'the PDF briefing is not available in this build; results.json, exposure.csv and summary.csv were written.' };
  try {
    const r = await writer.writeBriefingPdf({ results, scenario, outPath: join(dir, 'report.pdf'), paper: 'A4', ...(chromiumPath !== undefined ? { chromiumPath } : {}) });
    return { ok: true, path: r.path };
  } catch (err) {
    const text = err instanceof Error ? err.message : String(err);
    const chromium = /chrom/i.test(text) && !/apt-get/.test(text) ? ` ${CHROMIUM_HINT}` : '';
    return { ok: false, message: `no PDF briefing written (${text}); results.json, exposure.csv and summary.csv were written.${chromium}` };
  }
}
