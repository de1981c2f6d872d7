// The Electron modules the app controller uses, narrowed to the members it calls. The entry
// point passes the real modules; tests pass fakes (the Electron binary is not needed).
import type { App, BrowserWindowConstructorOptions, Dialog, IpcMain, MenuItemConstructorOptions, WebContents, IpcMainInvokeEvent } from 'electron';
import type { GuardedSession } from '../security/navigation-guard.js';
import type { ReportWindow } from '../report/briefing-pdf.js';

/** The members of a BrowserWindow the controller relies on. */
export interface AppWindow {
  readonly webContents: Pick<WebContents, 'on' | 'setWindowOpenHandler' | 'send' | 'printToPDF' | 'id'>;
  loadURL(url: string): Promise<void>;
  on(event: 'close', listener: (event: { preventDefault(): void }) => void): unknown;
  on(event: 'closed', listener: () => void): unknown;
  setTitle(title: string): void;
  setDocumentEdited(edited: boolean): void;
  close(): void;
  focus(): void;
  isDestroyed(): boolean;
}

export interface ElectronModules {
  readonly app: Pick<App, 'on' | 'getPath' | 'quit' | 'addRecentDocument'>;
  readonly createWindow: (options: BrowserWindowConstructorOptions) => AppWindow;
  /** A hidden, sandboxed window for printing the briefing (REPORT_WINDOW_OPTIONS, navigation blocked). */
  readonly createReportWindow: () => ReportWindow;
  /** Finds the controller's window for an IPC event (BrowserWindow.fromWebContents in the app). */
  readonly windowForEvent: (event: IpcMainInvokeEvent) => AppWindow | null;
  readonly focusedWindow: () => AppWindow | null;
  readonly dialog: Pick<Dialog, 'showOpenDialog' | 'showSaveDialog' | 'showMessageBox'>;
  readonly ipcMain: Pick<IpcMain, 'handle'>;
  readonly setApplicationMenu: (template: MenuItemConstructorOptions[]) => void;
  readonly defaultSession: GuardedSession;
  readonly platform: NodeJS.Platform;
}
