/**
 * Shared by `zeitlight run` and `zeitlight demo`: run the pipeline on a validated scenario,
 * write results.json, exposure.csv and summary.csv (and the scenario itself for the demo),
 * optionally the PDF briefing, and report what was written. The output folder is checked before
 * any work and receives the whole set of files at once (output-folder.ts).
 */
import { HEALTH_CAUTION, printJson } from '../output.js';
import type { CommandContext } from '../command.js';
import { CliError } from '../cli-error.js';
import type { Scenario } from '../../schedules/index.js';
import { exposureCsv, runScenario, RunInputError, summaryCsv, withEnsemble, type RunInput, type RunResults } from '../../schedules/run/index.js';
import { seatComparisons } from '../../schedules/words/seat-comparison.js';
import { ensembleLines, ensembleModelsLine } from './ensemble-lines.js';
import { beginOutput, type StagedOutput } from './output-folder.js';
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
  /** Files the run reads (scenario, weather, light logs): the output folder must not hold them. */
  readonly inputFiles?: readonly string[];
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

/** The single run, with exposure.csv made at once so the per-minute light can go before a cohort starts. */
function singleRun(o: RunAndWriteOptions): { results: RunResults; exposure: string; ensemble_ms: number } {
  const single = runOrExplain(o.input);
  const tEnsemble = performance.now();
  const results = o.ensemble ? withEnsemble(single) : single.results;
  const ensemble_ms = performance.now() - tEnsemble;
  return { results, exposure: exposureCsv(single.light, single.clock), ensemble_ms };
}

export async function runAndWrite(ctx: CommandContext, o: RunAndWriteOptions): Promise<RunResults> {
  const output = beginOutput(o.outDir, { force: o.force, ...(o.inputFiles !== undefined ? { inputFiles: o.inputFiles } : {}) });
  try {
    return await runInto(ctx, o, output);
  } finally {
    output.abandon();
  }
}

async function runInto(ctx: CommandContext, o: RunAndWriteOptions, output: StagedOutput): Promise<RunResults> {
  const t0 = performance.now();
  const first = singleRun(o);
  let results: RunResults = first.results;
  const ensemble_ms = first.ensemble_ms;
  if (o.cohort !== undefined) {
    const cohort = await runCohorts(o.input, o.cohort.size, o.cohort.seed, {
      ...(o.cohort.workers !== undefined ? { workers: o.cohort.workers } : {}),
      ...(o.cohort.untilStable === true ? { stopRule: COHORT_STOP_RULE } : {}),
      ...(ctx.json ? {} : { onProgress: (text: string) => ctx.stderr(`\r${text}   `) }),
    });
    if (!ctx.json) ctx.stderr('\n');
    results = { ...results, cohort };
  }
  const out = { results };
  const compute_ms = performance.now() - t0;
  output.write({
    'results.json': JSON.stringify(out.results, null, 1) + '\n',
    'exposure.csv': first.exposure,
    'summary.csv': summaryCsv(out.results),
    ...(o.extraFiles ?? {}),
  });
  let pdfNote: string | undefined;
  if (o.pdf) {
    const r = await writeBriefing(output.staging, out.results, o.scenarioForReport, o.chromiumPath, o.paper);
    if (!r.ok) {
      pdfNote = r.message;
      ctx.stderr(`zeitlight: ${r.message}\n`);
    }
  }
  const written = output.commit();
  if (ctx.json) printJson(ctx, out.results);
  else {
    const lines = [`Ran "${out.results.scenario.name}": ${out.results.personas.length} person(s), ${out.results.scenario.days} days, in ${(compute_ms / 1000).toFixed(2)} s${o.ensemble ? ` (model ensemble ${(ensemble_ms / 1000).toFixed(2)} s)` : ''}.`];
    const seats = seatComparisons(o.input.scenario, out.results);
    for (const p of out.results.personas) {
      lines.push('', `${p.name} — recommended: ${p.recommendation.strategy_name}`, `  ${p.recommendation.reason}`);
      for (const c of seats) if (c.personaIds[c.personaIds.length - 1] === p.id) lines.push(`  ${c.sentence}`);
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
