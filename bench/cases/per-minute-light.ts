/**
 * Body-clock cost on light that changes every minute — a measured-style log with noise, cloudy
 * daylight at a window, a night shift with bright breaks (model/circadian/per-minute-light-cases.ts)
 * — 14 days each, default pacemaker, from an entrained state, through the product's own path
 * (per-minute values → light series → simulate). Reports the CPU time per simulated person-day
 * (mean over the three kinds) and the largest CBTmin difference against the reference: the same
 * light given minute by minute (every minute its own segment) with tight odex tolerances.
 * Goal: ≤ 0.2 ms per person-day and ≤ 0.02 h.
 */
import { dailySleepPattern, entrain } from '../../model/circadian/entrain.js';
import { lightFromPerMinute } from '../../model/circadian/light-series.js';
import { PER_MINUTE_LIGHT_KINDS, perMinuteLightCase } from '../../model/circadian/per-minute-light-cases.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID } from '../../model/circadian/registry.js';
import { simulate, type SimulationRun } from '../../model/circadian/simulate.js';
import { createOdexIntegrator, ODEX_TIGHT_TOLERANCES } from '../../model/solver/odex-integrator.js';

const DAYS = 14;

function maxCbtDiff(a: SimulationRun, b: SimulationRun): number {
  if (a.cbtmin_h.length !== b.cbtmin_h.length) return Number.POSITIVE_INFINITY;
  let e = 0;
  for (let i = 0; i < a.cbtmin_h.length; i++) e = Math.max(e, Math.abs((a.cbtmin_h[i] as number) - (b.cbtmin_h[i] as number)));
  return e;
}

export async function bench(): Promise<Record<string, unknown>> {
  const model = createPacemaker(DEFAULT_PACEMAKER_ID);
  const perKind: Record<string, unknown> = {};
  let cpuSum = 0;
  let errMax = 0;
  for (const kind of PER_MINUTE_LIGHT_KINDS) {
    const c = perMinuteLightCase(kind, DAYS);
    const sleep = { mode: 'prescribed' as const, episodes: c.sleep };
    const firstDay = lightFromPerMinute(c.mel_edi_lx.subarray(0, 1440), 'mel_edi_lx');
    const state = entrain({ model, light: firstDay, sleep: { mode: 'prescribed', episodes: dailySleepPattern([{ start_h: 0, end_h: 7 }, { start_h: 23, end_h: 24 }]) } }).state;
    const product = () => simulate({ model, light: lightFromPerMinute(c.mel_edi_lx, 'mel_edi_lx'), sleep, initial: state, end_h: 24 * DAYS });
    const reference = simulate({ model, light: lightFromPerMinute(c.mel_edi_lx, 'mel_edi_lx'), sleep, initial: state, end_h: 24 * DAYS, integrator: createOdexIntegrator(ODEX_TIGHT_TOLERANCES) });
    let run = product();
    const reps = 5;
    const cpu0 = process.cpuUsage();
    for (let k = 0; k < reps; k++) run = product();
    const cpu = process.cpuUsage(cpu0);
    const cpuMsPerDay = (cpu.user + cpu.system) / 1000 / reps / DAYS;
    const err = maxCbtDiff(run, reference);
    cpuSum += cpuMsPerDay;
    errMax = Math.max(errMax, err);
    perKind[kind] = { cpu_ms_per_person_day: cpuMsPerDay, err_h: err, restarts_per_day: run.integrations / DAYS, rhs_per_day: run.rhsEvaluations / DAYS };
  }
  return {
    per_minute_light_ms_per_person_day: cpuSum / PER_MINUTE_LIGHT_KINDS.length,
    per_minute_light_err_h: errMax,
    per_minute_light_kinds: perKind,
  };
}
