/**
 * EPW weather files as they come from many sources: a few days laid out per the EnergyPlus EPW
 * Data Dictionary, with odd LOCATION values, data lines that end early or carry extra fields,
 * missing-value codes, empty, non-numeric and impossible cells, hours dropped or repeated, dates
 * that do not exist, a file cut short — through `zeitlight weather` and `zeitlight run`.
 */
import fc from 'fast-check';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { callCli } from '../cli-call.js';
import { crashFindings, refusalFindings, type Finding } from '../findings.js';
import { applyTextCorruption, encodeText, textCorruptionArb, type TextCorruption } from '../text-corruption.js';
import { count, type FuzzTarget } from '../target.js';

type CellEdit = readonly [row: number, field: number, text: string];
type RowEdit = { kind: 'drop' | 'repeat' | 'short' | 'long'; row: number; n: number };

export interface EpwCase {
  readonly days: number;
  readonly location: readonly [lat: string, lon: string, tz: string, elev: string];
  readonly periodEnd: string;
  readonly cells: readonly CellEdit[];
  readonly rows: readonly RowEdit[];
  readonly text: TextCorruption;
  readonly run: boolean;
}

const cellTextArb = fc.oneof(
  fc.constantFrom('', '9999', '999999', '99.9', '99', '999', '-1', '-9999', '1e308', '-1e308', 'NaN', 'Infinity', 'x', ' ', '0', '2147483648', '1e-320', '200001', '1500.5'),
  fc.double({ noNaN: true }).map(String),
  fc.string({ maxLength: 6 }),
);

export const epwCaseArb: fc.Arbitrary<EpwCase> = fc.record({
  days: fc.integer({ min: 1, max: 3 }),
  location: fc.oneof(
    { weight: 4, arbitrary: fc.tuple(fc.double({ min: -90, max: 90, noNaN: true }).map(String), fc.double({ min: -180, max: 180, noNaN: true }).map(String), fc.constantFrom('1.0', '-12', '14', '5.75', '0'), fc.constantFrom('500.0', '-1000', '9000', '0')) },
    {
      weight: 1,
      arbitrary: fc.tuple(
        fc.oneof(fc.constantFrom('48.0', '-90', '90', '90.1', '0', 'x', ''), fc.double({ min: -95, max: 95, noNaN: true }).map(String)),
        fc.oneof(fc.constantFrom('11.0', '-180', '180', '181', 'abc'), fc.double({ min: -185, max: 185, noNaN: true }).map(String)),
        fc.constantFrom('1.0', '-12', '14', '14.5', '5.75', 'x', ''),
        fc.constantFrom('500.0', '-1000', '9000', '9001', ''),
      ),
    },
  ),
  periodEnd: fc.oneof({ weight: 5, arbitrary: fc.constant('auto') }, { weight: 1, arbitrary: fc.constantFrom(' 1/ 1', '12/31', '2/30', '1/x', '') }),
  cells: fc.array(fc.tuple(fc.nat(72), fc.oneof({ weight: 4, arbitrary: fc.integer({ min: 5, max: 35 }) }, { weight: 1, arbitrary: fc.integer({ min: 1, max: 4 }) }), cellTextArb), { maxLength: 8 }),
  rows: fc.array(fc.record({ kind: fc.constantFrom<RowEdit['kind']>('drop', 'repeat', 'short', 'short', 'long'), row: fc.nat(72), n: fc.integer({ min: 1, max: 20 }) }), { maxLength: 2 }),
  text: textCorruptionArb,
  run: fc.boolean(),
});

function dataRow(day: number, hour: number): string[] {
  const up = hour >= 9 && hour <= 16;
  return ['2001', '1', String(day), String(hour), '60', 'A7A7', '2.0', '-1.0', '80', '95000', up ? '300' : '0', '1400', '300', up ? '150' : '0', up ? '200' : '0', up ? '80' : '0', up ? '16000' : '0', up ? '20000' : '0', up ? '9000' : '0', '9999', '180', '3.0', '5', '5', '20', '77777', '9', '999999999', '10', '0.1', '12', '1', '0.3', '0', '0'];
}

function epwText(c: EpwCase): string {
  const [lat, lon, tz, elev] = c.location;
  const end = c.periodEnd === 'auto' ? ` 1/ ${c.days}` : c.periodEnd;
  const header = [`LOCATION,"Fuzzville, invented",-,XXX,invented,000000,${lat},${lon},${tz},${elev}`, 'DESIGN CONDITIONS,0', 'TYPICAL/EXTREME PERIODS,0', 'GROUND TEMPERATURES,0', 'HOLIDAYS/DAYLIGHT SAVINGS,No,0,0,0', 'COMMENTS 1,"invented, for checks"', 'COMMENTS 2,', `DATA PERIODS,1,1,Data,Sunday, 1/ 1,${end}`];
  let rows: string[][] = [];
  for (let d = 1; d <= c.days; d++) for (let h = 1; h <= 24; h++) rows.push(dataRow(d, h));
  for (const [row, field, text] of c.cells) {
    const r = rows[row % rows.length];
    if (r !== undefined) r[field - 1] = text;
  }
  for (const e of c.rows) {
    const k = e.row % rows.length;
    if (e.kind === 'drop') rows = [...rows.slice(0, k), ...rows.slice(k + e.n)];
    else if (e.kind === 'repeat') rows.splice(k, 0, [...(rows[k] ?? [])]);
    else if (e.kind === 'short') rows[k] = (rows[k] ?? []).slice(0, 35 - e.n);
    else rows[k] = [...(rows[k] ?? []), ...Array.from({ length: e.n }, (_, i) => (i % 2 === 0 ? '' : '1'))];
  }
  return [...header, ...rows.map((r) => r.join(','))].join('\n') + '\n';
}

export function epwTarget(dir: string): FuzzTarget<EpwCase> {
  const epw = join(dir, 'site.epw');
  const scenarioFile = join(dir, 'weather-scenario.json');
  const out = join(dir, 'weather-out');
  const outcomes: Record<string, number> = {};
  const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
  return {
    name: 'epw',
    arbitrary: epwCaseArb,
    outcomes,
    async run(c) {
      writeFileSync(epw, encodeText(applyTextCorruption(epwText(c), c.text), c.text.encoding));
      const findings: Finding[] = [];
      if (c.run) {
        // One day inside the file's period (2 January), the site where the file says.
        writeFileSync(scenarioFile, JSON.stringify({ ...DEMO_SCENARIO, run: { startDate: '2026-01-02', days: 1 }, site: { ...DEMO_SCENARIO.site, weather: { kind: 'file', file: 'site.epw' } }, personas: [desk], rosters: [], strategies: [] }));
        const call = await callCli(['run', scenarioFile, '--out', out, '--no-ensemble', '--json']);
        count(outcomes, call.code === 0 ? 'run completed' : 'run refused');
        findings.push(...crashFindings(call), ...refusalFindings(call, ['site.epw', 'weather-scenario.json']));
        if (call.code !== 0 && call.stderr.includes('site.epw') && !/\bline \d+|is empty|MB, more than/.test(call.stderr)) findings.push({ kind: 'unlocated', detail: call.stderr.slice(0, 300) });
        return findings;
      }
      const call = await callCli(['weather', epw, '--json']);
      count(outcomes, call.code === 0 ? 'weather read' : 'weather refused');
      findings.push(...crashFindings(call), ...refusalFindings(call, ['site.epw']));
      if (call.code !== 0 && !/\bline \d+|is empty|MB, more than/.test(call.stderr)) findings.push({ kind: 'unlocated', detail: call.stderr.slice(0, 300) });
      return findings;
    },
  };
}
