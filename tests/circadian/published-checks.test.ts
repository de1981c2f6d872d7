/**
 * Body-clock models against published human data (numbers reported side by side in
 * docs/validation/circadian.md). Protocols in protocols.ts.
 *
 * Targets are the published values with the tolerance stated beside each; a pacemaker that,
 * correctly built, misses a target is pinned to its recorded value within a small tolerance and
 * recorded as a model limitation, so that a change is noticed.
 */
import { describe, expect, it } from 'vitest';
import { entrain } from '../../model/circadian/entrain.js';
import { lightFromSteps } from '../../model/circadian/light-series.js';
import { createPacemaker, DEFAULT_ENSEMBLE_PACEMAKERS, DEFAULT_PACEMAKER_ID, PACEMAKER_IDS, type PacemakerId } from '../../model/circadian/registry.js';
import { simulate } from '../../model/circadian/simulate.js';
import { clock_h, REGULAR_SLEEP_DAY0, regularDayLight, regularSleep } from '../../model/circadian/test-schedules.js';
import { createRk4Integrator } from '../../model/solver/rk4-integrator.js';
import { baseline, doseResponse, eveningNight, halfMaxLux, phaseResponseCurve, phaseShift_h, pulseRun } from './protocols.js';

const OFFSETS = Array.from({ length: 49 }, (_, i) => (i - 24) / 2);
const LUX = [1, 3, 10, 30, 50, 100, 200, 500, 1000, 3000, 10000];
const I10000 = LUX.indexOf(10000);

/** Pacemakers that meet every light-response target below (the others are model limitations). */
const MEETS_LIGHT_TARGETS: readonly PacemakerId[] = ['jfk99-x7-sh07', 'fjk99-cubic-sh07', 'hfb19-sp'];
/** Recorded values of the pacemakers that miss the targets (model limitation). */
const RECORDED: Record<string, { halfDelay_lx: number; delay10000_h: number; peakToTrough_h: number }> = {
  'jfk99-x7': { halfDelay_lx: 364.1, delay10000_h: 1.917, peakToTrough_h: 3.469 },
  'fjk99-cubic': { halfDelay_lx: 292.9, delay10000_h: 2.12, peakToTrough_h: 3.659 },
  'fjk99-cubic-sf14': { halfDelay_lx: 385.3, delay10000_h: 2.088, peakToTrough_h: 3.618 },
};

function prcOf(id: PacemakerId) {
  const prc = phaseResponseCurve(createPacemaker(id), OFFSETS);
  const shifts = prc.map((p) => p.shift_h);
  return { prc, maxAdvance: Math.max(...shifts), maxDelay: -Math.min(...shifts) };
}

describe('phase response to a single 6.7 h bright pulse (Khalsa et al. 2003, J Physiol 549:945)', () => {
  it.each(PACEMAKER_IDS)('%s: type 1 PRC, delays before CBTmin, advances after, crossover near CBTmin', (id) => {
    const { prc, maxAdvance, maxDelay } = prcOf(id);
    // type 1: bounded shifts, no dead zone of more than a few hours
    expect(maxAdvance).toBeLessThan(4);
    expect(maxDelay).toBeLessThan(4);
    // delays for pulses centred 2–6 h before CBTmin, advances 1–6 h after (Khalsa 2003)
    for (const p of prc) {
      if (p.offset_h <= -2 && p.offset_h >= -6) expect(p.shift_h).toBeLessThan(0);
      if (p.offset_h >= 1 && p.offset_h <= 6) expect(p.shift_h).toBeGreaterThan(0);
    }
    // crossover (delay → advance) within 1.5 h of CBTmin (Khalsa 2003: at the critical phase near CBTmin)
    const i = prc.findIndex((p, k) => k > 0 && (prc[k - 1] as { shift_h: number }).shift_h < 0 && p.shift_h >= 0 && Math.abs(p.offset_h) < 6);
    expect(i).toBeGreaterThan(0);
    const a = prc[i - 1] as { offset_h: number; shift_h: number };
    const b = prc[i] as { offset_h: number; shift_h: number };
    const crossover = a.offset_h + ((0 - a.shift_h) / (b.shift_h - a.shift_h)) * (b.offset_h - a.offset_h);
    expect(Math.abs(crossover)).toBeLessThan(1.5);
  });

  it.each(MEETS_LIGHT_TARGETS)('%s: peak-to-trough 4–6 h (Khalsa 2003: 5.02 h)', (id) => {
    const { maxAdvance, maxDelay } = prcOf(id);
    expect(maxAdvance + maxDelay).toBeGreaterThan(4);
    expect(maxAdvance + maxDelay).toBeLessThan(6);
  });

  it.each(Object.keys(RECORDED))('%s: peak-to-trough below the 4–6 h target (model limitation), recorded value ±0.05 h', (id) => {
    const { maxAdvance, maxDelay } = prcOf(id as PacemakerId);
    expect(Math.abs(maxAdvance + maxDelay - (RECORDED[id] as { peakToTrough_h: number }).peakToTrough_h)).toBeLessThan(0.05);
    expect(maxAdvance + maxDelay).toBeLessThan(4);
  });

  it('jfk99-x7 reproduces the independent SciPy LSODA regression PRC (+1.57 / −1.88 h) within 0.1 h', () => {
    const { maxAdvance, maxDelay } = prcOf('jfk99-x7');
    expect(Math.abs(maxAdvance - 1.57)).toBeLessThan(0.1);
    expect(Math.abs(maxDelay - 1.88)).toBeLessThan(0.1);
  });
});

describe('illuminance response of a 6.5 h evening pulse (Zeitzer et al. 2000, J Physiol 526:695)', () => {
  it.each(PACEMAKER_IDS)('%s: phase delay grows monotonically and saturates', (id) => {
    const d = doseResponse(createPacemaker(id), LUX).map((p) => p.delay_h);
    for (let i = 3; i < d.length; i++) expect(d[i] as number).toBeGreaterThan(d[i - 1] as number);
    // saturating: the last decade of lux adds less than the decade 100 → 1000 lx
    expect((d[I10000] as number) - (d[LUX.indexOf(1000)] as number)).toBeLessThan((d[LUX.indexOf(1000)] as number) - (d[LUX.indexOf(100)] as number));
  });

  it.each(MEETS_LIGHT_TARGETS)('%s: half of the delay at 10 000 lx reached at 60–240 lx (Zeitzer 2000: ~119 lx), delay at 10 000 lx 2–3 h', (id) => {
    const d = doseResponse(createPacemaker(id), LUX).map((p) => p.delay_h);
    const half = halfMaxLux(LUX, d);
    expect(half).toBeGreaterThan(60);
    expect(half).toBeLessThan(240);
    expect(d[I10000]).toBeGreaterThan(2);
    expect(d[I10000]).toBeLessThan(3);
  });

  it.each(Object.keys(RECORDED))('%s: half-maximum above the 60–240 lx target (model limitation), recorded values ±2 % and ±0.02 h', (id) => {
    const rec = RECORDED[id] as { halfDelay_lx: number; delay10000_h: number };
    const d = doseResponse(createPacemaker(id as PacemakerId), LUX).map((p) => p.delay_h);
    const half = halfMaxLux(LUX, d);
    expect(half).toBeGreaterThan(240);
    expect(Math.abs(half / rec.halfDelay_lx - 1)).toBeLessThan(0.02);
    expect(Math.abs((d[I10000] as number) - rec.delay10000_h)).toBeLessThan(0.02);
  });

  it('melatonin suppression over the exposure rises monotonically to saturation by 200 lx, ≤ 5 % without light (Zeitzer 2000: minimal below 80 lx, saturation ≈ 200 lx)', () => {
    const dr = doseResponse(createPacemaker(DEFAULT_PACEMAKER_ID), [0, ...LUX]);
    const acute = dr.map((p) => p.acuteSuppression_pct);
    for (let i = 1; i < acute.length; i++) expect(acute[i] as number).toBeGreaterThanOrEqual((acute[i - 1] as number) - 0.5);
    expect(acute[0]).toBeLessThanOrEqual(5);
    expect(acute[1 + LUX.indexOf(200)]).toBeGreaterThan(90);
    expect(acute[1 + I10000]).toBeGreaterThan(90);
  });

  it('melatonin suppression half-maximum 48 lx, below the 60–200 lx target (Zeitzer 2000: 106 lx; St Hilaire et al. 2007 model: 98 lx): model limitation, recorded value ±2 lx', () => {
    const dr = doseResponse(createPacemaker(DEFAULT_PACEMAKER_ID), LUX);
    const half = halfMaxLux(LUX, dr.map((p) => p.acuteSuppression_pct));
    expect(Math.abs(half - 48.4)).toBeLessThan(2);
    // Zeitzer's own definition (area during the exposure against the same clock hours of a dim run) agrees
    expect(Math.abs(halfMaxLux(LUX, dr.map((p) => p.experimentalSuppression_pct)) - half)).toBeLessThan(2);
  });
});

describe('melatonin suppression per night over a fixed window (the awake hours of the dim-light biological night)', () => {
  const EVENING = [0, 3, 10, 30, 100, 300, 1000, 3000, 10000];

  it.each(PACEMAKER_IDS)('%s: one evening of brighter light never lowers the night’s suppression; ≤ 5 % with a dark evening (Zeitzer 2000 shape)', (id) => {
    const model = createPacemaker(id);
    const s = EVENING.map((lx) => eveningNight(model, lx).acuteSuppression_pct);
    for (let i = 1; i < s.length; i++) expect(s[i] as number).toBeGreaterThanOrEqual((s[i - 1] as number) - 0.1);
    expect(s[0]).toBeLessThanOrEqual(5);
    expect(s[s.length - 1]).toBeGreaterThan(90);
  });
});

describe('melatonin timing in an entrained sleeper (wake 07:00–23:00 at 150 lx)', () => {
  function entrainedDay(id: PacemakerId) {
    const model = createPacemaker(id);
    const e = entrain({ model, light: regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });
    const r = simulate({ model, light: regularDayLight(150), periodicLight: true, sleep: regularSleep(2), initial: e.state, end_h: 48 });
    const night = r.nights.find((n) => n.onset_h > 12 && n.onset_h < 36);
    if (night === undefined) throw new Error('no night');
    return { r, night };
  }

  it.each(PACEMAKER_IDS)('%s: dim-light melatonin onset (10 pg/mL) 1–3 h before habitual sleep onset (Burgess et al. 2003 Behav Sleep Med 1:102; Sletten et al. 2010 Front Neurol 1:137: ≈ 2 h)', (id) => {
    const { night } = entrainedDay(id);
    expect(23 - night.onset_h).toBeGreaterThan(1);
    expect(23 - night.onset_h).toBeLessThan(3);
    // the 25 %-of-peak rule lands within 15 min of the 10 pg/mL threshold (peak ≈ 45 pg/mL)
    expect(Math.abs(night.dlmo25_h - night.onset_h)).toBeLessThan(0.25);
  });

  it.each(DEFAULT_ENSEMBLE_PACEMAKERS)('%s: DLMO 6–8 h before CBTmin (≈ 7 h, from memory)', (id) => {
    const { r, night } = entrainedDay(id);
    const cbt = r.cbtmin_h.find((c) => c > night.onset_h) as number;
    expect(cbt - night.onset_h).toBeGreaterThan(6);
    expect(cbt - night.onset_h).toBeLessThan(8);
  });

  it('the as-lit curve rises after the dim-light onset when the evening is lit; its onset is not the DLMO', () => {
    const { night } = entrainedDay(DEFAULT_PACEMAKER_ID);
    // 150 lx until 23:00 suppresses the evening rise: the as-lit curve crosses 10 pg/mL only after lights-out
    expect(night.litOnset_h).toBeGreaterThan(23);
    expect(night.litOnset_h).toBeGreaterThan(night.onset_h + 1);
  });

  it('synthesis onset 8.26 ± 1.58 h before CBTmin (St Hilaire et al. 2007 J Pineal Res 43:294), default pacemaker', () => {
    const { r } = entrainedDay(DEFAULT_PACEMAKER_ID);
    const cbt = r.cbtmin_h[0] as number;
    const on = r.synOn_h.find((t) => t < cbt + 24 && t > cbt - 12) as number;
    expect(Math.abs(clock_h(cbt - on) - 8.26)).toBeLessThan(1.58);
  });
});

describe('intermittent light (Gronfier et al. 2004 as reported in St Hilaire 2007)', () => {
  it('six 15-min 9 500 lx pulses give 74 % ± 10 points of the continuous 6.5 h delay, default pacemaker', () => {
    const model = createPacemaker(DEFAULT_PACEMAKER_ID);
    const b = baseline(model, 3);
    const cbt = b.reference.cbtmin_h.find((c) => c > 14) as number;
    const start = cbt - 6.75;
    const continuous = -phaseShift_h(b, pulseRun(b, 3, start, 6.5, 9500));
    const times: number[] = [0];
    const levels: number[] = [3];
    for (let k = 0; k < 6; k++) {
      times.push(start + k * 1.25, start + k * 1.25 + 0.25);
      levels.push(9500, 3);
    }
    const intermittent = simulate({ model, light: lightFromSteps(times, levels, 'native_lx', 120), sleep: { mode: 'prescribed', episodes: [] }, initial: b.state, end_h: 120 });
    const ratio = -phaseShift_h(b, intermittent) / continuous;
    expect(Math.abs(ratio - 0.74)).toBeLessThan(0.1);
  });
});

describe('solver agreement', () => {
  it.each(PACEMAKER_IDS)('%s: odex and 1-minute RK4 agree within 0.01 h on the pulse-shifted CBTmin', (id) => {
    const model = createPacemaker(id);
    const b = baseline(model, 5);
    const rk = baseline(model, 5, createRk4Integrator());
    const cbt = b.reference.cbtmin_h.find((c) => c > 14) as number;
    for (const o of [-3, 0, 3]) {
      const a = pulseRun(b, 5, cbt + o - 3.35, 6.7, 10000);
      const r = pulseRun(rk, 5, cbt + o - 3.35, 6.7, 10000, createRk4Integrator());
      expect(a.cbtmin_h.length).toBe(r.cbtmin_h.length);
      a.cbtmin_h.forEach((v, i) => expect(Math.abs(v - (r.cbtmin_h[i] as number))).toBeLessThan(0.01));
      a.synOn_h.forEach((v, i) => expect(Math.abs(v - (r.synOn_h[i] as number))).toBeLessThan(0.01));
    }
  });
});
