/**
 * The model-ensemble regression scenario: fixtures/ensemble-desk-worker.json, a frozen copy of the
 * office part of the built-in demo (the desk worker and the four office strategies, made from the
 * demo as committed on 2026-12-05 by keeping those parts of DEMO_SCENARIO), so that the recorded
 * ensemble values move only when a model or the pipeline does.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { validateScenarioValue, type Scenario } from '../../schedules/index.js';

export const ENSEMBLE_FIXTURE = join(import.meta.dirname, 'fixtures', 'ensemble-desk-worker.json');

/** The fixture as written (scenario input), optionally cut to fewer days. */
export function ensembleFixtureInput(days?: number): Record<string, unknown> {
  const input = JSON.parse(readFileSync(ENSEMBLE_FIXTURE, 'utf8')) as Record<string, unknown> & { run: Record<string, unknown> };
  return days === undefined ? input : { ...input, run: { ...input.run, days } };
}

export function ensembleFixture(days?: number): Scenario {
  const v = validateScenarioValue(ensembleFixtureInput(days));
  if (v.scenario === undefined || !v.ok) throw new Error(`ensemble fixture does not validate: ${JSON.stringify(v.problems.filter((p) => p.severity === 'error'))}`);
  return v.scenario;
}
