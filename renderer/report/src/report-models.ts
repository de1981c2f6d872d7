// The models a briefing names, each with its one citation from the model registry
// (schedules/words/model-words.ts): the body-clock and sleepiness models whose values the briefing
// shows, the other models of the ensemble behind the ranges, and the melatonin model.
import type { RunResults } from '../../../schedules/run/results-types.js';
import { bodyClockModelWords, melatoninModelWords, sleepinessModelWords, type ModelWords } from '../../../schedules/words/model-words.js';
import { DEFAULT_PACEMAKER_ID } from '../../../model/circadian/registry.js';
import { HEADLINE_SLEEPINESS_ID } from '../../../model/circadian/sleepiness-registry.js';

export interface ReportModel extends ModelWords {
  /** "figures": the values shown are this model's; "range": it only widens the ranges. */
  readonly use: 'figures' | 'range';
}

/** The run's models: from results.json (its ensemble when run), the product defaults for a view. */
export function reportModels(results: RunResults | null): ReportModel[] {
  const defaults = results?.ensemble?.default ?? { pacemaker: results?.models.pacemaker ?? DEFAULT_PACEMAKER_ID, sleepiness: HEADLINE_SLEEPINESS_ID };
  const ids = (role: 'body clock' | 'sleepiness', first: string) => [first, ...(results?.ensemble?.models ?? []).filter((m) => m.role === role && m.id !== first).map((m) => m.id)];
  return [
    ...ids('body clock', defaults.pacemaker).map((id, i): ReportModel => ({ ...bodyClockModelWords(id), use: i === 0 ? 'figures' : 'range' })),
    { ...melatoninModelWords(), use: 'figures' },
    ...ids('sleepiness', defaults.sleepiness).map((id, i): ReportModel => ({ ...sleepinessModelWords(id), use: i === 0 ? 'figures' : 'range' })),
  ];
}
