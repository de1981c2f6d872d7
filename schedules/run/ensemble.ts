/**
 * The ensemble stage: the body-clock, melatonin and sleepiness models re-run under every member
 * of the model ensemble (ensemble-members.ts) on the light at the eye the run has already
 * computed (RunOutput.light: the light is prepared once and reused, only the models run again).
 * Each pacemaker runs through the cohort's occupant engine (cohort-occupant.ts) with the persona's
 * own traits, which gives exactly the run's own figures for the run's own model (tested): every
 * strategy from the state entrained to the baseline's first day, then the same metrics. The
 * sleepiness models read each body-clock run without running it again. The default pair's values
 * are the run's own (not recomputed).
 *
 * Work is split into jobs (one persona × one pacemaker) so a host can run them in pieces (the
 * app's worker yields between jobs and stops when a newer run is asked for).
 */
import { isPacemakerId, type PacemakerId } from '../../model/circadian/registry.js';
import type { SleepinessModelId } from '../../model/circadian/sleepiness-registry.js';
import { cohortPersonaFromRun, occupantResults, type OccupantResult } from './cohort-occupant.js';
import { bodyClockOnly, DEFAULT_SLEEPINESS_ID, defaultEnsemble, memberName, pacemakerName, pacemakerSource, sleepinessName, sleepinessShortName, sleepinessSource, type EnsembleMember } from './ensemble-members.js';
import { ENSEMBLE_RANKING_RULE, rankingSentence, strategyRanks } from './ensemble-ranking.js';
import { ENSEMBLE_METRICS, type EnsembleMetric, type EnsembleRange, type EnsembleRanking, type EnsembleValue, type PersonaResult, type RunResults, type StrategyEnsemble, type StrategyResult } from './results-types.js';
import type { RunOutput } from './run-scenario.js';

/** Figures that depend on the sleepiness model; the others depend on the body-clock model only. */
const SLEEPINESS_METRICS: ReadonlySet<EnsembleMetric> = new Set(['work_hours_kss_ge_7_share']);

const HEADLINE_FIGURE: Readonly<Record<string, EnsembleMetric>> = {
  phase_shift_h: 'mean_phase_shift_h',
  melatonin_suppression_pct: 'mean_melatonin_suppression_pct',
  work_hours_kss_ge_7_share: 'work_hours_kss_ge_7_share',
};

/** One persona under one pacemaker, with every sleepiness model that pacemaker is paired with. */
export interface EnsembleJob {
  readonly personaId: string;
  readonly pacemaker: PacemakerId;
  readonly sleepiness: readonly SleepinessModelId[];
}

/** A job's strategy results (summary and alignment), per sleepiness model, per strategy id. */
export interface EnsembleJobResult {
  readonly personaId: string;
  readonly pacemaker: PacemakerId;
  readonly results: ReadonlyMap<SleepinessModelId, ReadonlyMap<string, OccupantResult>>;
}

export interface EnsemblePlan {
  readonly out: RunOutput;
  /** The run's own pair first, then the other members. */
  readonly members: readonly EnsembleMember[];
  readonly jobs: readonly EnsembleJob[];
}

function runDefault(out: RunOutput): EnsembleMember {
  const id = out.results.models.pacemaker;
  if (!isPacemakerId(id)) throw new Error(`the run's pacemaker "${id}" is not a registered model`);
  return { pacemaker: id, sleepiness: DEFAULT_SLEEPINESS_ID };
}

const sameMember = (a: EnsembleMember, b: EnsembleMember) => a.pacemaker === b.pacemaker && a.sleepiness === b.sleepiness;

/** The jobs for a finished run: every persona × every pacemaker with a member other than the run's own pair. */
export function planEnsemble(out: RunOutput, members?: readonly EnsembleMember[]): EnsemblePlan {
  const own = runDefault(out);
  const wanted = members ?? defaultEnsemble(own.pacemaker);
  const list = [own, ...wanted.filter((m, i) => !sameMember(m, own) && wanted.findIndex((x) => sameMember(x, m)) === i)];
  const pacemakers = [...new Set(list.map((m) => m.pacemaker))];
  const jobs: EnsembleJob[] = [];
  for (const p of out.results.personas) {
    for (const pacemaker of pacemakers) {
      const sleepiness = list.filter((m) => m.pacemaker === pacemaker && !sameMember(m, own)).map((m) => m.sleepiness);
      if (sleepiness.length > 0) jobs.push({ personaId: p.id, pacemaker, sleepiness });
    }
  }
  return { out, members: list, jobs };
}

/** Runs one job: the persona's strategies in pipeline order (baseline first) under the job's pacemaker. */
export function runEnsembleJob(plan: EnsemblePlan, job: EnsembleJob): EnsembleJobResult {
  const { out } = plan;
  const baseline = out.results.personas.find((p) => p.id === job.personaId)?.strategies.find((s) => s.is_baseline);
  const persona = out.light.find((l) => l.personaId === job.personaId && l.strategyId === baseline?.id)?.persona;
  if (persona === undefined) throw new Error(`no persona "${job.personaId}" in the run`);
  const base = cohortPersonaFromRun(out, persona, job.pacemaker);
  const byModel = occupantResults(base, { intrinsicPeriod_h: persona.intrinsicPeriod_h, lightSensitivity: persona.lightSensitivity, habitualMidSleepShift_h: 0 }, job.sleepiness);
  const results = new Map<SleepinessModelId, ReadonlyMap<string, OccupantResult>>([...byModel].map(([id, byStrategy]) => [id, new Map(Object.entries(byStrategy))]));
  return { personaId: job.personaId, pacemaker: job.pacemaker, results };
}

/** A figure of one strategy result: a `summary` field, or the misalignment from its `alignment`. */
export function figureOf(r: OccupantResult | undefined, metric: EnsembleMetric): number | null {
  if (r === undefined) return null;
  return metric === 'misalignment_h_per_day' ? (r.alignment?.misalignment_h_per_day ?? null) : r.summary[metric];
}

function range(values: readonly EnsembleValue[]): EnsembleRange {
  const finite = values.flatMap((v) => (v.value !== null && Number.isFinite(v.value) ? [v.value] : []));
  return {
    default: values[0]?.value ?? null,
    min: finite.length === 0 ? null : Math.min(...finite),
    max: finite.length === 0 ? null : Math.max(...finite),
    model_count: finite.length,
    models: values,
  };
}

function personaEnsemble(p: PersonaResult, members: readonly EnsembleMember[], done: readonly EnsembleJobResult[]): PersonaResult {
  const own = members[0];
  if (own === undefined) return p;
  const both = !bodyClockOnly(members);
  const pacemakers = [...new Set(members.map((m) => m.pacemaker))];
  const resultOf = (m: EnsembleMember, strategy: StrategyResult): OccupantResult | undefined =>
    sameMember(m, own) ? strategy : done.find((d) => d.personaId === p.id && d.pacemaker === m.pacemaker)?.results.get(m.sleepiness)?.get(strategy.id);
  // a body-clock figure under a pacemaker: from any of its members (they share one body-clock run)
  const withPacemaker = (pacemaker: PacemakerId): EnsembleMember => members.find((m) => m.pacemaker === pacemaker && m.sleepiness === own.sleepiness) ?? members.find((m) => m.pacemaker === pacemaker) ?? own;
  const strategies: StrategyResult[] = p.strategies.map((s) => {
    const ensemble = {} as Record<EnsembleMetric, EnsembleRange>;
    for (const metric of ENSEMBLE_METRICS) {
      const values: EnsembleValue[] = SLEEPINESS_METRICS.has(metric)
        ? members.map((m) => ({ pacemaker: m.pacemaker, sleepiness: m.sleepiness, value: figureOf(resultOf(m, s), metric) }))
        : pacemakers.map((pm) => ({ pacemaker: pm, sleepiness: null, value: figureOf(resultOf(withPacemaker(pm), s), metric) }));
      ensemble[metric] = range(values);
    }
    const headlines = s.headlines.map((h) => {
      const figure = HEADLINE_FIGURE[h.metric];
      return figure === undefined ? h : { ...h, ensemble: ensemble[figure] };
    });
    return { ...s, headlines, ensemble: ensemble as StrategyEnsemble };
  });
  const ranksByMember = members.map((m) => strategyRanks(p.strategies.map((s) => resultOf(m, s) ?? s)));
  const noun = both ? 'model pairs (body clock and KSS model)' : 'body-clock models';
  const ranking: EnsembleRanking = {
    rule: ENSEMBLE_RANKING_RULE,
    strategies: p.strategies.map((s, i) => {
      const ranks = members.map((m, k) => ({ pacemaker: m.pacemaker, sleepiness: m.sleepiness, rank: ranksByMember[k]?.[i] ?? 0 }));
      const subject = s.is_baseline ? 'The baseline' : `“${s.name}”`;
      const named = ranks.map((r) => ({ name: memberName(r, both), rank: r.rank, ...(both ? { pair: { clock: pacemakerName(r.pacemaker), kss: sleepinessShortName(r.sleepiness) } } : {}) }));
      return { strategy_id: s.id, default_rank: ranks[0]?.rank ?? 0, ranks, sentence: rankingSentence(subject, named, noun) };
    }),
  };
  return { ...p, strategies, ensemble_ranking: ranking };
}

/** Adds the ensemble to a run's results: ranges per strategy and headline, ranks per persona, the models. */
export function assembleEnsemble(plan: EnsemblePlan, done: readonly EnsembleJobResult[]): RunResults {
  const { out, members } = plan;
  const own = members[0];
  if (own === undefined) throw new Error('an ensemble needs at least one model');
  const both = !bodyClockOnly(members);
  const pacemakers = [...new Set(members.map((m) => m.pacemaker))];
  const sleepiness = [...new Set(members.map((m) => m.sleepiness))];
  return {
    ...out.results,
    personas: out.results.personas.map((p) => personaEnsemble(p, members, done)),
    ensemble: {
      default: { pacemaker: own.pacemaker, sleepiness: own.sleepiness },
      members: members.map((m) => ({ pacemaker: m.pacemaker, sleepiness: m.sleepiness, name: memberName(m, both) })),
      models: [
        ...pacemakers.map((id) => ({ role: 'body clock' as const, id, name: pacemakerName(id), source: pacemakerSource(id) })),
        ...sleepiness.map((id) => ({ role: 'sleepiness' as const, id, name: sleepinessName(id), source: sleepinessSource(id) })),
      ],
      metrics: ENSEMBLE_METRICS,
      note:
        `The same light at the eye run through ${pacemakers.length} published body-clock model${pacemakers.length === 1 ? '' : 's'}` +
        `${both ? ` and ${sleepiness.length} sleepiness models (every pairing; the sleepiness models change only the KSS figures)` : ''}; ` +
        `each figure's range is the lowest and highest of the models' values, beside the default model's (${pacemakerName(own.pacemaker)}${both ? `; ${sleepinessName(own.sleepiness)}` : ''}). ` +
        'A range shows how far published models disagree for this scenario, not the spread between people (see the cohort for that).',
    },
  };
}

/** Runs every job of the plan and adds the ensemble to the results. */
export function withEnsemble(out: RunOutput, members?: readonly EnsembleMember[]): RunResults {
  const plan = planEnsemble(out, members);
  return assembleEnsemble(plan, plan.jobs.map((j) => runEnsembleJob(plan, j)));
}
