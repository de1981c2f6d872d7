// The workspace: build the scenario on the left (Site, Places, People, Strategies), read the
// results (Summary, Light at the eye, Body clock, Melatonin, Sleepiness, Sleep, Compare, Cohort).
// A scenario opens on its Summary (the answer first); a new empty one on the People editor.
import { useEffect, useState } from 'react';
import { useController, useWorkspace } from './state/workspace-context.js';
import { isDirty } from './state/workspace-store.js';
import { canRedo, canUndo } from './state/history.js';
import { SitePanel } from './panels/SitePanel.js';
import { PlacesPanel } from './panels/PlacesPanel.js';
import { PeoplePanel } from './panels/PeoplePanel.js';
import { StrategiesPanel } from './panels/StrategiesPanel.js';
import { ResultsFrame, type ResultsSelection } from './views/ResultsFrame.js';
import { LightAtEyeView } from './views/LightAtEyeView.js';
import { BodyClockView } from './views/BodyClockView.js';
import { MelatoninView } from './views/MelatoninView.js';
import { SleepinessView } from './views/SleepinessView.js';
import { SleepView } from './views/SleepView.js';
import { CompareView } from './views/CompareView.js';
import { ProblemsList } from './components/ProblemsList.js';
import { CohortView } from './views/CohortView.js';
import { SummaryView } from './views/SummaryView.js';
import { RunStatusLine } from './views/RunStatusLine.js';

type ViewId = 'site' | 'places' | 'people' | 'strategies' | 'summary' | 'light' | 'clock' | 'melatonin' | 'sleepiness' | 'sleep' | 'compare' | 'cohort';

const BUILD: readonly { id: ViewId; label: string }[] = [
  { id: 'site', label: 'Site' },
  { id: 'places', label: 'Places' },
  { id: 'people', label: 'People' },
  { id: 'strategies', label: 'Strategies' },
];
const RESULTS: readonly { id: ViewId; label: string; lead: string; day: boolean }[] = [
  { id: 'summary', label: 'Summary', lead: 'The answer first: what to do for each person and why, in plain words, with the headline figures of every strategy.', day: false },
  { id: 'light', label: 'Light at the eye', lead: 'Melanopic EDI at the eye through one day, by source.', day: true },
  { id: 'clock', label: 'Body clock', lead: 'Circadian phase (DLMO, CBTmin) day by day for each strategy.', day: false },
  { id: 'melatonin', label: 'Melatonin', lead: 'Modelled melatonin through one night, with and without light.', day: true },
  { id: 'sleepiness', label: 'Sleepiness', lead: 'Karolinska Sleepiness Scale (KSS) by hour.', day: true },
  { id: 'sleep', label: 'Sleep', lead: 'Sleep and nap episodes for each strategy.', day: false },
  { id: 'compare', label: 'Compare', lead: 'Strategies side by side with their differences from the baseline.', day: false },
];

function StartScreen() {
  const controller = useController();
  const notice = useWorkspace().notice;
  // An error from opening a file stays on the start page until the next attempt (the notice itself fades).
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    if (notice?.tone === 'error') setError(notice.text);
  }, [notice]);
  const open = () => {
    setError(null);
    void controller.open();
  };
  return (
    <section className="start">
      <h1>Zeitlight</h1>
      <p className="panel-lead">Light at the eye, body clock, melatonin and sleepiness for buildings and the people in them.</p>
      <div className="start-actions">
        <button type="button" className="button button-primary" onClick={() => controller.openDemo()}>
          Open the demo scenario
        </button>
        <button type="button" className="button" onClick={() => controller.newDocument()}>
          New scenario
        </button>
        <button type="button" className="button" onClick={open}>
          Open a scenario file…
        </button>
      </div>
      {error !== null && (
        <div className="banner banner-warning start-error" role="alert">
          <strong>The file could not be opened.</strong> {error}
        </div>
      )}
    </section>
  );
}

export function App() {
  const controller = useController();
  const state = useWorkspace();
  const [view, setView] = useState<ViewId>('summary');
  const [selection, setSelection] = useState<ResultsSelection>({ personaId: '', day: 0 });
  const scenario = state.history.present;
  const dirty = isDirty(state);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => controller.handleKey(e);
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [controller]);
  // A loaded document opens on its answer; a new empty one on the People editor.
  useEffect(() => {
    if (state.landing.seq > 0) setView(state.landing.on === 'editor' ? 'people' : 'summary');
  }, [state.landing]);
  useEffect(() => {
    document.title = `${dirty ? '• ' : ''}${state.displayName} — Zeitlight`;
  }, [dirty, state.displayName]);
  useEffect(() => {
    if (state.notice === null) return;
    const t = setTimeout(() => controller.store.clearNotice(), 5000);
    return () => clearTimeout(t);
  }, [state.notice, controller]);

  if (scenario === null) return <StartScreen />;
  const resultsEntry = RESULTS.find((r) => r.id === view);
  const results = state.results;

  return (
    <div className="app">
      <header className="topbar">
        <div className="brand" aria-label="Zeitlight">
          <span className="brand-mark" aria-hidden="true" />
          Zeitlight
        </div>
        <div className="doc-name" title={state.path ?? undefined}>
          {state.displayName}
          {dirty && (
            <span className="dirty" aria-label="unsaved changes">
              {' '}
              •
            </span>
          )}
        </div>
        <nav className="actions" aria-label="Document">
          <button type="button" className="button" onClick={() => void controller.open()}>
            Open…
          </button>
          <button type="button" className="button" onClick={() => void controller.save('save')}>
            Save
          </button>
          <button type="button" className="button" onClick={() => controller.store.undo()} disabled={!canUndo(state.history)} aria-keyshortcuts="Control+Z">
            Undo
          </button>
          <button type="button" className="button" onClick={() => controller.store.redo()} disabled={!canRedo(state.history)} aria-keyshortcuts="Control+Shift+Z">
            Redo
          </button>
          <button type="button" className="button" onClick={() => void controller.exportCsv()}>
            Export CSV
          </button>
          <button type="button" className="button" onClick={() => void controller.exportPdf()} disabled={state.exportProgress !== null}>
            Briefing PDF
          </button>
        </nav>
      </header>
      {state.progressVisible && results.status === 'running' && (
        <div className="progress" role="progressbar" aria-label="Simulation progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(results.fraction * 100)}>
          <span style={{ width: `${Math.max(3, results.fraction * 100)}%` }} />
        </div>
      )}
      {state.exportProgress !== null && (
        <div className="export-progress" role="status" aria-label="Briefing export">
          <span>Briefing: {state.exportProgress.stage}</span>
          <div className="progress" role="progressbar" aria-label="Briefing export progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(state.exportProgress.fraction * 100)}>
            <span style={{ width: `${Math.max(3, state.exportProgress.fraction * 100)}%` }} />
          </div>
        </div>
      )}
      <div className="body">
        <nav className="sidenav" aria-label="Workspace">
          <p className="nav-group">Build</p>
          {BUILD.map((b) => (
            <button key={b.id} type="button" className={view === b.id ? 'nav-item nav-active' : 'nav-item'} aria-current={view === b.id ? 'page' : undefined} onClick={() => setView(b.id)}>
              {b.label}
            </button>
          ))}
          <p className="nav-group">Results</p>
          {RESULTS.map((r) => (
            <button key={r.id} type="button" className={view === r.id ? 'nav-item nav-active' : 'nav-item'} aria-current={view === r.id ? 'page' : undefined} onClick={() => setView(r.id)}>
              {r.label}
            </button>
          ))}
          <button type="button" className={view === 'cohort' ? 'nav-item nav-active' : 'nav-item'} aria-current={view === 'cohort' ? 'page' : undefined} onClick={() => setView('cohort')}>
            Cohort
          </button>
          <div className="nav-footer">
            <RunStatusLine results={results} problems={state.problems} />
          </div>
        </nav>
        <main className="content">
          <ProblemsList problems={state.problems} />
          {view === 'site' && <SitePanel scenario={scenario} />}
          {view === 'places' && <PlacesPanel scenario={scenario} />}
          {view === 'people' && <PeoplePanel scenario={scenario} />}
          {view === 'strategies' && <StrategiesPanel scenario={scenario} />}
          {view === 'cohort' && <CohortView scenario={scenario} />}
          {resultsEntry !== undefined && (
            <ResultsFrame title={resultsEntry.label} lead={resultsEntry.lead} results={results} selection={selection} onSelect={setSelection} showDay={resultsEntry.day} showPerson={view !== 'summary'}>
              {(v, personaId) => {
                const day = Math.min(selection.day, v.days - 1);
                if (view === 'summary') return <SummaryView view={v} onOpen={setView} />;
                if (view === 'light') return <LightAtEyeView view={v} personaId={personaId} day={day} />;
                if (view === 'clock') return <BodyClockView view={v} personaId={personaId} />;
                if (view === 'melatonin') return <MelatoninView view={v} personaId={personaId} day={day} />;
                if (view === 'sleepiness') return <SleepinessView view={v} personaId={personaId} day={day} />;
                if (view === 'sleep') return <SleepView view={v} personaId={personaId} />;
                return <CompareView view={v} personaId={personaId} onExport={() => void controller.exportCsv()} />;
              }}
            </ResultsFrame>
          )}
        </main>
      </div>
      {state.notice !== null && (
        <div className={`notice notice-${state.notice.tone}`} role={state.notice.tone === 'error' ? 'alert' : 'status'}>
          {state.notice.text}
        </div>
      )}
    </div>
  );
}
