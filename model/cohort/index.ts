/** Public surface of virtual cohorts: seeded traits, exact spread summaries, convergence readout. */
export { Xoshiro128StarStar } from './xoshiro128starstar.js';
export { SplitMix64, mix64 } from './splitmix64.js';
export { occupantStream, assertCohortSeed, TRAIT_STREAM } from './occupant-stream.js';
export { standardNormal, truncatedStandardNormal } from './normal-draw.js';
export * from './population-spread.js';
export { pacemakerPersonOf, populationCohortSpread, zeroCohortSpread, type CohortSpread, type OccupantTraits, type PersonaTraits } from './occupant-traits.js';
export { assertCohortSpread, assertPersonaTraits } from './validate-cohort-input.js';
export { sampleCohort, sampleOccupantTraits } from './sample-occupants.js';
export { quantileOfSorted, summarizeDistribution, type DistributionSummary } from './quantiles.js';
export { aggregateCohort, seriesBands, type CohortSummary, type MetricValues, type OccupantOutcome, type SeriesBands } from './aggregate-cohort.js';
export { CohortConvergence, DEFAULT_COHORT_CONVERGENCE, metricKey, type ConvergenceCheckpoint, type ConvergenceOptions, type MetricReadout } from './convergence.js';
