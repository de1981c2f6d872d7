/** `zeitlight validate`: called through the command module and through the built launcher. */
import { describe, expect, it, beforeAll } from 'vitest';
import { mkdtempSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { validateCommand } from '../../cli/commands/validate.js';
import type { CommandContext } from '../../cli/command.js';
import { DEMO_SCENARIO } from '../../schedules/index.js';
import { PROJECT_ROOT, runZeitlight } from '../helpers/run-cli.js';

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'zeitlight-validate-'));
});

async function run(args: string[], json: boolean): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const ctx: CommandContext = { positionals: args, values: {}, json, stdout: (t) => (out += t), stderr: (t) => (err += t) };
  const code = await validateCommand.run(ctx);
  return { code, out, err };
}

function write(name: string, value: unknown): string {
  const file = join(dir, name);
  writeFileSync(file, typeof value === 'string' ? value : JSON.stringify(value, null, 2));
  return file;
}

describe('zeitlight validate', () => {
  it('accepts the demo scenario: exit 0, one JSON document', async () => {
    const r = await run([write('demo.json', DEMO_SCENARIO)], true);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as { valid: boolean; errors: number; problems: unknown[]; summary: { personas: number } };
    expect(doc).toMatchObject({ valid: true, errors: 0, problems: [], summary: { personas: 3 } });
    expect(r.err).toBe('');
  });

  it('lists every problem with its path, exits 1 and says so on stderr', async () => {
    const bad = structuredClone(DEMO_SCENARIO) as unknown as { site: Record<string, unknown>; run: Record<string, unknown> };
    bad.site.timeZone = 'Mars/Olympus';
    bad.run.days = 0;
    const r = await run([write('bad.json', bad)], true);
    expect(r.code).toBe(1);
    const doc = JSON.parse(r.out) as { valid: boolean; problems: { path: string; fix: string }[] };
    expect(doc.valid).toBe(false);
    // The schema error in run.days does not hide the sense check of the time zone.
    expect(doc.problems.map((p) => p.path)).toEqual(['run.days', 'site.timeZone']);
    expect(r.err).toMatch(/bad\.json: 2 error/);
    const r2 = await run([write('bad2.json', bad)], false);
    expect(r2.out).toMatch(/error: site\.timeZone: "Mars\/Olympus" is not a known IANA time zone/);
  });

  it('lists schema errors, a misspelt template name and a missing light log together, in one pass', async () => {
    const bad = structuredClone(DEMO_SCENARIO) as unknown as {
      run: Record<string, unknown>;
      personas: Record<string, unknown>[];
      lightLogs: unknown[];
      strategies: unknown[];
      format?: unknown;
    };
    delete bad.format;
    bad.personas = bad.personas.filter((p) => p.id === 'nurse' || p.id === 'desk-worker');
    bad.strategies = [];
    bad.run.days = 0;
    const desk = bad.personas[1] as { age_y: unknown; week: Record<string, unknown>; measuredLight?: unknown[] };
    desk.age_y = 'forty';
    desk.week.mon = 'wrokday';
    desk.measuredLight = [{ log: 'wear' }];
    bad.lightLogs = [{ id: 'wear', file: 'no-such-log.csv', quantity: { kind: 'photopic-lux' } }];
    const r = await run([write('staged.json', bad)], true);
    expect(r.code).toBe(1);
    const doc = JSON.parse(r.out) as { problems: { path: string; message: string; fix: string }[] };
    expect(doc.problems.map((p) => p.path).sort()).toEqual(['format', 'lightLogs[0].file', 'personas[1].age_y', 'personas[1].week.mon', 'run.days']);
    expect(doc.problems.find((p) => p.path === 'personas[1].week.mon')?.fix).toMatch(/Did you mean "workday"/);
  });

  it('checks a measured light log the scenario refers to and names the bad line', async () => {
    write('wear.csv', 'time,lux\n2026-03-24T10:00:00+01:00,120\n2026-03-24T10:01:00+01:00,oops\n2026-03-24T10:02:00+01:00,130\n2026-03-24T10:03:00+01:00,90\n');
    const s = structuredClone(DEMO_SCENARIO) as unknown as { lightLogs: unknown[]; personas: { measuredLight?: unknown[] }[] };
    s.lightLogs = [{ id: 'wear', file: 'wear.csv', quantity: { kind: 'photopic-lux' } }];
    const p = s.personas[1];
    if (p !== undefined) p.measuredLight = [{ log: 'wear' }];
    const r = await run([write('with-log.json', s)], true);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as { problems: { severity: string; path: string; message: string }[] };
    expect(doc.problems).toEqual([expect.objectContaining({ severity: 'warning', path: 'lightLogs[0]', message: expect.stringContaining('wear.csv line 3') })]);
  });

  it('refuses an unreadable file with a message naming it', async () => {
    await expect(run([join(dir, 'missing.json')], true)).rejects.toThrow(/missing\.json: no such file/);
  });

  it('works through the launcher (needs npm run build)', () => {
    expect(existsSync(join(PROJECT_ROOT, 'dist', 'cli', 'commands', 'validate.js'))).toBe(true);
    const r = runZeitlight(['validate', write('demo2.json', DEMO_SCENARIO), '--json']);
    expect(r.status).toBe(0);
    expect((JSON.parse(r.stdout) as { valid: boolean }).valid).toBe(true);
    const bad = runZeitlight(['validate', write('syntax.json', '{ "format": "zeitlight-scenario", }')]);
    expect(bad.status).toBe(1);
    expect(bad.stdout).toMatch(/not valid JSON at line 1/);
  });
});
