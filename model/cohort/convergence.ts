/**
 * Running convergence readout of a cohort and its stop rule.
 *
 * Results may arrive in any order (several workers); the tracker only reads the contiguous
 * prefix of occupants 0 … k − 1 and takes a checkpoint each time k reaches a multiple of the batch
 * size. At a checkpoint it records, for every headline metric (per strategy), the running median
 * and IQR. The cohort has converged at the first checkpoint (with k ≥ minOccupants) where, for
 * every metric, both the median and the IQR moved by no more than that metric's tolerance since
 * the previous checkpoint (i.e. over the last batch). Because checkpoints depend only on the
 * prefix, the stop point is the same for any number of workers.
 */
import { summarizeDistribution } from './quantiles.js';
import type { OccupantOutcome } from './aggregate-cohort.js';

export interface ConvergenceOptions {
  /** Occupants per batch (checkpoint spacing). */
  batchSize: number;
  /** Allowed change of median and IQR over one batch, in each metric's own unit; `default` for the rest. */
  tolerance: Readonly<Record<string, number>> & { default: number };
  /** No stop before this many occupants (default: two batches). */
  minOccupants?: number;
}

export interface MetricReadout {
  median: number | null;
  iqr: number | null;
  /** |Δ| since the previous checkpoint (null at the first). */
  medianChange: number | null;
  iqrChange: number | null;
}

export interface ConvergenceCheckpoint {
  occupants: number;
  /** "strategy/metric" → readout. */
  metrics: Record<string, MetricReadout>;
  converged: boolean;
}

/** Key of a metric of a strategy in readouts and tolerances ("strategy/metric"); a bare metric name also matches a tolerance. */
export function metricKey(strategy: string, metric: string): string {
  return `${strategy}/${metric}`;
}

export class CohortConvergence {
  private readonly batchSize: number;
  private readonly minOccupants: number;
  private readonly outcomes: (OccupantOutcome | undefined)[] = [];
  private prefix = 0;
  private readonly checkpointList: ConvergenceCheckpoint[] = [];
  /** "strategy/metric" → values of occupants 0 … prefix − 1 (null where absent). */
  private readonly columns = new Map<string, { strategy: string; metric: string; values: (number | null)[] }>();
  private stop: number | null = null;

  constructor(private readonly options: ConvergenceOptions) {
    if (!Number.isSafeInteger(options.batchSize) || options.batchSize < 1) throw new RangeError(`batchSize: must be a whole number ≥ 1, got ${String(options.batchSize)}`);
    for (const [k, v] of Object.entries(options.tolerance)) {
      if (!(Number.isFinite(v) && v >= 0)) throw new RangeError(`tolerance.${k}: must be a finite number ≥ 0, got ${String(v)}`);
    }
    this.batchSize = options.batchSize;
    this.minOccupants = options.minOccupants ?? 2 * options.batchSize;
  }

  /** Adds one occupant's outcome (any order). Returns the checkpoints this addition completed. */
  add(outcome: OccupantOutcome): ConvergenceCheckpoint[] {
    const i = outcome.occupantIndex;
    if (!Number.isSafeInteger(i) || i < 0) throw new RangeError(`occupantIndex: must be a whole number ≥ 0, got ${String(i)}`);
    if (this.outcomes[i] !== undefined) throw new RangeError(`occupant ${i} was added twice`);
    this.outcomes[i] = outcome;
    const completed: ConvergenceCheckpoint[] = [];
    let next: OccupantOutcome | undefined;
    while ((next = this.outcomes[this.prefix]) !== undefined) {
      this.appendToColumns(next);
      this.prefix++;
      if (this.prefix % this.batchSize === 0) completed.push(this.checkpoint());
    }
    return completed;
  }

  /** Occupants 0 … k − 1 all present. */
  get contiguousOccupants(): number {
    return this.prefix;
  }

  /** Occupant count at which the stop rule first held, or null. */
  get stopAt(): number | null {
    return this.stop;
  }

  get checkpoints(): readonly ConvergenceCheckpoint[] {
    return this.checkpointList;
  }

  private toleranceFor(strategy: string, metric: string): number {
    const t = this.options.tolerance;
    return t[metricKey(strategy, metric)] ?? t[metric] ?? t.default;
  }

  private appendToColumns(outcome: OccupantOutcome): void {
    const n = this.prefix;
    for (const [strategy, metrics] of Object.entries(outcome.byStrategy)) {
      for (const [metric, value] of Object.entries(metrics)) {
        const key = metricKey(strategy, metric);
        let c = this.columns.get(key);
        if (c === undefined) this.columns.set(key, (c = { strategy, metric, values: new Array<number | null>(n).fill(null) }));
        c.values.push(value);
      }
    }
    // Metrics this occupant lacks count as missing for it.
    for (const c of this.columns.values()) if (c.values.length === n) c.values.push(null);
  }

  private checkpoint(): ConvergenceCheckpoint {
    const n = this.prefix;
    const columns = this.columns;
    const previous = this.checkpointList[this.checkpointList.length - 1];
    const metrics: Record<string, MetricReadout> = {};
    let allWithin = previous !== undefined;
    for (const key of [...columns.keys()].sort()) {
      const c = columns.get(key) as { strategy: string; metric: string; values: (number | null)[] };
      const s = summarizeDistribution(c.values);
      const before = previous?.metrics[key];
      const change = (now: number | null, then: number | null | undefined): number | null =>
        now === null || then === null || then === undefined ? null : Math.abs(now - then);
      const readout: MetricReadout = {
        median: s?.median ?? null,
        iqr: s?.iqr ?? null,
        medianChange: change(s?.median ?? null, before?.median),
        iqrChange: change(s?.iqr ?? null, before?.iqr),
      };
      metrics[key] = readout;
      const tol = this.toleranceFor(c.strategy, c.metric);
      const bothMissing = readout.median === null && (before === undefined || before.median === null);
      if (!bothMissing && !(readout.medianChange !== null && readout.medianChange <= tol && readout.iqrChange !== null && readout.iqrChange <= tol)) {
        allWithin = false;
      }
    }
    const converged = allWithin && n >= this.minOccupants;
    const cp: ConvergenceCheckpoint = { occupants: n, metrics, converged };
    this.checkpointList.push(cp);
    if (converged && this.stop === null) this.stop = n;
    return cp;
  }
}

/**
 * Suggested stop rule for headline metrics (tolerances in each metric's unit, per batch of 50):
 * timings 0.05 h (3 min, a tenth of the usual 30-min melatonin sampling step — common practice),
 * percentages 1 percentage point, shares 0.01. At least 200 occupants before a stop.
 */
export const DEFAULT_COHORT_CONVERGENCE: ConvergenceOptions = {
  batchSize: 50,
  minOccupants: 200,
  tolerance: {
    default: 0.05,
    phaseShift_h: 0.05,
    dlmo_h: 0.05,
    cbtmin_h: 0.05,
    midSleep_h: 0.05,
    sleepOnset_h: 0.05,
    sleepOffset_h: 0.05,
    melatoninSuppression_pct: 1,
    kss7Share_pct: 1,
    kss7Share: 0.01,
  },
};
