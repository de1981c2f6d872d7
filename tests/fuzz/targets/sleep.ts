/**
 * Sleep files for `zeitlight simulate --sleep`: episodes in hours since t = 0 with any delimiter
 * and decimal commas, touching, overlapping, reversed, zero-length, very long, negative, far in
 * the future, junk cells, a wrong header — with a fixed light file (and a light file with the same
 * kinds of damage now and then).
 */
import fc from 'fast-check';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { callCli } from '../cli-call.js';
import { crashFindings, refusalFindings, type Finding } from '../findings.js';
import { applyTextCorruption, encodeText, textCorruptionArb, type TextCorruption } from '../text-corruption.js';
import { count, type FuzzTarget } from '../target.js';

export interface SleepCase {
  readonly delimiter: ',' | ';' | '\t';
  readonly header: string;
  readonly episodes: readonly (readonly [string, string])[];
  readonly light: 'hour,lux' | 'hour;lux' | 'logger' | 'damaged';
  readonly lightDamage: TextCorruption;
  readonly days: string;
  readonly model: string | null;
  readonly text: TextCorruption;
}

const hourArb = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: -30, max: 80, noNaN: true }).map((v) => String(Math.round(v * 4) / 4)) },
  { weight: 1, arbitrary: fc.constantFrom('', 'NaN', 'x', '1e308', '-1e308', '1e-320', '23,5', '7:30', '+8', '.5', '1e999') },
);

export const sleepCaseArb: fc.Arbitrary<SleepCase> = fc.record({
  delimiter: fc.constantFrom(',', ';', '\t'),
  header: fc.oneof({ weight: 8, arbitrary: fc.constant('start_h,end_h') }, { weight: 1, arbitrary: fc.constantFrom('start,end', 'START_H,END_H', 'start_h', 'end_h,start_h', '') }),
  episodes: fc.oneof(
    { weight: 3, arbitrary: fc.integer({ min: 0, max: 3 }).map((n) => Array.from({ length: n }, (_, d) => [String(23 + 24 * d), String(31 + 24 * d)] as const)) },
    { weight: 2, arbitrary: fc.array(fc.tuple(hourArb, hourArb), { maxLength: 6 }) },
  ),
  light: fc.constantFrom('hour,lux', 'hour;lux', 'logger', 'damaged'),
  lightDamage: textCorruptionArb,
  days: fc.oneof({ weight: 6, arbitrary: fc.constantFrom('1', '2') }, { weight: 1, arbitrary: fc.constantFrom('0', '367', '1.5', '-1', 'x', '1e9') }),
  model: fc.oneof({ weight: 6, arbitrary: fc.constant(null) }, { weight: 3, arbitrary: fc.constantFrom('jfk99-x7', 'fjk99-cubic', 'hfb19-sp') }, { weight: 1, arbitrary: fc.constant('nope') }),
  text: textCorruptionArb,
});

function lightText(c: SleepCase): string {
  switch (c.light) {
    case 'hour,lux':
    case 'damaged':
      return 'hour,lux\n0,0\n7,250.5\n19,80\n23,0\n';
    case 'hour;lux':
      return 'hour;lux\n0;0\n7;250,5\n19;80\n23;0\n';
    case 'logger':
      return 'timestamp\tlux\n2026-03-23T00:00:00+01:00\t0\n2026-03-23T07:00:00+01:00\t250,5\n2026-03-23T19:00:00+01:00\t80\n2026-03-23T23:00:00+01:00\t0\n';
  }
}

export function sleepTarget(dir: string): FuzzTarget<SleepCase> {
  const sleepFile = join(dir, 'sleep.csv');
  const lightFile = join(dir, 'light.csv');
  const outcomes: Record<string, number> = {};
  return {
    name: 'sleep',
    arbitrary: sleepCaseArb,
    outcomes,
    async run(c) {
      const d = c.delimiter;
      const text = [c.header.replace(',', d), ...c.episodes.map(([s, e]) => `${d === ',' ? s : s.replace('.', ',')}${d}${d === ',' ? e : e.replace('.', ',')}`)].join('\n') + '\n';
      writeFileSync(sleepFile, encodeText(applyTextCorruption(text, c.text), c.text.encoding));
      const light = lightText(c);
      writeFileSync(lightFile, c.light === 'damaged' ? encodeText(applyTextCorruption(light, c.lightDamage), c.lightDamage.encoding) : light);
      // A fixed starting state skips the entrainment, so each case stays short (the x-xc-n models).
      const init = c.model === 'hfb19-sp' ? [] : ['--init', '-0.5,-0.86,0.3'];
      const call = await callCli(['simulate', lightFile, '--days', c.days, '--sleep', sleepFile, ...init, '--json', ...(c.model !== null ? ['--model', c.model] : [])]);
      count(outcomes, call.code === 0 ? 'simulated' : 'refused');
      const findings: Finding[] = [...crashFindings(call), ...refusalFindings(call, ['sleep.csv', 'light.csv'])];
      return findings;
    },
  };
}
