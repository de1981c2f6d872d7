/**
 * `zeitlight run` and `zeitlight demo` called through their command modules: the files written,
 * refusal of a folder holding other files, --force, no half-written files, and clear messages
 * for bad input (invalid scenario, missing weather file, missing --out).
 */
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { CliError } from '../../cli/cli-error.js';
import type { CommandContext } from '../../cli/command.js';
import { demoCommand } from '../../cli/commands/demo.js';
import { runCommand } from '../../cli/commands/run.js';
import { DEMO_SCENARIO } from '../../schedules/index.js';
import { runZeitlight } from '../helpers/run-cli.js';

function ctx(positionals: string[], values: Record<string, string | boolean>, json = false) {
  const out: string[] = [];
  const err: string[] = [];
  const c: CommandContext = { positionals, values: { ...values, ...(json ? { json: true } : {}) }, json, stdout: (t) => out.push(t), stderr: (t) => err.push(t) };
  return { c, out, err };
}

const tmp = () => mkdtempSync(join(tmpdir(), 'zeitlight-run-'));

function shortScenario(extra: Record<string, unknown> = {}): string {
  return JSON.stringify({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 2 }, strategies: [], ...extra });
}

describe('zeitlight run', () => {
  test('writes results.json, exposure.csv and summary.csv and prints the results with --json', async () => {
    const dir = tmp();
    const file = join(dir, 'scenario.json');
    writeFileSync(file, shortScenario());
    const out = join(dir, 'out');
    const { c, out: stdout } = ctx([file], { out }, true);
    expect(await runCommand.run(c)).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['exposure.csv', 'results.json', 'summary.csv']);
    const printed = JSON.parse(stdout.join('')) as { format: string; version: number };
    expect(printed.format).toBe('zeitlight-results');
    expect(JSON.parse(readFileSync(join(out, 'results.json'), 'utf8'))).toEqual(printed);
  });

  test('refuses a folder holding other files, and replaces its whole content with --force', async () => {
    const dir = tmp();
    const file = join(dir, 'scenario.json');
    writeFileSync(file, shortScenario());
    const out = join(dir, 'out');
    mkdirSync(out);
    writeFileSync(join(out, 'notes.txt'), 'mine');
    await expect(runCommand.run(ctx([file], { out }).c)).rejects.toThrow(/holds other files \(.*notes\.txt.*\).*--force/);
    expect(readdirSync(out)).toEqual(['notes.txt']);
    expect(await runCommand.run(ctx([file], { out, force: true, 'no-ensemble': true }).c)).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['exposure.csv', 'results.json', 'summary.csv']);
    expect(readdirSync(dir).sort()).toEqual(['out', 'scenario.json']);
  });

  test('refuses --force on a folder that holds the scenario file itself', async () => {
    const dir = tmp();
    const file = join(dir, 'scenario.json');
    writeFileSync(file, shortScenario());
    await expect(runCommand.run(ctx([file], { out: dir, force: true }).c)).rejects.toThrow(/--out .*scenario\.json/);
    expect(readdirSync(dir)).toEqual(['scenario.json']);
  });

  test('a run without --pdf into the folder of an earlier run with --pdf leaves nothing of the earlier run', async () => {
    const dir = tmp();
    const file = join(dir, 'scenario.json');
    writeFileSync(file, shortScenario());
    const out = join(dir, 'out');
    expect(await runCommand.run(ctx([file], { out, 'no-ensemble': true }).c)).toBe(0);
    // the earlier run's briefing (a run with --pdf writes it beside the results)
    writeFileSync(join(out, 'report.pdf'), '%PDF-1.4 earlier run');
    expect(await runCommand.run(ctx([file], { out, 'no-ensemble': true }).c)).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['exposure.csv', 'results.json', 'summary.csv']);
  });

  test('a scenario with an error is refused with its path and nothing is written', async () => {
    const dir = tmp();
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 0 } }));
    const out = join(dir, 'out');
    await expect(runCommand.run(ctx([file], { out }).c)).rejects.toThrow(/bad\.json: not a valid scenario[\s\S]*run\.days/);
    expect(existsSync(join(out, 'results.json'))).toBe(false);
  });

  test('a missing weather file is named with the scenario field', async () => {
    const dir = tmp();
    const file = join(dir, 'scenario.json');
    writeFileSync(file, shortScenario({ site: { ...DEMO_SCENARIO.site, weather: { kind: 'file', file: 'nowhere.epw' } } }));
    const err = await runCommand.run(ctx([file], { out: join(dir, 'out') }).c).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(CliError);
    expect(String((err as Error).message)).toMatch(/site\.weather\.file: cannot read the weather file .*nowhere\.epw: no such file/);
  });

  test('a weather file that is not an EPW is refused naming the file', async () => {
    const dir = tmp();
    writeFileSync(join(dir, 'w.epw'), 'this is not a weather file\n');
    const file = join(dir, 'scenario.json');
    writeFileSync(file, shortScenario({ site: { ...DEMO_SCENARIO.site, weather: { kind: 'file', file: 'w.epw' } } }));
    await expect(runCommand.run(ctx([file], { out: join(dir, 'out') }).c)).rejects.toThrow(/site\.weather\.file: w\.epw/);
  });

  test('--out is required', async () => {
    await expect(runCommand.run(ctx(['x.json'], {}).c)).rejects.toThrow(/--out <dir> is required/);
  });
});

describe('zeitlight demo', () => {
  test('writes the scenario it ran next to the results', async () => {
    const out = join(tmp(), 'demo');
    const { c, out: stdout } = ctx([], { out, 'no-pdf': true });
    expect(await demoCommand.run(c)).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['exposure.csv', 'results.json', 'scenario.json', 'summary.csv']);
    expect(JSON.parse(readFileSync(join(out, 'scenario.json'), 'utf8'))).toEqual(JSON.parse(JSON.stringify(DEMO_SCENARIO)));
    expect(stdout.join('')).toMatch(/recommended:[\s\S]*Caution: model estimates/);
  }, 60_000);
});

describe('zeitlight demo without Chromium', () => {
  test('still writes the JSON and CSV files and says how to get Chromium', async () => {
    const out = join(tmp(), 'demo');
    const { c, err } = ctx([], { out, chromium: join(tmp(), 'no-chromium-here') });
    expect(await demoCommand.run(c)).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['exposure.csv', 'results.json', 'scenario.json', 'summary.csv']);
    expect(err.join('')).toMatch(/no PDF briefing written[\s\S]*(apt-get install chromium|ZEITLIGHT_CHROMIUM)/);
  }, 60_000);
});

describe.skipIf(!existsSync('/usr/bin/chromium'))('zeitlight demo with Chromium', () => {
  test('writes the PDF briefing report.pdf by default, next to the JSON and CSV results', () => {
    const out = join(tmp(), 'demo');
    const r = runZeitlight(['demo', '--out', out, '--paper', 'letter']);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['exposure.csv', 'report.pdf', 'results.json', 'scenario.json', 'summary.csv']);
    expect(readFileSync(join(out, 'report.pdf')).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  }, 120_000);

  test('refuses a paper size other than A4 or Letter before running', () => {
    const r = runZeitlight(['demo', '--out', join(tmp(), 'demo'), '--paper', 'A3']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--paper must be A4 or Letter, not "A3"/);
  });
});
