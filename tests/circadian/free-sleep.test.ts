import { describe, expect, it } from 'vitest';
import { runBodyClock } from '../../model/circadian/body-clock.js';
import { lightFromPerMinute } from '../../model/circadian/light-series.js';

/** Invented day in native lux, per minute: 300 lx 07:00–18:00, 100 lx to 22:00, dark otherwise. */
function perMinuteDay(days: number): number[] {
  const out: number[] = [];
  for (let d = 0; d < days; d++) for (let m = 0; m < 1440; m++) out.push(m >= 420 && m < 1080 ? 300 : m >= 1080 && m < 1320 ? 100 : 0);
  return out;
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

  it('gates light by the predicted sleep: a lamp left on at night acts differently with eyes closed than with eyes open', () => {
    // light left on all night at 300 lx; asleep, none of it reaches the eye
    const lamp = lightFromPerMinute(perMinuteDay(4).map((v) => (v === 0 ? 300 : v)), 'native_lx');
    const gated = runBodyClock({ light: lamp, days: 4, sleep: { mode: 'free' }, init: { kind: 'entrained' } });
    const open = runBodyClock({ light: lamp, days: 4, sleep: { mode: 'free' }, eyelidTransmission: 1 });
    expect(gated.sleep_episodes.length).toBeGreaterThan(0);
    expect(gated.cbtmin_h[2]).not.toBeCloseTo(open.cbtmin_h[2] as number, 1);
  });
});
