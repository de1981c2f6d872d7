/**
 * Expansion of a validated scenario into exposure timelines: one per persona × strategy
 * (the baseline first), covering every real minute of the run exactly once. Day plans and
 * rosters are laid out in local wall-clock time and mapped to real time through the site's
 * time-zone rules, so a day with a daylight-saving change has 1380 or 1500 minutes and no
 * minute is lost or counted twice.
 */
import { DateTime } from 'luxon';
import type { Persona, Scenario, Strategy } from '../schema/scenario-types.js';
import { clockSpan } from '../time/clock-time.js';
import { wallTimeToUtc_ms } from '../time/local-calendar.js';
import { applyStrategyToPlaces } from './apply-strategy.js';
import { strategyChangeWords } from '../words/strategy-changes.js';
import { applyBehaviour } from './behaviour-overlay.js';
import { BASELINE_ID, type DayKind, type ExpandedScenario, type ExposureSlice, type ExposureTimeline, type SleepState, type StrategyVariant, type TimelineDay } from './exposure-types.js';
import { IntervalPainter } from './interval-painter.js';
import { rosterSegments } from './roster-plan.js';
import { dateOfDay, defaultState, stateFromSegment, WALL_DAY_MIN, weekdayOf, type WallState } from './wall-state.js';

const MS_PER_MIN = 60_000;

function sleepStateOf(state: WallState, persona: Persona): SleepState {
  const resting = state.activity === 'sleep' || state.activity === 'nap';
  if (persona.sleep.mode === 'habitual') return resting ? 'asleep' : 'awake';
  return state.activity === 'work' || state.activity === 'commute' ? 'awake' : 'free';
}

/** Parses an ISO 8601 date-time; without an offset it is read in the site's time zone. */
export function parseDateTimeAtSite(text: string, zone: string): number | undefined {
  const hasOffset = /(Z|[+-]\d{2}(:?\d{2})?)$/.test(text);
  const dt = hasOffset ? DateTime.fromISO(text, { setZone: true }) : DateTime.fromISO(text, { zone });
  return dt.isValid ? dt.toMillis() : undefined;
}

function wallLayout(scenario: Scenario, persona: Persona, strategy: Strategy | undefined): { painter: IntervalPainter<WallState>; dayKind: (d: number) => DayKind | null } {
  const { startDate, days } = scenario.run;
  // One day either side so that sleep running past midnight into day 0 and the last day is included.
  const firstDay = -1;
  const lastDay = days;
  const painter = new IntervalPainter<WallState>();
  let dayKind: (d: number) => DayKind | null = () => null;
  const roster = persona.roster !== undefined ? scenario.rosters.find((r) => r.id === persona.roster?.roster) : undefined;
  if (roster !== undefined && persona.roster !== undefined) {
    const plan = rosterSegments(persona, roster, persona.roster.offsetDays, startDate, firstDay - 1, lastDay);
    dayKind = plan.dayKind;
    for (let d = firstDay; d <= lastDay; d++) painter.paint(d * WALL_DAY_MIN, (d + 1) * WALL_DAY_MIN, defaultState(persona, plan.dayKind(d)));
    for (const seg of plan.segments) painter.paint(seg.start, seg.end, seg.state);
  } else {
    for (let d = firstDay; d <= lastDay; d++) painter.paint(d * WALL_DAY_MIN, (d + 1) * WALL_DAY_MIN, defaultState(persona, null));
    if (persona.week !== undefined) {
      for (let d = firstDay; d <= lastDay; d++) {
        const plan = persona.week[weekdayOf(dateOfDay(startDate, d))];
        const segs = typeof plan === 'string' ? (persona.templates[plan] ?? []) : plan;
        for (const seg of segs) {
          const span = clockSpan(seg.start, seg.end);
          painter.paint(d * WALL_DAY_MIN + span.start_min, d * WALL_DAY_MIN + span.end_min, stateFromSegment(seg, 'routine'));
        }
      }
    }
  }
  applyBehaviour(painter, strategy, persona.id, { startDate, firstDay, lastDay, dayKind });
  return { painter, dayKind };
}

/** The timeline of one persona under one variant (strategy undefined = baseline). */
export function expandPersona(scenario: Scenario, persona: Persona, strategy: Strategy | undefined): ExposureTimeline {
  const zone = scenario.site.timeZone;
  const { startDate, days: nDays } = scenario.run;
  const { painter, dayKind } = wallLayout(scenario, persona, strategy);
  const runStart = wallTimeToUtc_ms(zone, startDate, 0);
  const runEnd = wallTimeToUtc_ms(zone, dateOfDay(startDate, nDays), 0);
  const total_min = Math.round((runEnd - runStart) / MS_PER_MIN);
  const toReal = (wall: number): number => {
    const d = Math.floor(wall / WALL_DAY_MIN);
    const t = wallTimeToUtc_ms(zone, dateOfDay(startDate, d), wall - d * WALL_DAY_MIN);
    return Math.min(total_min, Math.max(0, Math.round((t - runStart) / MS_PER_MIN)));
  };

  const days: TimelineDay[] = [];
  for (let d = 0; d < nDays; d++) {
    const date = dateOfDay(startDate, d);
    const s = toReal(d * WALL_DAY_MIN);
    const e = d + 1 === nDays ? total_min : toReal((d + 1) * WALL_DAY_MIN);
    days.push({ index: d, date, weekday: weekdayOf(date), start_min: s, length_min: e - s, utcStart_ms: runStart + s * MS_PER_MIN, dayKind: dayKind(d) });
  }

  // Measured-log periods in real minutes.
  const measured = persona.measuredLight.map((m) => ({
    log: m.log,
    from: m.from === undefined ? 0 : Math.max(0, Math.round(((parseDateTimeAtSite(m.from, zone) ?? runStart) - runStart) / MS_PER_MIN)),
    to: m.to === undefined ? total_min : Math.min(total_min, Math.round(((parseDateTimeAtSite(m.to, zone) ?? runEnd) - runStart) / MS_PER_MIN)),
  }));

  const slices: ExposureSlice[] = [];
  for (const it of painter.intervals()) {
    const s = toReal(it.start);
    const e = toReal(it.end);
    if (e <= s) continue;
    const state = { ...it.value, sleep: sleepStateOf(it.value, persona) };
    // Split at the edges of measured periods.
    const cuts = new Set<number>([s, e]);
    for (const m of measured) for (const c of [m.from, m.to]) if (c > s && c < e) cuts.add(c);
    const points = [...cuts].sort((a, b) => a - b);
    for (let k = 0; k + 1 < points.length; k++) {
      const a = points[k] ?? 0;
      const b = points[k + 1] ?? 0;
      const log = measured.find((m) => m.from <= a && m.to >= b);
      slices.push({ ...state, start_min: a, end_min: b, measuredLogId: log?.log ?? null });
    }
  }
  return { personaId: persona.id, strategyId: strategy?.id ?? BASELINE_ID, timeZone: zone, runStartUtc_ms: runStart, total_min, days, slices };
}

/** Every persona under the baseline and under each strategy meant for them. */
export function expandScenario(scenario: Scenario): ExpandedScenario {
  const everyone = scenario.personas.map((p) => p.id);
  const variants: StrategyVariant[] = [
    { id: BASELINE_ID, name: 'Baseline', changes: [], scenario, personaIds: everyone },
    ...scenario.strategies.map((st) => ({ id: st.id, name: st.name, changes: strategyChangeWords(scenario, st), scenario: applyStrategyToPlaces(scenario, st), personaIds: st.personas ?? everyone })),
  ];
  const timelines: ExposureTimeline[] = [];
  for (const v of variants) {
    const strategy = scenario.strategies.find((s) => s.id === v.id);
    for (const pid of v.personaIds) {
      const persona = v.scenario.personas.find((p) => p.id === pid);
      if (persona !== undefined) timelines.push(expandPersona(v.scenario, persona, strategy));
    }
  }
  return { baseline: scenario, variants, timelines };
}
