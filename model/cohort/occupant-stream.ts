/**
 * Independent random streams per (cohort seed, occupant index, trait). Each stream's 128-bit
 * xoshiro128** state is filled from a SplitMix64 generator whose seed is a chain of SplitMix64
 * finalisers over the three keys — the seeding the xoshiro authors recommend (Blackman & Vigna
 * 2021, §"Seeding"). Because a stream depends only on its keys, an occupant's traits never depend
 * on how many occupants exist, in which order they are drawn, or how many workers draw them.
 */
import { mix64, SplitMix64 } from './splitmix64.js';
import { Xoshiro128StarStar } from './xoshiro128starstar.js';

/** One stream per sampled quantity, so adding a trait never changes the others. */
export const TRAIT_STREAM = {
  intrinsicPeriod: 1,
  lightSensitivity: 2,
  age: 3,
  habitualSleepTiming: 4,
} as const;
export type TraitStreamId = (typeof TRAIT_STREAM)[keyof typeof TRAIT_STREAM];

/** A cohort seed is any safe non-negative integer (the `--seed` a user types). */
export function assertCohortSeed(seed: number, field = 'seed'): void {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`${field}: must be a non-negative whole number up to ${Number.MAX_SAFE_INTEGER}, got ${String(seed)}`);
  }
}

const MASK_32 = 0xffffffffn;

/** The random stream of one quantity of one occupant. */
export function occupantStream(seed: number, occupantIndex: number, streamId: number): Xoshiro128StarStar {
  assertCohortSeed(seed);
  if (!Number.isSafeInteger(occupantIndex) || occupantIndex < 0) {
    throw new RangeError(`occupant index: must be a non-negative whole number, got ${String(occupantIndex)}`);
  }
  const key = mix64(mix64(mix64(BigInt(seed)) ^ BigInt(occupantIndex)) ^ BigInt(streamId));
  const seeder = new SplitMix64(key);
  const hi = seeder.nextUint64();
  const lo = seeder.nextUint64();
  const words: [number, number, number, number] = [
    Number(hi >> 32n),
    Number(hi & MASK_32),
    Number(lo >> 32n),
    Number(lo & MASK_32),
  ];
  // Two consecutive SplitMix64 outputs are never both zero (the finaliser is a bijection and the
  // states differ), so the forbidden all-zero xoshiro state cannot occur.
  return new Xoshiro128StarStar(words);
}
