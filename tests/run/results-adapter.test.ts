/**
 * The app's results adapter fed by the real pipeline: every persona × strategy becomes a run
 * view with light by source at 10-minute steps covering the run, body-clock markers per day,
 * melatonin with its dim-light reference, hourly KSS and the summary metrics.
 */
import { describe, expect, test } from 'vitest';
import { runScenarioForView, VIEW_LIGHT_STEP_MIN } from '../../renderer/src/results/results-adapter.js';
import { demoScenario } from './demo-run.js';

describe('results adapter on the pipeline', () => {
  test('maps the demo to a ready results view', async () => {
    const s = demoScenario();
    const scenario = { ...s, run: { ...s.run, days: 3 } };
    const progress: number[] = [];
    const outcome = await runScenarioForView(scenario, (f) => progress.push(f));
    expect(outcome.status).toBe('ready');
    if (outcome.status !== 'ready') return;
    const v = outcome.view;
    // the nurse and the window-desk worker with the baseline and 4 strategies each, the deep-desk worker with 3
    expect(v.runs.length).toBe(5 + 5 + 4);
    expect(progress[progress.length - 1]).toBe(1);
    const run = v.runs[0];
    const steps = Math.ceil((3 * 1440) / VIEW_LIGHT_STEP_MIN);
    for (const src of run?.light.sources ?? []) expect(src.mel_edi_lx.length).toBe(steps);
    expect(run?.phases.length).toBe(3);
    expect(run?.kssHourly.length).toBe(72);
    expect(run?.melatonin.level.length).toBe(run?.melatonin.unsuppressed?.length);
    expect(run?.metrics.map((m) => m.id)).toContain('suppression');
    expect(v.recommendations?.length).toBe(3);
  }, 60_000);
});
