// React access to the ensemble's ranges: the results view with them once they have arrived.
import { useMemo, useSyncExternalStore } from 'react';
import { withViewEnsemble } from '../results/ensemble-view.js';
import type { ResultsView } from '../results/view-model.js';
import { useController } from './workspace-context.js';

export function useEnsembleView(view: ResultsView): ResultsView {
  const { ensemble } = useController();
  const snapshot = useSyncExternalStore(ensemble.subscribe, ensemble.getSnapshot);
  return useMemo(() => (snapshot !== null && snapshot.view === view ? withViewEnsemble(view, snapshot.ensemble) : view), [snapshot, view]);
}
