import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PROJECT_ROOT } from './helpers/run-cli.js';

describe('record documents', () => {
  it('docs/methods.md, docs/validation.md and docs/performance.md match their per-topic parts', () => {
    const r = spawnSync(process.execPath, [join(PROJECT_ROOT, 'scripts', 'assemble-docs.mjs'), '--check'], { encoding: 'utf8' });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
  });
});
