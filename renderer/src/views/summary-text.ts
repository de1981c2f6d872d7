// The summary's headline figures in words: the body-clock shift as a duration earlier or later,
// suppression and the share of sleepy work hours in %, and their ranges across the model ensemble.
import type { MetricEnsemble, RunHeadline } from '../results/view-model.js';
import { formatDuration, formatNumber } from '../charts/number-format.js';

type HeadlineMetric = RunHeadline['metric'];

/** A headline figure in words: the shift as a duration earlier or later, the others in %. */
export function headlineText(metric: HeadlineMetric, value: number | null, isBaseline: boolean): string {
  if (value === null) return 'not available';
  if (metric === 'phase_shift_h') {
    if (isBaseline) return 'reference';
    return Math.abs(value) < 0.5 / 60 ? 'no shift' : `${formatDuration(value)} ${value < 0 ? 'earlier' : 'later'}`;
  }
  if (metric === 'melatonin_suppression_pct') return `${formatNumber(value, 0)} %`;
  return `${formatNumber(value * 100, 0)} %`;
}

/** "5–20 min" when both are under an hour, else "45 min–1 h 10 min". */
function durationRange(a_h: number, b_h: number): string {
  const a = formatDuration(a_h);
  const b = formatDuration(b_h);
  return a.endsWith(' min') && b.endsWith(' min') && !a.includes(' h') && !b.includes(' h') ? `${a.slice(0, -4)}–${b}` : `${a}–${b}`;
}

/** A headline's range across the model ensemble in the same words as the figure. */
export function headlineRangeText(metric: HeadlineMetric, ensemble: MetricEnsemble): string {
  const across = `across ${ensemble.models} models`;
  if (metric === 'phase_shift_h') {
    const words = (v: number) => (Math.abs(v) < 0.5 / 60 ? 'no shift' : `${formatDuration(v)} ${v < 0 ? 'earlier' : 'later'}`);
    const lo = words(ensemble.min);
    const hi = words(ensemble.max);
    if (lo === hi) return `same with all ${ensemble.models} models`;
    if (ensemble.min < 0 && ensemble.max < 0) return `${durationRange(ensemble.max, ensemble.min)} earlier ${across}`;
    if (ensemble.min > 0 && ensemble.max > 0) return `${durationRange(ensemble.min, ensemble.max)} later ${across}`;
    return `${lo} to ${hi} ${across}`;
  }
  // the kss share arrives in % (the view's unit), suppression in %
  const lo = formatNumber(ensemble.min, 0);
  const hi = formatNumber(ensemble.max, 0);
  return lo === hi ? `same with all ${ensemble.models} models` : `${lo}–${hi} % ${across}`;
}
