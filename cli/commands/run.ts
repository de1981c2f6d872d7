/**
 * `zeitlight run <scenario.json> --out <dir> [--json] [--force] [--no-ensemble] [--pdf] [--chromium <path>]`
 * — the whole job: validate the scenario, read the weather file and light logs it names
 * (paths relative to the scenario file), run the pipeline (schedules/run) with the model
 * ensemble (ranges beside every headline; --no-ensemble runs the default model only) and write
 * results.json, exposure.csv and summary.csv (and report.pdf with --pdf) into the folder.
 */
import { basename, dirname, resolve } from 'node:path';
import { CliError, UsageError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { numberOption, positionals, stringOption } from '../args.js';
import { readInputFile } from '../input-file.js';
import { formatProblem, validateScenarioText, type Scenario } from '../../schedules/index.js';
import type { RunInput } from '../../schedules/run/index.js';
import { paperOption } from '../run-output/paper-option.js';
import { cohortWorkerCount, MAX_COHORT_SIZE, MAX_COHORT_WORKERS } from '../run-output/cohort-limits.js';
import { runAndWrite } from '../run-output/run-and-write.js';

/** Weather and light-log texts the scenario refers to, read relative to the scenario file. */
export function externalInputs(scenario: Scenario, scenarioFile: string): Pick<RunInput, 'weather' | 'lightLogTexts'> {
  const base = dirname(resolve(scenarioFile));
  const w = scenario.site.weather;
  const weather = w.kind === 'file' ? { fileName: w.file, text: readInputFile(resolve(base, w.file), 'weather', 'site.weather.file') } : undefined;
  const used = new Set(scenario.personas.flatMap((p) => p.measuredLight.map((m) => m.log)));
  const lightLogTexts: Record<string, string> = {};
  scenario.lightLogs.forEach((l, i) => {
    if (used.has(l.id)) lightLogTexts[l.id] = readInputFile(resolve(base, l.file), 'light-log', `lightLogs[${i}].file`);
  });
  return { ...(weather !== undefined ? { weather } : {}), lightLogTexts };
}

/** Every file the run reads: the scenario, its weather file and its light logs. */
function inputFilesOf(scenario: Scenario, scenarioFile: string): string[] {
  const base = dirname(resolve(scenarioFile));
  const w = scenario.site.weather;
  return [resolve(scenarioFile), ...(w.kind === 'file' ? [resolve(base, w.file)] : []), ...scenario.lightLogs.map((l) => resolve(base, l.file))];
}

export function validatedScenario(text: string, file: string): Scenario {
  const v = validateScenarioText(text);
  if (v.scenario === undefined || !v.ok) {
    const errors = v.problems.filter((p) => p.severity === 'error');
    const shown = errors.slice(0, 10).map((p) => `  ${formatProblem(p)}`);
    throw new CliError(`${file}: not a valid scenario (${errors.length} error(s)):\n${shown.join('\n')}${errors.length > 10 ? `\n  … and ${errors.length - 10} more; run "zeitlight validate ${basename(file)}" for the full list` : ''}`);
  }
  return v.scenario;
}

export function outOption(ctx: CommandContext): string {
  const out = stringOption(ctx, 'out');
  if (out === undefined || out.trim() === '') throw new UsageError('--out <dir> is required: the folder for results.json, exposure.csv and summary.csv');
  return out;
}

function wholeNumber(ctx: CommandContext, name: string, min: number, max: number): number | undefined {
  const n = numberOption(ctx, name);
  if (n === undefined) return undefined;
  if (!Number.isInteger(n) || n < min || n > max) throw new UsageError(`--${name}: must be a whole number from ${min} to ${max} (got ${n})`);
  return n;
}

/** --cohort n --seed s [--workers w] [--until-stable]; the seed is required so that a cohort can be repeated. */
function cohortOptions(ctx: CommandContext): { size: number; seed: number; workers?: number; untilStable?: boolean } | undefined {
  const size = wholeNumber(ctx, 'cohort', 1, MAX_COHORT_SIZE);
  const seed = wholeNumber(ctx, 'seed', 0, Number.MAX_SAFE_INTEGER);
  const workers = wholeNumber(ctx, 'workers', 1, MAX_COHORT_WORKERS);
  if (size === undefined) {
    if (seed !== undefined || workers !== undefined || ctx.values['until-stable'] === true) throw new UsageError('--seed, --workers and --until-stable go with --cohort <n>');
    return undefined;
  }
  if (seed === undefined) throw new UsageError('--cohort needs --seed <s> (any whole number ≥ 0) so that the same virtual occupants can be drawn again');
  return { size, seed, ...(workers !== undefined ? { workers } : {}), ...(ctx.values['until-stable'] === true ? { untilStable: true } : {}) };
}

export const runCommand: Command = {
  name: 'run',
  summary: 'Run a scenario and write results',
  usage: '<scenario.json> --out <dir> [--force] [--no-ensemble] [--pdf [--paper A4|Letter] [--chromium <path>]] [--cohort <n> --seed <s> [--workers <n>] [--until-stable]] [--json]',
  options: {
    out: { type: 'string' },
    force: { type: 'boolean' },
    pdf: { type: 'boolean' },
    paper: { type: 'string' },
    chromium: { type: 'string' },
    cohort: { type: 'string' },
    seed: { type: 'string' },
    workers: { type: 'string' },
    'until-stable': { type: 'boolean' },
    'no-ensemble': { type: 'boolean' },
  },
  async run(ctx: CommandContext): Promise<number> {
    const [file] = positionals(ctx, ['scenario.json']);
    if (file === undefined) throw new UsageError('expected a scenario file');
    const outDir = outOption(ctx);
    const cohort = cohortOptions(ctx);
    const text = readInputFile(file, 'scenario');
    const scenario = validatedScenario(text, file);
    const inputs = externalInputs(scenario, file);
    if (cohort !== undefined) cohort.workers = cohortWorkerCount(scenario, cohort.workers, Object.fromEntries(Object.entries(inputs.lightLogTexts ?? {}).map(([id, t]) => [id, t.length])));
    const chromium = stringOption(ctx, 'chromium');
    await runAndWrite(ctx, {
      input: { scenario, ...inputs },
      outDir,
      force: ctx.values['force'] === true,
      ensemble: ctx.values['no-ensemble'] !== true,
      pdf: ctx.values['pdf'] === true,
      paper: paperOption(ctx),
      ...(chromium !== undefined ? { chromiumPath: chromium } : {}),
      scenarioForReport: JSON.parse(text) as unknown,
      inputFiles: inputFilesOf(scenario, file),
      ...(cohort !== undefined ? { cohort } : {}),
    });
    return 0;
  },
};
