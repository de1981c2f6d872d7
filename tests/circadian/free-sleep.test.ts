import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { runBodyClock } from '../../model/circadian/body-clock.js';
import { lightFromPerMinute } from '../../model/circadian/light-series.js';
import type { SleepEpisode } from '../../model/circadian/sleep-input.js';
import type { Scenario } from '../../schedules/index.js';
import { runScenario } from '../../schedules/run/index.js';
import { minutesToClockTime } from '../../schedules/time/clock-time.js';
import { demoScenario } from '../run/demo-run.js';

/** Invented day in native lux, per minute: 300 lx 07:00–18:00, 100 lx to 22:00, dark otherwise. */
function perMinuteDay(days: number): number[] {
  const out: number[] = [];
  for (let d = 0; d < days; d++) for (let m = 0; m < 1440; m++) out.push(m >= 420 && m < 1080 ? 300 : m >= 1080 && m < 1320 ? 100 : 0);
  return out;
}

/** Minutes of overlap between sleep and the windows (h). */
function overlap_h(sleep: readonly SleepEpisode[], windows: readonly SleepEpisode[]): number {
  let s = 0;
  for (const e of sleep) for (const w of windows) s += Math.max(0, Math.min(e.end_h, w.end_h) - Math.max(e.start_h, w.start_h));
  return s;
}

describe('free (model-predicted) sleep, HCL thresholds (Skeldon et al. 2023/24)', () => {
  const light = lightFromPerMinute(perMinuteDay(4), 'native_lx');

  it('settles into one consolidated sleep of 7–9.5 h per night for a regular light day', () => {
    const r = runBodyClock({ light, days: 4, modelId: 'fjk99-cubic' });
    const nights = r.sleep_episodes.filter((e) => e.start_h > 12 && e.end_h < 96);
    expect(nights.length).toBeGreaterThanOrEqual(2);
    for (const e of nights) {
      expect(e.end_h - e.start_h).toBeGreaterThan(7);
      expect(e.end_h - e.start_h).toBeLessThan(9.5);
    }
  });

  it('ends every sleep at the alarm or earlier', () => {
    const r = runBodyClock({ light, days: 4, sleep: { mode: 'free', alarm_h: 6 } });
    for (const e of r.sleep_episodes) if (e.end_h < 96) expect(((e.end_h % 24) + 24) % 24).toBeLessThanOrEqual(6 + 1e-6);
  });

  it('reads the light behind the closed eyelids in predicted sleep: a lamp left on at night acts differently with eyes closed than with eyes open', () => {
    // light left on all night at 300 lx; asleep, 0.3 % of it reaches the eye (model/photometry/eyelid-transmittance.ts)
    const lamp = lightFromPerMinute(perMinuteDay(4).map((v) => (v === 0 ? 300 : v)), 'native_lx');
    const closed = runBodyClock({ light: lamp, days: 4, sleep: { mode: 'free' }, init: { kind: 'entrained' } });
    const open = runBodyClock({ light: lamp, days: 4, sleep: { mode: 'free' }, eyelidTransmission: 1 });
    expect(closed.sleep_episodes.length).toBeGreaterThan(0);
    expect(closed.cbtmin_h[2]).not.toBeCloseTo(open.cbtmin_h[2] as number, 1);
  });
});

describe('free sleep respects work and travel (wake windows: a product rule, like the alarm)', () => {
  it('is never asleep inside a wake window, whatever the windows (property)', () => {
    // Up to one window a day over 4 days: start anywhere in the day, 1–12 h long, never overlapping.
    const windowsArb = fc
      .array(fc.option(fc.record({ start: fc.integer({ min: 0, max: 95 }), length: fc.integer({ min: 4, max: 48 }) }), { nil: undefined }), { minLength: 4, maxLength: 4 })
      .map((days) => {
        const out: SleepEpisode[] = [];
        days.forEach((w, d) => {
          if (w === undefined) return;
          const start = 24 * d + w.start / 4;
          const prev = out[out.length - 1];
          const from = prev === undefined ? start : Math.max(start, prev.end_h + 0.25);
          out.push({ start_h: from, end_h: from + w.length / 4 });
        });
        return out;
      });
    fc.assert(
      fc.property(windowsArb, fc.constantFrom('jfk99-x7', 'fjk99-cubic', 'hfb19-sp') , (windows, modelId) => {
        const days = 5;
        const r = runBodyClock({ light: lightFromPerMinute(perMinuteDay(days), 'native_lx'), days, modelId, sleep: { mode: 'free', wakeWindows: windows } });
        expect(overlap_h(r.sleep_episodes, windows)).toBeLessThan(1e-6);
      }),
      { numRuns: 30, seed: 20261202 },
    );
  });

  it('wakes a sleeper when a window starts and lets a sleepy worker fall asleep as soon as it ends', () => {
    // Light 07:00–23:00; a night at work 22:00–07:30 on day 2 (h 70–79.5).
    const days = 4;
    const windows = [{ start_h: 70, end_h: 79.5 }];
    const r = runBodyClock({ light: lightFromPerMinute(perMinuteDay(days), 'native_lx'), days, modelId: 'jfk99-x7', sleep: { mode: 'free', wakeWindows: windows } });
    expect(overlap_h(r.sleep_episodes, windows)).toBeLessThan(1e-6);
    // after 24.5 h awake the sleep pressure is far above the threshold: asleep on leaving work
    const after = r.sleep_episodes.find((e) => e.start_h >= 79.5 - 1e-9);
    expect(after?.start_h).toBeCloseTo(79.5, 6);
  });
});

describe('free sleepers on generated rosters (scenario pipeline)', () => {
  it('are never asleep during work or the commute (property over rosters)', () => {
    const base = demoScenario();
    const q = (quarters: number) => minutesToClockTime((quarters * 15) % 1440);
    const rosterArb = fc.record({
      cycle: fc.array(fc.constantFrom('early', 'late', 'night', 'rest'), { minLength: 2, maxLength: 6 }),
      offsetDays: fc.integer({ min: 0, max: 5 }),
      early: fc.tuple(fc.integer({ min: 20, max: 36 }), fc.integer({ min: 24, max: 40 })),
      late: fc.tuple(fc.integer({ min: 48, max: 64 }), fc.integer({ min: 24, max: 36 })),
      night: fc.tuple(fc.integer({ min: 76, max: 92 }), fc.integer({ min: 32, max: 44 })),
      commute: fc.integer({ min: 0, max: 60 }),
      days: fc.integer({ min: 2, max: 4 }),
    });
    fc.assert(
      fc.property(rosterArb, (r) => {
        const roster = base.rosters[0];
        if (roster === undefined) throw new Error('the demo has a roster');
        const shift = (id: string, kind: 'day' | 'evening' | 'night', [start, len]: [number, number]) => ({ id, kind, start: q(start), end: q(start + len), place: 'ward-station', posture: 'standing' as const, gaze: 'room' as const });
        const scenario: Scenario = {
          ...base,
          run: { ...base.run, days: r.days },
          personas: base.personas.filter((p) => p.id === 'nurse').map((p) => ({ ...p, sleep: { mode: 'free' }, roster: { roster: roster.id, offsetDays: r.offsetDays } })),
          rosters: [{ ...roster, cycle: r.cycle, shifts: [shift('early', 'day', r.early), shift('late', 'evening', r.late), shift('night', 'night', r.night)], commute: { minutes: r.commute, place: 'car', posture: 'seated' } }],
          strategies: [],
        };
        const out = runScenario({ scenario, personaIds: ['nurse'] });
        for (const tl of out.light) {
          // minutes asleep as the results count them (episode edges to the nearest minute; times reach the solver as multiples of 1/1024 h)
          const asleep = new Uint8Array(tl.timeline.total_min);
          for (const e of tl.sleepEpisodes) asleep.fill(1, Math.round(e.start_h * 60), Math.round(e.end_h * 60));
          let busyAsleep = 0;
          for (const s of tl.timeline.slices) if (s.activity === 'work' || s.activity === 'commute') for (let m = s.start_min; m < s.end_min; m++) busyAsleep += asleep[m] ?? 0;
          expect(busyAsleep).toBe(0);
          expect(tl.sleepEpisodes.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 8, seed: 20261203 },
    );
  }, 300_000);
});

describe('mid-sleep of a free sleeper on a 07:00–23:00 light day (model limitation)', () => {
  // Published: mid-sleep on free days ≈ 04:00–05:00 clock time in chronotype surveys (Roenneberg et
  // al. 2003 J Biol Rhythms 18:80 and 2007 Curr Biol 17:R44, from memory; the Munich group's
  // questionnaire feedback puts the average type at 0:15–8:15, mid-sleep 04:15; Santisteban et
  // al. 2018 Sleep Disord 5646848: 04:56 ± 1:16). The HCL model, correctly built (its published
  // thresholds, no alarm), puts mid-sleep later on this light day; the values are pinned here and
  // recorded in docs/validation/circadian.md so that a change is noticed.
  const days = 10;
  const light = lightFromPerMinute(Array.from({ length: days * 1440 }, (_, m) => (m % 1440 >= 420 && m % 1440 < 1380 ? 150 : 0)), 'native_lx');
  const midSleep = (modelId: 'jfk99-x7' | 'fjk99-cubic' | 'fjk99-cubic-sf14' | 'hfb19-sp') => {
    const r = runBodyClock({ light, days, modelId, sleep: { mode: 'free' } });
    const last = r.sleep_episodes.filter((e) => e.start_h > 24 * (days - 3) && e.end_h < 24 * days);
    const mids = last.map((e) => ((0.5 * (e.start_h + e.end_h)) % 24));
    return mids.reduce((a, b) => a + b, 0) / mids.length;
  };
  const RECORDED = { 'jfk99-x7': 6.215, 'fjk99-cubic': 6.08, 'fjk99-cubic-sf14': 5.99, 'hfb19-sp': 5.285 } as const;
  for (const [modelId, h] of Object.entries(RECORDED) as [keyof typeof RECORDED, number][]) {
    it(`${modelId}: mid-sleep at the recorded ${h} h (later than the published 04:00–05:00)`, () => {
      const m = midSleep(modelId);
      expect(Math.abs(m - h)).toBeLessThan(0.05);
      expect(m).toBeGreaterThan(5);
    });
  }
});
