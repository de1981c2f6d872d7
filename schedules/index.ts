/**
 * Public surface of the scenario layer: format (schema, types, versions, JSON Schema),
 * validation, expansion into exposure timelines, measured light logs, and the demo scenario.
 */
export { SCENARIO_FORMAT, SCENARIO_FORMAT_VERSION, scenarioSchema, runSettingsSchema } from './schema/scenario-schema.js';
export type * from './schema/scenario-types.js';
export { WEEKDAYS, type Weekday } from './schema/primitives.js';
export { ACTIVITIES, POSTURES, GAZES, type Activity, type Posture, type Gaze } from './schema/personas-schema.js';
export { REST_DAY } from './schema/roster-schema.js';
export { FILL_RULES, TIMESTAMP_FORMATS, type FillRule, type TimestampFormat } from './schema/light-log-schema.js';
export { scenarioJsonSchema, scenarioJsonSchemaText, SCENARIO_JSON_SCHEMA_ID } from './scenario-json-schema.js';

export { validateScenarioText, validateScenarioValue, type ScenarioValidation } from './validation/validate-scenario.js';
export { formatPath, formatProblem, type ScenarioProblem, type ProblemSeverity } from './validation/problem.js';
export { migrateScenario, MIGRATIONS, type MigrationResult } from './migration/migrate.js';

export { expandScenario, expandPersona, parseDateTimeAtSite } from './timeline/expand-scenario.js';
export { applyStrategyToPlaces } from './timeline/apply-strategy.js';
export { changeWords, strategyChangeWords } from './words/strategy-changes.js';
export { rosterDay, type RosterDay } from './timeline/roster-plan.js';
export { formatRosterPattern, parseRosterPattern, RosterPatternError } from './roster/roster-pattern.js';
export { sliceAtMinute, sliceIndexPerMinute, dayAtMinute, utcAtMinute, wallClockAtMinute, forEachMinute } from './timeline/timeline-sampling.js';
export {
  BASELINE_ID,
  type ExpandedScenario,
  type ExposureTimeline,
  type ExposureSlice,
  type ExposureState,
  type TimelineDay,
  type StrategyVariant,
  type SleepState,
  type DayKind,
  type CommuteDirection,
  type SliceOrigin,
} from './timeline/exposure-types.js';

export { importLightLog, type ImportedLightLog, type LightLogImport, type LightLogOptions, type LogSample, type LogGap, type LogProblem } from './lightlog/import-light-log.js';
export { logToMinuteSeries, type MinuteLightSeries } from './lightlog/log-to-minutes.js';
export { parseTimestamp, detectTimestampFormat } from './lightlog/timestamp.js';

export { clockTimeToMinutes, minutesToClockTime, clockSpan, MINUTES_PER_DAY } from './time/clock-time.js';
export { wallTimeToUtc_ms, utcToWallTime, utcOffsetAt_min, isValidTimeZone, addDays, daysBetween, isoWeekday } from './time/local-calendar.js';

export { DEMO_SCENARIO } from './demo/demo-scenario.js';
export { exposureContext, luminaireOutputAt, clockWindowHolds, eyewearFilter, EYEWEAR_DEFAULTS, type ExposureContext, type EyewearFilter } from './timeline/exposure-context.js';

export {
  runScenario,
  clearPipelineCaches,
  exposureCsv,
  summaryCsv,
  RunInputError,
  RESULTS_FORMAT,
  RESULTS_FORMAT_VERSION,
  RECOMMENDATION_RULE,
  PIPELINE_VERSION,
  type RunInput,
  type RunOutput,
  type RunResults,
  type PersonaResult,
  type StrategyResult,
  type DayMetrics,
  type StrategySummary,
  type Headline,
  type Recommendation,
} from './run/index.js';
