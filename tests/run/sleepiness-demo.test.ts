/**
 * Sleepiness at work in the built-in demo (baseline strategies), through the whole pipeline with
 * the headline sleepiness model (model/circadian/sleepiness-registry.ts). Targets from human data
 * (docs/validation/circadian.md, "Sleep and sleepiness"): night-shift workers report KSS ≥ 7 in
 * the early morning of night shifts, day workers stay below 7 at work (Åkerstedt & Gillberg 1990
 * scale; Åkerstedt and colleagues' field data, from memory).
 */
import { describe, expect, it } from 'vitest';
import { KSS_SLEEPY } from '../../schedules/run/metrics.js';
import { demoRun } from './demo-run.js';

/** Hourly KSS of the baseline in the hours that hold work of the given shift kinds (all work if none). */
function workHourKss(personaId: string, shiftKinds?: readonly string[]): number[] {
  const out = demoRun();
  const persona = out.results.personas.find((p) => p.id === personaId);
  const base = persona?.strategies.find((s) => s.is_baseline);
  const tl = out.light.find((l) => l.personaId === personaId && l.strategyId === base?.id);
  if (base === undefined || tl === undefined) throw new Error(`no baseline run for ${personaId}`);
  const hours = new Set<number>();
  for (const s of tl.timeline.slices) {
    if (s.activity !== 'work' || (shiftKinds !== undefined && !shiftKinds.includes(s.shiftKind ?? ''))) continue;
    for (let m = s.start_min; m < s.end_min; m++) hours.add(Math.floor(m / 60));
  }
  return [...hours].flatMap((h) => {
    const k = base.hourly.kss[h];
    return k === null || k === undefined ? [] : [k];
  });
}

describe('sleepiness at work in the demo (headline model)', () => {
  it('keeps the desk worker below KSS 7 in every work hour', () => {
    const k = workHourKss('desk-worker');
    expect(k.length).toBeGreaterThan(50);
    expect(Math.max(...k)).toBeLessThan(KSS_SLEEPY);
  });

  it('the nurse on night shifts: highest hourly KSS 6.8 (recorded, ±0.15), short of the ≥ 7 of field data (model limitation)', () => {
    // Target: KSS ≥ 7 in at least one night-shift work hour. The three-process model reaches
    // 6.8 at 03:00–05:00 of the third night: she naps before the first night and sleeps 6.5 h
    // after each, and her simulated CBTmin (03:06–03:35) puts the circadian low early in the
    // shift. Recorded in docs/validation/circadian.md; update this pin when the pipeline moves it.
    const k = workHourKss('nurse', ['night']);
    expect(k.length).toBeGreaterThan(20);
    expect(Math.max(...k)).toBeGreaterThan(6.65);
    expect(Math.max(...k)).toBeLessThan(6.95);
  });
});
