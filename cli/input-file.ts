/**
 * Reading the files a command is given: a size limit per kind of file, checked before the file is
 * read; text decoded from UTF-8 (with or without a byte-order mark) or UTF-16 (little- or
 * big-endian, with a byte-order mark, or recognised by its zero bytes, as some spreadsheet
 * programs save "Unicode text"); binary files refused. Every refusal is one CliError naming the
 * file (and the scenario field that names it, when there is one).
 */
import { readFileSync, statSync } from 'node:fs';
import { CliError } from './cli-error.js';

export type InputKind = 'scenario' | 'light-log' | 'weather' | 'spectrum' | 'sleep';

/** Largest file of each kind, bytes. Documented in docs/scenario-format.md ("Limits"). */
export const MAX_INPUT_BYTES: Readonly<Record<InputKind, number>> = {
  scenario: 20_000_000,
  'light-log': 20_000_000,
  weather: 10_000_000,
  spectrum: 5_000_000,
  sleep: 5_000_000,
};

const LABEL: Readonly<Record<InputKind, string>> = {
  scenario: 'scenario file',
  'light-log': 'light log',
  weather: 'weather file',
  spectrum: 'spectrum file',
  sleep: 'sleep file',
};

const mb = (bytes: number) => `${(bytes / 1_000_000).toLocaleString('en-US', { maximumFractionDigits: 1 })} MB`;

/** Why a file cannot be read, in words. */
export function readFailure(err: unknown): string {
  const code = (err as NodeJS.ErrnoException | undefined)?.code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EISDIR') return 'it is a folder';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  if (code === 'ENAMETOOLONG') return 'the file name is too long';
  if (code === 'ENOTDIR') return 'a part of the path is not a folder';
  if (code === 'ELOOP') return 'too many symbolic links';
  return err instanceof Error ? err.message : String(err);
}

/** Share of zero bytes at even and odd positions of the first bytes (UTF-16 without a byte-order mark). */
function utf16WithoutBom(bytes: Uint8Array): 'utf-16le' | 'utf-16be' | undefined {
  const n = Math.min(bytes.length, 4096) & ~1;
  if (n < 4) return undefined;
  let evenZero = 0;
  let oddZero = 0;
  for (let i = 0; i < n; i += 2) {
    if (bytes[i] === 0) evenZero++;
    if (bytes[i + 1] === 0) oddZero++;
  }
  const pairs = n / 2;
  if (oddZero > 0.4 * pairs && evenZero < 0.05 * pairs) return 'utf-16le';
  if (evenZero > 0.4 * pairs && oddZero < 0.05 * pairs) return 'utf-16be';
  return undefined;
}

/** Text of file bytes: UTF-8 or UTF-16 as described above; undefined for binary content. */
export function decodeText(bytes: Uint8Array): { text: string } | { binaryAtLine: number } {
  let encoding: 'utf-8' | 'utf-16le' | 'utf-16be' = 'utf-8';
  let start = 0;
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) start = 3;
  else if (bytes[0] === 0xff && bytes[1] === 0xfe) [encoding, start] = ['utf-16le', 2];
  else if (bytes[0] === 0xfe && bytes[1] === 0xff) [encoding, start] = ['utf-16be', 2];
  else encoding = utf16WithoutBom(bytes) ?? 'utf-8';
  const text = new TextDecoder(encoding, { ignoreBOM: true }).decode(bytes.subarray(start));
  const nul = text.indexOf('\0');
  if (nul >= 0) return { binaryAtLine: text.slice(0, nul).split('\n').length };
  return { text };
}

/**
 * The text of an input file. `field` is the scenario field or option that named the file; it
 * starts the message when given.
 */
export function readInputFile(path: string, kind: InputKind, field?: string): string {
  const where = (text: string) => `${field !== undefined ? `${field}: ` : ''}${text}`;
  const label = LABEL[kind];
  let size: number;
  try {
    const st = statSync(path);
    if (st.isDirectory()) throw Object.assign(new Error('is a directory'), { code: 'EISDIR' });
    size = st.size;
  } catch (err) {
    throw new CliError(where(`cannot read the ${label} ${path}: ${readFailure(err)}`));
  }
  const max = MAX_INPUT_BYTES[kind];
  if (size > max) throw new CliError(where(`the ${label} ${path} is ${mb(size)}, more than the ${mb(max)} a ${label} may have (see "Limits" in docs/scenario-format.md)`));
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (err) {
    throw new CliError(where(`cannot read the ${label} ${path}: ${readFailure(err)}`));
  }
  if (bytes.length > max) throw new CliError(where(`the ${label} ${path} is more than the ${mb(max)} a ${label} may have`));
  const decoded = decodeText(bytes);
  if ('binaryAtLine' in decoded) throw new CliError(where(`the ${label} ${path}, line ${decoded.binaryAtLine}: holds binary data (a zero byte), not text; save it as text (CSV or JSON) and try again`));
  return decoded.text;
}
