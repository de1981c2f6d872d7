import { describe, expect, it } from 'vitest';
import { mkdtemp, readdir, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { writeFileAtomic } from './atomic-write.js';
import { nodeFileSystem, type FileSystem } from './file-system.js';

async function scratch(): Promise<string> {
  return mkdtemp(path.join(tmpdir(), 'zeitlight-atomic-'));
}

describe('atomic file replacement', () => {
  it('replaces the file content and leaves no temporary file behind', async () => {
    const dir = await scratch();
    const target = path.join(dir, 'office.zeitlight');
    await writeFile(target, '{"old":true}');
    await writeFileAtomic(nodeFileSystem, target, '{"new":true}');
    expect(await readFile(target, 'utf8')).toBe('{"new":true}');
    expect(await readdir(dir)).toEqual(['office.zeitlight']);
  });

  it('keeps the previous file intact and removes the temporary file when the rename fails', async () => {
    const dir = await scratch();
    const target = path.join(dir, 'ward.zeitlight');
    await writeFile(target, '{"previous":1}');
    const failingRename: FileSystem = { ...nodeFileSystem, rename: async () => Promise.reject(new Error('disk full')) };
    await expect(writeFileAtomic(failingRename, target, '{"next":2}')).rejects.toThrow('disk full');
    expect(await readFile(target, 'utf8')).toBe('{"previous":1}');
    expect(await readdir(dir)).toEqual(['ward.zeitlight']);
  });

  it('writes binary data unchanged (PDF exports)', async () => {
    const dir = await scratch();
    const target = path.join(dir, 'briefing.pdf');
    const bytes = new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x00, 0xff]);
    await writeFileAtomic(nodeFileSystem, target, bytes);
    expect(new Uint8Array(await readFile(target))).toEqual(bytes);
  });
});
