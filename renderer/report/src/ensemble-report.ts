// The model ensemble in a briefing printed from results.json: each metric's range across the
// models (results.json "ensemble", per strategy) on the briefing's own metric ids and units, and
// the models with their citations and the rank changes in words for the methods and results pages.
import type { RunResults } from '../../../schedules/run/index.js';
import { viewEnsembleFromResults, withViewEnsemble, type EnsembleViewMetric } from '../../src/results/ensemble-view.js';
import type { ResultsView } from '../../src/results/view-model.js';

/** The briefing's metric ids (results-view.ts) for the figures with a range. */
export const REPORT_ENSEMBLE_METRICS: readonly EnsembleViewMetric[] = [
  { metricId: 'work-kss7-share', field: 'work_hours_kss_ge_7_share', scale: 100 },
  { metricId: 'suppression', field: 'mean_melatonin_suppression_pct', scale: 1 },
  { metricId: 'phase-shift', field: 'mean_phase_shift_h', scale: 1 },
  { metricId: 'sleep-timing', field: 'mean_phase_angle_dlmo_to_sleep_h', scale: 1 },
  { metricId: 'sleep-duration', field: 'mean_sleep_duration_h', scale: 1 },
  { metricId: 'misalignment', field: 'misalignment_h_per_day', scale: 1 },
];

/** The view with the ranges of the results' ensemble, or the view unchanged when the run had none. */
export function reportViewWithEnsemble(results: RunResults, view: ResultsView): ResultsView {
  const ensemble = viewEnsembleFromResults(results, REPORT_ENSEMBLE_METRICS);
  return ensemble === null ? view : withViewEnsemble(view, ensemble);
}
