/**
 * `zeitlight run` killed at several moments (SIGKILL: no chance to clean up) leaves the output
 * folder either exactly as it was (an earlier run's files, byte for byte) or complete (every file of
 * the new run, the same as an uninterrupted run writes). Kill points: fractions of the time an
 * uninterrupted run takes, the moment the first result file appears in the folder being written,
 * and the moment the earlier folder is deleted after the swap. Needs `npm run build` (the
 * launcher runs dist/).
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, watch, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCli } from '../../cli/main.js';
import { demoPart } from '../../schedules/demo/demo-part.js';
import { PROJECT_ROOT } from '../helpers/run-cli.js';

const LAUNCHER = join(PROJECT_ROOT, 'bin', 'zeitlight.mjs');
const NEW_RUN = ['run', 'new.json', '--out', 'out', '--no-ensemble'];
const QUIET = { stdout: () => undefined, stderr: () => undefined };
const built = existsSync(join(PROJECT_ROOT, 'dist', 'cli', 'run-output', 'output-folder.js'));

type Folder = Map<string, Buffer>;

function snapshot(dir: string): Folder | null {
  if (!existsSync(dir)) return null;
  return new Map(readdirSync(dir).sort().map((f) => [f, readFileSync(join(dir, f))]));
}

function restore(dir: string, folder: Folder): void {
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir);
  for (const [f, content] of folder) writeFileSync(join(dir, f), content);
}

function sameFolder(a: Folder | null, b: Folder | null): boolean {
  if (a === null || b === null) return a === b;
  return a.size === b.size && [...a].every(([f, c]) => b.get(f)?.equals(c) === true);
}

/** Runs the launcher; kills it after `delay_ms`, or when `killWhen` says so; resolves with the elapsed time. */
function runAndKill(args: string[], cwd: string, opts: { delay_ms?: number; killWhen?: (kill: () => void) => () => void }): Promise<{ elapsed_ms: number; killed: boolean }> {
  return new Promise((done, fail) => {
    const t0 = Date.now();
    const child = spawn(process.execPath, [LAUNCHER, ...args], { cwd, stdio: 'ignore' });
    let killed = false;
    const kill = () => {
      if (child.exitCode === null && !killed) {
        killed = true;
        child.kill('SIGKILL');
      }
    };
    const timer = opts.delay_ms !== undefined ? setTimeout(kill, opts.delay_ms) : undefined;
    const stopWatching = opts.killWhen?.(kill);
    child.on('error', fail);
    child.on('exit', () => {
      if (timer !== undefined) clearTimeout(timer);
      stopWatching?.();
      done({ elapsed_ms: Date.now() - t0, killed });
    });
  });
}

function scenario(name: string): string {
  const desk = demoPart(['desk-worker']);
  return JSON.stringify({ ...desk, name, run: { startDate: '2026-03-23', days: 2 }, strategies: (desk.strategies ?? []).slice(0, 1) });
}

describe.skipIf(!built)('zeitlight run killed part-way', () => {
  test('leaves the output folder as it was or complete, at every kill point', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'zeitlight-kill-'));
    writeFileSync(join(dir, 'earlier.json'), scenario('Earlier run'));
    writeFileSync(join(dir, 'new.json'), scenario('New run'));
    const out = join(dir, 'out');
    // The earlier run's folder, with the briefing a run with --pdf would have left.
    expect(await runCli(['run', join(dir, 'earlier.json'), '--out', out, '--no-ensemble'], QUIET)).toBe(0);
    writeFileSync(join(out, 'report.pdf'), '%PDF-1.4 earlier run');
    const earlier = snapshot(out);
    if (earlier === null) throw new Error('the earlier run wrote nothing');

    // An uninterrupted run of the new scenario: what "complete" means, and how long it takes.
    const full = await runAndKill(['run', 'new.json', '--out', 'complete', '--no-ensemble'], dir, {});
    const complete = snapshot(join(dir, 'complete'));
    expect(complete === null ? [] : [...complete.keys()]).toEqual(['exposure.csv', 'results.json', 'summary.csv']);
    const resultsWithoutTiming = (b: Buffer | undefined) => (b === undefined ? null : (JSON.parse(b.toString('utf8')) as { scenario: { name: string } }).scenario.name);

    const outcomes: string[] = [];
    const check = () => {
      const now = snapshot(out);
      if (sameFolder(now, earlier)) outcomes.push('as it was');
      else {
        expect(now === null ? null : [...now.keys()]).toEqual(['exposure.csv', 'results.json', 'summary.csv']);
        expect(resultsWithoutTiming(now?.get('results.json'))).toBe('New run');
        expect(now?.get('exposure.csv')?.equals(complete?.get('exposure.csv') ?? Buffer.alloc(0))).toBe(true);
        outcomes.push('complete');
      }
      restore(out, earlier);
    };

    for (const fraction of [0.1, 0.5, 0.9, 0.97]) {
      await runAndKill(NEW_RUN, dir, { delay_ms: Math.round(fraction * full.elapsed_ms) });
      check();
    }
    // The moment the first result file is written into the folder being prepared.
    await runAndKill(NEW_RUN, dir, {
      killWhen: (kill) => {
        const watchers: ReturnType<typeof watch>[] = [];
        watchers.push(
          watch(dir, (_, name) => {
            if (name === null || !name.startsWith('.out.zeitlight-new')) return;
            try {
              watchers.push(watch(join(dir, name), () => kill()));
            } catch {
              // the folder went already: the run is past writing
            }
          }),
        );
        return () => watchers.forEach((w) => w.close());
      },
    });
    check();
    // The moment the earlier folder, renamed aside, is deleted (just after the new one is in place).
    await runAndKill(NEW_RUN, dir, {
      killWhen: (kill) => {
        let seen = 0;
        const w = watch(dir, (_, name) => {
          if (name !== null && name.startsWith('.out.zeitlight-old') && ++seen === 2) kill();
        });
        return () => w.close();
      },
    });
    check();
    // The early kills land before the results are put in place, the last one after.
    expect(outcomes).toContain('as it was');
    expect(outcomes).toContain('complete');

    // A later uninterrupted run tidies what the killed runs left beside the folder.
    expect(await runCli(['run', join(dir, 'new.json'), '--out', out, '--no-ensemble'], QUIET)).toBe(0);
    expect(readdirSync(dir).sort()).toEqual(['complete', 'earlier.json', 'new.json', 'out']);
    expect(snapshot(out)?.get('exposure.csv')?.equals(complete?.get('exposure.csv') ?? Buffer.alloc(0))).toBe(true);
  }, 120_000);
});
