import { describe, expect, it } from 'vitest';
import { assertCohortSeed, occupantStream, TRAIT_STREAM } from './occupant-stream.js';

const firstDraws = (seed: number, i: number, s: number) => {
  const r = occupantStream(seed, i, s);
  return [r.nextUint32(), r.nextUint32(), r.nextUint32()];
};

describe('occupant streams', () => {
  it('depend only on (seed, occupant, trait), not on the order streams are made in', () => {
    const forward = [0, 1, 2, 3].map((i) => firstDraws(42, i, TRAIT_STREAM.intrinsicPeriod));
    const backward = [3, 2, 1, 0].map((i) => firstDraws(42, i, TRAIT_STREAM.intrinsicPeriod)).reverse();
    expect(backward).toEqual(forward);
  });

  it('differ between seeds, occupants and traits', () => {
    const keys: [number, number, number][] = [
      [42, 0, 1],
      [43, 0, 1],
      [42, 1, 1],
      [42, 0, 2],
      [0, 0, 1],
      [0, 1, 0],
    ];
    const outputs = new Set(keys.map(([s, i, t]) => firstDraws(s, i, t).join(',')));
    expect(outputs.size).toBe(keys.length);
  });

  it('rejects seeds a user could mistype, naming the field', () => {
    expect(() => assertCohortSeed(-1)).toThrow(/seed: must be a non-negative whole number/);
    expect(() => assertCohortSeed(1.5)).toThrow(/seed/);
    expect(() => assertCohortSeed(Number.NaN)).toThrow(/seed/);
    expect(() => occupantStream(1, -3, 1)).toThrow(/occupant index/);
  });
});
