/**
 * Spectrum files as spectrometer software and spreadsheets write them: any step and range (also
 * far outside 380–780 nm, or in µm by mistake), comma, semicolon or tab with decimal commas,
 * negative noise (small and large), zero and extreme values, extra columns, unsorted or repeated
 * wavelengths, junk cells — through `zeitlight alphaopic`, with and without --illuminance.
 */
import fc from 'fast-check';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { callCli } from '../cli-call.js';
import { crashFindings, refusalFindings, type Finding } from '../findings.js';
import { applyTextCorruption, encodeText, textCorruptionArb, type TextCorruption } from '../text-corruption.js';
import { count, type FuzzTarget } from '../target.js';

export interface SpectrumCase {
  readonly delimiter: ',' | ';' | '\t';
  readonly from_nm: number;
  readonly step_nm: number;
  readonly rows: number;
  readonly shape: 'led' | 'flat' | 'zero' | 'noise-only' | 'huge' | 'tiny';
  /** Relative size of negative noise added to dark parts (share of the peak). */
  readonly noise: number;
  readonly extraColumns: number;
  readonly junk: readonly (readonly [number, string])[];
  readonly swap: number | null;
  readonly illuminance: string | null;
  readonly age: string | null;
  readonly text: TextCorruption;
}

export const spectrumCaseArb: fc.Arbitrary<SpectrumCase> = fc.record({
  delimiter: fc.constantFrom(',', ';', '\t'),
  from_nm: fc.oneof({ weight: 4, arbitrary: fc.integer({ min: 300, max: 420 }) }, { weight: 1, arbitrary: fc.constantFrom(0.38, -10, 0, 700, 800, 1e6) }),
  step_nm: fc.oneof({ weight: 4, arbitrary: fc.constantFrom(0.1, 0.5, 1, 2, 4, 5, 10) }, { weight: 1, arbitrary: fc.constantFrom(0.001, 50, 100, 400) }),
  rows: fc.integer({ min: 0, max: 900 }),
  shape: fc.oneof({ weight: 6, arbitrary: fc.constantFrom('led', 'flat') }, { weight: 1, arbitrary: fc.constantFrom('zero', 'noise-only', 'huge', 'tiny') }),
  noise: fc.constantFrom(0, 0, 0.001, 0.01, 0.019, 0.05, 0.5),
  extraColumns: fc.constantFrom(0, 0, 1, 3),
  junk: fc.oneof({ weight: 3, arbitrary: fc.constant([]) }, { weight: 1, arbitrary: fc.array(fc.tuple(fc.nat(900), fc.constantFrom('', 'NaN', 'n/a', '1e999', '-', '12,3', '"', '∞', '-0', '+5', '.5', '5.', '1e-400')), { maxLength: 3 }) }),
  swap: fc.oneof({ weight: 6, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: fc.nat(900) }),
  illuminance: fc.oneof({ weight: 6, arbitrary: fc.constant(null) }, { weight: 4, arbitrary: fc.constantFrom('500', '1e-300', '100000', '0.001', '1e308') }, { weight: 1, arbitrary: fc.constantFrom('0', '-1', 'NaN', 'x') }),
  age: fc.oneof({ weight: 8, arbitrary: fc.constant(null) }, { weight: 4, arbitrary: fc.constantFrom('32', '1', '100', '64.5') }, { weight: 1, arbitrary: fc.constantFrom('0', '150', 'x') }),
  text: textCorruptionArb,
});

function value(c: SpectrumCase, w: number): number {
  const led = Math.exp(-(((w - 450) / 12) ** 2)) + 0.6 * Math.exp(-(((w - 580) / 60) ** 2));
  const base = c.shape === 'led' ? led : c.shape === 'flat' ? 1 : c.shape === 'zero' ? 0 : c.shape === 'noise-only' ? 0 : c.shape === 'huge' ? led * 1e300 : led * 1e-300;
  const noise = c.noise * Math.sin(w * 12.9898) * (c.shape === 'noise-only' ? 1 : base < 0.05 ? 1 : 0);
  return base - Math.abs(noise);
}

function spectrumText(c: SpectrumCase): string {
  const d = c.delimiter;
  const comma = d !== ',';
  const fmt = (v: number) => (comma ? String(v).replace('.', ',') : String(v));
  const lines = [['wavelength_nm', 'irradiance_W_m2_nm', ...Array.from({ length: c.extraColumns }, (_, i) => `extra${i}`)].join(d)];
  for (let i = 0; i < c.rows; i++) {
    const w = Math.round((c.from_nm + i * c.step_nm) * 1000) / 1000;
    lines.push([fmt(w), fmt(value(c, w)), ...Array.from({ length: c.extraColumns }, () => '1')].join(d));
  }
  for (const [row, text] of c.junk) if (lines.length > 1) lines[1 + (row % (lines.length - 1))] = `${lines[1 + (row % (lines.length - 1))]?.split(d)[0] ?? ''}${d}${text}`;
  if (c.swap !== null && lines.length > 3) {
    const k = 1 + (c.swap % (lines.length - 2));
    [lines[k], lines[k + 1]] = [lines[k + 1] ?? '', lines[k] ?? ''];
  }
  return lines.join('\n') + '\n';
}

export function spectrumTarget(dir: string): FuzzTarget<SpectrumCase> {
  const file = join(dir, 'spd.csv');
  const outcomes: Record<string, number> = {};
  return {
    name: 'spectrum',
    arbitrary: spectrumCaseArb,
    outcomes,
    async run(c) {
      writeFileSync(file, encodeText(applyTextCorruption(spectrumText(c), c.text), c.text.encoding));
      const args = ['alphaopic', file, '--json', ...(c.illuminance !== null ? ['--illuminance', c.illuminance] : []), ...(c.age !== null ? ['--age', c.age] : [])];
      const call = await callCli(args);
      count(outcomes, call.code === 0 ? 'spectrum read' : 'spectrum refused');
      const findings: Finding[] = [...crashFindings(call), ...refusalFindings(call, ['spd.csv'])];
      return findings;
    },
  };
}
