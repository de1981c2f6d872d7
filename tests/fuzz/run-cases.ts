/**
 * Runs the cases of one target in order and gathers what they found (no shrinking: the fuzz run
 * reports each finding with its case number, so it can be replayed with the same seed).
 */
import fc from 'fast-check';
import type { Finding } from './findings.js';
import type { FuzzTarget } from './target.js';

export interface CaseReport {
  readonly target: string;
  readonly index: number;
  readonly findings: readonly Finding[];
  readonly ms: number;
}

/** The cases of a target for a seed, generated the same way every time. */
export function casesOf<C>(target: FuzzTarget<C>, seed: number, count: number): C[] {
  return fc.sample(target.arbitrary, { seed, numRuns: count });
}

export async function runCases<C>(target: FuzzTarget<C>, seed: number, from: number, count: number, onCase?: (r: CaseReport) => void): Promise<CaseReport[]> {
  const cases = casesOf(target, seed, from + count).slice(from);
  const reports: CaseReport[] = [];
  for (let i = 0; i < cases.length; i++) {
    const t0 = performance.now();
    const findings = await target.run(cases[i] as C);
    const r = { target: target.name, index: from + i, findings, ms: performance.now() - t0 };
    reports.push(r);
    onCase?.(r);
  }
  return reports;
}
