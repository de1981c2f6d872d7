/**
 * Corrupted photometric files: every invented luminaire, changed at random (a line dropped,
 * doubled or cut short, a value replaced by text, a negative or a huge number, the end cut off),
 * is either read or refused with a PhotometricFileError naming a line of the file (or the
 * missing line after its end) and a field, never another exception. Deterministic: a fixed-seed generator (mulberry32, common practice).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { expandCandelaTable } from '../../model/photometry/candela-grid.js';
import { PhotometricFileError } from '../../model/photometry/candela-table.js';
import { readPhotometricFile } from '../../model/photometry/photometric-file.js';
import { zonalFlux_lm } from '../../model/photometry/zonal-flux.js';
import { PROJECT_ROOT } from '../helpers/run-cli.js';

const DIR = join(PROJECT_ROOT, 'tests', 'photometry', 'luminaires');
const FILES = readdirSync(DIR).filter((f) => /\.(ies|ldt)$/.test(f));

function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const REPLACEMENTS = ['x', '', '-1', '-0.5', '1e400', '0', '99999', 'NaN', '3.5', '[MORE]', 'TILT=NONE', '90 0'];

function corrupt(text: string, rnd: () => number): string {
  const lines = text.split(/\r\n/);
  const i = Math.floor(rnd() * lines.length);
  const kind = Math.floor(rnd() * 5);
  if (kind === 0) lines.splice(i, 1);
  else if (kind === 1) lines.splice(i, 0, lines[i] ?? '');
  else if (kind === 2) lines[i] = (lines[i] ?? '').slice(0, Math.floor(rnd() * (lines[i] ?? '').length));
  else if (kind === 3) {
    const parts = (lines[i] ?? '').split(' ');
    parts[Math.floor(rnd() * parts.length)] = REPLACEMENTS[Math.floor(rnd() * REPLACEMENTS.length)] as string;
    lines[i] = parts.join(' ');
  } else return lines.slice(0, i).join('\r\n');
  return lines.join('\r\n');
}

describe('corrupted photometric files', () => {
  it('are read or refused with a line inside the file and a field, never another error (100 variants per file)', () => {
    const rnd = mulberry32(20261206);
    let refused = 0;
    let read = 0;
    for (const name of FILES) {
      const text = readFileSync(join(DIR, name), 'utf8');
      for (let k = 0; k < 100; k++) {
        const bad = corrupt(text, rnd);
        try {
          const t = readPhotometricFile(bad);
          expect(Number.isFinite(zonalFlux_lm(expandCandelaTable(t))), `${name} variant ${k}`).toBe(true);
          read++;
        } catch (err) {
          if (!(err instanceof PhotometricFileError)) throw new Error(`${name} variant ${k}: ${String(err)}\n${bad}`, { cause: err });
          const lineCount = bad.split(/\r\n|\r|\n/).length;
          expect(err.line, `${name} variant ${k}: ${err.message}`).toBeGreaterThanOrEqual(1);
          // A file that ends early names the line that is missing: one past the last.
          expect(err.line, `${name} variant ${k}: ${err.message}`).toBeLessThanOrEqual(err.reason.includes('ends early') ? lineCount + 1 : lineCount);
          expect(err.field.length).toBeGreaterThan(0);
          refused++;
        }
      }
    }
    expect(refused).toBeGreaterThan(FILES.length * 25);
    expect(read).toBeGreaterThan(0);
  });
});
