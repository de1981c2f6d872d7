// The client briefing as PDF from the command line: the built report page (dist/report/) is
// loaded in headless Chromium through playwright-core, given the briefing document, and printed
// with Chromium's header/footer templates. The PDF goes to a temporary name first and is renamed
// into place, so a failed export never leaves half a file.
import { mkdtemp, readFile, rename, rm, writeFile } from 'node:fs/promises';
import * as os from 'node:os';
import * as path from 'node:path';
import { chromium } from 'playwright-core';
import { setPdfInfo, type PdfInfo } from '../../schedules/report/pdf-info.js';
import { CliError } from '../cli-error.js';
import { VERSION } from '../version.js';
import { chromiumExecutable } from './chromium-path.js';
import { REPORT_ORIGIN, reportAsset, reportPageFolder } from './report-page.js';

export type PaperSize = 'A4' | 'Letter';

export interface BriefingPdfOptions {
  /** The run's results document (results.json, "zeitlight-results"), or results already in the
   *  renderer's results-view shape (personas, strategies, runs, metrics). */
  readonly results: unknown;
  /** The scenario as read from its file. */
  readonly scenario: unknown;
  readonly outPath: string;
  readonly paper: PaperSize;
  readonly chromiumPath?: string;
  /** Client or site name as entered; the site name is used when absent. */
  readonly client?: string;
  /** Date printed on the cover, "YYYY-MM-DD"; today (local) when absent. */
  readonly generatedOn?: string;
  /** Cohort ranges, when a cohort was run. */
  readonly cohort?: unknown;
  /** Marks the results as a layout check (shown as a banner). */
  readonly synthetic?: boolean;
  /** Folder of a built report page; the installed dist/report/ when absent. */
  readonly reportFolder?: string;
  /** Longest wait for the page to draw, ms. */
  readonly timeout_ms?: number;
}

export const CHROMIUM_FLAGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

interface PagePrintSettings {
  status: 'ready' | 'failed';
  message: string;
  paper: PaperSize;
  headerTemplate: string;
  footerTemplate: string;
  margins_mm: { top: number; bottom: number; left: number; right: number };
  info?: PdfInfo;
}

function isResultsDocument(value: unknown): boolean {
  return typeof value === 'object' && value !== null && (value as { format?: unknown }).format === 'zeitlight-results';
}

function today(): string {
  const now = new Date();
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
}

/** The JSON document the report page draws. */
export function briefingDocument(options: BriefingPdfOptions): Record<string, unknown> {
  return {
    kind: 'zeitlight-briefing',
    paper: options.paper,
    generatedOn: options.generatedOn ?? today(),
    zeitlightVersion: VERSION,
    scenario: options.scenario,
    ...(isResultsDocument(options.results) ? { results: options.results } : { view: options.results }),
    ...(options.client === undefined ? {} : { client: options.client }),
    ...(options.cohort === undefined ? {} : { cohort: options.cohort }),
    ...(options.synthetic === true ? { synthetic: true } : {}),
  };
}

/** Writes the briefing PDF to `outPath`; resolves to the number of bytes written. */
export async function writeBriefingPdf(options: BriefingPdfOptions): Promise<{ path: string; bytes: number }> {
  if (options.paper !== 'A4' && options.paper !== 'Letter') throw new CliError(`briefing PDF: paper must be "A4" or "Letter", not "${String(options.paper)}"`);
  const executablePath = chromiumExecutable(options.chromiumPath);
  const folder = options.reportFolder ?? reportPageFolder();
  const outPath = path.resolve(options.outPath);
  const temp = path.join(path.dirname(outPath), `.${path.basename(outPath)}.${process.pid}.partial`);
  const userDataDir = await mkdtemp(path.join(os.tmpdir(), 'zeitlight-chromium-'));
  const document = briefingDocument(options);
  let context: Awaited<ReturnType<typeof chromium.launchPersistentContext>> | null = null;
  try {
    try {
      context = await chromium.launchPersistentContext(userDataDir, { executablePath, headless: true, args: CHROMIUM_FLAGS, viewport: { width: 900, height: 1200 }, offline: false });
    } catch (error) {
      throw new CliError(`briefing PDF: Chromium at ${executablePath} did not start (${error instanceof Error ? error.message.split('\n')[0] : String(error)})`);
    }
    await context.route('**/*', async (route) => {
      const asset = reportAsset(folder, route.request().url());
      if (asset === null) return route.abort('blockedbyclient');
      try {
        return await route.fulfill({ status: 200, contentType: asset.contentType, body: await readFile(asset.file) });
      } catch {
        return route.fulfill({ status: 404, body: 'not found' });
      }
    });
    const page = context.pages()[0] ?? (await context.newPage());
    await page.addInitScript((doc) => {
      (globalThis as unknown as { __ZEITLIGHT_REPORT__: unknown }).__ZEITLIGHT_REPORT__ = doc;
    }, document);
    await page.goto(`${REPORT_ORIGIN}/index.html`, { waitUntil: 'load' });
    await page.waitForFunction(() => (globalThis as unknown as { __zeitlightPrint?: unknown }).__zeitlightPrint !== undefined, undefined, { timeout: options.timeout_ms ?? 120_000 });
    const settings = await page.evaluate(() => (globalThis as unknown as { __zeitlightPrint: PagePrintSettings }).__zeitlightPrint);
    if (settings.status !== 'ready') throw new CliError(`briefing PDF: ${settings.message}`);
    await page.emulateMedia({ media: 'print' });
    const mm = (v: number) => `${v}mm`;
    await page.pdf({
      path: temp,
      format: settings.paper,
      printBackground: true,
      displayHeaderFooter: true,
      headerTemplate: settings.headerTemplate,
      footerTemplate: settings.footerTemplate,
      margin: { top: mm(settings.margins_mm.top), bottom: mm(settings.margins_mm.bottom), left: mm(settings.margins_mm.left), right: mm(settings.margins_mm.right) },
      outline: true,
      tagged: true,
    });
    // Chromium names itself as the creator and gives no subject: the page's document information replaces it.
    if (settings.info !== undefined) await writeFile(temp, setPdfInfo(new Uint8Array(await readFile(temp)), settings.info));
    await rename(temp, outPath);
    const bytes = (await readFile(outPath)).length;
    return { path: outPath, bytes };
  } catch (error) {
    await rm(temp, { force: true });
    if (error instanceof CliError) throw error;
    throw new CliError(`briefing PDF: ${error instanceof Error ? error.message.split('\n')[0] : String(error)}`);
  } finally {
    if (context !== null) await context.close().catch(() => undefined);
    await rm(userDataDir, { recursive: true, force: true });
  }
}
