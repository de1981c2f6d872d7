/** One entry point under test: how its cases are generated and what one case checks. */
import type fc from 'fast-check';
import type { Finding } from './findings.js';

export interface FuzzTarget<C> {
  readonly name: string;
  readonly arbitrary: fc.Arbitrary<C>;
  /** Runs one case; returns what was wrong (nothing when the command behaved). */
  run(c: C): Promise<Finding[]>;
  /** How the cases went (e.g. "run completed", "refused"), counted by the target. */
  readonly outcomes: Record<string, number>;
}

/** Counts one outcome of a case. */
export function count(outcomes: Record<string, number>, what: string): void {
  outcomes[what] = (outcomes[what] ?? 0) + 1;
}
