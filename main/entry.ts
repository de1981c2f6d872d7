// Electron entry point: wires the real Electron modules into the app controller. This is the
// only main-process file that loads 'electron' at run time.
import { app, BrowserWindow, dialog, ipcMain, Menu, protocol, session } from 'electron';
import * as path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ZeitlightApp } from './app/zeitlight-app.js';
import { appPaths } from './app/paths.js';
import { nodeFileSystem } from './files/file-system.js';
import { realTimers } from './files/autosaver.js';
import { scenarioFilesInArgs } from './app/command-line.js';
import { securityViolations } from './security/web-preferences.js';
import { APP_SCHEME, APP_SCHEME_PRIVILEGES, handleAppScheme } from './security/app-protocol.js';
import { openReportWindow } from './report/report-window.js';

// dist/electron/main.mjs sits two folders below the app root.
const appRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

if (!app.requestSingleInstanceLock()) {
  app.quit();
} else {
  app.enableSandbox();
  protocol.registerSchemesAsPrivileged([{ scheme: APP_SCHEME, privileges: APP_SCHEME_PRIVILEGES }]);
  app.whenReady().then(async () => {
    const paths = appPaths(appRoot, app.getPath('userData'));
    handleAppScheme(protocol, nodeFileSystem, paths.rendererDist);
    const controller = new ZeitlightApp(
      {
        app,
        createWindow: (options) => {
          const problems = securityViolations(options.webPreferences);
          if (problems.length > 0) throw new Error(`refusing an insecure window: ${problems.join('; ')}`);
          return new BrowserWindow(options);
        },
        createReportWindow: () => openReportWindow((options) => new BrowserWindow(options), (what) => console.warn(`[zeitlight] briefing window blocked ${what}`)),
        windowForEvent: (event) => BrowserWindow.fromWebContents(event.sender),
        focusedWindow: () => BrowserWindow.getFocusedWindow(),
        dialog,
        ipcMain,
        setApplicationMenu: (template) => Menu.setApplicationMenu(Menu.buildFromTemplate(template)),
        defaultSession: session.defaultSession,
        platform: process.platform,
      },
      nodeFileSystem,
      paths,
      realTimers,
      (message) => console.warn(`[zeitlight] ${message}`),
    );
    const args = scenarioFilesInArgs(process.argv.slice(1));
    await controller.start({ files: args.files, demo: args.demo });
    app.on('second-instance', (_event, argv) => {
      for (const file of scenarioFilesInArgs(argv.slice(1)).files) void controller.openPath(file);
    });
    app.on('open-file', (event, file) => {
      event.preventDefault();
      void controller.openPath(file);
    });
    app.on('activate', () => {
      if (controller.openWindowCount() === 0) controller.openWindow({ kind: 'empty' }, null);
    });
  }).catch((error: unknown) => {
    console.error(error);
    app.quit();
  });
}
