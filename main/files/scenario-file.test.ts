import { describe, expect, it } from 'vitest';
import { mkdtemp, writeFile, readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { nodeFileSystem } from './file-system.js';
import { readScenarioFile, withScenarioExtension, writeScenarioFile } from './scenario-file.js';

describe('scenario files on disk', () => {
  it('reads a scenario and names it by its file name', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'clinic.zeitlight');
    await writeFile(file, '{"site":{}}');
    const read = await readScenarioFile(nodeFileSystem, file);
    expect(read).toEqual({ ok: true, document: { path: file, displayName: 'clinic.zeitlight', text: '{"site":{}}' } });
  });

  it('refuses malformed JSON with a message naming the file', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'broken.zeitlight');
    await writeFile(file, '{"site":');
    const read = await readScenarioFile(nodeFileSystem, file);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.message).toContain(file);
  });

  it('refuses a JSON array at the top level', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'list.json');
    await writeFile(file, '[1,2]');
    const read = await readScenarioFile(nodeFileSystem, file);
    expect(read.ok).toBe(false);
  });

  it('reports a missing file instead of throwing', async () => {
    const read = await readScenarioFile(nodeFileSystem, path.join(tmpdir(), 'no-such-dir-zl', 'x.zeitlight'));
    expect(read.ok).toBe(false);
  });

  it('does not write text that is not a scenario object, leaving the old file', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'keep.zeitlight');
    await writeFile(file, '{"a":1}');
    const written = await writeScenarioFile(nodeFileSystem, file, 'not json');
    expect(written.ok).toBe(false);
    expect(await readFile(file, 'utf8')).toBe('{"a":1}');
  });

  it('adds the scenario extension only when the name has none of ours', () => {
    expect(withScenarioExtension('/x/office')).toBe('/x/office.zeitlight');
    expect(withScenarioExtension('/x/office.zeitlight')).toBe('/x/office.zeitlight');
    expect(withScenarioExtension('/x/office.JSON')).toBe('/x/office.JSON');
  });
});
