// What was modelled, in words and small drawings: site and weather source, places, people with
// a compact week of their timeline, strategies and what each changes. Read from the scenario
// (validated and with defaults filled by the scenario schema) and the expanded timelines of
// schedules/ — the same expansion the run pipeline uses.
import { scenarioSchema } from '../../../schedules/schema/scenario-schema.js';
import type { Persona, Scenario, Strategy } from '../../../schedules/schema/scenario-types.js';
import type { Activity } from '../../../schedules/schema/personas-schema.js';
import { expandPersona } from '../../../schedules/timeline/expand-scenario.js';
import { placeWords, rosterName, shortName, strategyChangeWords } from '../../../schedules/words/index.js';

export interface TimelineBar {
  readonly from_h: number;
  readonly to_h: number;
  readonly activity: Activity;
}

export interface TimelineRow {
  readonly day: number;
  readonly date: string;
  /** Pieces of the local day in clock hours 0..24 (days with a clock change are drawn as 24 h). */
  readonly bars: readonly TimelineBar[];
}

export interface PersonaFacts {
  readonly id: string;
  readonly name: string;
  readonly details: string;
  readonly rows: readonly TimelineRow[];
}

export interface StrategyFacts {
  readonly id: string;
  readonly name: string;
  readonly description: string | null;
  readonly appliesTo: string;
  readonly changes: readonly string[];
}

export interface ScenarioFacts {
  readonly name: string;
  readonly description: string | null;
  readonly formatVersion: number;
  readonly siteName: string;
  readonly siteLine: string;
  readonly weatherLine: string;
  readonly period: string;
  readonly places: readonly { readonly name: string; readonly line: string }[];
  readonly personas: readonly PersonaFacts[];
  readonly strategies: readonly StrategyFacts[];
  /** Work minutes per hour since t = 0 for persona × strategy ("persona:strategy"), 0..60. */
  readonly workMinutesPerHour: ReadonlyMap<string, readonly number[]>;
}

export function workKey(personaId: string, strategyId: string): string {
  return `${personaId}:${strategyId}`;
}

const WEEKDAY_TEXT = { mon: 'Mon', tue: 'Tue', wed: 'Wed', thu: 'Thu', fri: 'Fri', sat: 'Sat', sun: 'Sun' } as const;

function coordinates(lat: number, lon: number): string {
  return `${Math.abs(lat).toFixed(2)}° ${lat >= 0 ? 'N' : 'S'}, ${Math.abs(lon).toFixed(2)}° ${lon >= 0 ? 'E' : 'W'}`;
}

function personaDetails(persona: Persona, scenario: Scenario): string {
  const routine = persona.roster !== undefined ? `works the shift roster “${rosterName(scenario, persona.roster.roster)}”` : 'keeps a weekly routine';
  const sleep = persona.sleep.mode === 'free' ? 'sleep times predicted by the model' : 'sleeps at the times planned';
  const sensitivity = persona.lightSensitivity === 1 ? 'average sensitivity to light (as in the published models)' : `sensitivity to light ${persona.lightSensitivity} times the average`;
  return `Age ${persona.age_y}; body clock running at ${persona.intrinsicPeriod_h.toFixed(2)} h a cycle when left to itself; ${sensitivity}; ${routine}; ${sleep}.`;
}

function timelineRows(scenario: Scenario, persona: Persona, maxDays: number): { rows: TimelineRow[]; work: number[] } {
  const timeline = expandPersona(scenario, persona, undefined);
  const rows: TimelineRow[] = [];
  for (const day of timeline.days.slice(0, maxDays)) {
    const from = day.start_min;
    const to = day.start_min + day.length_min;
    const bars: TimelineBar[] = [];
    for (const s of timeline.slices) {
      const a = Math.max(from, s.start_min);
      const b = Math.min(to, s.end_min);
      if (b <= a) continue;
      const last = bars[bars.length - 1];
      const bar = { from_h: ((a - from) / day.length_min) * 24, to_h: ((b - from) / day.length_min) * 24, activity: s.activity };
      if (last !== undefined && last.activity === bar.activity && Math.abs(last.to_h - bar.from_h) < 1e-9) bars[bars.length - 1] = { ...last, to_h: bar.to_h };
      else bars.push(bar);
    }
    rows.push({ day: day.index, date: `${WEEKDAY_TEXT[day.weekday]} ${day.date.slice(8)}.${day.date.slice(5, 7)}.`, bars });
  }
  return { rows, work: workPerHour(timeline.slices, timeline.total_min) };
}

function workPerHour(slices: readonly { start_min: number; end_min: number; activity: Activity }[], total_min: number): number[] {
  const hours = Math.ceil(total_min / 60);
  const work = new Array<number>(hours).fill(0);
  for (const s of slices) {
    if (s.activity !== 'work') continue;
    for (let m = s.start_min; m < s.end_min; ) {
      const h = Math.floor(m / 60);
      const next = Math.min(s.end_min, (h + 1) * 60);
      work[h] = (work[h] ?? 0) + (next - m);
      m = next;
    }
  }
  return work;
}

function strategyFacts(strategy: Strategy, scenario: Scenario): StrategyFacts {
  const names = (strategy.personas ?? scenario.personas.map((p) => p.id)).flatMap((id) => {
    const p = scenario.personas.find((x) => x.id === id);
    return p === undefined ? [] : [shortName(p.name)];
  });
  return { id: strategy.id, name: strategy.name, description: strategy.description ?? null, appliesTo: names.join(', '), changes: strategyChangeWords(scenario, strategy) };
}

function weatherLine(scenario: Scenario): string {
  const w = scenario.site.weather;
  if (w.kind === 'file') return `Daylight from the hourly weather file ${w.file}.`;
  return `Daylight from generated skies: each day clear, partly cloudy or overcast, drawn from the seasonal mix entered for the site (the same days on every run with random seed ${w.seed}).`;
}

/** Facts for the "What was modelled" section, or a message naming the first problem. */
export function scenarioFacts(input: unknown, timelineDays = 7): { ok: true; facts: ScenarioFacts } | { ok: false; message: string } {
  const parsed = scenarioSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { ok: false, message: `scenario: ${issue === undefined ? 'not a valid scenario' : `${issue.path.join('.') || '(top level)'}: ${issue.message}`}` };
  }
  const scenario = parsed.data;
  const work = new Map<string, readonly number[]>();
  const personas = scenario.personas.map((persona) => {
    const { rows, work: baselineWork } = timelineRows(scenario, persona, timelineDays);
    work.set(workKey(persona.id, 'baseline'), baselineWork);
    for (const strategy of scenario.strategies) {
      if (strategy.personas !== undefined && !strategy.personas.includes(persona.id)) continue;
      const t = expandPersona(scenario, persona, strategy);
      work.set(workKey(persona.id, strategy.id), workPerHour(t.slices, t.total_min));
    }
    return { id: persona.id, name: persona.name, details: personaDetails(persona, scenario), rows };
  });
  const site = scenario.site;
  const endDay = new Date(`${scenario.run.startDate}T00:00:00Z`);
  endDay.setUTCDate(endDay.getUTCDate() + scenario.run.days - 1);
  return {
    ok: true,
    facts: {
      name: scenario.name,
      description: scenario.description ?? null,
      formatVersion: scenario.version,
      siteName: site.name ?? coordinates(site.latitude_deg, site.longitude_deg),
      siteLine: `${site.name ?? 'Site'} — ${coordinates(site.latitude_deg, site.longitude_deg)}, ${site.elevation_m} m above sea level, time zone ${site.timeZone}; ground reflectance ${site.ground.reflectance}.`,
      weatherLine: weatherLine(scenario),
      period: `${scenario.run.days} days from ${scenario.run.startDate} to ${endDay.toISOString().slice(0, 10)}`,
      places: scenario.places.map((p) => ({ name: p.name ?? placeWords(p).replace(/[,;].*$/, ''), line: placeWords(p) })),
      personas,
      strategies: scenario.strategies.map((s) => strategyFacts(s, scenario)),
      workMinutesPerHour: work,
    },
  };
}
