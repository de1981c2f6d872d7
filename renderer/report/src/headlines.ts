// The summary numbers per persona and strategy, and the recommended strategy.
//  - Body-clock shift vs baseline, hours, + later and − earlier (the one sign convention,
//    schedules/words/shift-sign.ts): the results' mean CBTmin shift, or for a view without results
//    the DLMO on the last day both runs have it (renderer/src/charts/phase-data.ts gives + earlier;
//    its sign is turned here).
//  - Alignment: misalignment of the body clock with the person's work and sleep hours, hours per
//    day (schedules/run/alignment.ts): the results' own figures, or for a view without them
//    (layout checks) the same measure on the view's markers, sleep and work minutes.
//  - Evening melatonin suppression: the run's suppression metric (% vs the same night in dim
//    light; docs/methods/circadian.md §5.1).
//  - Share of work hours at KSS ≥ 7: hours weighted by the minutes spent at work in them; awake
//    hours are used when the scenario has no work in it (said so in the sentence).
// Recommendation: the pipeline's own, quoted with its sentences and rule when the view carries
// it (the app); otherwise the pipeline's rule (schedules/run/recommend.ts) on the numbers the view
// has. Shift sentences come from schedules/run/phase-words.ts.
import type { NamedItem, ResultsView, RunView } from '../../src/results/view-model.js';
import { phaseShiftVsBaseline_h } from '../../src/charts/phase-data.js';
import { KSS_SLEEPY_THRESHOLD } from '../../src/charts/kss-grid-data.js';
import { formatNumber } from '../../src/charts/comparison-data.js';
import { alignmentSummary, type AlignmentSummary } from '../../../schedules/run/alignment.js';
import { baselineAlignmentSentence, lastDayShiftSentence, shortPersonName } from '../../../schedules/run/phase-words.js';
import { compareByRule, pickByRule, RECOMMENDATION_RULE, type RuleFigures } from '../../../schedules/run/recommend.js';

export interface StrategyHeadline {
  readonly strategy: NamedItem;
  /** Body-clock shift vs the baseline, h: + later, − earlier. */
  readonly phaseShift_h: number | null;
  readonly suppression_pct: number | null;
  readonly sleepyShare_pct: number | null;
  /** Alignment with the person's work and sleep hours; null when it could not be assessed. */
  readonly alignment: AlignmentSummary | null;
}

export interface PersonaSummary {
  readonly persona: NamedItem;
  readonly basis: 'work' | 'awake';
  readonly baseline: StrategyHeadline | null;
  readonly recommended: StrategyHeadline | null;
  readonly all: readonly StrategyHeadline[];
  readonly sentences: { readonly phase: string; readonly suppression: string; readonly sleepiness: string; readonly recommendation: string; readonly reason: string };
  /** How the recommendation was chosen, in words. */
  readonly rule: string;
  /** Phase marker the shift is read from. */
  readonly phaseMarker: 'DLMO' | 'CBTmin';
}

const SUPPRESSION_IDS = ['evening-suppression', 'melatonin-suppression', 'suppression', 'melatonin_suppression_pct'];
/** DLMO = CBTmin − 7 h where a view gives CBTmin without DLMO (model/circadian marker convention). */
const VIEW_DLMO_BEFORE_CBTMIN_H = 7;

export function suppressionOf(run: RunView): number | null {
  for (const id of SUPPRESSION_IDS) {
    const m = run.metrics.find((x) => x.id === id);
    if (m !== undefined) return m.value;
  }
  return run.metrics.find((x) => /suppression/i.test(x.label))?.value ?? null;
}

/** Share (%) of weighted hours with KSS ≥ 7; weights are minutes per hour (null = awake hours). */
export function sleepyShare_pct(kssHourly: readonly (number | null)[], weights: readonly number[] | null): number | null {
  let total = 0;
  let sleepy = 0;
  kssHourly.forEach((kss, h) => {
    const w = weights === null ? (kss === null ? 0 : 1) : (weights[h] ?? 0);
    if (w <= 0) return;
    total += w;
    if (kss !== null && kss >= KSS_SLEEPY_THRESHOLD) sleepy += w;
  });
  return total > 0 ? (100 * sleepy) / total : null;
}

function hasWork(weights: readonly number[] | undefined): weights is readonly number[] {
  return weights !== undefined && weights.some((w) => w > 0);
}

/** Alignment from a view's markers, main sleep (episodes of kind "sleep") and work minutes per hour (taken from the start of each hour). */
export function viewAlignment(run: RunView, workMinutesPerHour: readonly number[], days: number): AlignmentSummary | null {
  return alignmentSummary({
    from_h: 0,
    to_h: 24 * days,
    days,
    work: workMinutesPerHour.flatMap((w, h) => (w > 0 ? [{ start_h: h, end_h: h + Math.min(60, w) / 60 }] : [])),
    sleep: run.sleep.filter((e) => e.kind === 'sleep'),
    mainSleepMin_h: 0,
    dlmo_h: run.phases.flatMap((p) => (p.dlmo_h === null ? [] : [p.dlmo_h])),
    cbtmin_h: run.phases.flatMap((p) => (p.cbtmin_h === null ? [] : [p.cbtmin_h])),
    fallbackDlmoBeforeCbtmin_h: VIEW_DLMO_BEFORE_CBTMIN_H,
  });
}

/** The figures the recommendation rule compares (no daytime-light figure in a view). */
export function ruleFigures(h: StrategyHeadline): RuleFigures {
  return { sleepyWorkShare: h.sleepyShare_pct === null ? null : h.sleepyShare_pct / 100, misalignment_h_per_day: h.alignment?.misalignment_h_per_day ?? null, suppression_pct: h.suppression_pct, daytime_h_ge_250_lx: null };
}

/** The pipeline's rule (schedules/run/recommend.ts) on the view's numbers; without a baseline, the best by its ordered comparison. */
export function pickRecommended(baseline: StrategyHeadline | null, others: readonly StrategyHeadline[]): StrategyHeadline | null {
  if (baseline !== null) return pickByRule(baseline, others, ruleFigures);
  let best: StrategyHeadline | null = null;
  for (const o of others) if (best === null || compareByRule(ruleFigures(o), ruleFigures(best)) > 0) best = o;
  return best;
}

/** phase-data.ts gives + earlier; the briefing's convention is + later. */
const laterOf = (earlier_h: number | null): number | null => (earlier_h === null ? null : earlier_h === 0 ? 0 : -earlier_h);

const pct = (v: number | null) => (v === null ? 'not available' : `${formatNumber(v, 0)} %`);

function phaseSentence(person: string, rec: StrategyHeadline | null, base: StrategyHeadline | null, isBaseline: boolean): string {
  if (rec === null) return 'Phase shift: not available from these results.';
  if (isBaseline) return `Phase shift: the baseline is the reference, so there is no shift to report for ${person}. ${baselineAlignmentSentence(person, rec.alignment)}`;
  return `Phase shift: ${lastDayShiftSentence(person, rec.strategy.name, 'DLMO', rec.phaseShift_h, rec.alignment, base?.alignment)}`;
}

function suppressionSentence(rec: StrategyHeadline | null, base: StrategyHeadline | null, isBaseline: boolean): string {
  if (rec === null || rec.suppression_pct === null) return 'Evening melatonin suppression: not available from these results.';
  const compare = isBaseline || base === null ? '' : ` (baseline ${pct(base.suppression_pct)})`;
  return `Evening melatonin suppression: light before sleep lowers melatonin by ${pct(rec.suppression_pct)} against a dark evening${compare}; lower is kinder to sleep.`;
}

function sleepinessSentence(rec: StrategyHeadline | null, base: StrategyHeadline | null, isBaseline: boolean, basis: 'work' | 'awake'): string {
  const what = basis === 'work' ? 'work hours' : 'waking hours (no work in this routine)';
  if (rec === null || rec.sleepyShare_pct === null) return `Sleepiness: the share of ${what} at KSS ≥ 7 is not available.`;
  const compare = isBaseline || base === null ? '' : ` (baseline ${pct(base.sleepyShare_pct)})`;
  return `Sleepiness: ${pct(rec.sleepyShare_pct)} of ${what} are spent at KSS ≥ 7, “sleepy”${compare}.`;
}

/** Summary for every persona of the view. `workMinutesPerHour` is keyed "persona:strategy". */
export function personaSummaries(view: ResultsView, workMinutesPerHour: ReadonlyMap<string, readonly number[]>): PersonaSummary[] {
  return view.personas.map((persona) => {
    const person = shortPersonName(persona.name);
    const runs = view.strategies.map((s) => ({ strategy: s, run: view.runs.find((r) => r.personaId === persona.id && r.strategyId === s.id) })).filter((x): x is { strategy: NamedItem; run: RunView } => x.run !== undefined);
    const baselineRun = runs.find((x) => x.strategy.id === view.baselineId)?.run;
    const basis = runs.some((x) => hasWork(workMinutesPerHour.get(`${persona.id}:${x.strategy.id}`))) ? 'work' : 'awake';
    const all = runs.map(({ strategy, run }): StrategyHeadline => {
      const weights = workMinutesPerHour.get(`${persona.id}:${strategy.id}`);
      return {
        strategy,
        phaseShift_h: baselineRun === undefined || strategy.id === view.baselineId ? (strategy.id === view.baselineId ? 0 : null) : laterOf(phaseShiftVsBaseline_h(run, baselineRun, 'dlmo')),
        suppression_pct: suppressionOf(run),
        sleepyShare_pct: sleepyShare_pct(run.kssHourly, basis === 'work' ? (hasWork(weights) ? weights : []) : null),
        alignment: run.alignment !== undefined ? run.alignment : viewAlignment(run, hasWork(weights) ? weights : [], view.days),
      };
    });
    const baseline = all.find((h) => h.strategy.id === view.baselineId) ?? null;
    const piped = view.recommendations?.find((r) => r.personaId === persona.id);
    const recommended = piped !== undefined ? (all.find((h) => h.strategy.id === piped.strategyId) ?? baseline) : pickRecommended(baseline, all.filter((h) => h !== baseline));
    const isBaseline = recommended !== null && recommended === baseline;
    const recommendation =
      recommended === null
        ? `No results for ${persona.name}.`
        : isBaseline
          ? piped !== undefined
            ? 'Recommended: keep the baseline.'
            : `Recommended: keep the baseline — no strategy lowered sleepy ${basis} hours or the misalignment with ${person}'s work and sleep hours without making the other worse.`
          : `Recommended: “${recommended.strategy.name}”.`;
    return {
      persona,
      basis,
      baseline,
      recommended,
      all,
      rule: piped?.rule ?? RECOMMENDATION_RULE,
      phaseMarker: 'DLMO',
      sentences: {
        recommendation,
        reason: piped?.reason ?? '',
        phase: piped?.sentences?.phase ?? phaseSentence(person, recommended, baseline, isBaseline),
        suppression: piped?.sentences?.suppression ?? suppressionSentence(recommended, baseline, isBaseline),
        sleepiness: piped?.sentences?.sleepiness ?? sleepinessSentence(recommended, baseline, isBaseline, basis),
      },
    };
  });
}
