import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { beginOutput } from './output-folder.js';

/** A process id that is not running (above the usual pid_max of 4 194 304). */
const DEAD_PID = 4_999_999;

describe('output folder', () => {
  it('puts back a folder that a run killed between its two renames left aside, and removes what it left', () => {
    const parent = mkdtempSync(join(tmpdir(), 'zeitlight-out-'));
    const aside = join(parent, `.out.zeitlight-old-${DEAD_PID}-x`);
    mkdirSync(aside);
    writeFileSync(join(aside, 'results.json'), '{"earlier":true}');
    mkdirSync(join(parent, `.out.zeitlight-new-${DEAD_PID}-x`));
    const out = beginOutput(join(parent, 'out'), { force: false });
    expect(readFileSync(join(parent, 'out', 'results.json'), 'utf8')).toBe('{"earlier":true}');
    out.abandon();
    expect(readdirSync(parent)).toEqual(['out']);
  });

  it('replaces the whole folder at commit and leaves nothing beside it', () => {
    const parent = mkdtempSync(join(tmpdir(), 'zeitlight-out-'));
    const dir = join(parent, 'out');
    mkdirSync(dir);
    writeFileSync(join(dir, 'report.pdf'), 'earlier');
    const out = beginOutput(dir, { force: false });
    out.write({ 'results.json': '{}' });
    expect(readdirSync(dir)).toEqual(['report.pdf']);
    expect(out.commit()).toEqual([join(dir, 'results.json')]);
    expect(readdirSync(dir)).toEqual(['results.json']);
    expect(readdirSync(parent)).toEqual(['out']);
  });

  it('leaves the folder as it was when the run is abandoned', () => {
    const parent = mkdtempSync(join(tmpdir(), 'zeitlight-out-'));
    const out = beginOutput(join(parent, 'new'), { force: false });
    out.write({ 'results.json': '{}' });
    out.abandon();
    expect(existsSync(join(parent, 'new'))).toBe(false);
    expect(readdirSync(parent)).toEqual([]);
  });
});
