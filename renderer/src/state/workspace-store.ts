// The workspace state: the scenario being edited with its undo history, where it is stored,
// whether it has unsaved edits, the latest validation problems and results, and progress.
// A small external store used through React's useSyncExternalStore.
import type { ScenarioProblem } from '../../../schedules/validation/problem.js';
import type { ResultsView } from '../results/view-model.js';
import type { ScenarioInput } from '../scenario/scenario-types.js';
import { applyEdit, canRedo, canUndo, redo, startHistory, undo, type History } from './history.js';
import { ActivityLog } from './activity-log.js';

export type ResultsState =
  | { readonly status: 'idle' }
  /** `previous`: the last results, still shown (marked as updating) while the new run goes. */
  | { readonly status: 'running'; readonly fraction: number; readonly stage: string; readonly previous: ResultsView | null }
  | { readonly status: 'ready'; readonly view: ResultsView }
  | { readonly status: 'unavailable'; readonly message: string }
  | { readonly status: 'failed'; readonly message: string };

export interface WorkspaceState {
  readonly history: History<ScenarioInput | null>;
  readonly displayName: string;
  readonly path: string | null;
  /** The document as last saved or opened; dirty when the present differs. */
  readonly saved: ScenarioInput | null;
  readonly problems: readonly ScenarioProblem[];
  readonly results: ResultsState;
  readonly progressVisible: boolean;
  /** Progress of a briefing export under way, else null. */
  readonly exportProgress: { readonly fraction: number; readonly stage: string } | null;
  readonly notice: { readonly text: string; readonly tone: 'info' | 'error' } | null;
  /** Which view a freshly loaded document opens on: the answer (summary) or, for a new empty document, an editor; `seq` counts loads. */
  readonly landing: { readonly seq: number; readonly on: 'answer' | 'editor' };
}

export function isDirty(state: WorkspaceState): boolean {
  return state.history.present !== state.saved;
}

type Listener = () => void;

export class WorkspaceStore {
  private state: WorkspaceState = {
    history: startHistory<ScenarioInput | null>(null),
    displayName: 'Untitled',
    path: null,
    saved: null,
    problems: [],
    results: { status: 'idle' },
    progressVisible: false,
    exportProgress: null,
    notice: null,
    landing: { seq: 0, on: 'answer' },
  };
  private readonly listeners = new Set<Listener>();
  /** What happened, kept after the screen has moved on (results runs, notices). */
  readonly activity = new ActivityLog();

  constructor(private readonly now: () => number = () => Date.now()) {}

  subscribe = (listener: Listener): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = (): WorkspaceState => this.state;

  private set(patch: Partial<WorkspaceState>): void {
    this.state = { ...this.state, ...patch };
    for (const l of this.listeners) l();
  }

  /**
   * Loads a document; `unsaved` marks a recovered draft or a new document as not yet saved. A
   * document opens on its answer (the summary), a new empty one on an editor.
   */
  load(scenario: ScenarioInput, displayName: string, path: string | null, unsaved = false, on: 'answer' | 'editor' = 'answer'): void {
    this.set({ history: startHistory<ScenarioInput | null>(scenario), displayName, path, saved: unsaved ? null : scenario, problems: [], results: { status: 'idle' }, landing: { seq: this.state.landing.seq + 1, on } });
  }

  /** Applies an edit; edits with the same key in quick succession merge into one undo step. */
  edit(change: (scenario: ScenarioInput) => ScenarioInput, key: string | null = null): void {
    const present = this.state.history.present;
    if (present === null) return;
    this.set({ history: applyEdit(this.state.history, change(present), key, this.now()) });
  }

  undo(): void {
    if (canUndo(this.state.history)) this.set({ history: undo(this.state.history) });
  }

  redo(): void {
    if (canRedo(this.state.history)) this.set({ history: redo(this.state.history) });
  }

  markSaved(displayName: string, path: string | null): void {
    this.set({ saved: this.state.history.present, displayName, path });
  }

  setProblems(problems: readonly ScenarioProblem[]): void {
    this.set({ problems });
  }

  setResults(results: ResultsState): void {
    const before = this.state.results.status;
    if (results.status !== before || results.status === 'ready') {
      this.activity.record('results', { status: results.status, message: 'message' in results ? results.message : null });
    }
    this.set({ results });
  }

  setProgressVisible(progressVisible: boolean): void {
    this.set({ progressVisible });
  }

  setExportProgress(exportProgress: WorkspaceState['exportProgress']): void {
    this.set({ exportProgress });
  }

  notify(text: string, tone: 'info' | 'error' = 'info'): void {
    this.activity.record('notice', { text, tone });
    this.set({ notice: { text, tone } });
  }

  clearNotice(): void {
    this.set({ notice: null });
  }
}
