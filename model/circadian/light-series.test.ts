import { describe, expect, it } from 'vitest';
import { lightAt, lightFromPerMinute, lightFromSteps, scaledLightSeries } from './light-series.js';

describe('light series', () => {
  it('merges equal consecutive per-minute values into one segment each', () => {
    const day = new Array<number>(1440).fill(0);
    for (let m = 7 * 60; m < 23 * 60; m++) day[m] = m < 12 * 60 ? 300 : 150;
    const s = lightFromPerMinute(day, 'mel_edi_lx');
    expect(Array.from(s.start_h)).toEqual([0, 7, 12, 23]);
    expect(Array.from(s.level)).toEqual([0, 300, 150, 0]);
    expect(s.end_h).toBe(24);
    expect(lightAt(s, 11.99)).toBe(300);
    expect(lightAt(s, 12)).toBe(150);
  });

  it('merges nearly equal minutes at their mean level when asked, and only then', () => {
    const v = [100, 101, 102, 103, 200, 200];
    expect(lightFromPerMinute(v, 'native_lx').level.length).toBe(5);
    const merged = lightFromPerMinute(v, 'native_lx', 0, { relative: 0.05 });
    expect(Array.from(merged.level)).toEqual([101.5, 200]);
    expect(Array.from(merged.start_h)).toEqual([0, 4 / 60]);
  });

  it('refuses negative or non-finite light naming the value index', () => {
    expect(() => lightFromPerMinute([1, -2], 'native_lx')).toThrow(/value 1/);
    expect(() => lightFromSteps([0, 0], [1, 2], 'native_lx')).toThrow(/time 1/);
  });

  it('scales smooth pieces together with levels', () => {
    const s = { ...lightFromSteps([0, 6], [0, 0], 'native_lx', 24), smooth: [undefined, (t: number) => 100 * t] };
    const k = scaledLightSeries(s, 2, 'native_lx');
    expect(lightAt(k, 7)).toBe(1400);
  });
});
