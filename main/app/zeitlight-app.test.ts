import { describe, expect, it, vi } from 'vitest';
import { mkdtemp, readFile, writeFile, readdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import type { MenuItemConstructorOptions } from 'electron';
import { ZeitlightApp } from './zeitlight-app.js';
import { appPaths } from './paths.js';
import { APP_PAGE_URL } from '../security/app-protocol.js';
import { fakeElectron, manualTimers, type FakeElectron, type FakeWindow } from './fake-electron.js';
import { nodeFileSystem } from '../files/file-system.js';
import { securityViolations } from '../security/web-preferences.js';
import { REPORT_PAGE_URL } from '../report/briefing-pdf.js';
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';

const BRIEFING = {
  kind: 'zeitlight-briefing',
  paper: 'A4',
  generatedOn: '2026-03-30',
  zeitlightVersion: '0.1.0',
  scenario: structuredClone(DEMO_SCENARIO),
  view: { baselineId: 'baseline', days: 14, startDate: '2026-03-23', strategies: [], personas: [], runs: [] },
};

async function setup(userData?: string) {
  const root = await mkdtemp(path.join(tmpdir(), 'zeitlight-app-'));
  const data = userData ?? path.join(root, 'user-data');
  const paths = appPaths('/opt/zeitlight', data);
  const fake = fakeElectron(APP_PAGE_URL);
  const timers = manualTimers();
  const app = new ZeitlightApp(fake.modules, nodeFileSystem, paths, timers);
  return { root, data, paths, fake, timers, app };
}

const last = (fake: FakeElectron): FakeWindow => fake.windows[fake.windows.length - 1]!;

function labels(items: MenuItemConstructorOptions[]): string[] {
  return items.flatMap((i) => [i.label ?? '', ...(Array.isArray(i.submenu) ? labels(i.submenu) : [])]);
}

describe('desktop app controller', () => {
  it('creates every window with the required security settings, the preload and the app page', async () => {
    const { fake, app, root, paths } = await setup();
    const file = path.join(root, 'office.zeitlight');
    await writeFile(file, '{"format":"zeitlight-scenario","version":2,"site":{"name":"Office"}}');
    await app.start({ files: [file], demo: false });
    app.openWindow({ kind: 'empty' }, null);
    app.openWindow({ kind: 'demo' }, null);
    expect(fake.windows).toHaveLength(3);
    for (const w of fake.windows) {
      expect(securityViolations(w.options.webPreferences)).toEqual([]);
      expect(w.options.webPreferences?.preload).toBe(paths.preloadScript);
      expect(w.loaded).toBe(APP_PAGE_URL);
      expect(w.webContents.windowOpenHandler?.({ url: 'https://example.com' })).toEqual({ action: 'deny' });
    }
  });

  it('opens a chosen file in a fresh empty window, and further files in windows of their own', async () => {
    const { fake, app, root } = await setup();
    await app.start({ files: [], demo: false });
    const a = path.join(root, 'a.zeitlight');
    const b = path.join(root, 'b.zeitlight');
    await writeFile(a, '{"format":"zeitlight-scenario","version":2,"n":1}');
    await writeFile(b, '{"format":"zeitlight-scenario","version":2,"n":2}');
    const first = last(fake);
    fake.openDialogAnswers.push(a, b, a);
    expect(await fake.invoke(first, 'document:open')).toMatchObject({ status: 'opened-here', document: { path: a, text: '{"format":"zeitlight-scenario","version":2,"n":1}' } });
    expect(await fake.invoke(first, 'document:open')).toEqual({ status: 'opened-elsewhere' });
    expect(fake.windows).toHaveLength(2);
    expect(await fake.invoke(last(fake), 'document:initial')).toMatchObject({ kind: 'file', document: { path: b } });
    // The same file again focuses its window instead of opening a second copy.
    expect(await fake.invoke(first, 'document:open')).toEqual({ status: 'opened-elsewhere' });
    expect(fake.windows).toHaveLength(2);
    expect(first.title).toBe('a.zeitlight — Zeitlight');
  });

  it('saves an untitled scenario through the save dialog, adds the extension and lists it as recent', async () => {
    const { fake, app, root } = await setup();
    await app.start({ files: [], demo: false });
    const w = last(fake);
    await fake.invoke(w, 'document:edited', { dirty: true, text: '{"format":"zeitlight-scenario","version":2,"edited":1}' });
    expect(w.title).toBe('• Untitled — Zeitlight');
    expect(w.edited).toBe(true);
    fake.saveDialogAnswers.push(path.join(root, 'clinic'));
    const outcome = await fake.invoke(w, 'document:save', { text: '{"format":"zeitlight-scenario","version":2,"edited":1}', mode: 'save' });
    const saved = path.join(root, 'clinic.zeitlight');
    expect(outcome).toEqual({ status: 'written', path: saved, displayName: 'clinic.zeitlight' });
    expect(await readFile(saved, 'utf8')).toBe('{"format":"zeitlight-scenario","version":2,"edited":1}');
    expect(w.title).toBe('clinic.zeitlight — Zeitlight');
    expect(labels(fake.menus[fake.menus.length - 1]!)).toContain(saved);
    // A plain save of a named document writes in place without asking.
    await fake.invoke(w, 'document:save', { text: '{"format":"zeitlight-scenario","version":2,"edited":2}', mode: 'save' });
    expect(fake.saveDialogs).toHaveLength(1);
    expect(await readFile(saved, 'utf8')).toBe('{"format":"zeitlight-scenario","version":2,"edited":2}');
  });

  it('refuses to save text that is not a scenario and leaves the file as it was', async () => {
    const { fake, app, root } = await setup();
    const file = path.join(root, 'keep.zeitlight');
    await writeFile(file, '{"format":"zeitlight-scenario","version":2,"ok":true}');
    await app.start({ files: [file], demo: false });
    const outcome = await fake.invoke(last(fake), 'document:save', { text: '{broken', mode: 'save' });
    expect(outcome).toMatchObject({ status: 'failed' });
    expect(await readFile(file, 'utf8')).toBe('{"format":"zeitlight-scenario","version":2,"ok":true}');
  });

  it('asks before closing a window with unsaved changes and honours each answer', async () => {
    const { fake, app, root } = await setup();
    await app.start({ files: [], demo: false });
    const w = last(fake);
    await fake.invoke(w, 'document:edited', { dirty: true, text: '{"format":"zeitlight-scenario","version":2,"x":1}' });

    fake.messageBoxAnswers.push(2); // Cancel
    w.close();
    await vi.waitFor(() => expect(fake.messageBoxes).toHaveLength(1), { timeout: 10_000 });
    expect(w.destroyed).toBe(false);
    expect(fake.messageBoxes[0]?.buttons).toEqual(['Save', 'Close without saving', 'Cancel']);

    fake.messageBoxAnswers.push(0); // Save
    fake.saveDialogAnswers.push(path.join(root, 'kept.zeitlight'));
    w.close();
    await vi.waitFor(() => expect(w.destroyed).toBe(true), { timeout: 10_000 });
    expect(await readFile(path.join(root, 'kept.zeitlight'), 'utf8')).toBe('{"format":"zeitlight-scenario","version":2,"x":1}');
    expect(app.openWindowCount()).toBe(0);
  });

  it('closes without asking when there is nothing unsaved', async () => {
    const { fake, app } = await setup();
    await app.start({ files: [], demo: false });
    last(fake).close();
    expect(last(fake).destroyed).toBe(true);
    expect(fake.messageBoxes).toEqual([]);
  });

  it('offers to restore unsaved work after a crash and reopens it as an unsaved window', async () => {
    const first = await setup();
    await first.app.start({ files: [], demo: false });
    await first.fake.invoke(last(first.fake), 'document:edited', { dirty: true, text: '{"format":"zeitlight-scenario","version":2,"draft":"morning light"}' });
    await first.timers.tick(); // autosave tick, then the process dies without closing windows

    const second = await setup(first.data);
    second.fake.messageBoxAnswers.push(0); // Restore
    await second.app.start({ files: [], demo: false });
    expect(second.fake.messageBoxes[0]?.buttons).toEqual(['Restore', 'Discard']);
    expect(second.fake.windows).toHaveLength(1);
    const restored = last(second.fake);
    expect(await second.fake.invoke(restored, 'document:initial')).toMatchObject({ kind: 'recovered', document: { text: '{"format":"zeitlight-scenario","version":2,"draft":"morning light"}' } });
    expect(restored.title).toBe('• Untitled — Zeitlight');
    // The restored draft is protected again at once, under the new window's name only.
    expect(await readdir(path.join(first.data, 'recovery'))).toEqual(['w1.recovery.json']);
  });

  it('discards leftover drafts when the user declines to restore', async () => {
    const first = await setup();
    await first.app.start({ files: [], demo: false });
    await first.fake.invoke(last(first.fake), 'document:edited', { dirty: true, text: '{"format":"zeitlight-scenario","version":2,"draft":1}' });
    await first.timers.tick();

    const second = await setup(first.data);
    second.fake.messageBoxAnswers.push(1); // Discard
    await second.app.start({ files: [], demo: false });
    expect(await second.fake.invoke(last(second.fake), 'document:initial')).toEqual({ kind: 'empty' });
    expect(await readdir(path.join(first.data, 'recovery'))).toEqual([]);
  });

  it('exports CSV text and the briefing PDF to the chosen files, with progress sent to the asking window', async () => {
    const { fake, app, root } = await setup();
    await app.start({ files: [], demo: true });
    const w = last(fake);
    expect(await fake.invoke(w, 'document:initial')).toEqual({ kind: 'demo' });
    fake.saveDialogAnswers.push(path.join(root, 'compare.csv'), path.join(root, 'briefing.pdf'));
    await fake.invoke(w, 'export:csv', { suggestedName: 'compare.csv', csvText: 'metric,value\n' });
    const outcome = await fake.invoke(w, 'export:pdf', { suggestedName: 'briefing.pdf', briefing: BRIEFING });
    expect(outcome).toMatchObject({ status: 'written', path: path.join(root, 'briefing.pdf') });
    expect(await readFile(path.join(root, 'compare.csv'), 'utf8')).toBe('metric,value\n');
    expect((await readFile(path.join(root, 'briefing.pdf'), 'utf8')).startsWith('%PDF')).toBe(true);
    // Drawn in a hidden report window that is handed the document and destroyed afterwards.
    const report = fake.reportWindows[0]!;
    expect(report.loaded).toBe(REPORT_PAGE_URL);
    expect(report.scripts[0]).toBe(`window.__zeitlightRender(${JSON.stringify(BRIEFING)}); true`);
    expect(report.destroyed).toBe(true);
    const progress = w.webContents.sent.filter((m) => m.channel === 'export:progress').map((m) => m.args[0] as { fraction: number; stage: string });
    expect(progress.length).toBeGreaterThan(2);
    expect(progress.map((p) => p.fraction)).toEqual([...progress.map((p) => p.fraction)].sort((a, b) => a - b));
    expect(progress[progress.length - 1]).toEqual({ fraction: 1, stage: 'Done' });
  });

  it('opens no report window when the save dialog is cancelled, and writes nothing when printing fails', async () => {
    const { fake, app, root } = await setup();
    await app.start({ files: [], demo: true });
    const w = last(fake);
    fake.saveDialogAnswers.push(null);
    expect(await fake.invoke(w, 'export:pdf', { suggestedName: 'briefing.pdf', briefing: BRIEFING })).toEqual({ status: 'cancelled' });
    expect(fake.reportWindows).toHaveLength(0);
    fake.saveDialogAnswers.push(path.join(root, 'failed.pdf'));
    const original = fake.modules.createReportWindow;
    (fake.modules as { createReportWindow: typeof original }).createReportWindow = () => {
      const r = original();
      r.webContents.printToPDF = async () => {
        throw new Error('printer went away');
      };
      return r;
    };
    expect(await fake.invoke(w, 'export:pdf', { suggestedName: 'briefing.pdf', briefing: BRIEFING })).toMatchObject({ status: 'failed', message: expect.stringContaining('printer went away') });
    await expect(readdir(root)).resolves.not.toContain('failed.pdf');
    expect(fake.reportWindows.every((r) => r.destroyed)).toBe(true);
  });

  it('sends menu commands to the focused window', async () => {
    const { fake, app } = await setup();
    await app.start({ files: [], demo: false });
    app.sendCommand('undo');
    expect(last(fake).webContents.sent).toEqual([{ channel: 'menu:command', args: ['undo'] }]);
  });
});
