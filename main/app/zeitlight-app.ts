// The desktop application controller: one window per scenario document, native dialogs,
// atomic saves, recent files, recovery copies with a restore offer after a crash, the unsaved-
// changes prompt, the menu and the typed IPC handlers. Electron is injected (see
// electron-modules.ts), so all of this runs in unit tests without the Electron binary.
import type { IpcMainInvokeEvent } from 'electron';
import type { InitialDocument, MenuCommand, OpenOutcome, WriteOutcome, SaveRequest } from '../../types/desktop-api.js';
import type { AppWindow, ElectronModules } from './electron-modules.js';
import type { AppPaths } from './paths.js';
import type { FileSystem } from '../files/file-system.js';
import { RecentFiles } from '../files/recent-files.js';
import { RecoveryStore } from '../files/recovery-store.js';
import { Autosaver, type Timers } from '../files/autosaver.js';
import { SCENARIO_EXTENSION, displayNameFor, readScenarioFile, withScenarioExtension, writeScenarioFile, writeTextFile } from '../files/scenario-file.js';
import { secureWebPreferences } from '../security/web-preferences.js';
import { guardSession, guardWebContents } from '../security/navigation-guard.js';
import { APP_PAGE_URL } from '../security/app-protocol.js';
import { registerIpcHandlers, type ChannelHandlers } from '../ipc/register-handlers.js';
import { buildMenuTemplate } from '../menu/menu-template.js';
import { printBriefingPdf } from '../report/briefing-pdf.js';

export const APP_NAME = 'Zeitlight';

const SCENARIO_FILTERS = [
  { name: 'Zeitlight scenario', extensions: [SCENARIO_EXTENSION] },
  { name: 'Scenario JSON', extensions: ['json'] },
];

interface DocumentWindow {
  readonly key: string;
  readonly window: AppWindow;
  readonly autosaver: Autosaver;
  initial: InitialDocument;
  path: string | null;
  dirty: boolean;
  text: string;
  closeConfirmed: boolean;
}

export interface StartOptions {
  /** Scenario files named on the command line or by the OS file association. */
  readonly files: readonly string[];
  /** Open the built-in demo scenario instead of an empty document. */
  readonly demo: boolean;
}

export class ZeitlightApp {
  private readonly windows = new Map<string, DocumentWindow>();
  private readonly recent: RecentFiles;
  private readonly recovery: RecoveryStore;
  private nextKey = 1;

  constructor(
    private readonly electron: ElectronModules,
    private readonly fs: FileSystem,
    private readonly paths: AppPaths,
    private readonly timers: Timers,
    private readonly log: (message: string) => void = () => {},
  ) {
    this.recent = new RecentFiles(fs, paths.recentFilesStore);
    this.recovery = new RecoveryStore(fs, paths.recoveryFolder);
  }

  /** Call once the Electron app is ready. */
  async start(options: StartOptions): Promise<void> {
    guardSession(this.electron.defaultSession, (what) => this.log(`blocked ${what}`));
    registerIpcHandlers(this.electron.ipcMain, this.handlers(), () => APP_PAGE_URL);
    await this.recent.load();
    this.refreshMenu();
    this.electron.app.on('window-all-closed', () => {
      if (this.electron.platform !== 'darwin') this.electron.app.quit();
    });

    const restored = await this.offerRecovery();
    for (const file of options.files) await this.openPath(file);
    if (this.windows.size === 0 && restored === 0) this.openWindow(options.demo ? { kind: 'demo' } : { kind: 'empty' }, null);
  }

  /** Opens a file in its own window (or focuses the window already showing it). */
  async openPath(filePath: string): Promise<OpenOutcome> {
    const existing = [...this.windows.values()].find((w) => w.path === filePath);
    if (existing !== undefined) {
      existing.window.focus();
      return { status: 'opened-elsewhere' };
    }
    const read = await readScenarioFile(this.fs, filePath);
    if (!read.ok) {
      await this.electron.dialog.showMessageBox({ type: 'error', title: APP_NAME, message: 'The scenario could not be opened.', detail: read.message });
      return { status: 'failed', message: read.message };
    }
    this.openWindow({ kind: 'file', document: read.document }, filePath, read.document.text);
    await this.rememberRecent(filePath);
    return { status: 'opened-elsewhere' };
  }

  openWindow(initial: InitialDocument, filePath: string | null, text = ''): AppWindow {
    const key = `w${this.nextKey++}`;
    const window = this.electron.createWindow({
      width: 1360,
      height: 880,
      minWidth: 960,
      minHeight: 640,
      title: APP_NAME,
      show: true,
      icon: this.paths.icon,
      backgroundColor: '#f7f7f5',
      webPreferences: secureWebPreferences(this.paths.preloadScript),
    });
    guardWebContents(window.webContents, APP_PAGE_URL, (what) => this.log(`blocked ${what}`));
    const state: DocumentWindow = {
      key,
      window,
      autosaver: new Autosaver(this.recovery, key, this.timers),
      initial,
      path: filePath,
      dirty: initial.kind === 'recovered',
      text: initial.kind === 'recovered' ? initial.document.text : text,
      closeConfirmed: false,
    };
    this.windows.set(key, state);
    state.autosaver.start();
    if (state.dirty) state.autosaver.report(true, state.text, state.path);
    window.on('close', (event) => {
      if (state.dirty && !state.closeConfirmed) {
        event.preventDefault();
        void this.confirmClose(state);
      }
    });
    window.on('closed', () => {
      this.windows.delete(key);
      void state.autosaver.stop();
    });
    this.updateTitle(state);
    void window.loadURL(APP_PAGE_URL);
    return window;
  }

  /** Sends a menu command to the focused scenario window. */
  sendCommand(command: MenuCommand): void {
    const target = this.electron.focusedWindow();
    if (target !== null && !target.isDestroyed()) target.webContents.send('menu:command', command);
  }

  openWindowCount(): number {
    return this.windows.size;
  }

  private handlers(): ChannelHandlers {
    return {
      'document:initial': (event) => this.stateFor(event).initial,
      'document:open': (event) => this.openFromDialog(this.stateFor(event)),
      'document:save': (event, request) => this.save(this.stateFor(event), request),
      'document:edited': (event, report) => {
        const state = this.stateFor(event);
        state.dirty = report.dirty;
        state.text = report.text;
        state.autosaver.report(report.dirty, report.text, state.path);
        this.updateTitle(state);
      },
      'export:csv': async (event, request) => {
        this.stateFor(event);
        return this.writeChosenFile(request.suggestedName, [{ name: 'CSV', extensions: ['csv'] }], async () => request.csvText);
      },
      'export:pdf': async (event, request) => {
        const state = this.stateFor(event);
        const progress = (fraction: number, stage: string) => {
          if (!state.window.isDestroyed()) state.window.webContents.send('export:progress', { fraction, stage });
        };
        // The briefing is drawn on the report page in a hidden window and printed there
        // (report/briefing-pdf.ts); the file is written only once the PDF exists.
        return this.writeChosenFile(request.suggestedName, [{ name: 'PDF', extensions: ['pdf'] }], () => printBriefingPdf(this.electron.createReportWindow(), request.briefing, progress));
      },
    };
  }

  private stateFor(event: IpcMainInvokeEvent): DocumentWindow {
    const window = this.electron.windowForEvent(event);
    const state = [...this.windows.values()].find((w) => w.window === window);
    if (state === undefined) throw new Error('IPC call from a window that is not a scenario window');
    return state;
  }

  private async openFromDialog(state: DocumentWindow): Promise<OpenOutcome> {
    const choice = await this.electron.dialog.showOpenDialog({ title: 'Open scenario', properties: ['openFile'], filters: SCENARIO_FILTERS });
    const chosen = choice.filePaths[0];
    if (choice.canceled || chosen === undefined) return { status: 'cancelled' };
    const reuseThisWindow = state.path === null && !state.dirty && state.initial.kind === 'empty';
    if (!reuseThisWindow) return this.openPath(chosen);
    const read = await readScenarioFile(this.fs, chosen);
    if (!read.ok) return { status: 'failed', message: read.message };
    state.path = chosen;
    state.text = read.document.text;
    state.initial = { kind: 'file', document: read.document };
    this.updateTitle(state);
    await this.rememberRecent(chosen);
    return { status: 'opened-here', document: read.document };
  }

  private async save(state: DocumentWindow, request: SaveRequest): Promise<WriteOutcome> {
    let target = request.mode === 'save' ? state.path : null;
    if (target === null) {
      const choice = await this.electron.dialog.showSaveDialog({
        title: 'Save scenario',
        defaultPath: state.path ?? `Untitled.${SCENARIO_EXTENSION}`,
        filters: SCENARIO_FILTERS,
      });
      if (choice.canceled || choice.filePath === undefined || choice.filePath === '') return { status: 'cancelled' };
      target = withScenarioExtension(choice.filePath);
    }
    const written = await writeScenarioFile(this.fs, target, request.text);
    if (!written.ok) return { status: 'failed', message: written.message };
    state.path = target;
    state.text = request.text;
    state.dirty = false;
    state.autosaver.report(false, request.text, target);
    this.updateTitle(state);
    await this.rememberRecent(target);
    return { status: 'written', path: target, displayName: displayNameFor(target) };
  }

  private async writeChosenFile(
    suggestedName: string,
    filters: { name: string; extensions: string[] }[],
    produce: () => Promise<string | Uint8Array>,
  ): Promise<WriteOutcome> {
    const choice = await this.electron.dialog.showSaveDialog({ title: 'Export', defaultPath: suggestedName, filters });
    if (choice.canceled || choice.filePath === undefined || choice.filePath === '') return { status: 'cancelled' };
    try {
      const data = await produce();
      const written = await writeTextFile(this.fs, choice.filePath, data);
      if (!written.ok) return { status: 'failed', message: written.message };
      return { status: 'written', path: choice.filePath, displayName: displayNameFor(choice.filePath) };
    } catch (error) {
      return { status: 'failed', message: `${choice.filePath}: ${error instanceof Error ? error.message : String(error)}` };
    }
  }

  private async confirmClose(state: DocumentWindow): Promise<void> {
    const name = displayNameFor(state.path);
    const answer = await this.electron.dialog.showMessageBox({
      type: 'warning',
      title: APP_NAME,
      message: `Save the changes to “${name}” before closing?`,
      detail: 'Your changes will be lost if you close without saving.',
      buttons: ['Save', 'Close without saving', 'Cancel'],
      defaultId: 0,
      cancelId: 2,
      noLink: true,
    });
    if (answer.response === 2) return;
    if (answer.response === 0) {
      const saved = await this.save(state, { text: state.text, mode: 'save' });
      if (saved.status !== 'written') return;
    }
    state.closeConfirmed = true;
    state.window.close();
  }

  /** Offers to restore drafts left by a run that ended abnormally; returns windows restored. */
  private async offerRecovery(): Promise<number> {
    const drafts = await this.recovery.leftovers();
    if (drafts.length === 0) return 0;
    const answer = await this.electron.dialog.showMessageBox({
      type: 'question',
      title: APP_NAME,
      message: drafts.length === 1 ? 'Zeitlight found unsaved work from a session that did not close normally.' : `Zeitlight found ${drafts.length} unsaved scenarios from a session that did not close normally.`,
      detail: drafts.map((d) => `${displayNameFor(d.originalPath)} — last kept ${d.savedAt}`).join('\n'),
      buttons: ['Restore', 'Discard'],
      defaultId: 0,
      cancelId: 1,
      noLink: true,
    });
    const restore = answer.response === 0;
    let restored = 0;
    for (const draft of drafts) {
      if (restore) {
        const document = { path: draft.originalPath, displayName: displayNameFor(draft.originalPath), text: draft.text };
        this.openWindow({ kind: 'recovered', document, recoveredAt: draft.savedAt }, draft.originalPath);
        restored += 1;
      }
      await this.recovery.removeFile(draft.recoveryFile);
    }
    // Restored windows hold the drafts as unsaved edits; write their recovery copies at once so
    // a second crash loses nothing.
    await Promise.all([...this.windows.values()].filter((w) => w.dirty).map((w) => w.autosaver.flush()));
    return restored;
  }

  private async rememberRecent(filePath: string): Promise<void> {
    await this.recent.add(filePath).catch((error: unknown) => this.log(`recent files not saved: ${String(error)}`));
    this.electron.app.addRecentDocument(filePath);
    this.refreshMenu();
  }

  private refreshMenu(): void {
    this.electron.setApplicationMenu(
      buildMenuTemplate(this.electron.platform, this.recent.list(), {
        send: (command) => this.sendCommand(command),
        newWindow: () => void this.openWindow({ kind: 'empty' }, null),
        openDialog: () => {
          const focused = this.electron.focusedWindow();
          if (focused !== null) this.sendCommand('open');
          else void this.openFromMenuWithoutWindow();
        },
        openRecent: (p) => void this.openPath(p),
        clearRecent: () => void this.recent.clear().then(() => this.refreshMenu()),
      }),
    );
  }

  private async openFromMenuWithoutWindow(): Promise<void> {
    const choice = await this.electron.dialog.showOpenDialog({ title: 'Open scenario', properties: ['openFile'], filters: SCENARIO_FILTERS });
    const chosen = choice.filePaths[0];
    if (!choice.canceled && chosen !== undefined) await this.openPath(chosen);
  }

  private updateTitle(state: DocumentWindow): void {
    if (state.window.isDestroyed()) return;
    const name = state.initial.kind === 'demo' && state.path === null ? 'Demo scenario' : displayNameFor(state.path);
    state.window.setTitle(`${state.dirty ? '• ' : ''}${name} — ${APP_NAME}`);
    state.window.setDocumentEdited(state.dirty);
  }
}
