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
    await writeFile(file, '{"format":"zeitlight-scenario","version":2,"site":{}}');
    const read = await readScenarioFile(nodeFileSystem, file);
    expect(read).toEqual({ ok: true, document: { path: file, displayName: 'clinic.zeitlight', text: '{"format":"zeitlight-scenario","version":2,"site":{}}' } });
  });

  it('refuses malformed JSON with a message naming the file', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'broken.zeitlight');
    await writeFile(file, '{"format":"zeitlight-scenario","version":2,"site":');
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

  it('refuses a JSON object that is not a Zeitlight scenario, naming the file and the field', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'package.json');
    await writeFile(file, '{"name":"something-else","version":"1.0.0"}');
    const read = await readScenarioFile(nodeFileSystem, file);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.message).toMatch(new RegExp(`${file}: error: format`));
    expect((await writeScenarioFile(nodeFileSystem, file, '{"format":"other"}')).ok).toBe(false);
  });

  it('opens and saves unfinished scenarios whose content still has problems', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'draft.zeitlight');
    expect(await writeScenarioFile(nodeFileSystem, file, '{"format":"zeitlight-scenario","version":2,"name":"draft"}')).toEqual({ ok: true });
    expect((await readScenarioFile(nodeFileSystem, file)).ok).toBe(true);
  });

  it('reports a missing file instead of throwing', async () => {
    const read = await readScenarioFile(nodeFileSystem, path.join(tmpdir(), 'no-such-dir-zl', 'x.zeitlight'));
    expect(read.ok).toBe(false);
  });

  it('does not write text that is not a scenario object, leaving the old file', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'zeitlight-file-'));
    const file = path.join(dir, 'keep.zeitlight');
    await writeFile(file, '{"format":"zeitlight-scenario","version":2,"a":1}');
    const written = await writeScenarioFile(nodeFileSystem, file, 'not json');
    expect(written.ok).toBe(false);
    expect(await readFile(file, 'utf8')).toBe('{"format":"zeitlight-scenario","version":2,"a":1}');
  });

  it('adds the scenario extension only when the name has none of ours', () => {
    expect(withScenarioExtension('/x/office')).toBe('/x/office.zeitlight');
    expect(withScenarioExtension('/x/office.zeitlight')).toBe('/x/office.zeitlight');
    expect(withScenarioExtension('/x/office.JSON')).toBe('/x/office.JSON');
  });
});
