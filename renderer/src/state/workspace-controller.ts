// Connects the workspace store to the outside: the desktop API (open, save, export, menu
// commands, edit reports for autosave), the simulation worker (debounced re-runs) and the
// keyboard shortcuts of web mode.
import type { DesktopApi, MenuCommand } from '../../../types/desktop-api.js';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import type { ScenarioInput } from '../scenario/scenario-types.js';
import { newScenario } from '../scenario/new-scenario.js';
import { RunScheduler } from '../worker/run-scheduler.js';
import type { PageToWorker, WorkerToPage } from '../worker/simulation-protocol.js';
import { resultsComparisonCsv } from '../charts/comparison-csv.js';
import type { ResultsView } from '../results/view-model.js';
import { briefingRequest } from '../briefing/briefing-request.js';
import { CohortRunner } from '../cohort/cohort-runner.js';
import { briefingCohort } from '../cohort/cohort-ranges.js';
import { createCohortWorker } from '../cohort/web-cohort-worker.js';
import type { CohortSummary } from '../../report/src/briefing-document.js';
import { isDirty, WorkspaceStore } from './workspace-store.js';
import { EnsembleStore } from './ensemble-store.js';

const EDIT_REPORT_DELAY_MS = 500;

function parseScenario(text: string): ScenarioInput | string {
  try {
    const value: unknown = JSON.parse(text);
    if (value === null || typeof value !== 'object' || Array.isArray(value)) return 'the file is not a scenario (the top level must be a JSON object)';
    // Shape problems are listed by the validator in the workspace, where they can be fixed.
    return value as ScenarioInput;
  } catch (error) {
    return `the file is not valid JSON: ${error instanceof Error ? error.message : String(error)}`;
  }
}

export class WorkspaceController {
  readonly store = new WorkspaceStore();
  /** Cohort runs on navigator.hardwareConcurrency Web Workers. */
  readonly cohort = new CohortRunner(
    createCohortWorker,
    () => (typeof navigator === 'undefined' ? 2 : navigator.hardwareConcurrency || 2),
    () => performance.now(),
    this.store.activity,
  );
  /** Ranges across the model ensemble for the results on screen (they arrive after the results). */
  readonly ensemble = new EnsembleStore();
  /** The run whose results are on screen, to match its ensemble when that arrives. */
  private lastResults: { readonly runId: number; readonly view: ResultsView } | null = null;
  private worker: Worker | null = null;
  private readonly scheduler: RunScheduler;
  private lastRunScenario: ScenarioInput | null = null;
  private reportTimer: ReturnType<typeof setTimeout> | null = null;

  constructor(private readonly api: DesktopApi) {
    this.scheduler = new RunScheduler(
      { setTimeout: (cb, ms) => setTimeout(cb, ms), clearTimeout: (h) => clearTimeout(h as ReturnType<typeof setTimeout>) },
      { start: (runId, scenario) => this.startWorkerRun(runId, scenario), cancel: () => this.restartWorker() },
      (visible) => this.store.setProgressVisible(visible),
    );
    this.store.subscribe(() => this.afterChange());
  }

  async start(): Promise<void> {
    this.api.onMenuCommand((command) => void this.command(command));
    const initial = await this.api.initialDocument();
    if (initial.kind === 'demo') this.store.load(structuredClone(DEMO_SCENARIO), 'Demo scenario', null);
    else if (initial.kind === 'file' || initial.kind === 'recovered') {
      const parsed = parseScenario(initial.document.text);
      if (typeof parsed === 'string') this.store.notify(`${initial.document.displayName}: ${parsed}`, 'error');
      else {
        this.store.load(parsed, initial.document.displayName, initial.document.path, initial.kind === 'recovered');
        if (initial.kind === 'recovered') this.store.notify(`Restored unsaved work from ${new Date(initial.recoveredAt).toLocaleString()}.`);
      }
    }
  }

  async command(command: MenuCommand): Promise<void> {
    switch (command) {
      case 'new':
        return this.newDocument();
      case 'open':
        return this.open();
      case 'save':
        return this.save('save');
      case 'save-as':
        return this.save('save-as');
      case 'undo':
        return this.store.undo();
      case 'redo':
        return this.store.redo();
      case 'export-csv':
        return this.exportCsv();
      case 'export-pdf':
        return this.exportPdf();
    }
  }

  openDemo(): void {
    this.store.load(structuredClone(DEMO_SCENARIO), 'Demo scenario', null);
  }

  newDocument(): void {
    const today = new Date().toISOString().slice(0, 10);
    this.store.load(newScenario(today), 'Untitled', null, true, 'editor');
  }

  async open(): Promise<void> {
    const outcome = await this.api.open();
    if (outcome.status === 'failed') this.store.notify(outcome.message, 'error');
    if (outcome.status !== 'opened-here') return;
    const parsed = parseScenario(outcome.document.text);
    if (typeof parsed === 'string') this.store.notify(`${outcome.document.displayName}: ${parsed}`, 'error');
    else this.store.load(parsed, outcome.document.displayName, outcome.document.path);
  }

  async save(mode: 'save' | 'save-as'): Promise<void> {
    const present = this.store.getSnapshot().history.present;
    if (present === null) return;
    const outcome = await this.api.save({ text: `${JSON.stringify(present, null, 2)}\n`, mode });
    if (outcome.status === 'written') {
      this.store.markSaved(outcome.displayName, outcome.path);
      this.store.notify(`Saved ${outcome.displayName}.`);
    } else if (outcome.status === 'failed') this.store.notify(outcome.message, 'error');
  }

  async exportCsv(): Promise<void> {
    const results = this.store.getSnapshot().results;
    if (results.status !== 'ready') {
      this.store.notify('There are no results to export yet.', 'error');
      return;
    }
    const outcome = await this.api.exportCsv({ suggestedName: 'comparison.csv', csvText: resultsComparisonCsv(results.view) });
    if (outcome.status === 'written') this.store.notify(`Exported ${outcome.displayName}.`);
    else if (outcome.status === 'failed') this.store.notify(outcome.message, 'error');
  }

  /** Prints the client briefing of the results on screen (cohort ranges included when a cohort was run). */
  async exportPdf(): Promise<void> {
    const state = this.store.getSnapshot();
    const shown = this.shownView();
    const view = shown === null ? null : this.ensemble.viewWithEnsemble(shown);
    if (state.history.present === null || view === null) {
      this.store.notify('There are no results for a briefing yet.', 'error');
      return;
    }
    if (state.exportProgress !== null) return;
    const briefing = briefingRequest(state.history.present, view, { now: new Date(), cohort: this.briefingCohort() });
    this.store.setExportProgress({ fraction: 0, stage: 'Preparing the briefing' });
    const stop = this.api.onExportProgress((p) => this.store.setExportProgress(p));
    try {
      const outcome = await this.api.exportPdf({ suggestedName: 'briefing.pdf', briefing });
      if (outcome.status === 'written') this.store.notify(`Exported ${outcome.displayName}.`);
      else if (outcome.status === 'failed') this.store.notify(outcome.message, 'error');
    } catch (error) {
      this.store.notify(`Briefing: ${error instanceof Error ? error.message : String(error)}`, 'error');
    } finally {
      stop();
      this.store.setExportProgress(null);
    }
  }

  /** Cohort ranges for the briefing: the finished cohort of the scenario as it is now, if any. */
  briefingCohort(): CohortSummary | null {
    const c = this.cohort.getSnapshot();
    const view = this.shownView();
    if (c.status !== 'done' || view === null || c.scenario !== this.store.getSnapshot().history.present || c.outcome.personas.length === 0) return null;
    return briefingCohort(c.outcome.personas, view.strategies, c.settings.seed);
  }

  /** Web mode: the usual shortcuts (the desktop app's menu accelerators do this there). */
  handleKey(event: KeyboardEvent): void {
    if (!(event.ctrlKey || event.metaKey) || event.altKey) return;
    const key = event.key.toLowerCase();
    const command: MenuCommand | null =
      key === 'z' ? (event.shiftKey ? 'redo' : 'undo') : key === 'y' ? 'redo' : key === 's' ? (event.shiftKey ? 'save-as' : 'save') : key === 'o' ? 'open' : key === 'e' ? 'export-csv' : null;
    if (command === null) return;
    event.preventDefault();
    void this.command(command);
  }

  private afterChange(): void {
    const state = this.store.getSnapshot();
    const present = state.history.present;
    if (present !== this.lastRunScenario) {
      const first = this.lastRunScenario === null;
      this.lastRunScenario = present;
      if (present !== null) this.scheduler.requestRun(present, first);
      this.scheduleEditReport();
    }
  }

  private scheduleEditReport(): void {
    if (this.reportTimer !== null) clearTimeout(this.reportTimer);
    this.reportTimer = setTimeout(() => {
      const state = this.store.getSnapshot();
      const present = state.history.present;
      if (present === null) return;
      void this.api.reportEdit({ dirty: isDirty(state), text: JSON.stringify(present, null, 2) }).catch(() => undefined);
    }, EDIT_REPORT_DELAY_MS);
  }

  private ensureWorker(): Worker {
    if (this.worker === null) {
      this.worker = new Worker(new URL('../worker/simulation.worker.ts', import.meta.url), { type: 'module' });
      this.worker.addEventListener('message', (event: MessageEvent<WorkerToPage>) => this.onWorkerMessage(event.data));
      this.worker.addEventListener('error', (event) => {
        this.store.setResults({ status: 'failed', message: `The simulation stopped: ${event.message}` });
      });
    }
    return this.worker;
  }

  private restartWorker(): void {
    this.worker?.terminate();
    this.worker = null;
  }

  /** The results on screen: the latest ready view, or the one kept while a new run goes. */
  shownView(): ResultsView | null {
    const r = this.store.getSnapshot().results;
    return r.status === 'ready' ? r.view : r.status === 'running' ? r.previous : null;
  }

  private startWorkerRun(runId: number, scenario: unknown): void {
    this.store.setResults({ status: 'running', fraction: 0, stage: 'Starting', previous: this.shownView() });
    const message: PageToWorker = { type: 'run', runId, scenario };
    this.ensureWorker().postMessage(message);
  }

  private onWorkerMessage(message: WorkerToPage): void {
    if (message.type === 'ensemble') {
      if (this.lastResults !== null && message.runId === this.lastResults.runId) this.ensemble.set(this.lastResults.view, message.ensemble);
      return;
    }
    if (!this.scheduler.isCurrent(message.runId)) return;
    switch (message.type) {
      case 'progress':
        this.store.setResults({ status: 'running', fraction: message.fraction, stage: message.stage, previous: this.shownView() });
        return;
      case 'problems':
        this.store.setProblems(message.problems);
        if (message.problems.some((p) => p.severity === 'error')) {
          this.scheduler.finished(message.runId);
          this.store.setResults({ status: 'failed', message: 'Fix the problems listed below to see results.' });
        }
        return;
      case 'results':
        this.scheduler.finished(message.runId);
        this.lastResults = { runId: message.runId, view: message.view };
        this.store.setResults({ status: 'ready', view: message.view });
        return;
      case 'unavailable':
        this.scheduler.finished(message.runId);
        this.store.setResults({ status: 'unavailable', message: message.message });
        return;
      case 'failed':
        this.scheduler.finished(message.runId);
        this.store.setResults({ status: 'failed', message: message.message });
        return;
    }
  }
}
