/**
 * Sets the document information of a finished PDF (Title, Subject, Author, Keywords, Creator,
 * Producer) by an incremental update, as ISO 32000-1 §7.5.6 describes it: the original bytes stay
 * as they are and a new version of the Info dictionary, a cross-reference section for it and a
 * trailer pointing back (/Prev) to the previous cross-reference are appended. Used for the
 * briefing, whose printer (Chromium's printToPDF) names the browser as creator.
 *
 * Limits (the files Chromium writes meet them): the last cross-reference must be a classic
 * `xref` table with a `trailer` dictionary (no cross-reference stream); otherwise an error is
 * thrown and the caller keeps the file as printed. Text strings are written as PDFDocEncoding-safe
 * literals when they are printable ASCII, else as UTF-16BE with a byte-order mark (§7.9.2.2).
 * Pure: bytes in, bytes out.
 */

export interface PdfInfo {
  readonly title?: string;
  readonly subject?: string;
  readonly author?: string;
  readonly keywords?: string;
  readonly creator?: string;
  readonly producer?: string;
}

const KEYS: readonly [keyof PdfInfo, string][] = [
  ['title', 'Title'],
  ['subject', 'Subject'],
  ['author', 'Author'],
  ['keywords', 'Keywords'],
  ['creator', 'Creator'],
  ['producer', 'Producer'],
];

/** Bytes as a Latin-1 string (one char per byte), so offsets in the string are byte offsets. */
function latin1(bytes: Uint8Array, from = 0, to = bytes.length): string {
  let s = '';
  for (let i = from; i < to; i += 8192) s += String.fromCharCode(...bytes.subarray(i, Math.min(to, i + 8192)));
  return s;
}

function asciiBytes(text: string): Uint8Array {
  const out = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) out[i] = text.charCodeAt(i) & 0xff;
  return out;
}

/** A PDF text string: "(Literal)" for printable ASCII, "<FEFF…>" (UTF-16BE) otherwise. */
export function pdfTextString(text: string): string {
  if (/^[\x20-\x7e]*$/.test(text)) return `(${text.replace(/[\\()]/g, (c) => `\\${c}`)})`;
  let hex = 'FEFF';
  for (let i = 0; i < text.length; i++) hex += text.charCodeAt(i).toString(16).toUpperCase().padStart(4, '0');
  return `<${hex}>`;
}

interface Trailer {
  readonly size: number;
  readonly root: string;
  readonly info: number | null;
  readonly id: string | null;
  readonly startxref: number;
}

/** The last trailer of a file with a classic cross-reference table. */
export function lastTrailer(bytes: Uint8Array): Trailer {
  const tail = latin1(bytes, Math.max(0, bytes.length - 4096));
  const sx = tail.lastIndexOf('startxref');
  if (sx < 0) throw new Error('PDF: no startxref at the end of the file');
  const startxref = Number(/startxref\s+(\d+)/.exec(tail.slice(sx))?.[1]);
  if (!Number.isFinite(startxref)) throw new Error('PDF: unreadable startxref');
  // The trailer dictionary sits between the last "trailer" keyword and "startxref".
  const head = latin1(bytes, startxref, Math.min(bytes.length, startxref + 4));
  if (head !== 'xref') throw new Error('PDF: the last cross-reference is not a classic xref table');
  const all = latin1(bytes, startxref);
  const t = all.lastIndexOf('trailer');
  if (t < 0) throw new Error('PDF: no trailer dictionary');
  const dict = all.slice(t, all.indexOf('startxref', t));
  const size = Number(/\/Size\s+(\d+)/.exec(dict)?.[1]);
  const root = /\/Root\s+(\d+\s+\d+\s+R)/.exec(dict)?.[1];
  if (!Number.isFinite(size) || root === undefined) throw new Error('PDF: trailer without /Size or /Root');
  const info = /\/Info\s+(\d+)\s+0\s+R/.exec(dict)?.[1];
  const id = /\/ID\s*(\[[^\]]*\])/.exec(dict)?.[1] ?? null;
  return { size, root, info: info === undefined ? null : Number(info), id, startxref };
}

/** Date entries of the current Info dictionary, kept in the new one. */
function currentDates(bytes: Uint8Array, infoObj: number | null): string {
  if (infoObj === null) return '';
  const text = latin1(bytes);
  const at = text.lastIndexOf(`\n${infoObj} 0 obj`);
  if (at < 0) return '';
  const body = text.slice(at, text.indexOf('endobj', at));
  return ['CreationDate', 'ModDate']
    .map((k) => new RegExp(`/${k}\\s*(\\([^)]*\\))`).exec(body)?.[1])
    .map((v, i) => (v === undefined ? '' : `/${i === 0 ? 'CreationDate' : 'ModDate'} ${v}\n`))
    .join('');
}

/** The PDF with its document information replaced by `info` (dates kept). */
export function setPdfInfo(bytes: Uint8Array, info: PdfInfo): Uint8Array {
  const t = lastTrailer(bytes);
  const objNum = t.info ?? t.size;
  const size = Math.max(t.size, objNum + 1);
  const entries = KEYS.flatMap(([k, name]) => (info[k] === undefined ? [] : [`/${name} ${pdfTextString(info[k] ?? '')}\n`])).join('');
  const sep = bytes[bytes.length - 1] === 0x0a ? '' : '\n';
  const objOffset = bytes.length + sep.length;
  const obj = `${objNum} 0 obj\n<<${entries}${currentDates(bytes, t.info)}>>\nendobj\n`;
  const xrefOffset = objOffset + obj.length;
  // Each cross-reference entry is exactly 20 bytes: 10-digit offset, 5-digit generation, "n", space, LF.
  const xref = `xref\n${objNum} 1\n${String(objOffset).padStart(10, '0')} 00000 n \n`;
  const trailer = `trailer\n<</Size ${size}\n/Root ${t.root}\n/Info ${objNum} 0 R\n/Prev ${t.startxref}${t.id === null ? '' : `\n/ID ${t.id}`}>>\nstartxref\n${xrefOffset}\n%%EOF\n`;
  const tail = asciiBytes(`${sep}${obj}${xref}${trailer}`);
  const out = new Uint8Array(bytes.length + tail.length);
  out.set(bytes, 0);
  out.set(tail, bytes.length);
  return out;
}
