// Reading a PDF back with poppler-utils (pdftotext, pdftoppm, pdfinfo, pdffonts): an outside
// reader, so the checks see what a client's PDF viewer would see.
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import * as path from 'node:path';

export function popplerAvailable(): boolean {
  try {
    execFileSync('pdftotext', ['-v'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

/** The text of the PDF (or one page): laid out as on the page, or in the order it was written ("raw"). */
export function pdfText(file: string, page?: number, mode: 'layout' | 'raw' = 'layout'): string {
  const range = page === undefined ? [] : ['-f', String(page), '-l', String(page)];
  return execFileSync('pdftotext', [`-${mode}`, ...range, file, '-'], { encoding: 'utf8' });
}

export function pdfInfo(file: string): Record<string, string> {
  const out = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
  return Object.fromEntries(out.split('\n').filter((l) => l.includes(':')).map((l) => [l.slice(0, l.indexOf(':')).trim(), l.slice(l.indexOf(':') + 1).trim()]));
}

/** Rows of `pdffonts`: font name and whether it is embedded. */
export function pdfFonts(file: string): { name: string; embedded: boolean }[] {
  const lines = execFileSync('pdffonts', [file], { encoding: 'utf8' }).split('\n').slice(2).filter((l) => l.trim() !== '');
  return lines.map((l) => {
    const cols = l.trim().split(/\s+/);
    // name type... encoding emb sub uni object ID: "emb" is the 5th field from the end
    return { name: cols[0] ?? '', embedded: cols[cols.length - 5] === 'yes' };
  });
}

/** Grey-level variance of every page rendered by pdftoppm at `dpi` (PGM, 8 bit). */
export function pageVariances(file: string, outDir: string, dpi = 30): number[] {
  execFileSync('pdftoppm', ['-gray', '-r', String(dpi), file, path.join(outDir, 'page')]);
  return readdirSync(outDir)
    .filter((f) => f.startsWith('page') && f.endsWith('.pgm'))
    .sort()
    .map((f) => pgmVariance(readFileSync(path.join(outDir, f))));
}

/** Variance of an 8-bit binary PGM (P5). */
export function pgmVariance(data: Buffer): number {
  // Header: "P5" whitespace width whitespace height whitespace maxval single-whitespace, then pixels.
  let offset = 0;
  const fields: string[] = [];
  while (fields.length < 4) {
    while (/\s/.test(String.fromCharCode(data[offset] ?? 32))) offset++;
    if (data[offset] === 0x23) {
      while (data[offset] !== 0x0a) offset++;
      continue;
    }
    let token = '';
    while (offset < data.length && !/\s/.test(String.fromCharCode(data[offset] ?? 32))) token += String.fromCharCode(data[offset++] ?? 0);
    fields.push(token);
  }
  offset++;
  const pixels = data.subarray(offset);
  let sum = 0;
  let sumSq = 0;
  for (const v of pixels) {
    sum += v;
    sumSq += v * v;
  }
  const n = pixels.length;
  return n === 0 ? 0 : sumSq / n - (sum / n) ** 2;
}

/** Number of raster images `pdfimages -list` finds (two header lines, then one line per image). */
export function pdfImageCount(file: string): number {
  return execFileSync('pdfimages', ['-list', file], { encoding: 'utf8' }).split('\n').slice(2).filter((l) => l.trim() !== '').length;
}

export interface PageFill {
  readonly page: number;
  /** Share of the printable height (between the header and footer margins) down to the lowest text on the page. */
  readonly fill: number;
  /** Text of the first line below the header. */
  readonly firstLine: string;
}

/**
 * How full each page is, read from `pdftotext -bbox-layout` (text boxes in PDF points): the lowest
 * text between the top and bottom margins (mm, as printed) against the printable height. Charts end
 * in axis labels and legends, tables in text rows, so the lowest text marks the end of the content.
 */
export function pageFills(file: string, margins_mm = { top: 18, bottom: 16 }): PageFill[] {
  const xml = execFileSync('pdftotext', ['-bbox-layout', file, '-'], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  const pt = (mm: number) => (mm * 72) / 25.4;
  const pages = xml.split('<page ').slice(1);
  return pages.map((p, i) => {
    const height = Number(/height="([\d.]+)"/.exec(p)?.[1]);
    const top = pt(margins_mm.top);
    const bottom = height - pt(margins_mm.bottom);
    let lowest = top;
    let first: { y: number; text: string } | null = null;
    for (const line of p.split('<line ').slice(1)) {
      const yMin = Number(/yMin="([\d.]+)"/.exec(line)?.[1]);
      const yMax = Number(/yMax="([\d.]+)"/.exec(line)?.[1]);
      if (!(yMin >= top - 1 && yMax <= bottom + 1)) continue;
      lowest = Math.max(lowest, yMax);
      const text = [...line.matchAll(/<word[^>]*>([^<]*)<\/word>/g)].map((m) => m[1]).join(' ');
      if (first === null || yMin < first.y) first = { y: yMin, text };
    }
    return { page: i + 1, fill: (lowest - top) / (bottom - top), firstLine: (first?.text ?? '').replace(/&apos;|&#39;/g, "'").replace(/&quot;/g, '"').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&amp;/g, '&') };
  });
}
