import { describe, expect, it } from 'vitest';
import { mix64, SplitMix64 } from './splitmix64.js';

describe('SplitMix64', () => {
  it('reproduces the published first outputs for seed 0', () => {
    // First outputs of Vigna's original splitmix64.c for state 0, as pinned by several
    // independent public test suites.
    const rng = new SplitMix64(0n);
    expect([rng.nextUint64(), rng.nextUint64(), rng.nextUint64(), rng.nextUint64()]).toEqual([
      0xe220a8397b1dcdafn,
      0x6e789e6aa1b965f4n,
      0x06c45d188009454fn,
      0xf88bb8a8724c81ecn,
    ]);
  });

  it('finaliser maps 0 to 0 and stays within 64 bits', () => {
    expect(mix64(0n)).toBe(0n);
    const big = mix64((1n << 64n) - 1n);
    expect(big >= 0n && big < 1n << 64n).toBe(true);
  });
});
