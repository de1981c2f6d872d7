// Which day the one-day charts of a persona show. With a recommended strategy: the day (with its
// following night inside the run) where its light differs most from the baseline's, so the
// charts show what the strategy changes. Otherwise, or when the strategies hardly differ: the last
// working day with its night inside the run, else the second-to-last day, else day 0.
import type { LightSeries } from '../../src/results/view-model.js';

/** Melanopic EDI summed over all sources per day, lx·h. */
export function dailyDose_lx_h(light: LightSeries, days: number): number[] {
  const dose = new Array<number>(days).fill(0);
  for (const source of light.sources) {
    source.mel_edi_lx.forEach((v, i) => {
      const day = Math.floor((light.start_h + i * light.step_h) / 24);
      if (day >= 0 && day < days) dose[day] = (dose[day] ?? 0) + v * light.step_h;
    });
  }
  return dose;
}

export function representativeDay(days: number, workMinutesPerHour: readonly number[] | undefined, baseline?: LightSeries, recommended?: LightSeries): number {
  const lastFull = Math.max(0, days - 2);
  if (baseline !== undefined && recommended !== undefined) {
    const a = dailyDose_lx_h(baseline, days);
    const b = dailyDose_lx_h(recommended, days);
    let best = -1;
    let bestDiff = 0;
    for (let d = 0; d <= lastFull; d++) {
      const diff = Math.abs((b[d] ?? 0) - (a[d] ?? 0));
      if (diff > bestDiff) {
        bestDiff = diff;
        best = d;
      }
    }
    // a difference under 1 % of that day's dose is not worth showing
    if (best >= 0 && bestDiff > 0.01 * Math.max(1, a[best] ?? 0)) return best;
  }
  if (workMinutesPerHour !== undefined) {
    for (let d = lastFull; d >= 0; d--) {
      let minutes = 0;
      for (let h = d * 24; h < d * 24 + 24; h++) minutes += workMinutesPerHour[h] ?? 0;
      if (minutes >= 60) return d;
    }
  }
  return lastFull;
}
