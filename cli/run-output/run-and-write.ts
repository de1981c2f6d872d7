/**
 * Shared by `zeitlight run` and `zeitlight demo`: run the pipeline on a validated scenario,
 * write results.json, exposure.csv and summary.csv (and the scenario itself for the demo),
 * optionally the PDF briefing, and report what was written.
 */
import { HEALTH_CAUTION, printJson } from '../output.js';
import type { CommandContext } from '../command.js';
import { CliError } from '../cli-error.js';
import type { Scenario } from '../../schedules/index.js';
import { exposureCsv, runScenario, RunInputError, summaryCsv, withEnsemble, type RunInput, type RunResults } from '../../schedules/run/index.js';
import { ensembleLines, ensembleModelsLine } from './ensemble-lines.js';
import { prepareOutputFolder, writeFilesAtomically } from './output-folder.js';
import { writeBriefing } from './briefing-pdf.js';
import { COHORT_STOP_RULE, runCohorts } from './cohort-runs.js';

export interface RunAndWriteOptions {
  readonly input: RunInput;
  readonly outDir: string;
  readonly force: boolean;
  readonly pdf: boolean;
  readonly chromiumPath?: string;
  readonly paper?: 'A4' | 'Letter';
  /** Extra files (e.g. the demo's scenario.json). */
  readonly extraFiles?: Readonly<Record<string, string>>;
  readonly scenarioForReport: unknown;
  /** Also run the model ensemble and give every headline its range (schedules/run/ensemble.ts). */
  readonly ensemble: boolean;
  /** Also run a cohort of virtual occupants per persona. */
  readonly cohort?: { readonly size: number; readonly seed: number; readonly workers?: number; readonly untilStable?: boolean };
}

function runOrExplain(input: RunInput): ReturnType<typeof runScenario> {
  try {
    return runScenario(input);
  } catch (err) {
    if (err instanceof RunInputError) throw new CliError(err.message);
    throw err;
  }
}

export async function runAndWrite(ctx: CommandContext, o: RunAndWriteOptions): Promise<RunResults> {
  prepareOutputFolder(o.outDir, o.force);
  const t0 = performance.now();
  const single = runOrExplain(o.input);
  let results: RunResults = single.results;
  const tEnsemble = performance.now();
  if (o.ensemble) results = withEnsemble(single);
  const ensemble_ms = performance.now() - tEnsemble;
  if (o.cohort !== undefined) {
    const cohort = await runCohorts(o.input, o.cohort.size, o.cohort.seed, {
      ...(o.cohort.workers !== undefined ? { workers: o.cohort.workers } : {}),
      ...(o.cohort.untilStable === true ? { stopRule: COHORT_STOP_RULE } : {}),
      ...(ctx.json ? {} : { onProgress: (text: string) => ctx.stderr(`\r${text}   `) }),
    });
    if (!ctx.json) ctx.stderr('\n');
    results = { ...results, cohort };
  }
  const out = { ...single, results };
  const compute_ms = performance.now() - t0;
  const files: Record<string, string> = {
    'results.json': JSON.stringify(out.results, null, 1) + '\n',
    'exposure.csv': exposureCsv(out.light, out.clock),
    'summary.csv': summaryCsv(out.results),
    ...(o.extraFiles ?? {}),
  };
  const written = writeFilesAtomically(o.outDir, files);
  let pdfNote: string | undefined;
  if (o.pdf) {
    const r = await writeBriefing(o.outDir, out.results, o.scenarioForReport, o.chromiumPath, o.paper);
    if (r.ok) written.push(r.path);
    else {
      pdfNote = r.message;
      ctx.stderr(`zeitlight: ${r.message}\n`);
    }
  }
  if (ctx.json) printJson(ctx, out.results);
  else {
    const lines = [`Ran "${out.results.scenario.name}": ${out.results.personas.length} person(s), ${out.results.scenario.days} days, in ${(compute_ms / 1000).toFixed(2)} s${o.ensemble ? ` (model ensemble ${(ensemble_ms / 1000).toFixed(2)} s)` : ''}.`];
    for (const p of out.results.personas) {
      lines.push('', `${p.name} — recommended: ${p.recommendation.strategy_name}`, `  ${p.recommendation.reason}`);
      const rec = p.strategies.find((s) => s.id === p.recommendation.strategy_id);
      for (const h of rec?.headlines ?? []) lines.push(`  • ${h.sentence}`);
      lines.push(...ensembleLines(out.results, p));
    }
    const models = ensembleModelsLine(out.results);
    if (models !== null) lines.push('', models);
    lines.push('', 'Wrote:', ...written.map((f) => `  ${f}`));
    if (pdfNote !== undefined) lines.push('  (no report.pdf — see the message on stderr)');
    if (out.results.cohort !== undefined) lines.push(`Cohort: ${out.results.cohort.size} virtual occupants per person (seed ${out.results.cohort.seed}); ranges in results.json "cohort".`);
    for (const w of out.results.warnings) lines.push(`warning: ${w}`);
    lines.push('', HEALTH_CAUTION);
    ctx.stdout(lines.join('\n') + '\n');
  }
  return out.results;
}

export type { Scenario };
