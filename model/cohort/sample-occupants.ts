/**
 * Seeded sampling of virtual occupants around a persona.
 *  - intrinsic period: normal, mean = persona's τ, SD from the spread, truncated at ±4 SD;
 *  - light sensitivity: log-normal multiplier, median = persona's multiplier, SD of ln from the
 *    spread, truncated at ±4 SD of ln;
 *  - age: uniform over the given range, else the persona's age;
 *  - habitual mid-sleep shift: normal, mean 0 h, SD from the spread, truncated at ±4 SD.
 * Each trait of each occupant has its own stream (occupant-stream.ts); a zero spread returns the
 * persona's values exactly, without drawing.
 */
import { assertCohortSeed, occupantStream, TRAIT_STREAM } from './occupant-stream.js';
import { truncatedStandardNormal } from './normal-draw.js';
import type { CohortSpread, OccupantTraits, PersonaTraits } from './occupant-traits.js';
import { TRUNCATION_SD } from './population-spread.js';
import { assertCohortSpread, assertPersonaTraits } from './validate-cohort-input.js';

function normalTrait(seed: number, index: number, stream: number, centre: number, sd: number): number {
  if (sd === 0) return centre;
  return centre + sd * truncatedStandardNormal(occupantStream(seed, index, stream), TRUNCATION_SD);
}

/** Traits of occupant `occupantIndex` (0-based) of the cohort with this seed. */
export function sampleOccupantTraits(persona: PersonaTraits, spread: CohortSpread, seed: number, occupantIndex: number): OccupantTraits {
  assertPersonaTraits(persona);
  assertCohortSpread(spread);
  assertCohortSeed(seed);
  if (!Number.isSafeInteger(occupantIndex) || occupantIndex < 0) {
    throw new RangeError(`occupant index: must be a non-negative whole number, got ${String(occupantIndex)}`);
  }
  const lnSensitivity = normalTrait(seed, occupantIndex, TRAIT_STREAM.lightSensitivity, 0, spread.lightSensitivitySdLn);
  let age_y = persona.age_y;
  if (spread.ageRange_y !== null) {
    const [min, max] = spread.ageRange_y;
    age_y = min === max ? min : min + (max - min) * occupantStream(seed, occupantIndex, TRAIT_STREAM.age).nextFloat64();
  }
  return {
    occupantIndex,
    intrinsicPeriod_h: normalTrait(seed, occupantIndex, TRAIT_STREAM.intrinsicPeriod, persona.intrinsicPeriod_h, spread.intrinsicPeriodSd_h),
    lightSensitivity: lnSensitivity === 0 ? persona.lightSensitivity : persona.lightSensitivity * Math.exp(lnSensitivity),
    age_y,
    habitualMidSleepShift_h: normalTrait(seed, occupantIndex, TRAIT_STREAM.habitualSleepTiming, 0, spread.habitualMidSleepSd_h),
  };
}

/** Occupants 0 … count − 1 of a cohort. */
export function sampleCohort(persona: PersonaTraits, spread: CohortSpread, seed: number, count: number): OccupantTraits[] {
  if (!Number.isSafeInteger(count) || count < 1) throw new RangeError(`cohort size: must be a whole number ≥ 1, got ${String(count)}`);
  const out: OccupantTraits[] = [];
  for (let i = 0; i < count; i++) out.push(sampleOccupantTraits(persona, spread, seed, i));
  return out;
}
