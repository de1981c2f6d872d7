// Plain-language lines saying what a strategy changes versus the baseline, one per change: the
// client words of schedules/words (the same lines the run's results and the briefing print).
import type { ScenarioInput, StrategyChangeInput } from './scenario-types.js';
import { changeWords } from '../../../schedules/words/strategy-changes.js';

export function describeChange(scenario: ScenarioInput, change: StrategyChangeInput): string {
  return changeWords(scenario, change);
}
