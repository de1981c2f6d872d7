// The application menu as a plain template: File (new, open, recent, save, save as, export),
// Edit (undo, redo and the text-editing roles), View and Help. Commands for the scenario are
// sent to the focused window; the rest use Electron's built-in roles.
import type { MenuItemConstructorOptions } from 'electron';
import type { MenuCommand } from '../../types/desktop-api.js';

export interface MenuActions {
  send(command: MenuCommand): void;
  newWindow(): void;
  openDialog(): void;
  openRecent(filePath: string): void;
  clearRecent(): void;
}

export function buildMenuTemplate(platform: NodeJS.Platform, recent: readonly string[], actions: MenuActions): MenuItemConstructorOptions[] {
  const isMac = platform === 'darwin';
  const redoAccelerator = platform === 'win32' ? 'Ctrl+Y' : 'CmdOrCtrl+Shift+Z';
  const recentItems: MenuItemConstructorOptions[] =
    recent.length === 0
      ? [{ label: 'No recent scenarios', enabled: false }]
      : [...recent.map((p) => ({ label: p, click: () => actions.openRecent(p) })), { type: 'separator' }, { label: 'Clear list', click: () => actions.clearRecent() }];

  const file: MenuItemConstructorOptions = {
    label: 'File',
    submenu: [
      { label: 'New Scenario', accelerator: 'CmdOrCtrl+N', click: () => actions.newWindow() },
      { label: 'Open…', accelerator: 'CmdOrCtrl+O', click: () => actions.openDialog() },
      { label: 'Open Recent', submenu: recentItems },
      { type: 'separator' },
      { label: 'Save', accelerator: 'CmdOrCtrl+S', click: () => actions.send('save') },
      { label: 'Save As…', accelerator: 'CmdOrCtrl+Shift+S', click: () => actions.send('save-as') },
      { type: 'separator' },
      { label: 'Export Comparison as CSV…', accelerator: 'CmdOrCtrl+E', click: () => actions.send('export-csv') },
      { label: 'Export Briefing as PDF…', accelerator: 'CmdOrCtrl+P', click: () => actions.send('export-pdf') },
      { type: 'separator' },
      isMac ? { role: 'close' } : { role: 'quit', accelerator: 'Ctrl+Q' },
    ],
  };
  const edit: MenuItemConstructorOptions = {
    label: 'Edit',
    submenu: [
      { label: 'Undo', accelerator: 'CmdOrCtrl+Z', click: () => actions.send('undo') },
      { label: 'Redo', accelerator: redoAccelerator, click: () => actions.send('redo') },
      { type: 'separator' },
      { role: 'cut' },
      { role: 'copy' },
      { role: 'paste' },
      { role: 'selectAll' },
    ],
  };
  const view: MenuItemConstructorOptions = {
    label: 'View',
    submenu: [{ role: 'resetZoom' }, { role: 'zoomIn' }, { role: 'zoomOut' }, { type: 'separator' }, { role: 'togglefullscreen' }],
  };
  const windowMenu: MenuItemConstructorOptions = { role: 'windowMenu' };
  const template: MenuItemConstructorOptions[] = [file, edit, view, windowMenu];
  if (isMac) template.unshift({ role: 'appMenu' });
  return template;
}
