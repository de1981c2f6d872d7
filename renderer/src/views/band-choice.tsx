// Which strategies' cohort bands a chart draws: one strategy (the recommended one by default), all
// of them, or none.
import type { NamedItem, ResultsView } from '../results/view-model.js';
import type { CohortSeries } from './use-cohort-series.js';

export type BandChoice = string;
export const ALL_BANDS = '*all';
export const NO_BANDS = '*none';

/** The strategy whose band shows first: the recommended one for the person, else the baseline. */
export function defaultBandStrategy(view: ResultsView, personaId: string): string {
  return view.recommendations?.find((r) => r.personaId === personaId)?.strategyId ?? view.baselineId;
}

/** The choice in force: the one made, while it names one of this person's strategies (or all, or none); else the default. */
export function effectiveBandChoice(choice: BandChoice | null, strategies: readonly NamedItem[], view: ResultsView, personaId: string): BandChoice {
  if (choice === ALL_BANDS || choice === NO_BANDS || (choice !== null && strategies.some((s) => s.id === choice))) return choice;
  const fallback = defaultBandStrategy(view, personaId);
  return strategies.some((s) => s.id === fallback) ? fallback : (strategies[0]?.id ?? NO_BANDS);
}

export function bandedStrategies(choice: BandChoice, strategies: readonly NamedItem[], cohort: CohortSeries | null): NamedItem[] {
  if (cohort === null || choice === NO_BANDS) return [];
  const have = strategies.filter((s) => (cohort.byStrategy[s.id]?.length ?? 0) > 0);
  return choice === ALL_BANDS ? have : have.filter((s) => s.id === choice);
}

export function BandPicker({ value, onChange, strategies, cohort }: { value: BandChoice; onChange: (v: BandChoice) => void; strategies: readonly NamedItem[]; cohort: CohortSeries | null }) {
  if (cohort === null) return null;
  return (
    <label>
      Cohort band
      <select value={value} onChange={(e) => onChange(e.target.value)}>
        {strategies.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name}
          </option>
        ))}
        <option value={ALL_BANDS}>All strategies</option>
        <option value={NO_BANDS}>None</option>
      </select>
    </label>
  );
}
