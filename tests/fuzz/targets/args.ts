/**
 * Command lines as people type them: every command with any mix of its own options, other
 * commands' options, unknown options, missing and repeated values, numbers at and beyond their
 * limits (NaN, Infinity, 1e308, -0, hexadecimal, empty), bad dates, and files that exist, do not
 * exist, are folders or hold the wrong kind of content. Left out so that each case stays short:
 * --pdf (prints through Chromium), `demo` with --out (runs the two-week demo), and cohorts small
 * enough to start worker threads.
 */
import fc from 'fast-check';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { callCli } from '../cli-call.js';
import { crashFindings, refusalFindings, type Finding } from '../findings.js';
import { count, type FuzzTarget } from '../target.js';

const COMMANDS = ['demo', 'run', 'validate', 'alphaopic', 'sources', 'sun', 'weather', 'simulate', 'models', 'help', 'version', 'nosuchcommand', '', '--help', '-h', '--version'] as const;

const OPTIONS = [
  '--lat', '--lon', '--time', '--elevation-m', '--pressure-hPa', '--temperature-C', '--delta-t-s', '--days', '--model', '--init', '--sleep', '--alarm', '--time-zone',
  '--illuminance', '--age', '--source', '--filter', '--column', '--out', '--force', '--paper', '--chromium', '--cohort', '--seed', '--workers', '--until-stable',
  '--no-ensemble', '--no-pdf', '--json', '--help', '--nope', '-x', '--', '---', '--lat=', '--days=1', '--json=yes', '--no-json',
] as const;

const NUMBERS = ['0', '-0', '1', '2', '48.1', '-105.2', '90', '-90.0001', '180.5', '1e308', '-1e308', '1e-320', 'NaN', 'Infinity', '-Infinity', '', ' ', '0x10', '1_000', '٣', '1,5', '366', '367', '10001', '1.5', '-1'] as const;
const TEXTS = ['2026-03-20T12:00:00+01:00', '2026-13-01T00:00Z', '2026-03-29T02:30', 'not-a-date', 'jfk99-x7', 'hfb19-sp', 'nope', 'entrained', '-0.5,-0.86,0.3', '1,2', 'A4', 'Letter', 'A3', 'Europe/Berlin', 'Mars/Olympus', 'D65', 'LED-Q7', 'amber', 'irradiance_W_m2_nm', '💡', 'x'.repeat(300)] as const;

/** Files the arguments may name (made once per run in the target's folder). */
const FILES = ['scenario', 'bad-scenario', 'light', 'sleep', 'spd', 'epw', 'missing', 'folder', 'out', 'other-out', 'empty'] as const;
type FileKey = (typeof FILES)[number];

type Token = { kind: 'option'; text: string } | { kind: 'number'; text: string } | { kind: 'text'; text: string } | { kind: 'file'; key: FileKey } | { kind: 'random'; text: string };

export interface ArgsCase {
  readonly command: string;
  readonly tokens: readonly Token[];
}

const tokenArb: fc.Arbitrary<Token> = fc.oneof(
  { weight: 5, arbitrary: fc.constantFrom(...OPTIONS).map((text): Token => ({ kind: 'option', text })) },
  { weight: 4, arbitrary: fc.constantFrom(...NUMBERS).map((text): Token => ({ kind: 'number', text })) },
  { weight: 2, arbitrary: fc.constantFrom(...TEXTS).map((text): Token => ({ kind: 'text', text })) },
  { weight: 3, arbitrary: fc.constantFrom(...FILES).map((key): Token => ({ kind: 'file', key })) },
  { weight: 1, arbitrary: fc.string({ maxLength: 12 }).filter((s) => !s.startsWith('/') && !s.includes('..')).map((text): Token => ({ kind: 'random', text })) },
);

export const argsCaseArb: fc.Arbitrary<ArgsCase> = fc.record({ command: fc.constantFrom(...COMMANDS), tokens: fc.array(tokenArb, { maxLength: 8 }) });

function prepareFiles(dir: string): Record<FileKey, string> {
  const f = (name: string) => join(dir, 'args', name);
  mkdirSync(join(dir, 'args', 'folder'), { recursive: true });
  mkdirSync(join(dir, 'args', 'other-out'), { recursive: true });
  writeFileSync(join(dir, 'args', 'other-out', 'notes.txt'), 'not a run');
  const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
  writeFileSync(f('scenario.json'), JSON.stringify({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 1 }, personas: [desk], rosters: [], strategies: [] }));
  writeFileSync(f('bad-scenario.json'), JSON.stringify({ ...DEMO_SCENARIO, run: { startDate: '2026-02-30', days: 0 } }));
  writeFileSync(f('light.csv'), 'hour,lux\n0,0\n7,300\n23,0\n');
  writeFileSync(f('sleep.csv'), 'start_h,end_h\n23,31\n');
  writeFileSync(f('spd.csv'), 'wavelength_nm,E\n380,0.1\n480,1\n580,0.8\n780,0.2\n');
  writeFileSync(f('site.epw'), 'LOCATION,x\n');
  writeFileSync(f('empty.csv'), '');
  return {
    scenario: f('scenario.json'),
    'bad-scenario': f('bad-scenario.json'),
    light: f('light.csv'),
    sleep: f('sleep.csv'),
    spd: f('spd.csv'),
    epw: f('site.epw'),
    missing: f('no-such-file.csv'),
    folder: f('folder'),
    out: f('out'),
    'other-out': f('other-out'),
    empty: f('empty.csv'),
  };
}

/** Values that would start long work in one case (see above) are left out. */
function tooLong(argv: readonly string[]): boolean {
  if (argv.includes('--pdf')) return true;
  if (argv[0] === 'demo' && argv.some((a) => a === '--out' || a.startsWith('--out='))) return true;
  const cohort = argv.indexOf('--cohort');
  const size = cohort >= 0 ? Number(argv[cohort + 1]) : Number.NaN;
  return Number.isInteger(size) && size >= 1 && size <= 10_000;
}

export function argsTarget(dir: string): FuzzTarget<ArgsCase> {
  let files: Record<FileKey, string> | undefined;
  const outcomes: Record<string, number> = {};
  return {
    name: 'args',
    arbitrary: argsCaseArb,
    outcomes,
    async run(c) {
      files ??= prepareFiles(dir);
      const paths = files;
      const argv = [c.command, ...c.tokens.map((t) => (t.kind === 'file' ? paths[t.key] : t.text))].filter((a, i) => i > 0 || a !== '');
      // Whatever follows --out names a folder inside the target's own folder: nothing is written elsewhere.
      for (let i = 0; i < argv.length - 1; i++) if (argv[i] === '--out' && !(argv[i + 1] ?? '').startsWith(join(dir, 'args'))) argv[i + 1] = join(dir, 'args', `out-${(argv[i + 1] ?? '').replace(/[^A-Za-z0-9]/g, '_').slice(0, 20)}`);
      if (tooLong(argv)) {
        count(outcomes, 'left out (long work)');
        return [];
      }
      const call = await callCli(argv);
      count(outcomes, call.code === 0 ? 'accepted' : 'refused');
      const findings: Finding[] = [...crashFindings(call), ...refusalFindings(call, [])];
      return findings;
    },
  };
}
