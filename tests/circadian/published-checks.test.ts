/**
 * Body-clock models against published human data (numbers reported side by side in
 * docs/validation/circadian.md). Protocols in protocols.ts.
 */
import { describe, expect, it } from 'vitest';
import { entrain } from '../../model/circadian/entrain.js';
import { lightFromSteps } from '../../model/circadian/light-series.js';
import { createPacemaker, PACEMAKER_IDS } from '../../model/circadian/registry.js';
import { simulate } from '../../model/circadian/simulate.js';
import { PMOL_L_PER_PG_ML } from '../../model/circadian/melatonin-sthilaire.js';
import { clock_h, REGULAR_SLEEP_DAY0, regularDayLight, regularSleep } from '../../model/circadian/test-schedules.js';
import { createRk4Integrator } from '../../model/solver/rk4-integrator.js';
import { baseline, doseResponse, halfMaxLux, phaseResponseCurve, phaseShift_h, pulseRun } from './protocols.js';

const OFFSETS = Array.from({ length: 25 }, (_, i) => i - 12);

describe('phase response to a single 6.7 h bright pulse (Khalsa et al. 2003, J Physiol 549:945)', () => {
  it.each(PACEMAKER_IDS)('%s: type 1 PRC, delays before CBTmin, advances after, crossover near CBTmin', (id) => {
    const prc = phaseResponseCurve(createPacemaker(id), OFFSETS);
    const shifts = prc.map((p) => p.shift_h);
    const maxAdvance = Math.max(...shifts);
    const maxDelay = -Math.min(...shifts);
    // type 1: bounded shifts, no dead zone of more than a few hours
    expect(maxAdvance).toBeLessThan(4);
    expect(maxDelay).toBeLessThan(4);
    // delays for pulses centred 1–6 h before CBTmin, advances 1–6 h after (Khalsa 2003)
    for (const p of prc) {
      if (p.offset_h <= -2 && p.offset_h >= -6) expect(p.shift_h).toBeLessThan(0);
      if (p.offset_h >= 1 && p.offset_h <= 6) expect(p.shift_h).toBeGreaterThan(0);
    }
    // crossover (delay → advance) within 1.5 h of CBTmin
    const i = prc.findIndex((p, k) => k > 0 && (prc[k - 1] as { shift_h: number }).shift_h < 0 && p.shift_h >= 0 && Math.abs(p.offset_h) < 6);
    expect(i).toBeGreaterThan(0);
    const a = prc[i - 1] as { offset_h: number; shift_h: number };
    const b = prc[i] as { offset_h: number; shift_h: number };
    const crossover = a.offset_h + ((0 - a.shift_h) / (b.shift_h - a.shift_h)) * (b.offset_h - a.offset_h);
    expect(Math.abs(crossover)).toBeLessThan(1.5);
    // peak-to-trough of the same order as the published 5.02 h (within a factor 2)
    expect(maxAdvance + maxDelay).toBeGreaterThan(5.02 / 2);
    expect(maxAdvance + maxDelay).toBeLessThan(5.02 * 1.2);
  });

  it('jfk99-x7 reproduces the independent SciPy LSODA regression PRC (+1.57 / −1.88 h) within 0.1 h', () => {
    const shifts = phaseResponseCurve(createPacemaker('jfk99-x7'), OFFSETS).map((p) => p.shift_h);
    expect(Math.abs(Math.max(...shifts) - 1.57)).toBeLessThan(0.1);
    expect(Math.abs(-Math.min(...shifts) - 1.88)).toBeLessThan(0.1);
  });
});

describe('illuminance response of a 6.5 h evening pulse (Zeitzer et al. 2000, J Physiol 526:695)', () => {
  const LUX = [1, 3, 10, 30, 50, 100, 200, 500, 1000, 3000, 9500];

  it.each(PACEMAKER_IDS)('%s: phase delay grows monotonically and saturates, half-maximum in the tens-to-hundreds of lux', (id) => {
    const dr = doseResponse(createPacemaker(id), LUX);
    const d = dr.map((p) => p.delay_h);
    for (let i = 3; i < d.length; i++) expect(d[i] as number).toBeGreaterThan(d[i - 1] as number);
    // saturating: the last decade of lux adds less than the decade 100 → 1000 lx
    expect((d[10] as number) - (d[8] as number)).toBeLessThan((d[8] as number) - (d[5] as number));
    const half = halfMaxLux(LUX, d);
    expect(half).toBeGreaterThan(10);
    expect(half).toBeLessThan(1000);
  });

  it('melatonin suppression rises with illuminance to saturation near 200 lx, half-maximum near the published 98–106 lx', () => {
    // St Hilaire 2007 J Pineal Res: model half-max 98 lx, saturation ≈ 200 lx; Zeitzer 2000 data:
    // half-max 106 lx, minimal below 80 lx. Acceptance: half-max within 40–150 lx, ≥ 90 % at 200 lx,
    // < 10 % at 10 lx (an independent computation with the same equations gave 55–65 lx).
    const dr = doseResponse(createPacemaker('jfk99-x7'), LUX);
    const acute = dr.map((p) => p.acuteSuppression_pct);
    for (let i = 1; i < acute.length; i++) expect(acute[i] as number).toBeGreaterThanOrEqual((acute[i - 1] as number) - 0.5);
    const half = halfMaxLux(LUX, acute);
    expect(half).toBeGreaterThan(40);
    expect(half).toBeLessThan(150);
    expect(acute[LUX.indexOf(200)]).toBeGreaterThan(90);
    expect(acute[LUX.indexOf(10)]).toBeLessThan(10);
    const exp = dr.map((p) => p.experimentalSuppression_pct);
    expect(Math.abs(halfMaxLux(LUX, exp) - half)).toBeLessThan(10);
  });
});

describe('melatonin timing in an entrained sleeper', () => {
  it('dim-light melatonin onset (plasma 10 pg/mL, common practice) about 2 h before habitual sleep onset at 23:00 (from memory)', () => {
    const model = createPacemaker('jfk99-x7');
    const e = entrain({ model, light: regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });
    const r = simulate({ model, light: regularDayLight(150), periodicLight: true, sleep: regularSleep(2), initial: e.state, end_h: 24 });
    const threshold = 10 * PMOL_L_PER_PG_ML;
    const s = r.samples;
    // DLMO is measured in dim light: the unsuppressed trace of the same night
    const i = s.t_h.findIndex((t, k) => t > 12 && (s.dimMelatonin_pmol_L[k] as number) >= threshold);
    const [t0, t1] = [s.t_h[i - 1] as number, s.t_h[i] as number];
    const [m0, m1] = [s.dimMelatonin_pmol_L[i - 1] as number, s.dimMelatonin_pmol_L[i] as number];
    const onset = t0 + ((threshold - m0) / (m1 - m0)) * (t1 - t0);
    // the model's curve onset lands ≈ 1.2 h before sleep (reported as a deviation in docs/validation);
    // accept 0.75–3.5 h; the marker rule DLMO = CBTmin − 7 h lands 1.8 h before
    expect(23 - onset).toBeGreaterThan(0.75);
    expect(23 - onset).toBeLessThan(3.5);
    // synthesis window vs CBTmin: SynOn 8.26 ± 1.58 h, SynOff 1.28 ± 3.33 h before CBTmin (St Hilaire 2007)
    const cbt = r.cbtmin_h[0] as number;
    const on = r.synOn_h.find((t) => t < cbt + 24 && t > cbt - 12) as number;
    expect(Math.abs(clock_h(cbt - on) - 8.26)).toBeLessThan(1.58);
  });
});

describe('intermittent light (Gronfier et al. 2004 as reported in St Hilaire 2007)', () => {
  it('six 15-min 9 500 lx pulses give a large fraction (published 74 %) of the continuous 6.5 h delay', () => {
    const model = createPacemaker('jfk99-x7');
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
    expect(ratio).toBeGreaterThan(0.5);
    expect(ratio).toBeLessThan(1);
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
      a.cbtmin_h.forEach((v, i) => expect(Math.abs(v - (r.cbtmin_h[i] as number))).toBeLessThan(0.01));
      a.synOn_h.forEach((v, i) => expect(Math.abs(v - (r.synOn_h[i] as number))).toBeLessThan(0.01));
    }
  });
});
