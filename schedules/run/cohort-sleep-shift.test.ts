import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { validateScenarioValue } from '../validation/validate-scenario.js';
import { expandScenario } from '../timeline/expand-scenario.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import { fixedAwakeMinutes, shiftedSleepSpec } from './cohort-sleep-shift.js';
import { prescribedSleep } from './body-clock-run.js';

function deskWorkerTimeline(): ExposureTimeline {
  const v = validateScenarioValue({ ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 4 } });
  if (v.scenario === undefined) throw new Error('demo scenario invalid');
  const t = expandScenario(v.scenario).timelines.find((x) => x.personaId === 'desk-worker' && x.strategyId === 'baseline');
  if (t === undefined) throw new Error('no desk-worker baseline');
  return t;
}

const overlapsWork = (e: { start_h: number; end_h: number }, mask: Uint8Array): boolean => {
  for (let m = Math.ceil(e.start_h * 60); m < Math.floor(e.end_h * 60); m++) if (mask[m] === 1) return true;
  return false;
};

describe('habitual sleep timing of a virtual occupant', () => {
  const timeline = deskWorkerTimeline();
  const spec = { mode: 'prescribed' as const, episodes: prescribedSleep(timeline) };
  const work = fixedAwakeMinutes(timeline);

  it('a shift that rounds to zero minutes and free sleep leave the sleep exactly as written', () => {
    expect(shiftedSleepSpec(spec, timeline, 0, work)).toBe(spec);
    expect(shiftedSleepSpec(spec, timeline, 0.004, work)).toBe(spec);
    const free = { mode: 'free' as const };
    expect(shiftedSleepSpec(free, timeline, 1.5, work)).toBe(free);
  });

  it('an earlier chronotype sleeps the same hours, one hour earlier, except where the run starts', () => {
    const moved = shiftedSleepSpec(spec, timeline, -1, work);
    if (moved.mode !== 'prescribed') throw new Error('mode changed');
    expect(moved.episodes.length).toBe(spec.episodes.length);
    spec.episodes.forEach((e, i) => {
      const m = moved.episodes[i];
      if (m === undefined) throw new Error('missing episode');
      // An episode cut by the run start keeps its start at 0 (no artificial awake stretch).
      expect(m.start_h).toBeCloseTo(e.start_h === 0 ? 0 : e.start_h - 1, 2);
      expect(m.end_h).toBeCloseTo(e.end_h === timeline.total_min / 60 ? e.end_h : e.end_h - 1, 2);
    });
  });

  it('a late chronotype never sleeps into work or the commute, so work days lose sleep (social jet lag)', () => {
    const moved = shiftedSleepSpec(spec, timeline, 3, work);
    if (moved.mode !== 'prescribed') throw new Error('mode changed');
    for (const e of moved.episodes) expect(overlapsWork(e, work)).toBe(false);
    const total = (eps: readonly { start_h: number; end_h: number }[]) => eps.reduce((s, e) => s + e.end_h - e.start_h, 0);
    expect(total(moved.episodes)).toBeLessThan(total(spec.episodes));
  });
});
