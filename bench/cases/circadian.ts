/**
 * Body-clock cost: one person, 14 days of 1-minute light at the eye (an invented office routine
 * with 5 light changes a day, sleep 23:00–07:00), from an entrained state. For each pacemaker:
 * wall time per simulated person-day (pacemaker + Process L with odex, melatonin pass, sleep
 * pressure and KSS, including the per-minute → segment conversion), right-hand-side evaluations
 * per day, and the largest CBTmin difference against a tight-tolerance odex run; the same for
 * fixed-step RK4 at 1-minute steps. Goal: ≤ 0.1 ms per person-day for the default model with
 * CBTmin within 0.02 h of the tight run.
 */
import { entrain, dailySleepPattern } from '../../model/circadian/entrain.js';
import { lightFromPerMinute } from '../../model/circadian/light-series.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID, PACEMAKER_IDS } from '../../model/circadian/registry.js';
import { simulate, type SimulationRun } from '../../model/circadian/simulate.js';
import { repeatDaily } from '../../model/circadian/sleep-input.js';
import type { Integrator } from '../../model/solver/integrator.js';
import { createOdexIntegrator, ODEX_TIGHT_TOLERANCES } from '../../model/solver/odex-integrator.js';
import { createRk4Integrator } from '../../model/solver/rk4-integrator.js';
import { medianMs } from '../timing.js';

const DAYS = 14;

/** Per-minute melanopic EDI (lx) of an invented office day; weekend days stay home. */
function routineMinutes(days: number): Float64Array {
  const out = new Float64Array(days * 1440);
  for (let d = 0; d < days; d++) {
    const weekend = d % 7 >= 5;
    for (let m = 0; m < 1440; m++) {
      const h = m / 60;
      let v = 0;
      if (h >= 7 && h < 23) v = 60; // home, warm light
      if (!weekend && h >= 8 && h < 8.75) v = 2500; // commute outdoors
      if (!weekend && h >= 8.75 && h < 17.5) v = 250; // office
      if (!weekend && h >= 17.5 && h < 18) v = 1200; // walk home
      if (weekend && h >= 11 && h < 13) v = 4000; // outdoors
      out[d * 1440 + m] = v;
    }
  }
  return out;
}

function maxCbtDiff(a: SimulationRun, b: SimulationRun): number {
  let e = 0;
  const n = Math.min(a.cbtmin_h.length, b.cbtmin_h.length);
  for (let i = 0; i < n; i++) e = Math.max(e, Math.abs((a.cbtmin_h[i] as number) - (b.cbtmin_h[i] as number)));
  if (a.cbtmin_h.length !== b.cbtmin_h.length) e = Number.POSITIVE_INFINITY;
  return e;
}

export async function bench(): Promise<Record<string, unknown>> {
  const minutes = routineMinutes(DAYS);
  const sleepEpisodes = repeatDaily([{ start_h: 0, end_h: 7 }, { start_h: 23, end_h: 24 }], 0, DAYS - 1);
  const sleep = { mode: 'prescribed' as const, episodes: sleepEpisodes };
  const perModel: Record<string, unknown> = {};
  const out: Record<string, unknown> = {};
  for (const id of PACEMAKER_IDS) {
    const model = createPacemaker(id);
    const day0 = lightFromPerMinute(minutes.subarray(0, 1440), 'mel_edi_lx');
    let entrainDays = 0;
    const entrainMs = medianMs(() => {
      entrainDays = entrain({ model, light: day0, sleep: { mode: 'prescribed', episodes: dailySleepPattern(sleepEpisodes) } }).days;
    }, 3, 1);
    const state = entrain({ model, light: day0, sleep: { mode: 'prescribed', episodes: dailySleepPattern(sleepEpisodes) } }).state;
    const run = (integrator: Integrator): SimulationRun =>
      simulate({ model, light: lightFromPerMinute(minutes, 'mel_edi_lx'), sleep, initial: state, end_h: 24 * DAYS, integrator });
    const odex = createOdexIntegrator();
    const rk4 = createRk4Integrator();
    const tight = run(createOdexIntegrator(ODEX_TIGHT_TOLERANCES));
    let adaptive = run(odex);
    const adaptiveMs = medianMs(() => {
      adaptive = run(odex);
    }, 15, 3);
    // CPU time of the same runs: on a shared machine wall time also counts other processes
    const reps = 20;
    const cpu0 = process.cpuUsage();
    for (let k = 0; k < reps; k++) run(odex);
    const cpu = process.cpuUsage(cpu0);
    const adaptiveCpuMs = (cpu.user + cpu.system) / 1000 / reps;
    let fixed = run(rk4);
    const rk4Ms = medianMs(() => {
      fixed = run(rk4);
    }, 3, 1);
    const entry = {
      adaptive_ms_per_person_day: adaptiveMs / DAYS,
      adaptive_cpu_ms_per_person_day: adaptiveCpuMs / DAYS,
      rk4_ms_per_person_day: rk4Ms / DAYS,
      adaptive_err_h: maxCbtDiff(adaptive, tight),
      rk4_err_h: maxCbtDiff(fixed, tight),
      adaptive_rhs_per_day: adaptive.rhsEvaluations / DAYS,
      adaptive_steps_per_day: adaptive.steps / DAYS,
      adaptive_restarts_per_day: adaptive.integrations / DAYS,
      rk4_rhs_per_day: fixed.rhsEvaluations / DAYS,
      tight_rhs_per_day: tight.rhsEvaluations / DAYS,
      entrain_ms: entrainMs,
      entrain_days: entrainDays,
    };
    perModel[id] = entry;
    if (id === DEFAULT_PACEMAKER_ID) Object.assign(out, entry);
  }
  return { circadian_default_model: DEFAULT_PACEMAKER_ID, ...out, circadian_models: perModel };
}
