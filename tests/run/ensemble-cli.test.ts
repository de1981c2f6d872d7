/**
 * The model ensemble in `zeitlight run`: on by default (ranges in results.json, summary.csv and
 * beside each headline figure in the text output), off with --no-ensemble.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import type { CommandContext } from '../../cli/command.js';
import { runCommand } from '../../cli/commands/run.js';
import { DEMO_SCENARIO } from '../../schedules/index.js';
import type { RunResults } from '../../schedules/run/index.js';

function ctx(positionals: string[], values: Record<string, string | boolean>) {
  const out: string[] = [];
  const c: CommandContext = { positionals, values, json: false, stdout: (t) => out.push(t), stderr: () => undefined };
  return { c, out };
}

function scenarioFile(): string {
  const dir = mkdtempSync(join(tmpdir(), 'zeitlight-ensemble-'));
  const file = join(dir, 'scenario.json');
  const strategies = (DEMO_SCENARIO.strategies ?? []).filter((s) => s.id === 'office-dim-evening');
  const desk = { ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 3 }, personas: DEMO_SCENARIO.personas.filter((p) => strategies.some((s) => s.personas?.includes(p.id))), strategies };
  writeFileSync(file, JSON.stringify(desk));
  return file;
}

describe('zeitlight run with the model ensemble', () => {
  test('prints each headline figure with its range across the models and writes the ranges', async () => {
    const file = scenarioFile();
    const out = join(file, '..', 'out');
    const { c, out: stdout } = ctx([file], { out });
    expect(await runCommand.run(c)).toBe(0);
    const text = stdout.join('');
    expect(text).toMatch(/Default model's figures, with the range across 3 body-clock models/);
    expect(text).toMatch(/Dimmer evening at home, phone night mode: phase shift \(\+ later\) [−+]?\d\.\d\d h \((models: [−+]?\d\.\d\d to [−+]?\d\.\d\d h|all 3 models: [^)]*)\); melatonin suppression \d+ % \(/);
    expect(text).toMatch(/Model ensemble — body clock: [^;]+\(default\); .*Sleepiness: [^;]+\(default\)/);
    const results = JSON.parse(readFileSync(join(out, 'results.json'), 'utf8')) as RunResults;
    expect(results.ensemble?.members.length).toBeGreaterThanOrEqual(3);
    expect(readFileSync(join(out, 'summary.csv'), 'utf8').split('\n')[0]).toContain('mean_phase_shift_h,mean_phase_shift_h_ensemble_min,mean_phase_shift_h_ensemble_max,mean_phase_shift_h_ensemble_models');
  });

  test('--no-ensemble runs the default model only', async () => {
    const file = scenarioFile();
    const out = join(file, '..', 'out');
    const { c, out: stdout } = ctx([file], { out, 'no-ensemble': true });
    expect(await runCommand.run(c)).toBe(0);
    expect(stdout.join('')).not.toMatch(/models:/);
    const results = JSON.parse(readFileSync(join(out, 'results.json'), 'utf8')) as RunResults;
    expect(results.ensemble).toBeUndefined();
    expect(results.personas[0]?.strategies[0]?.ensemble).toBeUndefined();
  });
});
