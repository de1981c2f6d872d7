import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PROJECT_ROOT } from './helpers/run-cli.js';

describe('embedded datasets', () => {
  it('the generated module matches the CSV files in model/data', () => {
    const r = spawnSync(process.execPath, [join(PROJECT_ROOT, 'scripts', 'embed-datasets.mjs'), '--check'], { encoding: 'utf8' });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
  });
});
