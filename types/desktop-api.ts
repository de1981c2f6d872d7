// The desktop contract shared by the Electron main process, its preload script and the renderer.
// Types only: nothing here exists at run time, so every side may `import type` it without
// crossing a layer boundary. Channel names are the single list both ends agree on.

/** A scenario document as the renderer sees it: its text and where it lives (if anywhere). */
export interface ScenarioDocument {
  /** Absolute path on disk in the desktop app; null for a new, never-saved document. */
  readonly path: string | null;
  /** Name to show in the title bar and tabs (file name, or "Untitled"). */
  readonly displayName: string;
  /** The scenario JSON text exactly as stored. */
  readonly text: string;
}

/** What a window starts with: an empty document, a file, a recovered draft, or the demo. */
export type InitialDocument =
  | { readonly kind: 'empty' }
  | { readonly kind: 'file'; readonly document: ScenarioDocument }
  | { readonly kind: 'recovered'; readonly document: ScenarioDocument; readonly recoveredAt: string }
  | { readonly kind: 'demo' };

export type SaveMode = 'save' | 'save-as';

export interface SaveRequest {
  readonly text: string;
  readonly mode: SaveMode;
}

export interface CsvExportRequest {
  /** Suggested file name without directory, e.g. "comparison.csv". */
  readonly suggestedName: string;
  readonly csvText: string;
}

export interface PdfExportRequest {
  /** Suggested file name without directory, e.g. "briefing.pdf". */
  readonly suggestedName: string;
  /**
   * The briefing document the report page draws (renderer/report/src/briefing-document.ts,
   * kind "zeitlight-briefing"): the scenario, the results view and cohort ranges when run.
   */
  readonly briefing: BriefingRequest;
}

/** The briefing document as it crosses the bridge; main checks its shape before printing. */
export interface BriefingRequest {
  readonly kind: 'zeitlight-briefing';
  readonly paper: 'A4' | 'Letter';
  readonly generatedOn: string;
  readonly zeitlightVersion: string;
  readonly client?: string;
  readonly scenario: Record<string, unknown>;
  readonly view: Record<string, unknown>;
  readonly cohort?: Record<string, unknown>;
}

/** Progress of a long export, sent by main to the window that asked for it. */
export interface ExportProgress {
  /** 0 … 1. */
  readonly fraction: number;
  readonly stage: string;
}

/** The result of anything that writes a file chosen by the user. */
export type WriteOutcome =
  | { readonly status: 'written'; readonly path: string; readonly displayName: string }
  | { readonly status: 'cancelled' }
  | { readonly status: 'failed'; readonly message: string };

/** The result of asking to open a scenario. */
export type OpenOutcome =
  | { readonly status: 'opened-here'; readonly document: ScenarioDocument }
  | { readonly status: 'opened-elsewhere' }
  | { readonly status: 'cancelled' }
  | { readonly status: 'failed'; readonly message: string };

/** Editing state the renderer reports so main can prompt on close and keep a recovery copy. */
export interface EditReport {
  readonly dirty: boolean;
  /** Current scenario text; main writes it to the recovery file on its autosave tick. */
  readonly text: string;
}

/** Commands the application menu sends to the focused window. */
export type MenuCommand =
  | 'new'
  | 'open'
  | 'save'
  | 'save-as'
  | 'undo'
  | 'redo'
  | 'export-csv'
  | 'export-pdf';

/** Request/response channels (renderer invokes, main handles). */
export interface InvokeChannels {
  'document:initial': { args: []; result: InitialDocument };
  'document:open': { args: []; result: OpenOutcome };
  'document:save': { args: [SaveRequest]; result: WriteOutcome };
  'document:edited': { args: [EditReport]; result: void };
  'export:csv': { args: [CsvExportRequest]; result: WriteOutcome };
  'export:pdf': { args: [PdfExportRequest]; result: WriteOutcome };
}

export type InvokeChannel = keyof InvokeChannels;

/** One-way events main sends to a window. */
export interface EventChannels {
  'menu:command': MenuCommand;
  'export:progress': ExportProgress;
}

/**
 * The task-level object the preload exposes as `window.zeitlight` (and the browser adapter
 * imitates in web mode). Nothing else crosses the bridge.
 */
export interface DesktopApi {
  readonly platform: 'desktop' | 'web';
  initialDocument(): Promise<InitialDocument>;
  open(): Promise<OpenOutcome>;
  save(request: SaveRequest): Promise<WriteOutcome>;
  reportEdit(report: EditReport): Promise<void>;
  exportCsv(request: CsvExportRequest): Promise<WriteOutcome>;
  exportPdf(request: PdfExportRequest): Promise<WriteOutcome>;
  /** Subscribes to progress of the briefing export; returns an unsubscribe function. */
  onExportProgress(listener: (progress: ExportProgress) => void): () => void;
  /** Subscribes to menu commands; returns an unsubscribe function. */
  onMenuCommand(listener: (command: MenuCommand) => void): () => void;
}
