/**
 * Seeded pseudo-random numbers for reproducible Monte Carlo runs: the same seed always gives the
 * same sequence, on any JavaScript engine.
 */

const MASK_32 = 0xffffffffn;

/**
 * SplitMix64 (Steele, Lea & Flood 2014, "Fast splittable pseudorandom number generators"), as in
 * Vigna's reference splitmix64.c: a 64-bit counter stepped by 0x9e3779b97f4a7c15 and mixed. The
 * xoshiro authors recommend it for filling a xoshiro state from a seed. BigInt keeps the 64-bit
 * arithmetic exact; it runs only while seeding.
 */
export function splitMix64(seed: bigint): () => bigint {
  let state = BigInt.asUintN(64, seed);
  return () => {
    state = BigInt.asUintN(64, state + 0x9e3779b97f4a7c15n);
    let z = state;
    z = BigInt.asUintN(64, (z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n);
    z = BigInt.asUintN(64, (z ^ (z >> 27n)) * 0x94d049bb133111ebn);
    return z ^ (z >> 31n);
  };
}

/**
 * xoshiro128** 1.1 (Blackman & Vigna, "Scrambled linear pseudorandom number generators", ACM
 * TOMS 2021; reference C at prng.di.unimi.it), 32-bit state words, period 2^128 − 1. A seed fills
 * the state with two SplitMix64 outputs, low word first, so that nearby seeds give unrelated
 * streams.
 */
export class Xoshiro128 {
  private s0 = 0;
  private s1 = 0;
  private s2 = 0;
  private s3 = 0;

  /** Seed: an integer 0 … 2^32 − 1 (other numbers are taken modulo 2^32). */
  constructor(seed: number) {
    const next = splitMix64(BigInt(seed >>> 0));
    const a = next();
    const b = next();
    // SplitMix64 is a bijection of its counter, so two successive outputs are never both zero.
    this.setState([Number(a & MASK_32), Number(a >> 32n), Number(b & MASK_32), Number(b >> 32n)]);
  }

  /** A generator started from the given state words (not all zero), as the reference code's `s`. */
  static fromState(state: readonly [number, number, number, number]): Xoshiro128 {
    const rng = new Xoshiro128(0);
    rng.setState(state);
    return rng;
  }

  private setState([s0, s1, s2, s3]: readonly [number, number, number, number]): void {
    if ((s0 | s1 | s2 | s3) >>> 0 === 0) throw new RangeError('A xoshiro128** state must not be all zero.');
    this.s0 = s0 | 0;
    this.s1 = s1 | 0;
    this.s2 = s2 | 0;
    this.s3 = s3 | 0;
  }

  /** Next unsigned 32-bit integer. */
  nextUint32(): number {
    const s1 = this.s1;
    const x = Math.imul(s1, 5);
    const result = Math.imul((x << 7) | (x >>> 25), 9) >>> 0;
    const t = s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = (this.s3 << 11) | (this.s3 >>> 21);
    return result;
  }

  /** Uniform number strictly inside (0, 1), resolution 2^−32. */
  nextUnit(): number {
    return (this.nextUint32() + 0.5) / 4294967296;
  }
}

/**
 * Fills `out` with independent standard normal variates by the Box–Muller transform (Box &
 * Muller 1958), using both outputs of each pair.
 */
export function fillStandardNormals(rng: Xoshiro128, out: Float64Array): void {
  const n = out.length;
  let i = 0;
  while (i < n) {
    const radius = Math.sqrt(-2 * Math.log(rng.nextUnit()));
    const angle = 2 * Math.PI * rng.nextUnit();
    out[i++] = radius * Math.cos(angle);
    if (i < n) out[i++] = radius * Math.sin(angle);
  }
}
