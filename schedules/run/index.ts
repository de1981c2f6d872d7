/** The run pipeline's public surface (pure; runs in the CLI, the app's main process or a Web Worker). */
export { runScenario, PIPELINE_VERSION, RUN_CAUTION, type RunInput, type RunOutput, type TimelineLight } from './run-scenario.js';
export { RESULTS_FORMAT, RESULTS_FORMAT_VERSION, type RunResults, type PersonaResult, type StrategyResult, type DayMetrics, type StrategySummary, type Headline, type Recommendation, type EventTime, type SourceMap } from './results-types.js';
export { RunInputError } from './run-input-error.js';
export { LIGHT_SOURCES, type LightSource, type EyeSeries } from './eye-series.js';
export { exposureCsv, summaryCsv, EXPOSURE_STEP_MIN } from './results-csv.js';
export { RECOMMENDATION_RULE } from './recommend.js';
export { prepareCohortPersona, runCohortOccupant, runCohortOccupantWithSeries, OCCUPANT_MELATONIN_STEP_H, type CohortPersonaBase, type CohortPerson, type OccupantClockSeries } from './cohort-occupant.js';
export { shiftedSleepSpec, fixedAwakeMinutes } from './cohort-sleep-shift.js';
export type { WeatherText } from './outdoor-light.js';
export { withEnsemble, planEnsemble, runEnsembleJob, assembleEnsemble, figureOf as ensembleFigureOf, type EnsemblePlan, type EnsembleJob, type EnsembleJobResult } from './ensemble.js';
export { defaultEnsemble, memberName, pacemakerName, pacemakerSource, sleepinessName, sleepinessSource, DEFAULT_SLEEPINESS_ID, type EnsembleMember } from './ensemble-members.js';
export { ENSEMBLE_RANKING_RULE } from './ensemble-ranking.js';
export { ENSEMBLE_FIGURES, figureNumber, rangeText, valueWithRange } from './ensemble-text.js';
export { ENSEMBLE_METRICS, type EnsembleMetric, type EnsembleRange, type EnsembleValue, type StrategyEnsemble, type EnsembleRanking, type EnsembleRank, type RunEnsembleModels } from './results-types.js';

import { clearEntrainCache } from './body-clock-run.js';
import { clearEyeCaches } from './eye-series.js';
import { clearOutdoorCache } from './outdoor-light.js';
/** Forget every cache the pipeline keeps between runs (prepared rooms, room daylight, outdoor daylight, entrained states). */
export function clearPipelineCaches(): void {
  clearEntrainCache();
  clearEyeCaches();
  clearOutdoorCache();
}
