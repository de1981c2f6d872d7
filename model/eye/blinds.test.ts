import { describe, expect, it } from 'vitest';
import { BLIND_CLOSED, BLIND_LOWERED, BLIND_OPEN, nextBlindState, prepareShading, type BlindMemory } from './blinds.js';

function run(sh: ReturnType<typeof prepareShading>, sun: number[], arrivals: Set<number> = new Set()): number[] {
  const mem: BlindMemory = { state: BLIND_OPEN, clearMinutes: 0 };
  return sun.map((s, i) => nextBlindState(sh, mem, i % 1440, s, arrivals.has(i)));
}

describe('blind control', () => {
  it('sun rule lowers above 50 W/m² of direct sun on the work area (Reinhart 2004) and raises after 30 min below 25 W/m²', () => {
    const sh = prepareShading('w', { control: { kind: 'sun-on-work-area' } });
    const sun = [0, 40, 60, ...new Array<number>(29).fill(20), 20, 0];
    const states = run(sh, sun);
    expect(states[1]).toBe(BLIND_OPEN); // 40 W/m²: below the threshold
    expect(states[2]).toBe(BLIND_LOWERED);
    expect(states[31]).toBe(BLIND_LOWERED); // 29 clear minutes (from minute 3)
    expect(states[32]).toBe(BLIND_OPEN); // 30th clear minute → raised
  });

  it('hysteresis: sun between the raise and lower thresholds keeps the state', () => {
    const sh = prepareShading('w', { control: { kind: 'sun-on-work-area' } });
    const states = run(sh, [100, ...new Array<number>(100).fill(40)]);
    expect(states.every((s) => s === BLIND_LOWERED)).toBe(true);
    expect(run(sh, new Array<number>(100).fill(40)).every((s) => s === BLIND_OPEN)).toBe(true);
  });

  it('"on-arrival" raises only at the first arrival of a day (Reinhart 2004 active user)', () => {
    const sh = prepareShading('w', { control: { kind: 'sun-on-work-area', raise: 'on-arrival', loweredState: 'closed' } });
    const sun = [100, ...new Array<number>(200).fill(0)];
    const states = run(sh, sun, new Set([150]));
    expect(states[149]).toBe(BLIND_CLOSED);
    expect(states[150]).toBe(BLIND_OPEN);
  });

  it('schedule and manual control', () => {
    const sched = prepareShading('w', { control: { kind: 'schedule', schedule: [{ fromMinute: 0, value: 'closed' }, { fromMinute: 420, value: 'open' }, { fromMinute: 1200, value: 'lowered' }] } });
    const mem: BlindMemory = { state: BLIND_OPEN, clearMinutes: 0 };
    expect(nextBlindState(sched, mem, 100, 0, false)).toBe(BLIND_CLOSED);
    expect(nextBlindState(sched, mem, 600, 999, false)).toBe(BLIND_OPEN);
    expect(nextBlindState(sched, mem, 1300, 0, false)).toBe(BLIND_LOWERED);
    const manual = prepareShading('w', { loweredTransmittance: 0.1, control: { kind: 'manual', state: 'lowered' } });
    expect(manual.transmittance).toEqual([1, 0.1, 0.02]);
  });

  it('refuses a raise threshold above the lower threshold, naming the field', () => {
    expect(() => prepareShading('windows[0].shading', { control: { kind: 'sun-on-work-area', lowerAbove_W_m2: 50, raiseBelow_W_m2: 80 } })).toThrow(/windows\[0\]\.shading\.control\.raiseBelow_W_m2/);
  });
});
