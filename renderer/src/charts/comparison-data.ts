// The comparison table: each metric for the baseline and every strategy, the difference
// versus baseline, and a one-line plain reading of that difference.
import type { MetricEnsemble, MetricValue, NamedItem, RunView } from '../results/view-model.js';
import { formatClockValue, formatDuration, formatNumber, formatSigned, formatSignedDuration } from './number-format.js';

export interface ComparisonCell {
  readonly strategyId: string;
  readonly value: number | null;
  /** strategy − baseline, in the metric's unit; null for the baseline itself or missing values. */
  readonly difference: number | null;
  readonly verdict: 'better' | 'worse' | 'same' | 'neutral' | 'unknown';
  readonly reading: string;
  /** The value's range across the model ensemble, once it has run. */
  readonly ensemble?: MetricEnsemble;
}

export interface ComparisonRow {
  readonly metricId: string;
  readonly label: string;
  readonly unit: string;
  readonly decimals: number;
  /** Values are local clock times (hours), shown as hh:mm. */
  readonly clock: boolean;
  readonly cells: readonly ComparisonCell[];
}

export { formatNumber };

/** A metric value as shown: hh:mm for a clock time, else fixed decimals with "−" for negatives. */
export function formatMetricValue(metric: { readonly clock?: boolean; readonly decimals: number }, value: number | null): string {
  return metric.clock === true ? formatClockValue(value) : formatNumber(value, metric.decimals);
}

/** A difference versus baseline as shown: "+1 h 05 min" for clock times, else "+1.2" / "−0.4" / "±0.0". */
export function formatMetricDifference(metric: { readonly clock?: boolean; readonly decimals: number }, difference: number): string {
  return metric.clock === true ? formatSignedDuration(difference) : formatSigned(difference, metric.decimals);
}

function readingFor(metric: MetricValue, difference: number, strategyName: string, note: string | undefined): { verdict: ComparisonCell['verdict']; reading: string } {
  // Clock times compare to the minute, other values at their shown decimals.
  const threshold = metric.clock === true ? 0.5 / 60 : 0.5 * 10 ** -metric.decimals;
  const tail = note === undefined ? '' : ` — ${note}`;
  if (Math.abs(difference) < threshold) return { verdict: 'same', reading: `${metric.label}: no change with ${strategyName}${tail}.` };
  const up = difference > 0;
  const amount = metric.clock === true ? formatDuration(difference) : `${formatNumber(Math.abs(difference), metric.decimals)}${metric.unit === '' ? '' : ` ${metric.unit}`}`;
  const word = up ? metric.increaseWord : metric.decreaseWord;
  const verdict = metric.better === 'none' ? 'neutral' : (metric.better === 'higher') === up ? 'better' : 'worse';
  const judgement = verdict === 'better' ? ' (favourable)' : verdict === 'worse' ? ' (unfavourable)' : '';
  return { verdict, reading: `${metric.label} ${amount} ${word} than baseline with ${strategyName}${judgement}${tail}.` };
}

export function comparisonRows(runs: readonly RunView[], strategies: readonly NamedItem[], baselineId: string): ComparisonRow[] {
  const baseline = runs.find((r) => r.strategyId === baselineId);
  if (baseline === undefined) return [];
  return baseline.metrics.map((metric) => ({
    metricId: metric.id,
    label: metric.label,
    unit: metric.unit,
    decimals: metric.decimals,
    clock: metric.clock === true,
    cells: strategies.map((strategy): ComparisonCell => {
      const run = runs.find((r) => r.strategyId === strategy.id);
      const own = run?.metrics.find((m) => m.id === metric.id);
      const value = own?.value ?? null;
      const ensemble = own?.ensemble === undefined ? {} : { ensemble: own.ensemble };
      if (strategy.id === baselineId) return { strategyId: strategy.id, value, difference: null, verdict: 'neutral', reading: 'Baseline.', ...ensemble };
      if (value === null || metric.value === null) return { strategyId: strategy.id, value, difference: null, verdict: 'unknown', reading: `${metric.label}: not available.`, ...ensemble };
      const difference = value - metric.value;
      return { strategyId: strategy.id, value, difference, ...readingFor(metric, difference, strategy.name, own?.note), ...ensemble };
    }),
  }));
}

/** "0.30–0.55 across 3 models" ("−0.55 to −0.30 …" with negative values), or "same with all 3 models" when they agree at the shown decimals. */
export function ensembleRangeText(ensemble: MetricEnsemble, decimals: number): string {
  const lo = formatNumber(ensemble.min, decimals);
  const hi = formatNumber(ensemble.max, decimals);
  if (lo === hi) return `same with all ${ensemble.models} models`;
  // an en dash beside a negative number would read as a second minus sign
  return `${lo}${ensemble.min < 0 ? ' to ' : '–'}${hi} across ${ensemble.models} models`;
}
