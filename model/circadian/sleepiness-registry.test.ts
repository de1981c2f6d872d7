/**
 * Sleepiness models against human data (targets of the product's validation record,
 * docs/validation/circadian.md "Sleep and sleepiness"). Protocols: the default pacemaker entrained
 * to sleep 23:00–07:00 with 150 lx (native) awake; then either a regular day or a night of total
 * sleep deprivation in 10 lx after waking at 07:00.
 */
import { describe, expect, it } from 'vitest';
import { entrain } from './entrain.js';
import { lightFromSteps } from './light-series.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID } from './registry.js';
import { simulate, type SimulationRun } from './simulate.js';
import { HEADLINE_SLEEPINESS_ID, isSleepinessModelId, SLEEPINESS_MODEL_IDS, SLEEPINESS_MODELS, type SleepinessModelId } from './sleepiness-registry.js';
import { KSS_SLEEPY } from './sleepiness-postnova.js';
import { REGULAR_SLEEP_DAY0, regularDayLight } from './test-schedules.js';

const model = createPacemaker(DEFAULT_PACEMAKER_ID);
const e = entrain({ model, light: regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });

/** Awake from 07:00 (t = 7) to t = 43 h: a first night of total sleep deprivation. */
const deprived: SimulationRun = simulate({
  model,
  light: lightFromSteps([0, 7, 23], [0, 150, 10], 'native_lx', 48),
  sleep: { mode: 'prescribed', episodes: [{ start_h: 0, end_h: 7 }] },
  initial: e.state,
  end_h: 43,
});
/** A regular day: sleep 23:00–07:00, 150 lx awake. */
const regular: SimulationRun = simulate({
  model,
  light: regularDayLight(150),
  periodicLight: true,
  sleep: { mode: 'prescribed', episodes: [{ start_h: 0, end_h: 7 }, { start_h: 23, end_h: 31 }] },
  initial: e.state,
  end_h: 24,
});

const kssAt = (r: SimulationRun, id: SleepinessModelId, t: number) => r.samples.kssByModel[id][r.samples.t_h.indexOf(t)] as number;
const window = (r: SimulationRun, id: SleepinessModelId, from: number, to: number) =>
  r.samples.t_h.flatMap((t, i) => (t >= from - 1e-9 && t <= to + 1e-9 ? [r.samples.kssByModel[id][i] as number] : []));

describe('sleepiness registry', () => {
  it('lists every model with a source and fills samples.kss with the headline model', () => {
    for (const id of SLEEPINESS_MODEL_IDS) {
      expect(isSleepinessModelId(id)).toBe(true);
      expect(SLEEPINESS_MODELS[id].source.length).toBeGreaterThan(20);
      expect(regular.samples.kssByModel[id]).toHaveLength(regular.samples.t_h.length);
    }
    expect(regular.samples.kss).toEqual(regular.samples.kssByModel[HEADLINE_SLEEPINESS_ID]);
    const other = simulate({ model, light: regularDayLight(150), periodicLight: true, sleep: REGULAR_SLEEP_DAY0, initial: e.state, end_h: 24, sleepinessModel: 'postnova18-kss' });
    expect(other.samples.kss).toEqual(other.samples.kssByModel['postnova18-kss']);
  });
});

describe('headline sleepiness model against human data', () => {
  const id = HEADLINE_SLEEPINESS_ID;

  it('is sleepy (KSS ≥ 7) throughout 04:00–07:00 of a first night awake (Åkerstedt & Gillberg 1990 and later laboratory data: about 7–8)', () => {
    const w = window(deprived, id, 28, 31);
    expect(w.length).toBeGreaterThan(10);
    expect(Math.min(...w)).toBeGreaterThanOrEqual(KSS_SLEEPY);
    expect(Math.max(...w)).toBeLessThanOrEqual(8.5);
  });

  it('rates about 3–5 in the middle of a day-work day (11:00–15:00) (Åkerstedt and colleagues, field data on day work)', () => {
    const w = window(regular, id, 11, 15);
    expect(Math.min(...w)).toBeGreaterThanOrEqual(3);
    expect(Math.max(...w)).toBeLessThanOrEqual(5);
  });

  it('rises towards bedtime: ≥ 5 at the habitual 23:00 and 6–7 at 01:00 after an 18 h day (same sources)', () => {
    expect(kssAt(deprived, id, 23)).toBeGreaterThanOrEqual(5);
    expect(kssAt(deprived, id, 23)).toBeLessThan(KSS_SLEEPY);
    expect(kssAt(deprived, id, 25)).toBeGreaterThanOrEqual(6);
    expect(kssAt(deprived, id, 25)).toBeLessThanOrEqual(7);
  });

  it('keeps an office worker on day work below 7 at work, 08:00–17:00 (same sources)', () => {
    expect(Math.max(...window(regular, id, 8, 17))).toBeLessThan(KSS_SLEEPY);
  });
});

describe('Postnova 2018 KSS: model limitation against the same data (recorded values, ±0.05)', () => {
  it('stays below 7 at 04:00–07:00 of a first night awake: 6.19 at 04:00, 6.60 at 07:00', () => {
    expect(kssAt(deprived, 'postnova18-kss', 28)).toBeCloseTo(6.19, 1);
    expect(kssAt(deprived, 'postnova18-kss', 31)).toBeCloseTo(6.6, 1);
    expect(Math.max(...window(deprived, 'postnova18-kss', 28, 31))).toBeLessThan(KSS_SLEEPY);
  });

  it('rates 4.2 at the habitual 23:00 bedtime (target ≥ 5) and 3.4–4.0 at midday', () => {
    expect(kssAt(deprived, 'postnova18-kss', 23)).toBeCloseTo(4.22, 1);
    const w = window(regular, 'postnova18-kss', 11, 15);
    expect(Math.min(...w)).toBeGreaterThanOrEqual(3);
    expect(Math.max(...w)).toBeLessThanOrEqual(5);
  });
});
