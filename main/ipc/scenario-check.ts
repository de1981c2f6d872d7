// The one place where main decides whether a text is an acceptable scenario document.
// Today: well-formed JSON whose top level is an object, within a size limit. When schedules/
// exports its scenario schema, call it here (and only here) so open, save and autosave all
// apply the same rules.

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
  return { ok: true, value: value as Record<string, unknown> };
}
