import { describe, expect, it } from 'vitest';
import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { nodeFileSystem } from './file-system.js';
import { RecentFiles } from './recent-files.js';

describe('recent files', () => {
  it('keeps the most recent first, without duplicates, up to the limit, across restarts', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-recent-'));
    const store = path.join(dir, 'recent.json');
    const recent = new RecentFiles(nodeFileSystem, store, 3);
    await recent.load();
    for (const f of ['/a', '/b', '/c', '/a', '/d']) await recent.add(f);
    expect(recent.list()).toEqual(['/d', '/a', '/c']);
    const reloaded = new RecentFiles(nodeFileSystem, store, 3);
    expect(await reloaded.load()).toEqual(['/d', '/a', '/c']);
  });

  it('starts empty when the stored list is damaged', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-recent-'));
    const store = path.join(dir, 'recent.json');
    await writeFile(store, '{"recent": [42]');
    expect(await new RecentFiles(nodeFileSystem, store).load()).toEqual([]);
  });
});
