// Cohort outcome → rows of ranges (median, IQR, 5–95 %) per persona, strategy and metric, for
// the cohort view and the briefing's cohort section.
import type { CohortSummary as BriefingCohort } from '../../report/src/briefing-document.js';
import type { NamedItem } from '../results/view-model.js';
import type { PersonaCohort } from './cohort-pool.js';
import { COHORT_METRICS } from './occupant-job.js';

export interface RangeRow {
  readonly personaId: string;
  readonly strategyId: string;
  readonly strategyName: string;
  readonly metricId: string;
  readonly label: string;
  readonly unit: string;
  readonly decimals: number;
  /** Occupants with a value. */
  readonly n: number;
  readonly median: number | null;
  readonly q25: number | null;
  readonly q75: number | null;
  readonly p05: number | null;
  readonly p95: number | null;
}

export function rangeRows(cohort: PersonaCohort, strategies: readonly NamedItem[]): RangeRow[] {
  const rows: RangeRow[] = [];
  for (const metric of COHORT_METRICS) {
    for (const strategy of strategies) {
      const bucket = cohort.summary.strategies[strategy.id];
      if (bucket === undefined) continue;
      // The baseline's shift versus itself is zero by definition: not a range worth showing.
      if (metric.id === 'phaseShift_h' && strategy.id === 'baseline') continue;
      const s = bucket[metric.id] ?? null;
      rows.push({
        personaId: cohort.personaId,
        strategyId: strategy.id,
        strategyName: strategy.name,
        metricId: metric.id,
        label: metric.label,
        unit: metric.unit,
        decimals: metric.decimals,
        n: s?.n ?? 0,
        median: s?.median ?? null,
        q25: s?.q25 ?? null,
        q75: s?.q75 ?? null,
        p05: s?.p05 ?? null,
        p95: s?.p95 ?? null,
      });
    }
  }
  return rows;
}

/** The cohort section of the briefing document. */
export function briefingCohort(personas: readonly PersonaCohort[], strategies: readonly NamedItem[], seed: number): BriefingCohort {
  return {
    occupants: Math.min(...personas.map((p) => p.occupants)),
    seed,
    ranges: personas.flatMap((p) =>
      rangeRows(p, strategies).map((r) => ({ personaId: r.personaId, strategyId: r.strategyId, label: r.label, unit: r.unit, decimals: r.decimals, p05: r.p05, median: r.median, p95: r.p95 })),
    ),
  };
}
