// The PDF document-information writer (schedules/report/pdf-info.ts) checked with an outside
// reader (poppler's pdfinfo and pdftotext): a small PDF written by hand, with and without an Info
// dictionary, gets the title, subject and creator asked for, keeps its pages and text, and a second
// update on top of the first still reads.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { lastTrailer, pdfTextString, setPdfInfo } from '../../schedules/report/pdf-info.js';
import { pdfInfo, pdfText } from './pdf-tools.js';

const work = mkdtempSync(path.join(tmpdir(), 'zeitlight-pdf-info-'));

/** A one-page PDF 1.4 with the text "Hello briefing", classic xref table (ISO 32000-1 §7.5.4), optionally with an Info dictionary. */
function handMadePdf(withInfo: boolean): Uint8Array {
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 300 200] /Contents 4 0 R /Resources << /Font << /F1 5 0 R >> >> >>',
    null, // content stream, below
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>',
    ...(withInfo ? ["<< /Creator (Some Browser 1.0) /CreationDate (D:20261201120000+00'00') >>"] : []),
  ];
  const stream = 'BT /F1 12 Tf 20 100 Td (Hello briefing) Tj ET';
  let text = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((o, i) => {
    offsets.push(text.length);
    text += `${i + 1} 0 obj\n${o ?? `<< /Length ${stream.length} >>\nstream\n${stream}\nendstream`}\nendobj\n`;
  });
  const xref = text.length;
  text += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, '0')} 00000 n \n`).join('')}`;
  text += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R${withInfo ? ` /Info ${objects.length} 0 R` : ''} >>\nstartxref\n${xref}\n%%EOF\n`;
  return new Uint8Array(Buffer.from(text, 'latin1'));
}

function write(name: string, bytes: Uint8Array): string {
  const file = path.join(work, name);
  writeFileSync(file, bytes);
  return file;
}

describe('PDF document information', () => {
  const info = { title: 'Lindenhafen demo — Zeitlight briefing', subject: 'Lindenhafen demo: night-shift ward (Ærø)', creator: 'Zeitlight 0.1.0', producer: 'Zeitlight 0.1.0 with Chromium' };

  it('replaces an existing Info dictionary: pdfinfo reads the new title, subject and creator, the page text stays', () => {
    const file = write('with-info.pdf', setPdfInfo(handMadePdf(true), info));
    const read = pdfInfo(file);
    expect(read.Title).toBe(info.title);
    expect(read.Subject).toBe(info.subject);
    expect(read.Creator).toBe(info.creator);
    expect(read.Producer).toBe(info.producer);
    expect(read.Pages).toBe('1');
    expect(read.CreationDate).toMatch(/2026/);
    expect(pdfText(file)).toContain('Hello briefing');
  });

  it('adds an Info dictionary to a PDF that has none', () => {
    const file = write('without-info.pdf', setPdfInfo(handMadePdf(false), { title: 'T', creator: 'Zeitlight' }));
    expect(pdfInfo(file).Title).toBe('T');
    expect(pdfInfo(file).Creator).toBe('Zeitlight');
  });

  it('reads again after a second update on top of the first (its /Prev chain is followed)', () => {
    const twice = setPdfInfo(setPdfInfo(handMadePdf(true), info), { title: 'Second' });
    const file = write('twice.pdf', twice);
    expect(pdfInfo(file).Title).toBe('Second');
    expect(lastTrailer(twice).info).toBe(6);
    expect(pdfText(file)).toContain('Hello briefing');
  });

  it('writes ASCII as literal strings with escapes and anything else as UTF-16BE with a byte-order mark (ISO 32000-1 §7.9.2.2)', () => {
    expect(pdfTextString('a (b) \\c')).toBe('(a \\(b\\) \\\\c)');
    expect(pdfTextString('—')).toBe('<FEFF2014>');
  });

  it('refuses a file whose last cross-reference is not a classic table', () => {
    expect(() => setPdfInfo(new Uint8Array(Buffer.from('%PDF-1.5\n1 0 obj\n<< /Type /XRef >>\nendobj\nstartxref\n9\n%%EOF\n', 'latin1')), info)).toThrow(/classic xref/);
  });
});
