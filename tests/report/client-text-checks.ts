// Checks that a text meant for clients holds no internal codes: the list of codes is built from
// the scenario (every id it gives things), the scenario format (every fixed value of its JSON
// Schema), the model registries (every model id) and the results format's own values, and a
// pattern for repository paths. Ids and values that are ordinary words ("ceiling", "phone",
// "amber", "work") cannot be told from plain English, so only code-like ones are listed: those
// with a hyphen, an underscore, a digit or a capital inside the word; ordinary-word ids are
// checked where they would show as codes (quoted, or after an arrow).
import { scenarioJsonSchema } from '../../schedules/scenario-json-schema.js';
import { PACEMAKER_IDS } from '../../model/circadian/registry.js';
import { SLEEPINESS_MODEL_IDS } from '../../model/circadian/sleepiness-registry.js';
import { MELATONIN_MODEL } from '../../model/circadian/model-citations.js';
import type { ScenarioInput } from '../../schedules/schema/scenario-types.js';

/** Fixed values of the scenario format (JSON Schema "enum" and "const"). */
export function formatValues(): string[] {
  const out = new Set<string>();
  const walk = (node: unknown): void => {
    if (Array.isArray(node)) return node.forEach(walk);
    if (typeof node !== 'object' || node === null) return;
    const o = node as Record<string, unknown>;
    if (Array.isArray(o.enum)) for (const v of o.enum) if (typeof v === 'string') out.add(v);
    if (typeof o.const === 'string') out.add(o.const);
    Object.values(o).forEach(walk);
  };
  walk(scenarioJsonSchema());
  return [...out];
}

/** Every id a scenario gives: places, windows, luminaires, screens, persona devices and eyewear, personas, templates, rosters, shifts, strategies, light logs. */
export function scenarioIds(s: ScenarioInput): string[] {
  const ids: string[] = [];
  for (const p of s.places) {
    ids.push(p.id);
    if (p.kind === 'room') {
      for (const w of p.windows ?? []) ids.push(w.id);
      for (const l of p.luminaires ?? []) ids.push(l.id);
      for (const sc of p.screens ?? []) ids.push(sc.id);
    }
  }
  for (const p of s.personas) {
    ids.push(p.id, ...Object.keys(p.templates ?? {}));
    for (const d of p.devices ?? []) ids.push(d.id);
    for (const e of p.eyewear ?? []) ids.push(e.id);
  }
  for (const r of s.rosters ?? []) ids.push(r.id, ...r.shifts.map((x) => x.id));
  for (const st of s.strategies ?? []) {
    ids.push(st.id);
    for (const c of st.changes) if (c.op === 'add-luminaire') ids.push(c.luminaire.id);
  }
  for (const l of s.lightLogs ?? []) ids.push(l.id);
  return [...new Set(ids)];
}

/** Values of the results format a client text might echo. */
const RESULTS_VALUES = ['sky-model', 'weather-file', 'zeitlight-results', 'zeitlight-scenario', 'zeitlight-briefing', 'mean_phase_shift_h', 'work_hours_kss_ge_7_share', 'mean_melatonin_suppression_pct'];

const codeLike = (t: string) => /[-_\d]/.test(t) || /[a-z][A-Z]/.test(t);

/** Code-like tokens for a scenario: its ids, the format's values, model ids, results values. */
export function codeTokens(s: ScenarioInput): string[] {
  const all = [...scenarioIds(s), ...formatValues(), ...PACEMAKER_IDS, ...SLEEPINESS_MODEL_IDS, MELATONIN_MODEL.id, ...RESULTS_VALUES];
  return [...new Set(all.filter(codeLike))].sort((a, b) => b.length - a.length);
}

/** Repository paths and source file names. */
const PATH_PATTERN = /\b(?:docs|model|schedules|renderer|cli|main|tests)\/[\w./-]+|\b[\w-]+\.(?:ts|tsx|md)\b|§\s?\d/g;

/** Internal codes found in `text`: code-like tokens as whole words, ordinary-word ids in quotes or after an arrow, and paths. */
export function internalCodesIn(text: string, s: ScenarioInput): string[] {
  const found: string[] = [];
  for (const t of codeTokens(s)) {
    const escaped = t.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
    if (new RegExp(`(?<![\\w-])${escaped}(?![\\w-])`).test(text)) found.push(t);
  }
  for (const id of scenarioIds(s).filter((t) => !codeLike(t))) {
    if (new RegExp(`["“]${id}["”]|→\\s*${id}\\b`).test(text)) found.push(`"${id}"`);
  }
  if (/→/.test(text)) found.push('→');
  for (const m of text.matchAll(PATH_PATTERN)) found.push(m[0]);
  return found;
}
