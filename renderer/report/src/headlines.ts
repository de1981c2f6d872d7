// The three numbers of the summary, per persona and strategy, and the recommended strategy.
//  - Phase shift vs baseline: DLMO on the last day both runs have it, hours, positive = advance
//    (earlier), as in the Body clock view (renderer/src/charts/phase-data.ts).
//  - Evening melatonin suppression: the run's suppression metric (% vs the same night in dim
//    light; docs/methods/circadian.md §5.1).
//  - Share of work hours at KSS ≥ 7: hours weighted by the minutes spent at work in them; awake
//    hours are used when the scenario has no work in it (said so in the sentence).
// Recommendation rule (ours, stated in the report): the lowest share of sleepy work hours; within
// half a percentage point, the lower evening suppression; the baseline stays recommended unless
// a strategy does better on one of the two without being worse on the other.
import type { NamedItem, ResultsView, RunView } from '../../src/results/view-model.js';
import { phaseShiftVsBaseline_h } from '../../src/charts/phase-data.js';
import { KSS_SLEEPY_THRESHOLD } from '../../src/charts/kss-grid-data.js';
import { formatNumber } from '../../src/charts/comparison-data.js';

export interface StrategyHeadline {
  readonly strategy: NamedItem;
  readonly phaseShift_h: number | null;
  readonly suppression_pct: number | null;
  readonly sleepyShare_pct: number | null;
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

export const BRIEFING_RECOMMENDATION_RULE =
  'The strategy with the lowest share of sleepy work hours (KSS ≥ 7); within half a percentage point, the one with less evening melatonin suppression. A strategy is recommended over the baseline only when it is better on one of these two and not worse on the other.';

const SUPPRESSION_IDS = ['evening-suppression', 'melatonin-suppression', 'suppression', 'melatonin_suppression_pct'];
/** Equal within this many percentage points (the numbers are shown to whole percent). */
const TIE_PP = 0.5;

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

function lessOrEqual(a: number | null, b: number | null): boolean {
  return a === null || b === null || a <= b + TIE_PP;
}

function strictlyLess(a: number | null, b: number | null): boolean {
  return a !== null && b !== null && a < b - TIE_PP;
}

/** Does `a` do better than `b`: better on one of the two scored numbers and not worse on the other. */
export function dominates(a: StrategyHeadline, b: StrategyHeadline): boolean {
  const better = strictlyLess(a.sleepyShare_pct, b.sleepyShare_pct) || strictlyLess(a.suppression_pct, b.suppression_pct);
  return better && lessOrEqual(a.sleepyShare_pct, b.sleepyShare_pct) && lessOrEqual(a.suppression_pct, b.suppression_pct);
}

/** Lexicographic order: lower sleepy share first, then lower suppression. */
function ranksBefore(a: StrategyHeadline, b: StrategyHeadline): boolean {
  if (strictlyLess(a.sleepyShare_pct, b.sleepyShare_pct)) return true;
  if (strictlyLess(b.sleepyShare_pct, a.sleepyShare_pct)) return false;
  return strictlyLess(a.suppression_pct, b.suppression_pct);
}

export function pickRecommended(baseline: StrategyHeadline | null, others: readonly StrategyHeadline[]): StrategyHeadline | null {
  const candidates = baseline === null ? others : others.filter((o) => dominates(o, baseline));
  let best = baseline ?? candidates[0] ?? null;
  for (const c of candidates) if (best === null || ranksBefore(c, best)) best = c;
  return best;
}

const pct = (v: number | null) => (v === null ? 'not available' : `${formatNumber(v, 0)} %`);

function phaseSentence(persona: string, rec: StrategyHeadline | null, isBaseline: boolean): string {
  if (rec === null || isBaseline) return `Phase shift: the baseline is the reference, so there is no shift to report for ${persona}.`;
  const s = rec.phaseShift_h;
  if (s === null) return `Phase shift: no day with a melatonin onset in both runs, so no shift can be given.`;
  if (Math.abs(s) < 0.05) return `Phase shift: with “${rec.strategy.name}” ${persona}'s body clock keeps the baseline timing (no shift).`;
  return s > 0
    ? `Phase shift: with “${rec.strategy.name}” ${persona}'s body clock runs ${formatNumber(s, 1)} h earlier than with the baseline by the last day (an advance: earlier sleepiness in the evening, easier early mornings).`
    : `Phase shift: with “${rec.strategy.name}” ${persona}'s body clock runs ${formatNumber(-s, 1)} h later than with the baseline by the last day (a delay: later sleepiness, harder early mornings).`;
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
    const runs = view.strategies.map((s) => ({ strategy: s, run: view.runs.find((r) => r.personaId === persona.id && r.strategyId === s.id) })).filter((x): x is { strategy: NamedItem; run: RunView } => x.run !== undefined);
    const baselineRun = runs.find((x) => x.strategy.id === view.baselineId)?.run;
    const basis = runs.some((x) => hasWork(workMinutesPerHour.get(`${persona.id}:${x.strategy.id}`))) ? 'work' : 'awake';
    const all = runs.map(({ strategy, run }): StrategyHeadline => {
      const weights = workMinutesPerHour.get(`${persona.id}:${strategy.id}`);
      return {
        strategy,
        phaseShift_h: baselineRun === undefined || strategy.id === view.baselineId ? (strategy.id === view.baselineId ? 0 : null) : phaseShiftVsBaseline_h(run, baselineRun, 'dlmo'),
        suppression_pct: suppressionOf(run),
        sleepyShare_pct: sleepyShare_pct(run.kssHourly, basis === 'work' ? (hasWork(weights) ? weights : []) : null),
      };
    });
    const baseline = all.find((h) => h.strategy.id === view.baselineId) ?? null;
    const recommended = pickRecommended(baseline, all.filter((h) => h !== baseline));
    const isBaseline = recommended !== null && recommended === baseline;
    const recommendation =
      recommended === null
        ? `No results for ${persona.name}.`
        : isBaseline
          ? `Recommended: keep the baseline — no strategy lowered sleepy ${basis} hours or evening melatonin suppression without making the other worse.`
          : `Recommended: “${recommended.strategy.name}”.`;
    return {
      persona,
      basis,
      baseline,
      recommended,
      all,
      rule: BRIEFING_RECOMMENDATION_RULE,
      phaseMarker: 'DLMO',
      sentences: {
        recommendation,
        reason: '',
        phase: phaseSentence(persona.name, recommended, isBaseline),
        suppression: suppressionSentence(recommended, baseline, isBaseline),
        sleepiness: sleepinessSentence(recommended, baseline, isBaseline, basis),
      },
    };
  });
}
