/**
 * Ensemble ranges in words and numbers for people: "+0.42 h (models: +0.30 to +0.55 h)". One
 * format per figure (unit, scale, decimals, sign), shared by the CLI summary and the app.
 */
import type { EnsembleMetric, EnsembleRange } from './results-types.js';

export interface EnsembleFigureFormat {
  readonly label: string;
  readonly unit: string;
  /** results.json value × scale = the shown value (shares are shown in %). */
  readonly scale: number;
  readonly decimals: number;
  /** Show + on positive values (shifts). */
  readonly signed: boolean;
}

export const ENSEMBLE_FIGURES: Readonly<Record<EnsembleMetric, EnsembleFigureFormat>> = {
  mean_phase_shift_h: { label: 'Phase shift (+ later)', unit: 'h', scale: 1, decimals: 2, signed: true },
  mean_melatonin_suppression_pct: { label: 'Melatonin suppression', unit: '%', scale: 1, decimals: 0, signed: false },
  work_hours_kss_ge_7_share: { label: 'Work hours at KSS ≥ 7', unit: '%', scale: 100, decimals: 0, signed: false },
  mean_phase_angle_dlmo_to_sleep_h: { label: 'DLMO to sleep onset', unit: 'h', scale: 1, decimals: 2, signed: false },
  mean_sleep_duration_h: { label: 'Main sleep', unit: 'h', scale: 1, decimals: 1, signed: false },
  misalignment_h_per_day: { label: 'Misalignment with work and sleep hours (a day)', unit: 'h', scale: 1, decimals: 1, signed: false },
};

/** A number as shown for the figure ("+0.42", "−0.10", "37"); "—" for null. */
export function figureNumber(metric: EnsembleMetric, value: number | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  const f = ENSEMBLE_FIGURES[metric];
  let text = (value * f.scale).toFixed(f.decimals);
  if (/^-0(\.0*)?$/.test(text)) text = text.slice(1);
  if (text.startsWith('-')) return `−${text.slice(1)}`;
  return f.signed && !/^0(\.0*)?$/.test(text) ? `+${text}` : text;
}

const withUnit = (text: string, unit: string) => (text === '—' ? text : unit === '%' ? `${text} %` : `${text} ${unit}`);

/** "+0.30 to +0.55 h", or "+0.42 h" when every model agrees at the shown decimals; "—" without values. */
export function rangeText(metric: EnsembleMetric, range: EnsembleRange): string {
  const lo = figureNumber(metric, range.min);
  const hi = figureNumber(metric, range.max);
  const unit = ENSEMBLE_FIGURES[metric].unit;
  if (lo === '—') return '—';
  return lo === hi ? withUnit(lo, unit) : withUnit(`${lo} to ${hi}`, unit);
}

/** "+0.42 h (models: +0.30 to +0.55 h)": the default model's value with the ensemble's range ("(all 3 models: 0 %)" when they agree). */
export function valueWithRange(metric: EnsembleMetric, value: number | null, range: EnsembleRange | undefined): string {
  const shown = withUnit(figureNumber(metric, value), ENSEMBLE_FIGURES[metric].unit);
  if (range === undefined || range.model_count < 2) return shown;
  const same = figureNumber(metric, range.min) === figureNumber(metric, range.max);
  return same ? `${shown} (all ${range.model_count} models: ${rangeText(metric, range)})` : `${shown} (models: ${rangeText(metric, range)})`;
}
