// The one place where main decides whether a text is an acceptable scenario document, so open
// and save apply the same rules: within the size limit, well-formed JSON, a top-level object
// that says it is a Zeitlight scenario in a format version this build can read (the scenario
// format's own migration check). Content problems (missing fields, sense checks) do not block
// opening or saving: unfinished work must be savable, and the workspace lists those problems
// with their paths and fixes.
import { migrateScenario } from '../../schedules/migration/migrate.js';
import { formatProblem } from '../../schedules/validation/problem.js';

/** Largest scenario text main accepts, in characters (a year of minute data stays well below). */
export const MAX_SCENARIO_CHARS = 20_000_000;

export type ScenarioCheck = { ok: true; value: Record<string, unknown> } | { ok: false; problems: string[] };

export function checkScenarioText(text: string, source: string): ScenarioCheck {
  if (text.length > MAX_SCENARIO_CHARS) {
    return { ok: false, problems: [`${source}: scenario is larger than ${MAX_SCENARIO_CHARS} characters`] };
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return { ok: false, problems: [`${source}: not valid JSON (${detail})`] };
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    return { ok: false, problems: [`${source}: the top level must be a JSON object`] };
  }
  const identity = migrateScenario(value).problems.filter((p) => p.severity === 'error');
  if (identity.length > 0) return { ok: false, problems: identity.map((p) => `${source}: ${formatProblem(p)}`) };
  return { ok: true, value: value as Record<string, unknown> };
}
