// The model ensemble's ranges for the results on screen. They arrive after the default model's
// results (the worker runs the ensemble second) and belong to exactly one results view: a newer
// view shows without ranges until its own ensemble arrives. Kept apart from the workspace store so
// that the ranges arriving is not a new results run.
import { withViewEnsemble, type ViewEnsemble } from '../results/ensemble-view.js';
import type { ResultsView } from '../results/view-model.js';

export interface EnsembleSnapshot {
  readonly view: ResultsView;
  readonly ensemble: ViewEnsemble;
}

export class EnsembleStore {
  private snapshot: EnsembleSnapshot | null = null;
  private readonly listeners = new Set<() => void>();

  readonly subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  readonly getSnapshot = (): EnsembleSnapshot | null => this.snapshot;

  set(view: ResultsView, ensemble: ViewEnsemble): void {
    this.snapshot = { view, ensemble };
    for (const l of this.listeners) l();
  }

  /** The view with the ranges of its ensemble, or the view as it is when none has arrived for it. */
  viewWithEnsemble(view: ResultsView): ResultsView {
    return this.snapshot !== null && this.snapshot.view === view ? withViewEnsemble(view, this.snapshot.ensemble) : view;
  }
}
