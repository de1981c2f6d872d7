/**
 * Sense checks of timing: day plans in order without overlaps, plausible daily sleep,
 * luminaire schedules without overlaps, roster shifts that match their kind and leave rest.
 */
import type { Persona, Roster, Scenario, Segment } from '../../schema/scenario-types.js';
import { WEEKDAYS } from '../../schema/primitives.js';
import { REST_DAY } from '../../schema/roster-schema.js';
import { clockSpan, MINUTES_PER_DAY } from '../../time/clock-time.js';
import { problem, type PathPart, type ScenarioProblem } from '../problem.js';

/** Minimum daily rest between shifts: 11 consecutive hours (EU Working Time Directive 2003/88/EC, Art. 3). */
export const MIN_DAILY_REST_H = 11;
const MIN_SLEEP_H = 4;
const MAX_SLEEP_H = 12;

/** Shifts that match their kind and leave the daily rest between them, for one roster at `path`. */
export function rosterTimingChecks(r: Roster, path: readonly PathPart[]): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  const shifts = new Map(r.shifts.map((sh) => [sh.id, sh]));
  r.shifts.forEach((sh, k) => {
    const { start_min, end_min } = clockSpan(sh.start, sh.end);
    const crosses = end_min > MINUTES_PER_DAY;
    if (sh.kind === 'night' && !crosses) out.push(problem('warning', [...path, 'shifts', k, 'kind'], `a night shift ${sh.start}–${sh.end} that does not run past midnight`, 'Check the times, or call it a day or evening shift.'));
    if (sh.kind !== 'night' && crosses && end_min - MINUTES_PER_DAY > 60) out.push(problem('warning', [...path, 'shifts', k, 'kind'], `a ${sh.kind} shift ${sh.start}–${sh.end} that runs well past midnight`, 'Call it a night shift so sleep moves into the day.'));
    if (end_min - start_min > 16 * 60) out.push(problem('warning', [...path, 'shifts', k, 'end'], `a shift of ${((end_min - start_min) / 60).toFixed(1)} h`, 'Check the times; shifts longer than 12–13 h are rare.'));
  });
  const commute = r.commute?.minutes ?? 0;
  r.cycle.forEach((id, k) => {
    const nextId = r.cycle[(k + 1) % r.cycle.length];
    const a = shifts.get(id);
    const b = nextId === undefined ? undefined : shifts.get(nextId);
    if (id === REST_DAY || nextId === REST_DAY || a === undefined || b === undefined) return;
    const aSpan = clockSpan(a.start, a.end);
    const bSpan = clockSpan(b.start, b.end);
    const rest_h = (bSpan.start_min + MINUTES_PER_DAY - commute - (aSpan.end_min + commute)) / 60;
    if (rest_h < MIN_DAILY_REST_H) {
      out.push(problem('warning', [...path, 'cycle', (k + 1) % r.cycle.length], `only ${rest_h.toFixed(1)} h between the end of "${id}" and the start of "${nextId}" (commute included)`, `Allow at least ${MIN_DAILY_REST_H} h of rest between shifts, e.g. put a rest day in between.`));
    }
  });
  return out;
}

function isAsleep(seg: Segment): boolean {
  return seg.activity === 'sleep' || seg.activity === 'nap';
}

function checkDayPlan(segs: readonly Segment[], persona: Persona, path: readonly PathPart[], out: ScenarioProblem[]): void {
  let prevEnd = -Infinity;
  let sleep_min = 0;
  segs.forEach((seg, k) => {
    const { start_min, end_min } = clockSpan(seg.start, seg.end);
    if (end_min - start_min === MINUTES_PER_DAY) {
      out.push(problem('warning', [...path, k, 'end'], `the segment ${seg.start}–${seg.end} lasts a whole day`, 'If it was meant to run past midnight, make the end earlier than the start (e.g. 23:00–07:00).'));
    }
    if (start_min < prevEnd) {
      out.push(problem('warning', [...path, k, 'start'], `starts at ${seg.start}, before the previous segment ends`, 'List segments in time order without overlaps; where they overlap, the later one is used.'));
    }
    prevEnd = Math.max(prevEnd, end_min);
    if (isAsleep(seg)) sleep_min += end_min - start_min;
  });
  if (persona.sleep.mode === 'habitual' && segs.length > 0) {
    if (sleep_min === 0) out.push(problem('warning', path, 'this day has no sleep segment, so the person is awake all day', 'Add a sleep segment (e.g. 23:00–07:00), or set the persona\'s sleep mode to "free".'));
    else if (sleep_min < MIN_SLEEP_H * 60 || sleep_min > MAX_SLEEP_H * 60) {
      out.push(problem('warning', path, `${(sleep_min / 60).toFixed(1)} h of sleep start on this day`, `Check the sleep segments; ${MIN_SLEEP_H}–${MAX_SLEEP_H} h is the usual range.`));
    }
  }
}

export function timingChecks(s: Scenario): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  s.personas.forEach((persona, i) => {
    const checked = new Set<string>();
    for (const [name, segs] of Object.entries(persona.templates)) {
      checkDayPlan(segs, persona, ['personas', i, 'templates', name], out);
      checked.add(name);
    }
    const week = persona.week;
    if (week === undefined) return;
    const segsOf = (day: (typeof WEEKDAYS)[number]): readonly Segment[] => {
      const plan = week[day];
      return typeof plan === 'string' ? (persona.templates[plan] ?? []) : plan;
    };
    WEEKDAYS.forEach((day, d) => {
      const plan = week[day];
      if (typeof plan !== 'string') checkDayPlan(plan, persona, ['personas', i, 'week', day], out);
      // A segment running past midnight must not run into the next day's first segment.
      const nextDay = WEEKDAYS[(d + 1) % 7] ?? 'mon';
      const nextStart = Math.min(...segsOf(nextDay).map((seg) => clockSpan(seg.start, seg.end).start_min));
      segsOf(day).forEach((seg, k) => {
        const spill = clockSpan(seg.start, seg.end).end_min - MINUTES_PER_DAY;
        if (spill > 0 && nextStart < spill) {
          const where: PathPart[] = typeof plan === 'string' ? ['personas', i, 'templates', plan, k, 'end'] : ['personas', i, 'week', day, k, 'end'];
          out.push(problem('warning', where, `on ${day} this segment runs to ${seg.end} on ${nextDay}, but ${nextDay}'s plan starts earlier; ${nextDay}'s plan is used from its start`, `End the segment when ${nextDay}'s plan begins, or start ${nextDay}'s plan later.`));
        }
      });
    });
  });
  s.places.forEach((pl, i) => {
    if (pl.kind !== 'room') return;
    pl.luminaires.forEach((l, k) => {
      const spans = l.schedule.map((e) => ({ ...clockSpan(e.start, e.end), days: e.days }));
      for (let a = 0; a < spans.length; a++) {
        for (let b = a + 1; b < spans.length; b++) {
          const x = spans[a];
          const y = spans[b];
          if (x === undefined || y === undefined) continue;
          const sharesDay = x.days === undefined || y.days === undefined || x.days.some((d) => y.days?.includes(d));
          if (sharesDay && x.start_min < y.end_min && y.start_min < x.end_min) {
            out.push(problem('warning', ['places', i, 'luminaires', k, 'schedule', b], `overlaps schedule entry ${a + 1}`, 'Make the periods follow each other; where they overlap, the later entry is used.'));
          }
        }
      }
    });
  });
  s.rosters.forEach((r, i) => out.push(...rosterTimingChecks(r, ['rosters', i])));
  s.strategies.forEach((st, i) => {
    st.changes.forEach((c, k) => {
      if (c.op === 'modify-segments' && Object.keys(c.set).length === 0) out.push(problem('warning', ['strategies', i, 'changes', k, 'set'], 'this change sets nothing', 'Say what changes, e.g. { "eyewear": "amber" }.'));
      if (c.op === 'modify-segments' && Object.keys(c.match).length === 0) out.push(problem('warning', ['strategies', i, 'changes', k, 'match'], 'this change applies to the whole timeline', 'Narrow it down with activity, place, shiftKind, days or from/to, if that was not meant.'));
    });
  });
  return out;
}
