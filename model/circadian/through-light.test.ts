import { describe, expect, it } from 'vitest';
import { createOdexIntegrator, ODEX_TIGHT_TOLERANCES } from '../solver/odex-integrator.js';
import { dailySleepPattern, entrain } from './entrain.js';
import { lightFromPerMinute } from './light-series.js';
import { PER_MINUTE_LIGHT_KINDS, perMinuteLightCase } from './per-minute-light-cases.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID } from './registry.js';
import { simulate, type SimulationRun } from './simulate.js';

const DAYS = 7;

function largestDifference(a: readonly number[], b: readonly number[]): number {
  expect(a.length).toBe(b.length);
  return a.reduce((m, v, i) => Math.max(m, Math.abs(v - (b[i] as number))), 0);
}

describe('body clock integrated through light', () => {
  // The reference restarts a tight-tolerance solver at every change of light (every minute of
  // these series); the product integrates through them. Goal: CBTmin within 0.02 h.
  it.each(PER_MINUTE_LIGHT_KINDS)('%s: CBTmin and melatonin synthesis onset within 0.02 h of restarting at every minute, with a few restarts a day instead of one a minute', (kind) => {
    const model = createPacemaker(DEFAULT_PACEMAKER_ID);
    const c = perMinuteLightCase(kind, DAYS);
    const state = entrain({ model, light: lightFromPerMinute(c.mel_edi_lx.subarray(0, 1440), 'mel_edi_lx'), sleep: { mode: 'prescribed', episodes: dailySleepPattern([{ start_h: 0, end_h: 7 }, { start_h: 23, end_h: 24 }]) } }).state;
    const run = (reference: boolean): SimulationRun =>
      simulate({
        model,
        light: lightFromPerMinute(c.mel_edi_lx, 'mel_edi_lx'),
        sleep: { mode: 'prescribed', episodes: c.sleep },
        initial: state,
        end_h: 24 * DAYS,
        ...(reference ? { integrator: createOdexIntegrator(ODEX_TIGHT_TOLERANCES) } : {}),
      });
    const fast = run(false);
    const reference = run(true);
    expect(reference.integrations / DAYS).toBeGreaterThan(100);
    // Restarts only where sleep changes and where a stretch has few light changes (dark sleep).
    expect(fast.integrations / DAYS).toBeLessThan(6);
    expect(largestDifference(fast.cbtmin_h, reference.cbtmin_h)).toBeLessThan(0.02);
    expect(largestDifference(fast.synOn_h, reference.synOn_h)).toBeLessThan(0.02);
  });
});
