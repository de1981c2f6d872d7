// Preload script (bundled to CommonJS; sandboxed preloads may only require 'electron').
// Exposes exactly one task-level object, window.zeitlight, and no Electron or Node objects.
import { contextBridge, ipcRenderer } from 'electron';
import type { DesktopApi, ExportProgress, InvokeChannel, InvokeChannels, MenuCommand } from '../types/desktop-api.js';

function invoke<C extends InvokeChannel>(channel: C, ...args: InvokeChannels[C]['args']): Promise<InvokeChannels[C]['result']> {
  return ipcRenderer.invoke(channel, ...args) as Promise<InvokeChannels[C]['result']>;
}

const api: DesktopApi = {
  platform: 'desktop',
  initialDocument: () => invoke('document:initial'),
  open: () => invoke('document:open'),
  save: (request) => invoke('document:save', request),
  reportEdit: (report) => invoke('document:edited', report),
  exportCsv: (request) => invoke('export:csv', request),
  exportPdf: (request) => invoke('export:pdf', request),
  onExportProgress: (listener) => {
    const wrapped = (_event: unknown, progress: ExportProgress) => listener(progress);
    ipcRenderer.on('export:progress', wrapped);
    return () => {
      ipcRenderer.removeListener('export:progress', wrapped);
    };
  },
  onMenuCommand: (listener) => {
    const wrapped = (_event: unknown, command: MenuCommand) => listener(command);
    ipcRenderer.on('menu:command', wrapped);
    return () => {
      ipcRenderer.removeListener('menu:command', wrapped);
    };
  },
};

contextBridge.exposeInMainWorld('zeitlight', api);
