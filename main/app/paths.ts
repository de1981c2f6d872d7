// Where the app finds its own files and keeps its state.
import * as path from 'node:path';

export interface AppPaths {
  /** The renderer build, served through the app scheme (security/app-protocol.ts). */
  readonly rendererDist: string;
  /** The bundled preload script (CommonJS, required by sandboxed renderers). */
  readonly preloadScript: string;
  readonly recentFilesStore: string;
  readonly recoveryFolder: string;
  readonly icon: string;
}

export function appPaths(appRoot: string, userData: string): AppPaths {
  return {
    rendererDist: path.join(appRoot, 'renderer', 'dist'),
    preloadScript: path.join(appRoot, 'dist', 'electron', 'preload.cjs'),
    recentFilesStore: path.join(userData, 'recent-scenarios.json'),
    recoveryFolder: path.join(userData, 'recovery'),
    icon: path.join(appRoot, 'build', 'icon.png'),
  };
}

