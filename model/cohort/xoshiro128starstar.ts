/**
 * xoshiro128** 1.1 — Blackman D, Vigna S. "Scrambled linear pseudorandom number generators",
 * ACM Trans Math Softw 47(4):36 (2021), doi:10.1145/3460772. 128-bit state of four 32-bit words,
 * period 2^128 − 1, output scrambler rotl(s1 · 5, 7) · 9, state update with shift 9 and
 * rotation 11. All arithmetic is 32-bit (Math.imul, >>> 0), so the sequence is identical in
 * Node, Electron renderers and Web Workers.
 */

function rotl32(x: number, k: number): number {
  return ((x << k) | (x >>> (32 - k))) >>> 0;
}

const TWO_POW_26 = 67108864;
const TWO_POW_53 = 9007199254740992;

export class Xoshiro128StarStar {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  /** Four 32-bit state words; the all-zero state is the one forbidden state of the generator. */
  constructor(state: readonly [number, number, number, number]) {
    const [a, b, c, d] = state.map((w) => w >>> 0) as [number, number, number, number];
    if ((a | b | c | d) === 0) throw new RangeError('xoshiro128** state must not be all zero');
    this.s0 = a;
    this.s1 = b;
    this.s2 = c;
    this.s3 = d;
  }

  /** Next unsigned 32-bit output. */
  nextUint32(): number {
    const result = Math.imul(rotl32(Math.imul(this.s1, 5) >>> 0, 7), 9) >>> 0;
    const t = (this.s1 << 9) >>> 0;
    this.s2 = (this.s2 ^ this.s0) >>> 0;
    this.s3 = (this.s3 ^ this.s1) >>> 0;
    this.s1 = (this.s1 ^ this.s2) >>> 0;
    this.s0 = (this.s0 ^ this.s3) >>> 0;
    this.s2 = (this.s2 ^ t) >>> 0;
    this.s3 = rotl32(this.s3, 11);
    return result;
  }

  /**
   * Uniform double in [0, 1) with 53 random bits: the upper 27 bits of one output and the upper
   * 26 bits of the next, (a·2^26 + b) / 2^53 — the usual 53-bit construction (from memory, as in
   * Matsumoto & Nishimura's genrand_res53).
   */
  nextFloat64(): number {
    const a = this.nextUint32() >>> 5;
    const b = this.nextUint32() >>> 6;
    return (a * TWO_POW_26 + b) / TWO_POW_53;
  }
}
