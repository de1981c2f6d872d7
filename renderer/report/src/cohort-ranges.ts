// The briefing's cohort ranges from a results document's "cohort" section (results.json written
// by `zeitlight run --cohort n --seed s`): per person, strategy and headline metric the 5th, 25th,
// 50th, 75th and 95th percentiles across the virtual occupants (docs/results-format.md).
import type { CohortMetricRange, CohortSummary } from './briefing-document.js';

interface MetricLabel {
  readonly label: string;
  readonly unit: string;
  readonly decimals: number;
  /** Factor from the results unit to the printed unit (shares printed as %). */
  readonly scale: number;
}

/** Printed names of the cohort's headline metrics, in print order. */
export const COHORT_METRIC_LABELS: Readonly<Record<string, MetricLabel>> = {
  mean_phase_shift_h: { label: 'Phase shift vs baseline, last 7 days (+ later)', unit: 'h', decimals: 2, scale: 1 },
  mean_melatonin_suppression_pct: { label: 'Melatonin suppression', unit: '%', decimals: 0, scale: 1 },
  work_hours_kss_ge_7_share: { label: 'Work time with KSS ≥ 7', unit: '%', decimals: 0, scale: 100 },
  mean_phase_angle_dlmo_to_sleep_h: { label: 'DLMO to sleep onset', unit: 'h', decimals: 2, scale: 1 },
  mean_sleep_duration_h: { label: 'Main sleep duration', unit: 'h', decimals: 2, scale: 1 },
  mean_daytime_hours_ge_250_lx: { label: 'Daytime hours at mel. EDI ≥ 250 lx', unit: 'h', decimals: 1, scale: 1 },
  mean_pre_sleep_mel_edi_lx: { label: 'Pre-sleep mel. EDI (3 h)', unit: 'lx', decimals: 1, scale: 1 },
};

/** Strategy id of the baseline in results.json. */
const BASELINE_STRATEGY_ID = 'baseline';

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** Ranges from results.json's "cohort" section; undefined when there is none or it is unreadable. */
export function cohortFromResults(results: unknown): CohortSummary | undefined {
  if (!isRecord(results) || !isRecord(results['cohort'])) return undefined;
  const cohort = results['cohort'];
  const personas = cohort['personas'];
  const metrics = Array.isArray(cohort['metrics']) ? cohort['metrics'].filter((m): m is string => typeof m === 'string') : [];
  if (!Array.isArray(personas)) return undefined;
  const order = Object.keys(COHORT_METRIC_LABELS).filter((m) => metrics.includes(m));
  const ranges: CohortMetricRange[] = [];
  let occupants = num(cohort['size']) ?? 0;
  for (const p of personas) {
    if (!isRecord(p) || typeof p['id'] !== 'string' || !isRecord(p['summary']) || !isRecord(p['summary']['strategies'])) continue;
    const run = num(p['occupants_run']);
    if (run !== null) occupants = Math.min(occupants, run);
    for (const [strategyId, byMetric] of Object.entries(p['summary']['strategies'])) {
      if (!isRecord(byMetric)) continue;
      for (const metric of order) {
        const label = COHORT_METRIC_LABELS[metric];
        const d = byMetric[metric];
        // The baseline's phase shift is 0 by definition.
        if (label === undefined || !isRecord(d) || (metric === 'mean_phase_shift_h' && strategyId === BASELINE_STRATEGY_ID)) continue;
        const at = (k: string) => {
          const v = num(d[k]);
          return v === null ? null : v * label.scale;
        };
        ranges.push({ personaId: p['id'], strategyId, label: label.label, unit: label.unit, decimals: label.decimals, p05: at('p05'), q25: at('q25'), median: at('median'), q75: at('q75'), p95: at('p95') });
      }
    }
  }
  return { occupants, seed: num(cohort['seed']), ranges };
}
