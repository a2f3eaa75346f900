/**
 * Seeded pseudo-random numbers for reproducible Monte Carlo runs: the same seed always gives the
 * same sequence, on any JavaScript engine.
 */

/**
 * xoshiro128** (Blackman & Vigna 2018, "Scrambled linear pseudorandom number generators"),
 * 32-bit state words, period 2^128 − 1. Seeded from one 32-bit integer by a SplitMix32-style
 * hash so that nearby seeds give unrelated streams.
 */
export class Xoshiro128 {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(seed: number) {
    let state = seed >>> 0;
    const next = () => {
      state = (state + 0x9e3779b9) | 0;
      let z = state;
      z = Math.imul(z ^ (z >>> 16), 0x21f0aaad);
      z = Math.imul(z ^ (z >>> 15), 0x735a2d97);
      return (z ^ (z >>> 15)) >>> 0;
    };
    this.s0 = next();
    this.s1 = next();
    this.s2 = next();
    this.s3 = next();
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1;
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
