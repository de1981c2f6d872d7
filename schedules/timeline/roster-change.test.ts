import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { scenarioSchema } from '../schema/scenario-schema.js';
import type { Scenario, Strategy } from '../schema/scenario-types.js';
import { expandScenario } from './expand-scenario.js';
import type { ExposureTimeline } from './exposure-types.js';
import { sliceAtMinute, wallClockAtMinute } from './timeline-sampling.js';

/** The demo's ward with one extra strategy holding the given roster changes for the nurse. */
function withStrategy(changes: Strategy['changes']): Scenario {
  const s = scenarioSchema.parse(DEMO_SCENARIO);
  s.strategies = [{ id: 'roster-option', name: 'Roster option', personas: ['nurse'], changes }];
  return s;
}

function timelineOf(s: Scenario, strategyId: string): ExposureTimeline {
  const t = expandScenario(s).timelines.find((x) => x.personaId === 'nurse' && x.strategyId === strategyId);
  if (t === undefined) throw new Error(`no timeline for ${strategyId}`);
  return t;
}

/** Activity at a wall-clock time of a run day. */
function activityAt(t: ExposureTimeline, dayIndex: number, clock: string): string | undefined {
  const [h, m] = clock.split(':').map(Number);
  const day = t.days[dayIndex];
  if (day === undefined) return undefined;
  for (let minute = day.start_min; minute < day.start_min + day.length_min; minute++) {
    const w = wallClockAtMinute(t, minute);
    if (w.minuteOfDay === (h ?? 0) * 60 + (m ?? 0)) return sliceAtMinute(t, minute)?.activity;
  }
  return undefined;
}

describe('roster changes in the expanded timeline', () => {
  it('lays the shifts out from a new cycle written as a pattern, for the persona only in that strategy', () => {
    const s = withStrategy([{ op: 'set-roster', persona: 'nurse', pattern: '4night 3rest 2early 2late 3rest' }]);
    const base = timelineOf(s, 'baseline');
    const option = timelineOf(s, 'roster-option');
    // Demo roster from its anchor (the run's first day): early early late late night night night …
    expect(base.days.slice(0, 7).map((d) => d.dayKind)).toEqual(['day', 'day', 'evening', 'evening', 'night', 'night', 'night']);
    expect(option.days.slice(0, 9).map((d) => d.dayKind)).toEqual(['night', 'night', 'night', 'night', 'rest', 'rest', 'rest', 'day', 'day']);
    expect(activityAt(base, 0, '23:30')).not.toBe('work');
    expect(activityAt(option, 0, '23:30')).toBe('work');
    // The baseline scenario's roster is left as it was.
    expect(s.rosters.find((r) => r.id === 'birch-rotation')?.cycle[0]).toBe('early');
  });

  it('moves the work of a shift to its new times', () => {
    const s = withStrategy([{ op: 'set-roster', persona: 'nurse', shifts: [{ shift: 'night', start: '19:00', end: '07:00' }] }]);
    const base = timelineOf(s, 'baseline');
    const option = timelineOf(s, 'roster-option');
    const firstNight = base.days.findIndex((d) => d.dayKind === 'night');
    expect(firstNight).toBeGreaterThanOrEqual(0);
    expect(activityAt(base, firstNight, '20:00')).not.toBe('work');
    expect(activityAt(option, firstNight, '20:00')).toBe('work');
    expect(activityAt(option, firstNight, '23:00')).toBe('work');
  });

  it('switches the persona to another roster of the scenario, leaving the baseline on its own', () => {
    const s = withStrategy([{ op: 'set-roster', persona: 'nurse', roster: 'twelve-hour', offsetDays: 2 }]);
    s.rosters.push({
      ...structuredClone(s.rosters[0] as Scenario['rosters'][number]),
      id: 'twelve-hour',
      cycle: ['long-day', 'long-day', 'long-night', 'long-night', 'rest', 'rest', 'rest'],
      shifts: [
        { id: 'long-day', kind: 'day', start: '07:00', end: '19:00', place: 'ward-station', posture: 'standing', gaze: 'room' },
        { id: 'long-night', kind: 'night', start: '19:00', end: '07:00', place: 'ward-station', posture: 'standing', gaze: 'room' },
      ],
    });
    const option = timelineOf(s, 'roster-option');
    expect(option.days.slice(0, 3).map((d) => d.dayKind)).toEqual(['night', 'night', 'rest']);
    expect(activityAt(option, 0, '19:30')).toBe('work');
    expect(activityAt(timelineOf(s, 'baseline'), 0, '19:30')).not.toBe('work');
  });

  it('puts a person with a weekly routine on a roster', () => {
    const s = withStrategy([{ op: 'set-roster', persona: 'desk-worker', roster: 'birch-rotation', offsetDays: 4 }]);
    const strategy = s.strategies[0];
    if (strategy === undefined) throw new Error('no strategy');
    strategy.personas = ['desk-worker'];
    const t = expandScenario(s).timelines.find((x) => x.personaId === 'desk-worker' && x.strategyId === 'roster-option');
    expect(t?.days[0]?.dayKind).toBe('night');
    expect(expandScenario(s).timelines.find((x) => x.personaId === 'desk-worker' && x.strategyId === 'baseline')?.days[0]?.dayKind).toBeNull();
  });

  it('starts the persona at another day of the cycle', () => {
    const s = withStrategy([{ op: 'set-roster', persona: 'nurse', offsetDays: 4 }]);
    expect(timelineOf(s, 'roster-option').days[0]?.dayKind).toBe('night');
  });

  it('lists the change in plain words with the cycle as a pattern', () => {
    const s = withStrategy([{ op: 'set-roster', persona: 'nurse', pattern: 'night night night night . . .', shifts: [{ shift: 'night', start: '19:00', end: '07:00' }], sleep: { afterNight: 'split' } }]);
    const words = expandScenario(s).variants.find((v) => v.id === 'roster-option')?.changes;
    expect(words).toEqual([
      `Mara Quellbrook's roster: cycle 4night 3rest; the "night" shift 19:00–07:00; split sleep after night shifts (a morning sleep and an afternoon nap).`,
    ]);
  });
});
