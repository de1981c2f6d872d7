/**
 * A seeded sample of the robustness properties that `npm run fuzz` checks at scale (10 000+
 * cases; docs/validation/robustness.md): for every entry point, generated hard inputs never crash
 * a command, never print a stack trace, every refusal names the file and the line or field, and
 * every number written as JSON is finite.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCases } from './run-cases.js';
import { fuzzTargets, SAMPLE_CASES, FUZZ_SEED } from './targets/index.js';

describe('hard inputs (seeded sample of the fuzz run)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'zeitlight-fuzz-sample-'));
  for (const target of fuzzTargets(dir)) {
    test(`${target.name}: no crash, no stack trace, every refusal located, finite JSON`, async () => {
      const reports = await runCases(target, FUZZ_SEED, 0, SAMPLE_CASES[target.name] ?? 10);
      const found = reports.filter((r) => r.findings.length > 0).map((r) => ({ case: r.index, findings: r.findings }));
      expect(found).toEqual([]);
    }, 120_000);
  }
});
