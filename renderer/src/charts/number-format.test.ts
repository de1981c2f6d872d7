import { describe, expect, it } from 'vitest';
import { formatClockValue, formatDuration, formatNumber, formatSigned, formatSignedDuration, MINUS, plainNumber } from './number-format.js';
import { formatLux, lightAxisTop_lx, logLightTicks } from './light-scale.js';

describe('numbers as shown', () => {
  it('writes negatives with the one minus sign U+2212, never a hyphen, and drops the sign of a rounded zero', () => {
    expect(MINUS).toBe('\u2212');
    expect(formatNumber(-0.13, 2)).toBe('\u22120.13');
    expect(formatNumber(-0.001, 2)).toBe('0.00');
    expect(formatNumber(null, 1)).toBe('—');
    expect(formatSigned(-1.234, 1)).toBe('\u22121.2');
    expect(formatSigned(0.5, 1)).toBe('+0.5');
    expect(formatSigned(-0.01, 1)).toBe('±0.0');
  });

  it('keeps the ASCII minus for files that spreadsheets read', () => {
    expect(plainNumber(-1.05, 2)).toBe('-1.05');
    expect(plainNumber(-0.001, 2)).toBe('0.00');
    expect(plainNumber(null, 2)).toBe('');
  });

  it('writes clock times as hh:mm and durations in hours and minutes', () => {
    expect(formatClockValue(20.05)).toBe('20:03');
    expect(formatClockValue(24.5)).toBe('00:30');
    expect(formatClockValue(null)).toBe('—');
    expect(formatDuration(1.05)).toBe('1 h 03 min');
    expect(formatDuration(-0.58)).toBe('35 min');
    expect(formatDuration(2)).toBe('2 h');
    expect(formatSignedDuration(-0.58)).toBe('\u221235 min');
    expect(formatSignedDuration(0.004)).toBe('±0 min');
  });
});

describe('light scales', () => {
  it('writes lux with thin-spaced thousands and two figures below 10', () => {
    expect(formatLux(12_000)).toBe('12\u2009000');
    expect(formatLux(250)).toBe('250');
    expect(formatLux(0.1)).toBe('0.1');
    expect(formatLux(1.234)).toBe('1.2');
  });

  it('puts log ticks on decades from 0.1 lx to the first decade above the peak', () => {
    expect(logLightTicks(8_000)).toEqual({ domain: [0.1, 10_000], ticks: [0.1, 1, 10, 100, 1000, 10_000] });
    expect(logLightTicks(3).domain).toEqual([0.1, 10]);
  });

  it('caps a linear axis above most of the day so one bright spell does not flatten it, and reports the cut peak', () => {
    const day = [...new Array<number>(100).fill(300), 8000, 9000];
    expect(lightAxisTop_lx(day)).toEqual({ top: 400, peak: 9000 });
  });
});
