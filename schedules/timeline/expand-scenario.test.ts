import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { scenarioSchema } from '../schema/scenario-schema.js';
import type { Scenario } from '../schema/scenario-types.js';
import { expandScenario, expandPersona } from './expand-scenario.js';
import type { ExposureTimeline } from './exposure-types.js';
import { forEachMinute, sliceAtMinute, sliceIndexPerMinute, utcAtMinute, wallClockAtMinute } from './timeline-sampling.js';

const demo: Scenario = scenarioSchema.parse(DEMO_SCENARIO);

function timeline(personaId: string, strategyId = 'baseline'): ExposureTimeline {
  const t = expandScenario(demo).timelines.find((x) => x.personaId === personaId && x.strategyId === strategyId);
  if (t === undefined) throw new Error(`no timeline ${personaId}/${strategyId}`);
  return t;
}

function at(t: ExposureTimeline, dayIndex: number, clock: string): ReturnType<typeof sliceAtMinute> {
  const [h, m] = clock.split(':').map(Number);
  for (let minute = 0; minute < t.total_min; minute++) {
    const w = wallClockAtMinute(t, minute);
    if (w.date === t.days[dayIndex]?.date && w.minuteOfDay === (h ?? 0) * 60 + (m ?? 0)) return sliceAtMinute(t, minute);
  }
  return undefined;
}

describe('expansion over a daylight-saving change (Europe/Berlin, 29 March 2026: 02:00 → 03:00, EU Directive 2000/84/EC)', () => {
  it('covers every real minute exactly once: 14 days = 14 × 1440 − 60 minutes', () => {
    const t = timeline('desk-worker');
    expect(t.total_min).toBe(14 * 1440 - 60);
    const visited: number[] = [];
    const utcSeen = new Set<number>();
    forEachMinute(t, (m) => {
      visited.push(m);
      utcSeen.add(utcAtMinute(t, m));
    });
    expect(visited).toEqual(Array.from({ length: t.total_min }, (_, k) => k));
    expect(utcSeen.size).toBe(t.total_min);
    const index = sliceIndexPerMinute(t);
    expect(index.length).toBe(t.total_min);
    expect(t.slices[index[5000] ?? -1]).toBe(sliceAtMinute(t, 5000));
  });
  it('makes the transition day 23 h long and keeps wall-clock plans on the wall clock', () => {
    const t = timeline('desk-worker');
    const sunday = t.days.find((d) => d.date === '2026-03-29');
    expect(sunday?.length_min).toBe(1380);
    expect(t.days.filter((d) => d.length_min !== 1440)).toHaveLength(1);
    // Monday after the change: still at the office at 08:10 local (now UTC+2).
    const mon = t.days.find((d) => d.date === '2026-03-30');
    if (mon === undefined) throw new Error('missing day');
    const minute = mon.start_min + 8 * 60 + 10;
    expect(sliceAtMinute(t, minute)?.placeId).toBe('office-floor');
    expect(new Date(utcAtMinute(t, minute)).toISOString()).toBe('2026-03-30T06:10:00.000Z');
  });
  it('has a 25 h day and no doubled hour at the autumn change (25 October 2026)', () => {
    const autumn: Scenario = { ...demo, run: { startDate: '2026-10-20', days: 10 } };
    const persona = autumn.personas.find((p) => p.id === 'desk-worker');
    if (persona === undefined) throw new Error('demo changed');
    const t = expandPersona(autumn, persona, undefined);
    expect(t.total_min).toBe(10 * 1440 + 60);
    expect(t.days.find((d) => d.date === '2026-10-25')?.length_min).toBe(1500);
    let prevEnd = 0;
    for (const s of t.slices) {
      expect(s.start_min).toBe(prevEnd);
      prevEnd = s.end_min;
    }
    expect(prevEnd).toBe(t.total_min);
  });
});

describe('week routine', () => {
  it('places the desk worker asleep at 03:00, at the office at 10:00 on a weekday, in the park on Saturday morning', () => {
    const t = timeline('desk-worker');
    expect(at(t, 1, '03:00')?.sleep).toBe('asleep');
    expect(at(t, 1, '10:00')).toMatchObject({ placeId: 'office-floor', screenId: 'desk-monitor', sleep: 'awake' });
    expect(at(t, 5, '10:30')?.placeId).toBe('park');
  });
});

describe('roster', () => {
  const t = timeline('nurse');
  it('works the cycle: early shift on day 0, late on day 2, night on day 4', () => {
    expect(t.days.map((d) => d.dayKind).slice(0, 8)).toEqual(['day', 'day', 'evening', 'evening', 'night', 'night', 'night', 'rest']);
    expect(at(t, 0, '10:00')).toMatchObject({ placeId: 'ward-station', activity: 'work' });
    expect(at(t, 2, '20:00')).toMatchObject({ placeId: 'ward-station', activity: 'work' });
    expect(at(t, 4, '23:30')).toMatchObject({ placeId: 'ward-station', activity: 'work', shiftKind: 'night' });
  });
  it('derives the commute around each shift', () => {
    expect(at(t, 0, '06:30')).toMatchObject({ placeId: 'car', activity: 'commute', commute: 'to-work' });
    expect(at(t, 5, '07:10')).toMatchObject({ placeId: 'car', commute: 'from-work', shiftKind: 'night' });
  });
  it('puts sleep after a night shift in the morning, and a nap before the first night', () => {
    // Night 1 (day 4) ends 07:00 on day 5; home 07:25; +45 min wind-down → sleep 08:10–14:40.
    expect(at(t, 5, '09:00')).toMatchObject({ placeId: 'nurse-bedroom', sleep: 'asleep' });
    expect(at(t, 5, '15:00')?.sleep).toBe('awake');
    // Nap before the first night: ends 22:00 − 25 min − 60 min = 20:35, lasts 1.5 h.
    expect(at(t, 4, '19:30')).toMatchObject({ activity: 'nap', sleep: 'asleep' });
  });
  it('wakes in time for an early shift', () => {
    // Early shift 06:45, commute 25 min, 60 min to get ready → awake by 05:20.
    expect(at(t, 1, '05:10')?.sleep).toBe('asleep');
    expect(at(t, 1, '05:25')?.sleep).toBe('awake');
  });
});

describe('strategies', () => {
  it('puts amber glasses on the nurse only on the journey home after nights', () => {
    const t = timeline('nurse', 'ward-amber-drive-home');
    const withGlasses = t.slices.filter((s) => s.eyewearId === 'amber');
    expect(withGlasses.length).toBeGreaterThan(0);
    expect(withGlasses.every((s) => s.commute === 'from-work' && s.shiftKind === 'night')).toBe(true);
    const base = timeline('nurse');
    expect(base.slices.some((s) => s.eyewearId !== null)).toBe(false);
  });
  it('adds a lunch walk on weekdays only', () => {
    const t = timeline('desk-worker', 'office-lunch-walk');
    expect(at(t, 0, '12:40')).toMatchObject({ placeId: 'park', origin: 'strategy' });
    expect(at(t, 5, '12:40')?.placeId).toBe('flat-living');
  });
  it('creates timelines only for the personas a strategy is meant for', () => {
    const ex = expandScenario(demo);
    // three people's baselines; the nurse's 4 strategies, the window-desk worker's 4, the deep-desk worker's 3
    expect(ex.timelines).toHaveLength(3 + 4 + 4 + 3);
    expect(ex.variants.find((v) => v.id === 'ward-dark-bedroom')?.changes).toHaveLength(2);
  });
  it('switches the bedside lamp off in the dark-bedroom variant but not in the baseline', () => {
    const ex = expandScenario(demo);
    const lamp = (id: string) => {
      const room = ex.variants.find((v) => v.id === id)?.scenario.places.find((p) => p.id === 'nurse-bedroom');
      return room?.kind === 'room' ? room.luminaires.find((l) => l.id === 'bedside')?.schedule.length : undefined;
    };
    expect(lamp('baseline')).toBe(1);
    expect(lamp('ward-dark-bedroom')).toBe(0);
  });
});

describe('measured light', () => {
  it('marks the minutes a measured log replaces', () => {
    const s: Scenario = structuredClone(demo);
    const p = s.personas.find((x) => x.id === 'desk-worker');
    if (p === undefined) throw new Error('demo changed');
    s.lightLogs = [{ id: 'wear1', file: 'x.csv', timestampFormat: 'auto', quantity: { kind: 'photopic-lux' }, fill: 'model' }];
    p.measuredLight = [{ log: 'wear1', from: '2026-03-24T00:00', to: '2026-03-25T00:00' }];
    const t = expandPersona(s, p, undefined);
    let n = 0;
    forEachMinute(t, (_m, sl) => {
      if (sl.measuredLogId === 'wear1') n++;
    });
    expect(n).toBe(1440);
  });
});
