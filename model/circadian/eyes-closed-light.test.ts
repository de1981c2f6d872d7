import { describe, expect, it } from 'vitest';
import { calibrationEyelidTransmission, receivedLightSeries } from './eyes-closed-light.js';
import { lightAt, lightFromSteps } from './light-series.js';

describe('light received with eyes open and closed', () => {
  const open = lightFromSteps([0, 7, 23], [0, 300, 0], 'native_lx', 24);
  const closed = lightFromSteps([0, 7, 23], [0, 0.9, 0], 'native_lx', 24);

  it('reads the closed-eye light inside sleep and the open-eye light outside it', () => {
    const r = receivedLightSeries(open, closed, [{ start_h: 22, end_h: 32 }], 0, 48, true);
    expect(lightAt(r, 12)).toBe(300);
    expect(lightAt(r, 22.5)).toBe(0.9); // asleep with the room still lit: the light behind the eyelids
    expect(lightAt(r, 25)).toBe(0);
    expect(lightAt(r, 31.5)).toBe(0.9); // 07:00–08:00 of the next day, still asleep
    expect(lightAt(r, 33)).toBe(300);
    expect(r.end_h).toBe(48);
  });

  it('joins neighbouring pieces of equal level (one piece per change)', () => {
    const r = receivedLightSeries(open, closed, [], 0, 48, true);
    expect(Array.from(r.start_h)).toEqual([0, 7, 23, 31, 47]);
  });

  it('refuses series in different units', () => {
    expect(() => receivedLightSeries(open, { ...closed, unit: 'mel_edi_lx' }, [], 0, 24, false)).toThrow(/native_lx/);
  });

  it('uses the eyelid melanopic transmittance of the calibration source CIE FL2 for a bare light series (≈ 0.30 %)', () => {
    expect(calibrationEyelidTransmission()).toBeGreaterThan(0.003);
    expect(calibrationEyelidTransmission()).toBeLessThan(0.0031);
  });
});
