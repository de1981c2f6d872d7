/**
 * `zeitlight demo --out <dir> [--json] [--force] [--no-ensemble] [--no-pdf] [--paper A4|Letter]` — runs the
 * built-in invented demo scenario (a rotating-shift nurse on a hospital ward and an office desk worker, 14 days across
 * the change to summer time) with no external files, and writes the scenario.json it ran next
 * to the results so it can be the start of one's own scenario. It also prints the PDF briefing
 * (report.pdf) unless --no-pdf is given; without Chromium the JSON and CSV files are still written.
 */
import { UsageError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { stringOption } from '../args.js';
import { DEMO_SCENARIO, validateScenarioValue } from '../../schedules/index.js';
import { paperOption } from '../run-output/paper-option.js';
import { runAndWrite } from '../run-output/run-and-write.js';
import { outOption } from './run.js';

export const demoCommand: Command = {
  name: 'demo',
  summary: 'Run the built-in demo scenario',
  usage: '--out <dir> [--force] [--no-ensemble] [--no-pdf] [--paper A4|Letter] [--chromium <path>] [--json]',
  options: { out: { type: 'string' }, force: { type: 'boolean' }, 'no-ensemble': { type: 'boolean' }, pdf: { type: 'boolean' }, 'no-pdf': { type: 'boolean' }, paper: { type: 'string' }, chromium: { type: 'string' } },
  async run(ctx: CommandContext): Promise<number> {
    if (ctx.positionals.length > 0) throw new UsageError(`zeitlight demo takes no file argument (got "${ctx.positionals[0]}"); use zeitlight run <scenario.json> for your own scenario`);
    const outDir = outOption(ctx);
    const v = validateScenarioValue(DEMO_SCENARIO);
    if (v.scenario === undefined) throw new Error('the built-in demo scenario does not validate');
    const chromium = stringOption(ctx, 'chromium');
    await runAndWrite(ctx, {
      input: { scenario: v.scenario },
      outDir,
      force: ctx.values['force'] === true,
      ensemble: ctx.values['no-ensemble'] !== true,
      pdf: ctx.values['no-pdf'] !== true,
      paper: paperOption(ctx),
      ...(chromium !== undefined ? { chromiumPath: chromium } : {}),
      extraFiles: { 'scenario.json': JSON.stringify(DEMO_SCENARIO, null, 2) + '\n' },
      scenarioForReport: DEMO_SCENARIO,
    });
    return 0;
  },
};
