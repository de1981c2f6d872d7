import { describe, expect, it } from 'vitest';
import { localHoursOf } from './results-view.js';
import { lightAxisTop_lx } from './components/print-charts.js';

describe('results.json times on the local-day axis', () => {
  it('counts local clock hours from local midnight of the start date, across month ends and clock changes', () => {
    expect(localHoursOf('2026-03-23T19:15+01:00', '2026-03-23')).toBeCloseTo(19.25, 10);
    // 29 March 2026 03:00 CEST is the first local hour after the spring change in Europe/Berlin
    // (Directive 2000/84/EC: last Sunday of March, 01:00 UTC); day 6 of a run from 23 March
    expect(localHoursOf('2026-03-29T03:00+02:00', '2026-03-23')).toBe(6 * 24 + 3);
    expect(localHoursOf('2026-04-01T00:30:30+02:00', '2026-03-30')).toBeCloseTo(48 + 0.5 + 30 / 3600, 10);
  });
});

describe('light axis of the printed chart', () => {
  it('keeps the 250 lx recommendation visible under brief outdoor peaks and states the cut', () => {
    const indoor = new Array<number>(100).fill(300);
    const { top, peak } = lightAxisTop_lx([...indoor, 8000, 9000]);
    expect(top).toBe(400);
    expect(peak).toBe(9000);
  });

  it('shows the whole curve when nothing stands out', () => {
    const ramp = Array.from({ length: 101 }, (_, i) => 9 * i); // 0 … 900 lx evenly
    expect(lightAxisTop_lx(ramp).top).toBeGreaterThanOrEqual(900);
  });
});
