/**
 * Cohort results per strategy: median, IQR and 5–95 % of every headline metric, and bands over
 * per-day (or per-hour) series for charts. Pure; shared by the app and the command line.
 */
import { quantileOfSorted, summarizeDistribution, type DistributionSummary } from './quantiles.js';

/** Headline scalars of one occupant under one strategy (metric name → value, null if undefined). */
export type MetricValues = Readonly<Record<string, number | null>>;

/** What the pipeline returns per occupant: strategy id → its headline metrics. */
export interface OccupantOutcome {
  occupantIndex: number;
  byStrategy: Readonly<Record<string, MetricValues>>;
}

export interface CohortSummary {
  occupants: number;
  /** strategy id → metric name → summary (null when no occupant had a finite value). */
  strategies: Record<string, Record<string, DistributionSummary | null>>;
}

/** Summaries of every metric of every strategy that appears in any outcome. */
export function aggregateCohort(outcomes: readonly OccupantOutcome[]): CohortSummary {
  const columns = new Map<string, Map<string, (number | null)[]>>();
  for (const outcome of outcomes) {
    for (const [strategy, metrics] of Object.entries(outcome.byStrategy)) {
      let byMetric = columns.get(strategy);
      if (byMetric === undefined) columns.set(strategy, (byMetric = new Map()));
      for (const [metric, value] of Object.entries(metrics)) {
        let column = byMetric.get(metric);
        if (column === undefined) byMetric.set(metric, (column = []));
        column.push(value);
      }
    }
  }
  const strategies: CohortSummary['strategies'] = {};
  for (const [strategy, byMetric] of columns) {
    const summaries: Record<string, DistributionSummary | null> = {};
    for (const [metric, column] of byMetric) {
      // An occupant that lacks the metric altogether counts as missing, too.
      while (column.length < outcomes.length) column.push(null);
      summaries[metric] = summarizeDistribution(column);
    }
    strategies[strategy] = summaries;
  }
  return { occupants: outcomes.length, strategies };
}

/** Per-step bands of a series over occupants (chart ribbons). */
export interface SeriesBands {
  median: (number | null)[];
  q25: (number | null)[];
  q75: (number | null)[];
  p05: (number | null)[];
  p95: (number | null)[];
}

/** Bands at each step of equally indexed series (one per occupant); a step with no finite value gives null. */
export function seriesBands(series: readonly (readonly (number | null)[])[]): SeriesBands {
  let length = 0;
  for (const s of series) length = Math.max(length, s.length);
  const bands: SeriesBands = { median: [], q25: [], q75: [], p05: [], p95: [] };
  const column: number[] = [];
  for (let i = 0; i < length; i++) {
    column.length = 0;
    for (const s of series) {
      const v = s[i];
      if (v !== undefined && v !== null && Number.isFinite(v)) column.push(v);
    }
    if (column.length === 0) {
      for (const key of ['median', 'q25', 'q75', 'p05', 'p95'] as const) bands[key].push(null);
      continue;
    }
    column.sort((x, y) => x - y);
    bands.median.push(quantileOfSorted(column, 0.5));
    bands.q25.push(quantileOfSorted(column, 0.25));
    bands.q75.push(quantileOfSorted(column, 0.75));
    bands.p05.push(quantileOfSorted(column, 0.05));
    bands.p95.push(quantileOfSorted(column, 0.95));
  }
  return bands;
}
