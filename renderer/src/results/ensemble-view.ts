// The model ensemble for the results views: the range of each headline figure across the models
// (results.json "ensemble", schedules/run/ensemble.ts) in the views' metric ids and units, and the
// models with the sentences about rank changes. The app receives it after the default model's
// results (the worker runs the ensemble second) and lays it over the view it belongs to.
import type { EnsembleMetric, EnsembleRange, RunResults } from '../../../schedules/run/index.js';
import type { MetricEnsemble, ResultsView, ViewEnsembleModels } from './view-model.js';

/** A results figure's view metric id and the factor from the results unit to the view unit. */
export interface EnsembleViewMetric {
  readonly metricId: string;
  readonly field: EnsembleMetric;
  readonly scale: number;
}

/** The app's metric ids (results-adapter.ts). */
export const ENSEMBLE_VIEW_METRICS: readonly EnsembleViewMetric[] = [
  { metricId: 'phase-shift', field: 'mean_phase_shift_h', scale: 1 },
  { metricId: 'suppression', field: 'mean_melatonin_suppression_pct', scale: 1 },
  { metricId: 'kss7', field: 'work_hours_kss_ge_7_share', scale: 100 },
  { metricId: 'sleep-timing', field: 'mean_phase_angle_dlmo_to_sleep_h', scale: 1 },
  { metricId: 'sleep', field: 'mean_sleep_duration_h', scale: 1 },
  { metricId: 'misalignment', field: 'misalignment_h_per_day', scale: 1 },
];

export interface EnsembleCell extends MetricEnsemble {
  readonly personaId: string;
  readonly strategyId: string;
  readonly metricId: string;
}

/** What the worker sends once the ensemble has run (small: no series). */
export interface ViewEnsemble extends ViewEnsembleModels {
  readonly cells: readonly EnsembleCell[];
}

/** A results range in a view unit; undefined without at least one model's value. */
export function metricEnsemble(range: EnsembleRange | undefined, scale: number): MetricEnsemble | undefined {
  if (range === undefined || range.min === null || range.max === null) return undefined;
  return { min: range.min * scale, max: range.max * scale, models: range.model_count };
}

/** The ensemble part of a results document for the views, or null when the run had none. */
export function viewEnsembleFromResults(results: RunResults, metrics: readonly EnsembleViewMetric[] = ENSEMBLE_VIEW_METRICS): ViewEnsemble | null {
  const e = results.ensemble;
  if (e === undefined) return null;
  const cells: EnsembleCell[] = [];
  for (const p of results.personas) {
    for (const s of p.strategies) {
      for (const m of metrics) {
        const range = metricEnsemble(s.ensemble?.[m.field], m.scale);
        if (range !== undefined) cells.push({ personaId: p.id, strategyId: s.id, metricId: m.metricId, ...range });
      }
    }
  }
  return {
    models: e.models.map((m) => ({ role: m.role, name: m.name, source: m.source })),
    pairs: e.members.length,
    rankings: results.personas.map((p) => ({ personaId: p.id, sentences: (p.ensemble_ranking?.strategies ?? []).flatMap((r) => (r.sentence === null ? [] : [r.sentence])) })),
    cells,
  };
}

/** The view with the ensemble's ranges on its metrics and the models named. */
export function withViewEnsemble(view: ResultsView, ensemble: ViewEnsemble): ResultsView {
  const byKey = new Map(ensemble.cells.map((c) => [`${c.personaId}\u0000${c.strategyId}\u0000${c.metricId}`, c]));
  return {
    ...view,
    runs: view.runs.map((r) => ({
      ...r,
      metrics: r.metrics.map((m) => {
        const c = byKey.get(`${r.personaId}\u0000${r.strategyId}\u0000${m.id}`);
        return c === undefined ? m : { ...m, ensemble: { min: c.min, max: c.max, models: c.models } };
      }),
    })),
    ensemble: { models: ensemble.models, pairs: ensemble.pairs, rankings: ensemble.rankings },
  };
}

/** "3 published body-clock models and 2 sleepiness models" (the sleepiness models only when more than one). */
export function ensembleModelsWords(e: ViewEnsembleModels): string {
  const clocks = e.models.filter((m) => m.role === 'body clock').length;
  const kss = e.models.filter((m) => m.role === 'sleepiness').length;
  return `${clocks} published body-clock model${clocks === 1 ? '' : 's'}${kss > 1 ? ` and ${kss} sleepiness (KSS) models` : ''}`;
}
