import { describe, expect, it } from 'vitest';
import { demoPart } from '../../../schedules/demo/demo-part.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { clockHoursOfLocal, runScenarioForView } from './results-adapter.js';
import { findRun, type ResultsView } from './view-model.js';

async function deskWorkerView(morningLux: number): Promise<ResultsView> {
  const desk = demoPart(['desk-worker'], ['office-tunable-white']);
  const change = desk.strategies?.[0]?.changes[0];
  if (change?.op !== 'set-luminaire') throw new Error('demo strategy changed shape');
  desk.strategies = [{ ...desk.strategies![0]!, changes: [{ ...change, eyeIlluminance_lx: morningLux }] }];
  const checked = validateScenarioValue(desk);
  if (!checked.ok || checked.scenario === undefined) throw new Error(JSON.stringify(checked.problems));
  const outcome = await runScenarioForView(checked.scenario, () => {});
  if (outcome.status !== 'ready') throw new Error(outcome.message);
  return outcome.view;
}

const metricOf = (view: ResultsView, strategyId: string, id: string) => findRun(view, 'desk-worker', strategyId)?.metrics.find((m) => m.id === id)?.value ?? null;

describe('results from the run pipeline', () => {
  it('reads local clock times of the markers, evening markers after midnight kept in order', () => {
    expect(clockHoursOfLocal('2026-03-30T21:15:00+02:00')).toBe(21.25);
    expect(clockHoursOfLocal('2026-03-31T00:30:00+02:00')).toBe(24.5);
    expect(clockHoursOfLocal(null)).toBeNull();
  });

  // Direction of the phase response to morning light: light after CBTmin advances the clock
  // (Khalsa et al. 2003, J Physiol 549:945, human phase response curve; Minors, Waterhouse & Wirz-Justice 1991).
  it('brighter morning light at the desk moves DLMO and CBTmin earlier', async () => {
    const dim = await deskWorkerView(450);
    const bright = await deskWorkerView(1500);
    const dlmoDim = metricOf(dim, 'office-tunable-white', 'dlmo');
    const dlmoBright = metricOf(bright, 'office-tunable-white', 'dlmo');
    expect(dlmoDim).not.toBeNull();
    expect(dlmoBright!).toBeLessThan(dlmoDim!);
    expect(metricOf(bright, 'office-tunable-white', 'phase-shift')!).toBeLessThan(metricOf(dim, 'office-tunable-white', 'phase-shift')!);
    expect(metricOf(bright, 'office-tunable-white', 'cbtmin')!).toBeLessThan(metricOf(dim, 'office-tunable-white', 'cbtmin')!);
    // The baseline does not see the strategy's light.
    expect(metricOf(bright, 'baseline', 'dlmo')).toBe(metricOf(dim, 'baseline', 'dlmo'));
  }, 120_000);
});
