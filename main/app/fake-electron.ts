// In-memory stand-ins for the Electron modules the controller uses, for unit tests.
import type { BrowserWindowConstructorOptions, IpcMainInvokeEvent, MenuItemConstructorOptions, MessageBoxOptions, OpenDialogOptions, SaveDialogOptions } from 'electron';
import type { AppWindow, ElectronModules } from './electron-modules.js';
import type { Timers } from '../files/autosaver.js';

type Listener = (...args: unknown[]) => void;

class Emitter {
  readonly listeners = new Map<string, Listener[]>();
  on(event: string, listener: Listener): this {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }
  emit(event: string, ...args: unknown[]): void {
    for (const l of this.listeners.get(event) ?? []) l(...args);
  }
}

export class FakeWebContents extends Emitter {
  static nextId = 1;
  readonly id = FakeWebContents.nextId++;
  readonly sent: { channel: string; args: unknown[] }[] = [];
  windowOpenHandler: ((details: { url: string }) => { action: string }) | null = null;
  setWindowOpenHandler(handler: (details: { url: string }) => { action: string }): void {
    this.windowOpenHandler = handler;
  }
  send(channel: string, ...args: unknown[]): void {
    this.sent.push({ channel, args });
  }
  async printToPDF(): Promise<Buffer> {
    return Buffer.from('%PDF-1.4 fake');
  }
}

export class FakeWindow extends Emitter {
  readonly webContents = new FakeWebContents();
  title = '';
  edited = false;
  destroyed = false;
  loaded: string | null = null;
  constructor(readonly options: BrowserWindowConstructorOptions) {
    super();
  }
  async loadURL(url: string): Promise<void> {
    this.loaded = url;
  }
  setTitle(title: string): void {
    this.title = title;
  }
  setDocumentEdited(edited: boolean): void {
    this.edited = edited;
  }
  focus(): void {}
  isDestroyed(): boolean {
    return this.destroyed;
  }
  /** Simulates the user (or code) closing the window: 'close' may be prevented. */
  close(): void {
    let prevented = false;
    this.emit('close', { preventDefault: () => (prevented = true) });
    if (!prevented) {
      this.destroyed = true;
      this.emit('closed');
    }
  }
}

/** The hidden briefing window: the page reports itself drawn on the first poll. */
export class FakeReportWindow {
  readonly scripts: string[] = [];
  loaded: string | null = null;
  destroyed = false;
  readonly webContents = {
    executeJavaScript: async (code: string): Promise<unknown> => {
      this.scripts.push(code);
      if (code.startsWith('window.__zeitlightRender(')) return true;
      return { status: 'ready', message: '', paper: 'A4', headerTemplate: '<div></div>', footerTemplate: '<div></div>', margins_mm: { top: 20, bottom: 15, left: 15, right: 15 } };
    },
    printToPDF: async (): Promise<Buffer> => Buffer.from('%PDF-1.7 fake briefing'),
  };
  async loadURL(url: string): Promise<void> {
    this.loaded = url;
  }
  destroy(): void {
    this.destroyed = true;
  }
}

export interface FakeElectron {
  reportWindows: FakeReportWindow[];
  modules: ElectronModules;
  windows: FakeWindow[];
  handlers: Map<string, (event: IpcMainInvokeEvent, ...args: unknown[]) => unknown>;
  menus: MenuItemConstructorOptions[][];
  messageBoxes: MessageBoxOptions[];
  openDialogs: OpenDialogOptions[];
  saveDialogs: SaveDialogOptions[];
  /** Answers for the next dialogs, consumed in order. */
  messageBoxAnswers: number[];
  openDialogAnswers: (string | null)[];
  saveDialogAnswers: (string | null)[];
  sessionHooks: { permission?: Listener; check?: Listener; beforeRequest?: Listener };
  /** Calls an IPC channel as the given window's page would. */
  invoke(window: FakeWindow, channel: string, ...args: unknown[]): Promise<unknown>;
}

export function fakeElectron(appPageUrl: string, platform: NodeJS.Platform = 'linux'): FakeElectron {
  const fake: FakeElectron = {
    reportWindows: [],
    windows: [],
    handlers: new Map(),
    menus: [],
    messageBoxes: [],
    openDialogs: [],
    saveDialogs: [],
    messageBoxAnswers: [],
    openDialogAnswers: [],
    saveDialogAnswers: [],
    sessionHooks: {},
    modules: undefined as unknown as ElectronModules,
    invoke: async (window, channel, ...args) => {
      const handler = fake.handlers.get(channel);
      if (handler === undefined) throw new Error(`no handler for ${channel}`);
      const event = { sender: window.webContents, senderFrame: { url: appPageUrl } } as unknown as IpcMainInvokeEvent;
      return handler(event, ...args);
    },
  };
  const appListeners = new Emitter();
  fake.modules = {
    app: {
      on: ((event: string, listener: Listener) => appListeners.on(event, listener)) as unknown as ElectronModules['app']['on'],
      getPath: () => '/nonexistent',
      quit: () => {},
      addRecentDocument: () => {},
    },
    createWindow: (options) => {
      const w = new FakeWindow(options);
      fake.windows.push(w);
      return w as unknown as AppWindow;
    },
    createReportWindow: () => {
      const w = new FakeReportWindow();
      fake.reportWindows.push(w);
      return w as unknown as ReturnType<ElectronModules['createReportWindow']>;
    },
    windowForEvent: (event) => (fake.windows.find((w) => w.webContents === (event.sender as unknown)) ?? null) as unknown as AppWindow | null,
    focusedWindow: () => (fake.windows.find((w) => !w.destroyed) ?? null) as unknown as AppWindow | null,
    dialog: {
      showOpenDialog: (async (options: OpenDialogOptions) => {
        fake.openDialogs.push(options);
        const answer = fake.openDialogAnswers.shift() ?? null;
        return { canceled: answer === null, filePaths: answer === null ? [] : [answer] };
      }) as unknown as ElectronModules['dialog']['showOpenDialog'],
      showSaveDialog: (async (options: SaveDialogOptions) => {
        fake.saveDialogs.push(options);
        const answer = fake.saveDialogAnswers.shift() ?? null;
        return { canceled: answer === null, filePath: answer ?? '' };
      }) as unknown as ElectronModules['dialog']['showSaveDialog'],
      showMessageBox: (async (options: MessageBoxOptions) => {
        fake.messageBoxes.push(options);
        return { response: fake.messageBoxAnswers.shift() ?? 0, checkboxChecked: false };
      }) as unknown as ElectronModules['dialog']['showMessageBox'],
    },
    ipcMain: {
      handle: (channel: string, listener: (event: IpcMainInvokeEvent, ...args: unknown[]) => unknown) => {
        fake.handlers.set(channel, listener);
      },
    } as ElectronModules['ipcMain'],
    setApplicationMenu: (template) => {
      fake.menus.push(template);
    },
    defaultSession: {
      setPermissionRequestHandler: ((h: Listener) => (fake.sessionHooks.permission = h)) as unknown as ElectronModules['defaultSession']['setPermissionRequestHandler'],
      setPermissionCheckHandler: ((h: Listener) => (fake.sessionHooks.check = h)) as unknown as ElectronModules['defaultSession']['setPermissionCheckHandler'],
      webRequest: {
        onBeforeRequest: ((h: Listener) => (fake.sessionHooks.beforeRequest = h)) as unknown as ElectronModules['defaultSession']['webRequest']['onBeforeRequest'],
      },
    },
    platform,
  };
  return fake;
}

/** Timers driven by the test: `tick()` runs every registered interval once. */
export function manualTimers(start = new Date('2026-03-01T09:00:00Z')): Timers & { tick(): Promise<void>; active: number } {
  const callbacks = new Map<number, () => unknown>();
  let next = 1;
  let now = start.getTime();
  return {
    get active() {
      return callbacks.size;
    },
    setInterval: (cb) => {
      const id = next++;
      callbacks.set(id, cb);
      return id;
    },
    clearInterval: (h) => {
      callbacks.delete(h as number);
    },
    now: () => new Date(now),
    tick: async () => {
      now += 20_000;
      // Await whatever each callback started (e.g. a recovery write), however slow the disk.
      await Promise.all([...callbacks.values()].map((cb) => cb()));
    },
  };
}
