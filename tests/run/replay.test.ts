/**
 * A measured light log that replays the modelled light at the eye exactly must give the same
 * model results: the light the body-clock models read is then identical minute by minute, so
 * CBTmin, DLMO, melatonin suppression, KSS and sleep agree to rounding. Reference: identity of
 * the model input (a self-consistency check of the log path against the model path).
 */
import { describe, expect, test } from 'vitest';
import type { Scenario } from '../../schedules/index.js';
import { demoScenario, run } from './demo-run.js';

function shortDeskWorkerScenario(): Scenario {
  const s = demoScenario();
  return { ...s, run: { ...s.run, days: 5 }, personas: s.personas.filter((p) => p.id === 'desk-worker'), strategies: [], rosters: [] };
}

describe('measured log replaying the modelled exposure', () => {
  const base = shortDeskWorkerScenario();
  const modelled = run({ scenario: base });
  const tl = modelled.light[0];
  if (tl === undefined) throw new Error('no timeline');
  const lines = ['timestamp,mel_edi'];
  for (let m = 0; m < tl.timeline.total_min; m++) lines.push(`${new Date(tl.timeline.runStartUtc_ms + m * 60_000).toISOString()},${String(tl.eye.mel_edi_lx[m] ?? 0)}`);
  const withLog: Scenario = {
    ...base,
    lightLogs: [{ id: 'replay', file: 'replay.csv', timestampFormat: 'iso', quantity: { kind: 'melanopic-edi', column: 'mel_edi' }, fill: 'model' }],
    personas: base.personas.map((p) => ({ ...p, measuredLight: [{ log: 'replay' }] })),
  };
  const measured = run({ scenario: withLog, lightLogTexts: { replay: lines.join('\n') + '\n' } });

  test('the light reaches the models from the log (measured source) with the same per-minute values', () => {
    const m = measured.light[0];
    expect(m?.eye.melBySource.measured.reduce((a, b) => a + b, 0)).toBeGreaterThan(0);
    let worst = 0;
    for (let i = 0; i < tl.timeline.total_min; i++) worst = Math.max(worst, Math.abs((m?.eye.mel_edi_lx[i] ?? 0) - (tl.eye.mel_edi_lx[i] ?? 0)));
    expect(worst).toBeLessThan(1e-9);
  });

  test('CBTmin, DLMO, melatonin suppression, KSS and sleep are the same as with modelled light', () => {
    const a = modelled.results.personas[0]?.strategies[0];
    const b = measured.results.personas[0]?.strategies[0];
    expect(b?.cbtmin.map((e) => e.t_h)).toEqual(a?.cbtmin.map((e) => e.t_h));
    expect(b?.dlmo.map((e) => e.t_h)).toEqual(a?.dlmo.map((e) => e.t_h));
    expect(b?.melatonin_nights.map((n) => n.suppression_pct)).toEqual(a?.melatonin_nights.map((n) => n.suppression_pct));
    expect(b?.hourly.kss).toEqual(a?.hourly.kss);
    expect(b?.sleep_episodes).toEqual(a?.sleep_episodes);
    expect(b?.summary).toEqual(a?.summary);
  });
});
