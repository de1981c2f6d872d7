import { describe, expect, it } from 'vitest';
import { entrain } from './entrain.js';
import { constantLight } from './light-series.js';
import { createPacemaker, PACEMAKER_IDS } from './registry.js';
import { simulate } from './simulate.js';
import { clock_h, REGULAR_SLEEP_DAY0, regularDayLight } from './test-schedules.js';
import { createRk4Integrator } from '../solver/rk4-integrator.js';

const DARK = constantLight(0, 'native_lx', 24);
const AWAKE: { mode: 'prescribed'; episodes: [] } = { mode: 'prescribed', episodes: [] };

function darkPeriod(id: (typeof PACEMAKER_IDS)[number], tau_h?: number): number {
  const model = createPacemaker(id, tau_h === undefined ? {} : { tau_h });
  const run = simulate({ model, light: DARK, periodicLight: true, sleep: AWAKE, end_h: 24 * 30, sampleStep_h: 24 });
  const m = run.xmin_h.slice(-10);
  return ((m[m.length - 1] as number) - (m[0] as number)) / (m.length - 1);
}

describe('free-running period in darkness', () => {
  // Kronauer family: the 0.99729 / 0.99669 factors make the period equal τx (24.2004 h for
  // τx = 24.2, computed independently with SciPy LSODA as a regression value).
  it.each(['jfk99-x7', 'fjk99-cubic', 'fjk99-cubic-sf14', 'jfk99-x7-sh07', 'fjk99-cubic-sh07'] as const)('%s runs at τx = 24.2 h', (id) => {
    expect(darkPeriod(id)).toBeCloseTo(24.2004, 2);
  });

  it('Hannay 2019 runs at 24.18 h although its natural frequency is 2π/23.84 h (regression value 24.177 h)', () => {
    expect(Math.abs(darkPeriod('hfb19-sp') - 24.177)).toBeLessThan(0.01);
  });

  it.each(PACEMAKER_IDS)('%s reaches the Czeisler et al. 1999 population mean 24.18 h through τ', (id) => {
    expect(Math.abs(darkPeriod(id, 24.18) - 24.18)).toBeLessThan(0.01);
  });
});

describe('entrained phase', () => {
  // Regression values computed independently with SciPy LSODA
  // from the same equations (wake 07:00–23:00, I = 0 asleep): x-minimum clock times.
  const cases: [string, number, string][] = [
    ['jfk99-x7', 150, '03:26'],
    ['jfk99-x7', 1000, '02:54'],
    ['fjk99-cubic', 150, '04:38'],
    ['fjk99-cubic', 50, '04:53'],
    ['fjk99-cubic-sf14', 500, '04:25'],
  ];
  it.each(cases)('%s at %i lx puts the x minimum at %s (±3 min)', (id, lux, hhmm) => {
    const model = createPacemaker(id as (typeof PACEMAKER_IDS)[number]);
    const e = entrain({ model, light: regularDayLight(lux), sleep: REGULAR_SLEEP_DAY0 });
    expect(e.converged).toBe(true);
    const [h, m] = hhmm.split(':').map(Number) as [number, number];
    expect(Math.abs(clock_h(e.lastMarker_h) - (h + m / 60))).toBeLessThan(3 / 60);
  });

  it.each(PACEMAKER_IDS)('%s puts CBTmin 1.5–3.5 h before a 07:00 wake (young adults ~2 h, Duffy et al., from memory)', (id) => {
    const model = createPacemaker(id);
    const e = entrain({ model, light: regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });
    const cbt = clock_h(e.lastMarker_h + model.marker.cbtminOffset_h);
    expect(7 - cbt).toBeGreaterThan(1.5);
    expect(7 - cbt).toBeLessThan(3.5);
  });
});

describe('solver cross-check', () => {
  it.each(PACEMAKER_IDS)('%s: odex and 1-minute RK4 agree on every CBTmin within 0.01 h', (id) => {
    const model = createPacemaker(id);
    const light = regularDayLight(300);
    const e = entrain({ model, light, sleep: REGULAR_SLEEP_DAY0 });
    const sleep = { mode: 'prescribed' as const, episodes: [{ start_h: 0, end_h: 7 }, { start_h: 23, end_h: 31 }, { start_h: 47, end_h: 55 }, { start_h: 71, end_h: 72 }] };
    // a 6.7 h bright pulse on day 1 evening to make the check non-trivial
    const pulsed = { ...light, start_h: Float64Array.from([0, 7, 17, 23.7, 24, 31, 47, 55, 71]), level: Float64Array.from([0, 300, 10000, 0, 0, 300, 0, 300, 0]), end_h: 72 };
    const a = simulate({ model, light: pulsed, sleep, initial: e.state, end_h: 72 });
    const b = simulate({ model, light: pulsed, sleep, initial: e.state, end_h: 72, integrator: createRk4Integrator() });
    expect(a.cbtmin_h.length).toBe(b.cbtmin_h.length);
    a.cbtmin_h.forEach((v, i) => expect(Math.abs(v - (b.cbtmin_h[i] as number))).toBeLessThan(0.01));
  });
});
