/**
 * Measured light logs as wearable-logger software and spreadsheets export them: any delimiter,
 * decimal commas, timestamps in every supported form (with and without offsets, day- or
 * month-first, AM/PM, epoch), readings over the clock change, gaps, not-worn stretches, rows out
 * of order or repeated, unreadable or negative readings, time-zone mistakes (an offset that is not
 * the site's, a log from another year) — through `zeitlight validate` and `zeitlight run` of a
 * small scenario that uses the log.
 */
import fc from 'fast-check';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DateTime } from 'luxon';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { callCli } from '../cli-call.js';
import { crashFindings, refusalFindings, type Finding } from '../findings.js';
import { applyTextCorruption, encodeText, textCorruptionArb, type TextCorruption } from '../text-corruption.js';
import { count, type FuzzTarget } from '../target.js';

type StampForm = 'iso-offset' | 'iso-z' | 'iso-local' | 'epoch-s' | 'epoch-ms' | 'dmy' | 'mdy' | 'mdy-ampm' | 'ymd';

export interface LightLogCase {
  readonly delimiter: ',' | ';' | '\t' | '|';
  readonly decimalComma: boolean;
  readonly form: StampForm;
  readonly declaredFormat: 'auto' | 'iso' | 'epoch-s' | 'epoch-ms' | 'ymd' | 'dmy' | 'mdy';
  readonly quantity: 'photopic-lux' | 'melanopic-edi' | 'channels';
  readonly fill: 'model' | 'dark' | 'hold' | 'linear';
  readonly maxGap_min: number | undefined;
  readonly withWorn: boolean;
  /** Start of the log, minutes after the run start (negative: before it; large: another year). */
  readonly start_min: number;
  readonly step_s: number;
  readonly values: readonly number[];
  /** Stretches cut out: [first row, rows]. */
  readonly cuts: readonly (readonly [number, number])[];
  /** Rows replaced by junk: [row, text]. */
  readonly junk: readonly (readonly [number, string])[];
  readonly shuffle: boolean;
  /** Offset written into the timestamps when it is not the site's (time-zone mistake), minutes. */
  readonly wrongOffset_min: number | null;
  readonly text: TextCorruption;
  readonly run: boolean;
}

const ZONE = 'Europe/Berlin';
/** The run: two days over the start of summer time in Berlin (29 March 2026). */
const RUN_START = DateTime.fromISO('2026-03-28T00:00', { zone: ZONE });

const junkArb = fc.oneof(fc.constantFrom('', 'NaN', '-5', '1e999', 'n/a', '"', '12,3,4', ';;', 'ERROR', '\u0000', '2026-13-45T99:99', '29/02/2026 10:00', '-0', 'Infinity'), fc.string({ maxLength: 15 }));

export const lightLogCaseArb: fc.Arbitrary<LightLogCase> = fc.record({
  delimiter: fc.constantFrom(',', ';', '\t', '|'),
  decimalComma: fc.boolean(),
  form: fc.constantFrom<StampForm>('iso-offset', 'iso-z', 'iso-local', 'epoch-s', 'epoch-ms', 'dmy', 'mdy', 'mdy-ampm', 'ymd'),
  declaredFormat: fc.oneof({ weight: 4, arbitrary: fc.constant('auto' as const) }, { weight: 1, arbitrary: fc.constantFrom('iso', 'epoch-s', 'epoch-ms', 'ymd', 'dmy', 'mdy') }),
  quantity: fc.constantFrom('photopic-lux', 'melanopic-edi', 'channels'),
  fill: fc.constantFrom('model', 'dark', 'hold', 'linear'),
  maxGap_min: fc.option(fc.double({ min: 0.01, max: 1440, noNaN: true }), { nil: undefined }),
  withWorn: fc.boolean(),
  start_min: fc.oneof({ weight: 6, arbitrary: fc.integer({ min: -600, max: 2400 }) }, { weight: 1, arbitrary: fc.constantFrom(-525_600, 525_600, 40 * 525_600) }),
  step_s: fc.constantFrom(1, 10, 30, 60, 120, 300, 900, 3600),
  values: fc.array(fc.oneof(fc.double({ min: 0, max: 120_000, noNaN: true }), fc.constantFrom(0, 1e-300, 5e-324, 1e6, 1e12)), { minLength: 0, maxLength: 200 }),
  cuts: fc.array(fc.tuple(fc.nat(200), fc.integer({ min: 1, max: 80 })), { maxLength: 3 }),
  junk: fc.array(fc.tuple(fc.nat(200), junkArb), { maxLength: 6 }),
  shuffle: fc.boolean(),
  wrongOffset_min: fc.option(fc.constantFrom(-300, 0, 330, 600, 840), { nil: null }),
  text: textCorruptionArb,
  run: fc.boolean(),
});

function stamp(t: DateTime, c: LightLogCase): string {
  const local = c.wrongOffset_min !== null ? t.setZone(`UTC${c.wrongOffset_min >= 0 ? '+' : '-'}${Math.floor(Math.abs(c.wrongOffset_min) / 60)}:${String(Math.abs(c.wrongOffset_min) % 60).padStart(2, '0')}`) : t;
  switch (c.form) {
    case 'iso-offset':
      return local.toISO({ suppressMilliseconds: true }) ?? '';
    case 'iso-z':
      return t.toUTC().toISO({ suppressMilliseconds: true }) ?? '';
    case 'iso-local':
      return local.toFormat("yyyy-MM-dd'T'HH:mm:ss");
    case 'epoch-s':
      return String(Math.round(t.toSeconds()));
    case 'epoch-ms':
      return String(t.toMillis());
    case 'dmy':
      return local.toFormat('dd/MM/yyyy HH:mm:ss');
    case 'mdy':
      return local.toFormat('MM/dd/yyyy HH:mm:ss');
    case 'mdy-ampm':
      return local.toFormat('M/d/yyyy h:mm:ss a');
    case 'ymd':
      return local.toFormat('yyyy.MM.dd HH:mm');
  }
}

function number(v: number, c: LightLogCase): string {
  const text = String(Math.round(v * 1000) / 1000);
  return c.decimalComma && c.delimiter !== ',' ? text.replace('.', ',') : text;
}

function logText(c: LightLogCase): string {
  const d = c.delimiter;
  const valueHeader = c.quantity === 'photopic-lux' ? ['Illuminance (lux)'] : c.quantity === 'melanopic-edi' ? ['Melanopic EDI'] : ['R', 'G', 'B'];
  const lines = [['Date Time', ...valueHeader, ...(c.withWorn ? ['worn'] : [])].join(d)];
  const cut = new Set<number>();
  for (const [first, n] of c.cuts) for (let k = first; k < first + n; k++) cut.add(k);
  const rows: string[] = [];
  c.values.forEach((v, i) => {
    if (cut.has(i)) return;
    const t = RUN_START.plus({ minutes: c.start_min, seconds: i * c.step_s });
    const values = c.quantity === 'channels' ? [v, v / 2, v / 3] : [v];
    rows.push([stamp(t, c), ...values.map((x) => number(x, c)), ...(c.withWorn ? [i % 17 < 3 ? '0' : '1'] : [])].join(d));
  });
  for (const [row, text] of c.junk) if (rows.length > 0) rows[row % rows.length] = text.includes(d) || row % 2 === 0 ? text : `${rows[row % rows.length]?.split(d)[0] ?? ''}${d}${text}`;
  if (c.shuffle) rows.reverse();
  return [...lines, ...rows].join('\n') + '\n';
}

function scenario(c: LightLogCase): unknown {
  const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
  const quantity = c.quantity === 'channels' ? { kind: 'channels', columns: ['R', 'G', 'B'], calibration: { photopic_lx: [1, 0.5, 0.1], melanopicEdi_lx: [0.2, 0.4, 0.9] } } : { kind: c.quantity };
  return {
    ...DEMO_SCENARIO,
    run: { startDate: RUN_START.toISODate(), days: 2 },
    personas: [{ ...desk, measuredLight: [{ log: 'wear' }] }],
    rosters: [],
    strategies: [],
    lightLogs: [{ id: 'wear', file: 'wear.csv', timestampFormat: c.declaredFormat, quantity, fill: c.fill, ...(c.maxGap_min !== undefined ? { maxGap_min: c.maxGap_min } : {}), ...(c.withWorn ? { wornColumn: 'worn' } : {}) }],
  };
}

export function lightLogTarget(dir: string): FuzzTarget<LightLogCase> {
  const file = join(dir, 'log-scenario.json');
  const log = join(dir, 'wear.csv');
  const out = join(dir, 'log-out');
  const outcomes: Record<string, number> = {};
  return {
    name: 'light-log',
    arbitrary: lightLogCaseArb,
    outcomes,
    async run(c) {
      writeFileSync(file, JSON.stringify(scenario(c)));
      writeFileSync(log, encodeText(applyTextCorruption(logText(c), c.text), c.text.encoding));
      const findings: Finding[] = [];
      if (c.run) {
        const call = await callCli(['run', file, '--out', out, '--no-ensemble', '--json']);
        count(outcomes, call.code === 0 ? 'run completed' : 'run refused');
        findings.push(...crashFindings(call), ...refusalFindings(call, ['wear.csv', 'log-scenario.json']));
        // A refusal because of the log names a line or column of it (or says it is empty).
        if (call.code !== 0 && call.stderr.includes('wear.csv') && !/\bline \d+|\bcolumn "|is empty|MB, more than/.test(call.stderr)) findings.push({ kind: 'unlocated', detail: call.stderr.slice(0, 300) });
        return findings;
      }
      const call = await callCli(['validate', file, '--json']);
      findings.push(...crashFindings(call));
      try {
        const report = JSON.parse(call.stdout) as { valid: boolean; problems: { severity: string; path: string; message: string }[] };
        count(outcomes, report.valid ? 'log accepted' : 'log refused');
        for (const p of report.problems) {
          // A problem with the log names the file and a line or column of it (or says it is empty).
          if (p.severity === 'error' && p.path.startsWith('lightLogs[0]') && !(p.message.includes('wear.csv') && /\bline \d+|\bcolumn "|is empty|no such file|MB, more than/.test(p.message))) {
            findings.push({ kind: 'unlocated', detail: p.message.slice(0, 300) });
          }
        }
      } catch {
        findings.push({ kind: 'crash', detail: `--json output is not one JSON document: ${call.stdout.slice(0, 200)}${call.stderr.slice(0, 200)}` });
      }
      return findings;
    },
  };
}
