/**
 * The model ensemble in the text output of `zeitlight run` / `zeitlight demo`: per strategy the
 * default model's headline figures with their range across the models ("+0.42 h (models: +0.30
 * to +0.55 h)"), and every strategy whose rank changes with the model, in words.
 */
import { ensembleFigureOf, valueWithRange, type EnsembleMetric, type PersonaResult, type RunResults } from '../../schedules/run/index.js';

const FIGURES: readonly { readonly metric: EnsembleMetric; readonly words: string }[] = [
  { metric: 'mean_phase_shift_h', words: 'phase shift (+ later)' },
  { metric: 'mean_melatonin_suppression_pct', words: 'melatonin suppression' },
  { metric: 'work_hours_kss_ge_7_share', words: 'work hours at KSS ≥ 7' },
  { metric: 'mean_phase_angle_dlmo_to_sleep_h', words: 'DLMO to sleep onset' },
  { metric: 'misalignment_h_per_day', words: 'misalignment with work and sleep hours (a day)' },
];

/** Lines for one persona (indented by two spaces), or none when the ensemble was not run. */
export function ensembleLines(results: RunResults, persona: PersonaResult): string[] {
  const e = results.ensemble;
  if (e === undefined) return [];
  const clocks = e.models.filter((m) => m.role === 'body clock').length;
  const kss = e.models.filter((m) => m.role === 'sleepiness').length;
  const lines = [`  Default model's figures, with the range across ${clocks} body-clock models${kss > 1 ? ` (KSS: across ${e.members.length} pairs with ${kss} sleepiness models)` : ''}:`];
  for (const s of persona.strategies) {
    const parts = FIGURES.flatMap(({ metric, words }) => {
      if (metric === 'mean_phase_shift_h' && s.is_baseline) return [];
      return [`${words} ${valueWithRange(metric, ensembleFigureOf(s, metric), s.ensemble?.[metric])}`];
    });
    lines.push(`    ${s.name}: ${parts.join('; ')}`);
  }
  for (const r of persona.ensemble_ranking?.strategies ?? []) if (r.sentence !== null) lines.push(`  ${r.sentence}`);
  return lines;
}

/** One line naming the ensemble's models by kind (the defaults first). */
export function ensembleModelsLine(results: RunResults): string | null {
  const e = results.ensemble;
  if (e === undefined) return null;
  const list = (role: 'body clock' | 'sleepiness') => e.models.filter((m) => m.role === role).map((m, i) => `${m.name}${i === 0 ? ' (default)' : ''}`).join('; ');
  return `Model ensemble — body clock: ${list('body clock')}. Sleepiness: ${list('sleepiness')}. Ranges in results.json "ensemble" and summary.csv; --no-ensemble runs the default models only.`;
}
