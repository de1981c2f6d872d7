import { describe, expect, test } from 'vitest';
import { lightFromPerMinute } from '../../model/circadian/light-series.js';
import { createPacemaker } from '../../model/circadian/registry.js';
import { simulate } from '../../model/circadian/simulate.js';
import { dyadicHours, mergedLightSeries } from './light-segments.js';
import { entrainedStart } from './body-clock-run.js';

/** An invented 3-day light pattern: smooth daylight ramps at a window, office light, evening lamp. */
function pattern(): Float64Array {
  const out = new Float64Array(3 * 1440);
  for (let m = 0; m < out.length; m++) {
    const h = (m % 1440) / 60;
    const day = h > 6 && h < 19 ? 900 * Math.sin((Math.PI * (h - 6)) / 13) : 0;
    out[m] = h >= 7 && h < 23 ? 80 + (h >= 9 && h < 17 ? day : day * 0.2) : 0;
  }
  return out;
}

describe('merged light segments', () => {
  test('keep the melanopic dose of every day exactly (segment level = mean of its minutes)', () => {
    const v = pattern();
    const s = mergedLightSeries(v);
    let merged = 0;
    for (let i = 0; i < s.start_h.length; i++) merged += (s.level[i] ?? 0) * (((s.start_h[i + 1] ?? s.end_h) as number) - (s.start_h[i] ?? 0));
    const exact = v.reduce((a, b) => a + b, 0) / 60;
    expect(Math.abs(merged - exact) / exact).toBeLessThan(1e-3); // breakpoints rounded to 1/1024 h
  });

  test('use far fewer breakpoints than minutes for smooth daylight', () => {
    expect(mergedLightSeries(pattern()).start_h.length).toBeLessThan(300);
  });

  test('breakpoints are exact in binary so that whole-day shifts land on themselves', () => {
    for (const m of [1, 7, 380, 1439]) expect(24 + dyadicHours(m) - 24).toBe(dyadicHours(m));
  });

  test('CBTmin with merged light stays within 0.05 h of the per-minute input (reference: the same model fed every minute)', () => {
    const v = pattern();
    const model = createPacemaker('jfk99-x7');
    const sleep = { mode: 'prescribed' as const, episodes: [0, 1, 2].map((d) => ({ start_h: 24 * d + 23, end_h: 24 * d + 31 })) };
    const init = entrainedStart(model, mergedLightSeries(v), sleep);
    const a = simulate({ model, light: lightFromPerMinute(v, 'mel_edi_lx'), sleep, initial: init, end_h: 72 });
    const b = simulate({ model, light: mergedLightSeries(v), sleep, initial: init, end_h: 72 });
    expect(b.cbtmin_h.length).toBe(a.cbtmin_h.length);
    a.cbtmin_h.forEach((t, i) => expect(Math.abs(t - (b.cbtmin_h[i] ?? 0))).toBeLessThan(0.05));
  });
});
