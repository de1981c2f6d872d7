/**
 * `zeitlight validate <scenario.json> [--json]` — checks a scenario file: JSON syntax, format
 * version (older versions migrated in memory), schema, sense checks, and the files it refers to
 * (weather file present, measured light logs readable). Lists every problem with its path and a
 * fix. Exit 0 when there is no error (warnings allowed), 1 otherwise.
 */
import { existsSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { CliError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { positionals } from '../args.js';
import { readInputFile } from '../input-file.js';
import { HEALTH_CAUTION, printJson } from '../output.js';
import { formatProblem, importLightLog, SCENARIO_FORMAT_VERSION, validateScenarioText, type ScenarioProblem } from '../../schedules/index.js';
import type { CheckableParts } from '../../schedules/validation/validate-scenario.js';
import type { LightLogSpec } from '../../schedules/schema/scenario-types.js';

/**
 * Problems with the files a scenario refers to, paths relative to the scenario file. Works on the
 * checkable parts of a scenario that has errors too (schedules/validation CheckableParts), so the
 * files are checked in the same pass as everything else; a file name that is itself invalid is
 * reported by the schema and not looked for.
 */
export function referencedFileProblems(parts: CheckableParts, scenarioFile: string): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  const { scenario, lightLogIndex, replaced } = parts;
  const base = dirname(resolve(scenarioFile));
  const w = scenario.site.weather;
  if (w.kind === 'file' && !replaced.some((r) => r === 'site' || r.startsWith('site.weather')) && !existsSync(resolve(base, w.file))) {
    out.push({ severity: 'error', path: 'site.weather.file', message: `weather file ${w.file} not found (looked in ${base})`, fix: 'Give the path relative to the scenario file, or use the sky-condition model.' });
  }
  scenario.lightLogs.forEach((log, k) => {
    const i = lightLogIndex[k] ?? k;
    if (replaced.includes(`lightLogs[${i}].file`)) return;
    out.push(...lightLogFileProblems(log, i, base, log.timeZone ?? scenario.site.timeZone));
  });
  return out;
}

function lightLogFileProblems(log: LightLogSpec, i: number, base: string, timeZone: string): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  const path = resolve(base, log.file);
  if (!existsSync(path)) {
    out.push({ severity: 'error', path: `lightLogs[${i}].file`, message: `light log ${log.file} not found (looked in ${base})`, fix: 'Give the path relative to the scenario file.' });
    return out;
  }
  let text: string;
  try {
    text = readInputFile(path, 'light-log', `lightLogs[${i}].file`);
  } catch (err) {
    out.push({ severity: 'error', path: `lightLogs[${i}].file`, message: err instanceof Error ? err.message : String(err), fix: 'Check the file, its permissions and its size.' });
    return out;
  }
  const r = importLightLog(text, { ...log, timeZone });
  for (const p of r.problems) {
    out.push({
      severity: p.severity,
      path: `lightLogs[${i}]`,
      message: `${log.file}${p.line !== null ? ` line ${p.line}` : ''}${p.column !== null ? ` column "${p.column}"` : ''}: ${p.message}`,
      fix: p.fix,
    });
  }
  return out;
}

export const validateCommand: Command = {
  name: 'validate',
  summary: 'Check a scenario file and list every problem',
  usage: '<scenario.json> [--json]',
  options: {},
  async run(ctx: CommandContext): Promise<number> {
    const [file] = positionals(ctx, ['scenario.json']);
    if (file === undefined) throw new CliError('expected a scenario file');
    const text = readInputFile(file, 'scenario');
    const v = validateScenarioText(text);
    const problems = [...v.problems, ...(v.checkable !== undefined ? referencedFileProblems(v.checkable, file) : [])];
    const errors = problems.filter((p) => p.severity === 'error').length;
    const warnings = problems.length - errors;
    const valid = errors === 0;
    if (ctx.json) {
      printJson(ctx, {
        file,
        valid,
        format_version: SCENARIO_FORMAT_VERSION,
        migrated_from: v.migratedFrom !== undefined && v.migratedFrom !== SCENARIO_FORMAT_VERSION ? v.migratedFrom : null,
        errors,
        warnings,
        problems: problems.map((p) => ({ severity: p.severity, path: p.path, message: p.message, fix: p.fix })),
        summary:
          v.scenario !== undefined
            ? { personas: v.scenario.personas.length, places: v.scenario.places.length, strategies: v.scenario.strategies.length, days: v.scenario.run.days, start_date: v.scenario.run.startDate }
            : null,
        caution: HEALTH_CAUTION,
      });
    } else {
      const lines: string[] = [];
      if (v.migrations.length > 0) lines.push(`note: written in format version ${v.migratedFrom}; read as version ${SCENARIO_FORMAT_VERSION} (${v.migrations.join(', ')}). Save it again to update the file.`);
      for (const p of problems) lines.push(formatProblem(p));
      lines.push(valid ? `${file}: valid${warnings > 0 ? ` with ${warnings} warning(s)` : ''}.` : `${file}: ${errors} error(s), ${warnings} warning(s).`);
      lines.push('', HEALTH_CAUTION);
      ctx.stdout(lines.join('\n') + '\n');
    }
    if (!valid) {
      const first = problems.find((p) => p.severity === 'error');
      const where = first === undefined ? '(file)' : first.path !== '' ? first.path : (/\bline \d+(, column \d+)?/.exec(first.message)?.[0] ?? '(file)');
      ctx.stderr(`zeitlight validate: ${file}: ${errors} error(s); the first is at ${where}\n`);
    }
    return valid ? 0 : 1;
  },
};
