/**
 * `zeitlight validate <scenario.json> [--json]` — checks a scenario file: JSON syntax, format
 * version (older versions migrated in memory), schema, sense checks, and the files it refers to
 * (weather file present, measured light logs readable). Lists every problem with its path and a
 * fix. Exit 0 when there is no error (warnings allowed), 1 otherwise.
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { CliError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { positionals } from '../args.js';
import { HEALTH_CAUTION, printJson } from '../output.js';
import { formatProblem, importLightLog, SCENARIO_FORMAT_VERSION, validateScenarioText, type Scenario, type ScenarioProblem } from '../../schedules/index.js';

function readText(file: string): string {
  try {
    return readFileSync(file, 'utf8');
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    throw new CliError(`cannot read ${file}: ${code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : ((err as Error).message ?? String(err))}`);
  }
}

/** Problems with the files a valid scenario refers to, paths relative to the scenario file. */
export function referencedFileProblems(scenario: Scenario, scenarioFile: string): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  const base = dirname(resolve(scenarioFile));
  const w = scenario.site.weather;
  if (w.kind === 'file' && !existsSync(resolve(base, w.file))) {
    out.push({ severity: 'error', path: 'site.weather.file', message: `weather file ${w.file} not found (looked in ${base})`, fix: 'Give the path relative to the scenario file, or use the sky-condition model.' });
  }
  scenario.lightLogs.forEach((log, i) => {
    const path = resolve(base, log.file);
    if (!existsSync(path)) {
      out.push({ severity: 'error', path: `lightLogs[${i}].file`, message: `light log ${log.file} not found (looked in ${base})`, fix: 'Give the path relative to the scenario file.' });
      return;
    }
    let text: string;
    try {
      text = readFileSync(path, 'utf8');
    } catch (err) {
      out.push({ severity: 'error', path: `lightLogs[${i}].file`, message: `light log ${log.file} cannot be read: ${(err as Error).message}`, fix: 'Check the file permissions.' });
      return;
    }
    const r = importLightLog(text, { ...log, timeZone: log.timeZone ?? scenario.site.timeZone });
    for (const p of r.problems) {
      out.push({
        severity: p.severity,
        path: `lightLogs[${i}]`,
        message: `${log.file}${p.line !== null ? ` line ${p.line}` : ''}${p.column !== null ? ` column "${p.column}"` : ''}: ${p.message}`,
        fix: p.fix,
      });
    }
    if (r.log !== undefined && r.log.gaps.length > 0) {
      const total = r.log.gaps.reduce((a, g) => a + g.duration_min, 0);
      out.push({ severity: 'warning', path: `lightLogs[${i}]`, message: `${log.file}: ${r.log.gaps.length} gap(s), ${Math.round(total)} min in all (device off or not worn)`, fix: `Gaps are filled by the "${log.fill}" rule; change "fill" if another suits better.` });
    }
  });
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
    const text = readText(file);
    const v = validateScenarioText(text);
    const problems = [...v.problems, ...(v.scenario !== undefined ? referencedFileProblems(v.scenario, file) : [])];
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
    if (!valid) ctx.stderr(`zeitlight validate: ${file}: ${errors} error(s); the first is at ${problems.find((p) => p.severity === 'error')?.path || '(file)'}\n`);
    return valid ? 0 : 1;
  },
};
