/**
 * SplitMix64 — Steele GL Jr, Lea D, Flood CH. "Fast splittable pseudorandom number
 * generators", OOPSLA 2014 (doi:10.1145/2660193.2660195). State advances by the odd
 * "golden gamma" 0x9E3779B97F4A7C15; each output is the state passed through the 64-bit
 * finaliser (shift-xor-multiply by 0xBF58476D1CE4E5B9 and 0x94D049BB133111EB; shifts 30, 27, 31),
 * the constants of the original splitmix64.c by S. Vigna that the xoshiro authors recommend for
 * seeding. Here it only derives seeds, so the BigInt arithmetic is off the hot path.
 */

const MASK_64 = (1n << 64n) - 1n;
const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;

/** The SplitMix64 output finaliser: a bijection on 64-bit integers with strong avalanche. */
export function mix64(z: bigint): bigint {
  let x = z & MASK_64;
  x = ((x ^ (x >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK_64;
  x = ((x ^ (x >> 27n)) * 0x94d049bb133111ebn) & MASK_64;
  return x ^ (x >> 31n);
}

/** Sequential SplitMix64 generator over a 64-bit state. */
export class SplitMix64 {
  private state: bigint;

  constructor(seed: bigint) {
    this.state = seed & MASK_64;
  }

  /** Next 64-bit output as an unsigned BigInt. */
  nextUint64(): bigint {
    this.state = (this.state + GOLDEN_GAMMA) & MASK_64;
    return mix64(this.state);
  }
}
