/**
 * Headline sentences and the recommended strategy per persona.
 *
 * Rule (docs/methods/pipeline.md §5). Each strategy is compared with the baseline on, in order:
 *   1. the share of work hours at KSS ≥ 7 (lower is better; counts from 1 percentage point),
 *   2. misalignment of the body clock with the person's work and sleep hours, hours per day
 *      (alignment.ts; lower is better; counts from 0.25 h),
 *   3. the mean melatonin suppression per night (lower is better; counts from 2 points),
 *   4. the mean daytime hours at ≥ 250 lx melanopic EDI (higher is better; counts from 0.25 h).
 * The first difference that reaches its margin decides (smaller differences lie within the
 * models' resolution for planning). A strategy qualifies when it ranks above the baseline this way
 * and is worse than the baseline on neither of the first two; the best qualifying strategy is
 * recommended, otherwise the baseline. Melatonin suppression and daytime light only break ties:
 * a strategy that realigns the body clock is not ruled out because light at night suppresses
 * more melatonin (the sentences still say so).
 */
import { ALIGNMENT_MARGIN_H } from './alignment.js';
import { phaseShiftSentence } from './phase-words.js';
import type { Headline, Recommendation, StrategyResult } from './results-types.js';

export const KSS_SHARE_MARGIN = 0.01;
export const MISALIGNMENT_MARGIN_H = ALIGNMENT_MARGIN_H;
export const SUPPRESSION_MARGIN_PCT = 2;
export const DAYTIME_MARGIN_H = 0.25;

const pct = (v: number) => `${Math.round(v * 100)} %`;
const hm = (h: number) => {
  const min = Math.round(Math.abs(h) * 60);
  return min >= 60 ? `${Math.floor(min / 60)} h ${String(min % 60).padStart(2, '0')} min` : `${min} min`;
};

type Scored = Pick<StrategyResult, 'summary' | 'alignment'>;

export function headlines(personName: string, s: Scored, base: Scored, strategyName: string, isBaseline: boolean): Headline[] {
  const under = isBaseline ? 'Under the baseline' : `Under "${strategyName}"`;
  const shift = s.summary.mean_phase_shift_h;
  const phase = phaseShiftSentence({ person: personName, strategyName, isBaseline, later_h: shift, alignment: s.alignment, baselineAlignment: base.alignment });
  const sup = s.summary.mean_melatonin_suppression_pct;
  const baseSup = base.summary.mean_melatonin_suppression_pct;
  const melSentence =
    sup === null
      ? `${under}, no night could be assessed for melatonin suppression.`
      : `${under}, light at night suppresses ${personName}'s melatonin by about ${Math.round(sup)} % per night on average${isBaseline || baseSup === null ? '' : `, against ${Math.round(baseSup)} % under the baseline`}.`;
  const k = s.summary.work_hours_kss_ge_7_share;
  const baseK = base.summary.work_hours_kss_ge_7_share;
  const kssSentence =
    k === null
      ? `${under}, ${personName} has no work hours in this period.`
      : `${under}, ${personName} is predicted to be sleepy (KSS 7 or more) in ${pct(k)} of work hours${isBaseline || baseK === null ? '' : `, against ${pct(baseK)} under the baseline`}.`;
  return [
    { metric: 'phase_shift_h', value: shift, baseline: 0, sentence: phase },
    { metric: 'melatonin_suppression_pct', value: sup, baseline: baseSup, sentence: melSentence },
    { metric: 'work_hours_kss_ge_7_share', value: k, baseline: baseK, sentence: kssSentence },
  ];
}

/** The four figures the rule compares; null where a figure could not be assessed. */
export interface RuleFigures {
  /** Share of work hours at KSS ≥ 7 (0–1). */
  readonly sleepyWorkShare: number | null;
  readonly misalignment_h_per_day: number | null;
  readonly suppression_pct: number | null;
  readonly daytime_h_ge_250_lx: number | null;
}

export function ruleFiguresOf(s: Scored): RuleFigures {
  return {
    sleepyWorkShare: s.summary.work_hours_kss_ge_7_share,
    misalignment_h_per_day: s.alignment?.misalignment_h_per_day ?? null,
    suppression_pct: s.summary.mean_melatonin_suppression_pct,
    daytime_h_ge_250_lx: s.summary.mean_daytime_hours_ge_250_lx,
  };
}

/** How much better a is than b on each figure (positive = a better); 0 where either is missing. */
export interface Gains {
  readonly kss: number;
  readonly misalignment: number;
  readonly suppression: number;
  readonly daytime: number;
}

const lowerIsBetter = (a: number | null, b: number | null) => (a === null || b === null ? 0 : b - a);

export function gains(a: RuleFigures, b: RuleFigures): Gains {
  return {
    kss: lowerIsBetter(a.sleepyWorkShare, b.sleepyWorkShare),
    misalignment: lowerIsBetter(a.misalignment_h_per_day, b.misalignment_h_per_day),
    suppression: lowerIsBetter(a.suppression_pct, b.suppression_pct),
    daytime: a.daytime_h_ge_250_lx === null || b.daytime_h_ge_250_lx === null ? 0 : a.daytime_h_ge_250_lx - b.daytime_h_ge_250_lx,
  };
}

const ORDER: readonly { readonly key: keyof Gains; readonly margin: number }[] = [
  { key: 'kss', margin: KSS_SHARE_MARGIN },
  { key: 'misalignment', margin: MISALIGNMENT_MARGIN_H },
  { key: 'suppression', margin: SUPPRESSION_MARGIN_PCT },
  { key: 'daytime', margin: DAYTIME_MARGIN_H },
];
// Figures are rounded in results.json, so a difference of exactly a margin may carry float noise.
const EPS = 1e-9;

/** Positive when a ranks above b by the ordered comparison, negative below, 0 when no margin separates them. */
export function compareByRule(a: RuleFigures, b: RuleFigures): number {
  const g = gains(a, b);
  for (const { key, margin } of ORDER) if (Math.abs(g[key]) >= margin - EPS) return g[key];
  return 0;
}

/** A strategy qualifies against the baseline: it ranks above it and is worse on neither sleepiness at work nor alignment. */
export function qualifiesByRule(s: RuleFigures, baseline: RuleFigures): boolean {
  const g = gains(s, baseline);
  return compareByRule(s, baseline) > 0 && g.kss > -KSS_SHARE_MARGIN + EPS && g.misalignment > -MISALIGNMENT_MARGIN_H + EPS;
}

/** The recommended item: the best qualifying one by the ordered comparison, else the baseline. */
export function pickByRule<T>(baseline: T, others: readonly T[], figures: (t: T) => RuleFigures): T {
  const b = figures(baseline);
  let best: T = baseline;
  let bestF: RuleFigures | undefined;
  for (const o of others) {
    const f = figures(o);
    if (!qualifiesByRule(f, b)) continue;
    if (bestF === undefined || compareByRule(f, bestF) > 0) {
      best = o;
      bestF = f;
    }
  }
  return best;
}

export const RECOMMENDATION_RULE =
  'Compared with the baseline, in order: fewer work hours at KSS 7 or more (by at least 1 percentage point); ' +
  'less misalignment between the body clock and the person’s work and sleep hours (by at least 15 min a day: work in the biological night, main sleep in the biological day, waking before the biological night is over); ' +
  'then, only to break ties, less melatonin suppression per night (by at least 2 points) and more daytime hours at 250 lx melanopic EDI or more (by at least 15 min). ' +
  'The first difference that reaches its margin decides; a strategy is recommended only when it ranks above the baseline and is worse on neither sleepiness at work nor alignment.';

type RunOf = Omit<StrategyResult, 'headlines'>;

/** Why the chosen strategy beats the baseline, in words, including a tie-breaker it worsens. */
function reasonFor(personName: string, s: RunOf, base: RunOf): string {
  const g = gains(ruleFiguresOf(s), ruleFiguresOf(base));
  const parts: string[] = [];
  if (g.kss >= KSS_SHARE_MARGIN - EPS) parts.push(`${Math.round(g.kss * 100)} percentage points fewer work hours at KSS 7 or more`);
  if (g.misalignment >= MISALIGNMENT_MARGIN_H - EPS) parts.push(`${hm(g.misalignment)} a day less misalignment of ${personName}'s body clock with work and sleep hours`);
  if (g.suppression >= SUPPRESSION_MARGIN_PCT - EPS) parts.push(`${Math.round(g.suppression)} points less melatonin suppression per night`);
  if (g.daytime >= DAYTIME_MARGIN_H - EPS) parts.push(`${hm(g.daytime)} more daytime light at 250 lx melanopic EDI or more per day`);
  const costs: string[] = [];
  if (g.suppression <= -SUPPRESSION_MARGIN_PCT + EPS) costs.push(`melatonin suppression per night rises by ${Math.round(-g.suppression)} points`);
  if (g.daytime <= -DAYTIME_MARGIN_H + EPS) costs.push(`daytime light at 250 lx melanopic EDI or more falls by ${hm(-g.daytime)} per day`);
  const cost = costs.length === 0 ? '' : ` In exchange ${costs.join(' and ')}; the rule weighs these below sleepiness at work and alignment.`;
  return `For ${personName}, "${s.name}" gives ${parts.join(', ')} than the baseline.${cost}`;
}

export function recommend(personName: string, strategies: readonly RunOf[]): Recommendation {
  const base = strategies.find((s) => s.is_baseline);
  if (base === undefined) throw new Error('no baseline among the strategies');
  const best = pickByRule(base, strategies.filter((s) => !s.is_baseline), ruleFiguresOf);
  if (best === base) {
    return {
      strategy_id: base.id,
      strategy_name: base.name,
      rule: RECOMMENDATION_RULE,
      reason: `No strategy improved on the baseline for ${personName} by the rule's margins without worsening sleepiness at work or the alignment of ${personName}'s body clock with work and sleep hours.`,
    };
  }
  return { strategy_id: best.id, strategy_name: best.name, rule: RECOMMENDATION_RULE, reason: reasonFor(personName, best, base) };
}

