import { describe, expect, it } from 'vitest';
import { mkdtemp, readdir, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { nodeFileSystem } from './file-system.js';
import { RecoveryStore } from './recovery-store.js';
import { Autosaver, AUTOSAVE_INTERVAL_MS } from './autosaver.js';
import { manualTimers } from '../app/fake-electron.js';

async function store(): Promise<{ folder: string; recovery: RecoveryStore }> {
  const folder = path.join(await mkdtemp(path.join(tmpdir(), 'zeitlight-recovery-')), 'recovery');
  return { folder, recovery: new RecoveryStore(nodeFileSystem, folder) };
}

describe('autosave to a recovery file', () => {
  it('runs at most every 30 s', () => {
    expect(AUTOSAVE_INTERVAL_MS).toBeLessThanOrEqual(30_000);
  });

  it('writes unsaved edits on the next tick and finds them as leftovers after a crash', async () => {
    const { recovery } = await store();
    const timers = manualTimers();
    const saver = new Autosaver(recovery, 'w1', timers);
    saver.start();
    saver.report(true, '{"edited":true}', '/work/office.zeitlight');
    expect(await recovery.leftovers()).toEqual([]);
    await timers.tick();
    // No stop(): the process "crashed". A new run finds the draft.
    const found = await new RecoveryStore(nodeFileSystem, recovery.folder).leftovers();
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ originalPath: '/work/office.zeitlight', text: '{"edited":true}', savedAt: '2026-03-01T09:00:20.000Z' });
  });

  it('removes the recovery copy once the document is saved, and on a normal close', async () => {
    const { recovery } = await store();
    const timers = manualTimers();
    const saver = new Autosaver(recovery, 'w1', timers);
    saver.start();
    saver.report(true, '{"a":1}', null);
    await timers.tick();
    expect(await recovery.leftovers()).toHaveLength(1);
    saver.report(false, '{"a":1}', '/saved.zeitlight');
    await saver.flush();
    expect(await recovery.leftovers()).toEqual([]);
    saver.report(true, '{"a":2}', '/saved.zeitlight');
    await timers.tick();
    await saver.stop();
    expect(await recovery.leftovers()).toEqual([]);
    expect(timers.active).toBe(0);
  });

  it('skips half-written or foreign files in the recovery folder', async () => {
    const { folder, recovery } = await store();
    await recovery.write('w1', null, '{"ok":1}', new Date('2026-01-01T00:00:00Z'));
    await writeFile(path.join(folder, 'w2.recovery.json'), '{"format":"zeitlight-recovery-1","text":');
    await writeFile(path.join(folder, 'notes.txt'), 'hello');
    const found = await recovery.leftovers();
    expect(found.map((d) => d.text)).toEqual(['{"ok":1}']);
    expect((await readdir(folder)).sort()).toEqual(['notes.txt', 'w1.recovery.json', 'w2.recovery.json']);
  });
});
