// Where the app finds its own files and keeps its state.
import * as path from 'node:path';

export interface AppPaths {
  /** renderer/dist/index.html, loaded with loadFile. */
  readonly rendererPage: string;
  /** The bundled preload script (CommonJS, required by sandboxed renderers). */
  readonly preloadScript: string;
  readonly recentFilesStore: string;
  readonly recoveryFolder: string;
  readonly icon: string;
}

export function appPaths(appRoot: string, userData: string): AppPaths {
  return {
    rendererPage: path.join(appRoot, 'renderer', 'dist', 'index.html'),
    preloadScript: path.join(appRoot, 'dist', 'electron', 'preload.cjs'),
    recentFilesStore: path.join(userData, 'recent-scenarios.json'),
    recoveryFolder: path.join(userData, 'recovery'),
    icon: path.join(appRoot, 'build', 'icon.png'),
  };
}

/** The file:// URL of the app page as the renderer reports it in IPC sender frames. */
export function pageUrlOf(filePath: string): string {
  const normalized = filePath.split(path.sep).join('/');
  return `file://${normalized.startsWith('/') ? '' : '/'}${encodeURI(normalized)}`;
}
