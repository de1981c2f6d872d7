// A results view built from simple closed-form shapes for tests of chart shaping and the briefing layout only.
// NOT a model output and never shown in the app.
// Strategy `brighter-morning` gets more morning light and a DLMO 0.1 h earlier per day (capped),
// so direction-of-change checks have something to read.
import type { MetricValue, ResultsView, RunView } from './view-model.js';

const STEP_H = 1 / 60;

function metric(id: string, label: string, unit: string, value: number, decimals: number, better: MetricValue['better'], increaseWord = 'higher', decreaseWord = 'lower'): MetricValue {
  return { id, label, unit, value, decimals, better, increaseWord, decreaseWord };
}

function run(personaId: string, strategyId: string, days: number, morningBoost_lx: number, advancePerDay_h: number): RunView {
  const steps = Math.round((days * 24) / STEP_H);
  const daylight: number[] = [];
  const electric: number[] = [];
  const screen: number[] = [];
  for (let i = 0; i < steps; i++) {
    const clock = (i * STEP_H) % 24;
    const sun = clock > 6 && clock < 19 ? Math.sin((Math.PI * (clock - 6)) / 13) : 0;
    daylight.push(180 * sun);
    const atWork = clock >= 8 && clock < 17;
    const morning = clock >= 7 && clock < 10;
    electric.push((atWork ? 120 : clock >= 17 && clock < 23 ? 25 : 0) + (morning ? morningBoost_lx : 0));
    screen.push(clock >= 21 && clock < 23 ? 6 : 0);
  }
  const phases = Array.from({ length: days }, (_, day) => {
    const shift = Math.min(1.2, advancePerDay_h * (day + 1));
    return { day, dlmo_h: day * 24 + 21.5 - shift, cbtmin_h: day * 24 + 28.5 - shift };
  });
  const time_h: number[] = [];
  const level: number[] = [];
  const unsuppressed: number[] = [];
  for (let t = 0; t <= days * 24; t += 0.25) {
    const clock = t % 24;
    const shift = Math.min(1.2, advancePerDay_h * (Math.floor(t / 24) + 1));
    const since = (clock - (21.5 - shift) + 24) % 24;
    const dark = since < 10 ? 60 * Math.sin((Math.PI * since) / 10) : 0;
    time_h.push(t);
    unsuppressed.push(dark);
    level.push(clock >= 21 && clock < 23 ? dark * 0.8 : dark);
  }
  const kssHourly = Array.from({ length: days * 24 }, (_, h) => {
    const clock = h % 24;
    if (clock >= 23 || clock < 7) return null;
    return Math.min(9, 3 + Math.max(0, clock - 15) * 0.5 + (clock < 9 ? 1.5 - morningBoost_lx / 400 : 0));
  });
  const sleep = Array.from({ length: days }, (_, day) => ({ start_h: day * 24 - 1, end_h: day * 24 + 7, kind: 'sleep' as const }));
  const finalShift = Math.min(1.2, advancePerDay_h * days);
  return {
    personaId,
    strategyId,
    light: { start_h: 0, step_h: STEP_H, sources: [
      { id: 'daylight', label: 'Daylight through windows', kind: 'daylight', mel_edi_lx: daylight },
      { id: 'ceiling', label: 'Ceiling luminaires', kind: 'electric', mel_edi_lx: electric },
      { id: 'phone', label: 'Phone screen', kind: 'screen', mel_edi_lx: screen },
    ] },
    phases,
    melatonin: { time_h, level, unsuppressed, unit: 'pmol/L' },
    kssHourly,
    sleep,
    metrics: [
      { ...metric('dlmo', 'DLMO (last day)', 'h', 21.5 - finalShift, 2, 'none', 'later', 'earlier'), clock: true },
      metric('day-above-250', 'Daytime hours ≥ 250 lx mEDI', 'h', 2 + morningBoost_lx / 100, 1, 'higher', 'more', 'fewer'),
      metric('suppression', 'Evening melatonin suppression', '%', 4, 1, 'lower', 'more', 'less'),
      metric('kss7', 'Awake hours with KSS ≥ 7', 'h', days * 1, 0, 'lower', 'more', 'fewer'),
    ],
  };
}

export function syntheticResultsView(days = 7): ResultsView {
  return {
    scenarioName: 'Synthetic layout check (not a simulation)',
    startDate: '2026-03-23',
    days,
    baselineId: 'baseline',
    strategies: [
      { id: 'baseline', name: 'Baseline' },
      { id: 'brighter-morning', name: 'Brighter morning' },
    ],
    personas: [{ id: 'desk', name: 'Desk worker' }],
    runs: [run('desk', 'baseline', days, 0, 0), run('desk', 'brighter-morning', days, 300, 0.15)],
    cautions: [],
  };
}
