// Frame shared by every results view: state of the run, cautions, persona and day pickers.
import type { ReactNode } from 'react';
import type { ResultsView } from '../results/view-model.js';
import type { ResultsState } from '../state/workspace-store.js';
import { RESULTS_CAUTIONS } from '../results/cautions.js';
import { RUN_CAUTION } from '../../../schedules/run/index.js';
import { formatDayLabel } from '../charts/clock.js';
import { wallClockOf } from '../charts/wall-clock.js';

export interface ResultsSelection {
  readonly personaId: string;
  readonly day: number;
}

export function Cautions() {
  return (
    <aside className="cautions" aria-label="Cautions">
      <strong>Read with care.</strong>
      <ul>
        {RESULTS_CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}

/**
 * Notes from the run (for example the gaps in a measured light log and how they were filled):
 * the results' warnings, which the view carries after the run's caution.
 */
export function runNotes(view: ResultsView): string[] {
  return view.cautions.filter((c) => c !== RUN_CAUTION && !RESULTS_CAUTIONS.includes(c));
}

export function RunNotes({ view }: { view: ResultsView }) {
  const notes = runNotes(view);
  if (notes.length === 0) return null;
  return (
    <aside className="cautions run-notes" aria-label="Notes from the run">
      <strong>Notes from the run.</strong>
      <ul>
        {notes.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
    </aside>
  );
}

/** The picked day, with its length when the clocks change that day ("Sun 29 Mar · 23 h"). */
function dayPickerLabel(view: ResultsView, day: number): string {
  const clock = wallClockOf(view);
  const length = Math.round(clock.dayLength_h(day) * 100) / 100;
  return `${formatDayLabel(view.startDate, day)}${clock.changesIn(day).length > 0 ? ` · ${length} h` : ''}`;
}

export function ResultsFrame({
  title,
  lead,
  results,
  selection,
  onSelect,
  showDay,
  showPerson = true,
  children,
}: {
  title: string;
  lead: string;
  results: ResultsState;
  selection: ResultsSelection;
  onSelect: (s: ResultsSelection) => void;
  showDay: boolean;
  /** False for views that show every person at once (the summary). */
  showPerson?: boolean;
  children: (view: ResultsView, personaId: string) => ReactNode;
}) {
  const view = results.status === 'ready' ? results.view : results.status === 'running' ? results.previous : null;
  const personaId = view?.personas.some((p) => p.id === selection.personaId) === true ? selection.personaId : (view?.personas[0]?.id ?? '');
  return (
    <section className="panel" aria-labelledby="results-title">
      <header className="panel-header">
        <h2 id="results-title">{title}</h2>
        <p className="panel-lead">{lead}</p>
      </header>
      {results.status === 'running' && results.previous !== null && (
        <p className="banner" role="status">
          Updating after your edit… {results.stage} — the results below are from before it.
        </p>
      )}
      <Cautions />
      {view !== null && <RunNotes view={view} />}
      {view !== null && (showPerson || showDay) && (
        <div className="results-controls">
          {showPerson && (
          <label>
            Person
            <select value={personaId} onChange={(e) => onSelect({ ...selection, personaId: e.target.value })}>
              {view.personas.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                </option>
              ))}
            </select>
          </label>
          )}
          {showDay && (
            <label className="day-picker">
              Day
              <input type="range" min={0} max={view.days - 1} value={Math.min(selection.day, view.days - 1)} onChange={(e) => onSelect({ ...selection, day: Number(e.target.value) })} />
              <output>{dayPickerLabel(view, Math.min(selection.day, view.days - 1))}</output>
            </label>
          )}
        </div>
      )}
      {results.status === 'idle' && <p className="empty">Open or create a scenario to see results.</p>}
      {results.status === 'running' && results.previous === null && <p className="empty">Running the scenario ({results.stage}); the results appear here when it is done.</p>}
      {results.status === 'unavailable' && <p className="empty">{results.message}</p>}
      {results.status === 'failed' && <p className="empty empty-error">{results.message}</p>}
      {view !== null && <div className="results-body">{children(view, personaId)}</div>}
    </section>
  );
}
