/**
 * Headline sentences and the recommended strategy per persona.
 *
 * Rule (docs/methods/pipeline.md §5): compare each strategy with the baseline on
 *   1. the share of work hours at KSS ≥ 7 (lower is better),
 *   2. the mean melatonin suppression per night (lower is better),
 *   3. the mean daytime hours at ≥ 250 lx melanopic EDI (higher is better),
 * in that order, a difference counting only when it reaches 1 percentage point, 2 percentage
 * points and 0.25 h respectively (smaller differences lie within the models' resolution for
 * planning). A strategy qualifies when it is better than the baseline on at least one of the
 * three and worse on none of the first two by more than those margins; the best qualifying
 * strategy by the ordered comparison is recommended. When none qualifies, the baseline is.
 */
import type { Headline, Recommendation, StrategyResult, StrategySummary } from './results-types.js';

export const KSS_SHARE_MARGIN = 0.01;
export const SUPPRESSION_MARGIN_PCT = 2;
export const DAYTIME_MARGIN_H = 0.25;

const pct = (v: number) => `${Math.round(v * 100)} %`;
const hm = (h: number) => {
  const min = Math.round(Math.abs(h) * 60);
  return min >= 60 ? `${Math.floor(min / 60)} h ${String(min % 60).padStart(2, '0')} min` : `${min} min`;
};

export function headlines(personName: string, s: StrategySummary, base: StrategySummary, strategyName: string, isBaseline: boolean): Headline[] {
  const under = isBaseline ? 'Under the baseline' : `Under "${strategyName}"`;
  const shift = s.mean_phase_shift_h;
  const phase =
    isBaseline
      ? `The baseline is the reference for phase shifts: ${personName}'s body clock is compared with it under each strategy.`
      : shift === null
        ? `${under}, no phase shift could be read for ${personName} (no matching body-clock minimum).`
        : Math.abs(shift) < 5 / 60
          ? `${under}, ${personName}'s body clock keeps about the same timing as under the baseline (within 5 min, last days of the run).`
          : `${under}, ${personName}'s body clock runs about ${hm(shift)} ${shift < 0 ? 'earlier' : 'later'} than under the baseline (core-temperature minimum, mean of the last days of the run).`;
  const sup = s.mean_melatonin_suppression_pct;
  const melSentence =
    sup === null
      ? `${under}, no night could be assessed for melatonin suppression.`
      : `${under}, light at night suppresses ${personName}'s melatonin by about ${Math.round(sup)} % per night on average${isBaseline || base.mean_melatonin_suppression_pct === null ? '' : `, against ${Math.round(base.mean_melatonin_suppression_pct)} % under the baseline`}.`;
  const k = s.work_hours_kss_ge_7_share;
  const kssSentence =
    k === null
      ? `${under}, ${personName} has no work hours in this period.`
      : `${under}, ${personName} is predicted to be sleepy (KSS 7 or more) in ${pct(k)} of work hours${isBaseline || base.work_hours_kss_ge_7_share === null ? '' : `, against ${pct(base.work_hours_kss_ge_7_share)} under the baseline`}.`;
  return [
    { metric: 'phase_shift_h', value: shift, baseline: 0, sentence: phase },
    { metric: 'melatonin_suppression_pct', value: sup, baseline: base.mean_melatonin_suppression_pct, sentence: melSentence },
    { metric: 'work_hours_kss_ge_7_share', value: k, baseline: base.work_hours_kss_ge_7_share, sentence: kssSentence },
  ];
}

interface Gains {
  readonly kss: number;
  readonly suppression: number;
  readonly daytime: number;
}

function gains(s: StrategySummary, b: StrategySummary): Gains {
  return {
    kss: (b.work_hours_kss_ge_7_share ?? 0) - (s.work_hours_kss_ge_7_share ?? 0),
    suppression: (b.mean_melatonin_suppression_pct ?? 0) - (s.mean_melatonin_suppression_pct ?? 0),
    daytime: s.mean_daytime_hours_ge_250_lx - b.mean_daytime_hours_ge_250_lx,
  };
}

/** Positive when a is better than b by the ordered comparison. */
function compare(a: Gains, b: Gains): number {
  if (Math.abs(a.kss - b.kss) >= KSS_SHARE_MARGIN) return a.kss - b.kss;
  if (Math.abs(a.suppression - b.suppression) >= SUPPRESSION_MARGIN_PCT) return a.suppression - b.suppression;
  if (Math.abs(a.daytime - b.daytime) >= DAYTIME_MARGIN_H) return a.daytime - b.daytime;
  return 0;
}

export const RECOMMENDATION_RULE =
  'Compared with the baseline, in order: fewer work hours at KSS 7 or more (by at least 1 percentage point), less melatonin suppression per night (by at least 2 points), ' +
  'more daytime hours at 250 lx melanopic EDI or more (by at least 15 min); a strategy must improve one and worsen neither of the first two.';

export function recommend(personName: string, strategies: readonly Omit<StrategyResult, 'headlines'>[]): Recommendation {
  const base = strategies.find((s) => s.is_baseline);
  if (base === undefined) throw new Error('no baseline among the strategies');
  let best: { s: Omit<StrategyResult, 'headlines'>; g: Gains } | undefined;
  for (const s of strategies) {
    if (s.is_baseline) continue;
    const g = gains(s.summary, base.summary);
    const improves = g.kss >= KSS_SHARE_MARGIN || g.suppression >= SUPPRESSION_MARGIN_PCT || g.daytime >= DAYTIME_MARGIN_H;
    const worsens = g.kss <= -KSS_SHARE_MARGIN || g.suppression <= -SUPPRESSION_MARGIN_PCT;
    if (!improves || worsens) continue;
    if (best === undefined || compare(g, best.g) > 0) best = { s, g };
  }
  if (best === undefined) {
    return { strategy_id: base.id, strategy_name: base.name, rule: RECOMMENDATION_RULE, reason: `No strategy improved on the baseline for ${personName} by the rule's margins without worsening sleepiness at work or melatonin suppression.` };
  }
  const g = best.g;
  const parts: string[] = [];
  if (g.kss >= KSS_SHARE_MARGIN) parts.push(`${Math.round(g.kss * 100)} percentage points fewer work hours at KSS 7 or more`);
  if (g.suppression >= SUPPRESSION_MARGIN_PCT) parts.push(`${Math.round(g.suppression)} points less melatonin suppression per night`);
  if (g.daytime >= DAYTIME_MARGIN_H) parts.push(`${hm(g.daytime)} more daytime light at 250 lx melanopic EDI or more per day`);
  return { strategy_id: best.s.id, strategy_name: best.s.name, rule: RECOMMENDATION_RULE, reason: `For ${personName}, "${best.s.name}" gives ${parts.join(', ')} than the baseline.` };
}
