/**
 * A gap in a measured light log is reported in results.json's warnings and in the text
 * `zeitlight run` prints, with its start, end and the rule that filled it (the app's results
 * frame and the briefing's notes show the same warnings: renderer/src/views/run-notes.test.ts,
 * renderer/report/src/run-notes.test.ts).
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import type { CommandContext } from '../../cli/command.js';
import { runCommand } from '../../cli/commands/run.js';
import { DEMO_SCENARIO, validateScenarioValue } from '../../schedules/index.js';
import { runScenario, type RunResults } from '../../schedules/run/index.js';

/** One reading a minute from 08:00 to 20:00 local time (UTC+1) on 2026-03-23, none from 12:00 to 13:00. */
function logText(): string {
  const lines = ['timestamp,lux'];
  const t0 = Date.UTC(2026, 2, 23, 7, 0);
  for (let m = 0; m < 12 * 60; m++) if (m < 240 || m >= 300) lines.push(`${new Date(t0 + m * 60_000).toISOString()},${300 + (m % 7)}`);
  return lines.join('\n') + '\n';
}

function scenarioDoc(): Record<string, unknown> {
  const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
  return {
    ...DEMO_SCENARIO,
    run: { startDate: '2026-03-23', days: 2 },
    personas: [{ ...desk, measuredLight: [{ log: 'wear' }] }],
    rosters: [],
    strategies: [],
    lightLogs: [{ id: 'wear', file: 'wear.csv', timestampFormat: 'iso', quantity: { kind: 'photopic-lux' }, fill: 'hold' }],
  };
}

const GAP = /wear\.csv line 241: gap from 2026-03-23 12:00 to 2026-03-23 13:00 \(60 min, no readings\).*filled with the last reading before it \("hold" rule\)/;

describe('a gap in a measured light log', () => {
  const v = validateScenarioValue(scenarioDoc());
  if (v.scenario === undefined) throw new Error(v.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  const out = runScenario({ scenario: v.scenario, lightLogTexts: { wear: logText() } });

  test('is listed in the results warnings with its start, end and fill rule', () => {
    expect(out.results.warnings.filter((w) => GAP.test(w))).toHaveLength(1);
  });

  test('is printed by zeitlight run and written into results.json', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'zeitlight-gaps-'));
    writeFileSync(join(dir, 'wear.csv'), logText());
    writeFileSync(join(dir, 'scenario.json'), JSON.stringify(scenarioDoc()));
    let stdout = '';
    const ctx: CommandContext = { positionals: [join(dir, 'scenario.json')], values: { out: join(dir, 'out'), 'no-ensemble': true }, json: false, stdout: (t) => (stdout += t), stderr: () => undefined };
    expect(await runCommand.run(ctx)).toBe(0);
    expect(stdout).toMatch(new RegExp(`warning: ${GAP.source}`));
    const written = JSON.parse(readFileSync(join(dir, 'out', 'results.json'), 'utf8')) as RunResults;
    expect(written.warnings.some((w) => GAP.test(w))).toBe(true);
  });
});
