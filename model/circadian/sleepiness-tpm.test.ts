import { describe, expect, it } from 'vitest';
import { entrain } from './entrain.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID } from './registry.js';
import { simulate } from './simulate.js';
import { TPM, TPM_ACROPHASE_AFTER_CBTMIN_H, tpmCircadian, tpmInertia, tpmKss, tpmSAsleep, tpmSAwake } from './sleepiness-tpm.js';
import { clock_h, REGULAR_SLEEP_DAY0, regularDayLight, regularSleep } from './test-schedules.js';

describe('three-process model of alertness', () => {
  it('recovers S from 7.96 to 14 in 8 h of sleep (the definition of its recovery rate, from memory)', () => {
    expect(tpmSAsleep(7.96, 8)).toBeCloseTo(14, 10);
  });

  it('lets S fall towards 2.4 while awake at 0.0353 per hour (Åkerstedt & Folkard 1997, from memory)', () => {
    expect(tpmSAwake(14, 0)).toBe(14);
    expect(tpmSAwake(14, 1 / 0.0353)).toBeCloseTo(2.4 + 11.6 / Math.E, 10);
    expect(tpmSAwake(14, 1000)).toBeCloseTo(2.4, 6);
  });

  it('puts the 24 h component at +2.5 at its acrophase and the 12 h component at 0 there', () => {
    // C = 2.5, U = −0.5 + 0.5·cos(−π/2) = −0.5 at the acrophase of C
    expect(tpmCircadian(TPM_ACROPHASE_AFTER_CBTMIN_H)).toBeCloseTo(2.5 - 0.5, 10);
    expect(tpmCircadian(TPM_ACROPHASE_AFTER_CBTMIN_H - 12)).toBeCloseTo(-2.5 - 0.5, 10);
  });

  it('starts sleep inertia at −5.72 and lets it decay to 1/e in 1/1.51 h (from memory)', () => {
    expect(tpmInertia(0)).toBe(TPM.Wc);
    expect(tpmInertia(1 / 1.51)).toBeCloseTo(-5.72 / Math.E, 10);
    expect(tpmInertia(Infinity)).toBe(0);
  });

  it('maps alertness to KSS by 10.6 − 0.6·A on the 1–9 scale (transformation from memory)', () => {
    expect(tpmKss(6)).toBeCloseTo(7, 10);
    expect(tpmKss(16)).toBeCloseTo(1, 10);
    expect(tpmKss(20)).toBe(1);
    expect(tpmKss(0)).toBe(9);
  });

  it('places the acrophase of C at 16.8 h clock time for the reference day worker (regression pin of the phase anchor)', () => {
    // TPM_ACROPHASE_AFTER_CBTMIN_H = 16.8 h − CBTmin of the default pacemaker entrained to
    // sleep 23:00–07:00 with 150 lx awake; this pins that CBTmin (04:02) within 0.1 h.
    const model = createPacemaker(DEFAULT_PACEMAKER_ID);
    const e = entrain({ model, light: regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });
    const r = simulate({ model, light: regularDayLight(150), periodicLight: true, sleep: regularSleep(2), initial: e.state, end_h: 24 });
    const cbtmin = clock_h(r.cbtmin_h[0] as number);
    expect(Math.abs(cbtmin + TPM_ACROPHASE_AFTER_CBTMIN_H - TPM.acrophaseClock_h)).toBeLessThan(0.1);
  });
});
