/**
 * Simulated laboratory protocols used to compare the models with published numbers.
 * Baseline: entrained to an invented regular day (wake 07:00–23:00 at 150 lx, sleep dark).
 * Protocol days: awake throughout in dim light (constant-routine-like), a single light pulse.
 * Regular-day protocols: one evening of other light after the baseline (per-night melatonin).
 */
import { entrain } from '../../model/circadian/entrain.js';
import type { MelatoninNight } from '../../model/circadian/melatonin-nights.js';
import { lightFromSteps } from '../../model/circadian/light-series.js';
import type { Pacemaker } from '../../model/circadian/pacemaker.js';
import { trapezoid } from '../../model/circadian/area.js';
import { simulate, type SimState, type SimulationRun } from '../../model/circadian/simulate.js';
import { REGULAR_SLEEP_DAY0, regularDayLight, regularSleep } from '../../model/circadian/test-schedules.js';
import type { Integrator } from '../../model/solver/integrator.js';

export const PROTOCOL_DAYS = 5;
const AWAKE = { mode: 'prescribed' as const, episodes: [] };

export interface Baseline {
  readonly model: Pacemaker;
  readonly state: SimState;
  /** First CBTmin of the dim reference run (h since t = 0). */
  readonly cbtmin0_h: number;
  readonly reference: SimulationRun;
}

export function baseline(model: Pacemaker, background_lx: number, integrator?: Integrator): Baseline {
  const e = entrain({ model, light: regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });
  const reference = simulate({ model, light: lightFromSteps([0], [background_lx], 'native_lx', 24 * PROTOCOL_DAYS), sleep: AWAKE, initial: e.state, end_h: 24 * PROTOCOL_DAYS, ...(integrator ? { integrator } : {}) });
  return { model, state: e.state, cbtmin0_h: reference.cbtmin_h[0] as number, reference };
}

export function pulseRun(b: Baseline, background_lx: number, start_h: number, duration_h: number, pulse_lx: number, integrator?: Integrator): SimulationRun {
  const light = lightFromSteps([0, start_h, start_h + duration_h], [background_lx, pulse_lx, background_lx], 'native_lx', 24 * PROTOCOL_DAYS);
  return simulate({ model: b.model, light, sleep: AWAKE, initial: b.state, end_h: 24 * PROTOCOL_DAYS, ...(integrator ? { integrator } : {}) });
}

/** Phase shift (h, + = advance) of the last CBTmin against the dim reference. */
export function phaseShift_h(b: Baseline, run: SimulationRun): number {
  const ref = b.reference.cbtmin_h[b.reference.cbtmin_h.length - 1] as number;
  const k = run.cbtmin_h.reduce((best, v) => (Math.abs(v - ref) < Math.abs(best - ref) ? v : best), Number.POSITIVE_INFINITY);
  return ref - k;
}

/** Phase response curve: pulse centres at CBTmin + offsets (h), 6.7 h × 10 000 lx by default (Khalsa et al. 2003). */
export function phaseResponseCurve(model: Pacemaker, offsets_h: readonly number[], pulse_lx = 10000, duration_h = 6.7, background_lx = 5): { offset_h: number; shift_h: number }[] {
  const b = baseline(model, background_lx);
  // centre the pulses on the CBTmin of day 1 so that every pulse starts after t = 0
  const cbt = (b.reference.cbtmin_h.find((c) => c > 14) as number);
  return offsets_h.map((o) => ({ offset_h: o, shift_h: phaseShift_h(b, pulseRun(b, background_lx, cbt + o - duration_h / 2, duration_h, pulse_lx)) }));
}

export interface DoseResponsePoint {
  readonly lux: number;
  readonly delay_h: number;
  /** Acute suppression over the exposure (vs the same trajectory without light), %. */
  readonly acuteSuppression_pct: number;
  /** Zeitzer-style: 1 − AUC(light run)/AUC(dim run) over the exposure clock hours, %. */
  readonly experimentalSuppression_pct: number;
}

/** Zeitzer et al. 2000 protocol: 6.5 h pulse centred 3.5 h before CBTmin, dim background. */
export function doseResponse(model: Pacemaker, lux: readonly number[], background_lx = 3, window: 'exposure' | 'before-midpoint' = 'exposure'): DoseResponsePoint[] {
  const b = baseline(model, background_lx);
  const cbt = b.reference.cbtmin_h.find((c) => c > 14) as number;
  const pulseStart = cbt - 3.5 - 3.25;
  // AUC window: the exposure, or the 4 h before the melatonin midpoint (≈ CBTmin − 2 h), as in
  // Zeitzer et al. 2000 as described by St Hilaire et al. 2007
  const start = window === 'exposure' ? pulseStart : cbt - 6;
  const end = window === 'exposure' ? pulseStart + 6.5 : cbt - 2;
  const dimAuc = trapezoid(b.reference.samples.t_h, b.reference.samples.plasmaMelatonin_pmol_L, start, end);
  return lux.map((l) => {
    const r = pulseRun(b, background_lx, pulseStart, 6.5, l);
    const s = r.samples;
    const auc = trapezoid(s.t_h, s.plasmaMelatonin_pmol_L, start, end);
    const shadow = trapezoid(s.t_h, s.dimMelatonin_pmol_L, start, end);
    return { lux: l, delay_h: -phaseShift_h(b, r), acuteSuppression_pct: 100 * (1 - auc / shadow), experimentalSuppression_pct: 100 * (1 - auc / dimAuc) };
  });
}

/** Illuminance at which y reaches half of its value at the brightest level (log-lux interpolation). */
export function halfMaxLux(lux: readonly number[], y: readonly number[]): number {
  const top = y[y.length - 1] as number;
  const half = top / 2;
  for (let i = 1; i < lux.length; i++) {
    const a = y[i - 1] as number;
    const b = y[i] as number;
    if (a < half && b >= half) {
      const la = Math.log(lux[i - 1] as number);
      const lb = Math.log(lux[i] as number);
      return Math.exp(la + ((half - a) / (b - a)) * (lb - la));
    }
  }
  return Number.NaN;
}

/**
 * A regular day (07:00–19:00 at 150 lx, sleep 23:00–07:00 in the dark) with `evening_lx` from
 * 19:00 to 23:00, started from the state entrained to the plain regular day (one evening of that
 * light; `entrainedToEvening`: entrained to the day with that evening). The night that begins on
 * day 0.
 */
export function eveningNight(model: Pacemaker, evening_lx: number, entrainedToEvening = false): MelatoninNight {
  const day = lightFromSteps([0, 7, 19, 23], [0, 150, evening_lx, 0], 'native_lx', 24);
  const e = entrain({ model, light: entrainedToEvening ? day : regularDayLight(150), sleep: REGULAR_SLEEP_DAY0 });
  const r = simulate({ model, light: day, periodicLight: true, sleep: regularSleep(2), initial: e.state, end_h: 48 });
  const night = r.nights.find((n) => n.onset_h > 12 && n.onset_h < 36);
  if (night === undefined) throw new Error(`${model.id}: no melatonin night found on day 0`);
  return night;
}
