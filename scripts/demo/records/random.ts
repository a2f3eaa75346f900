/**
 * A small seeded random source for the demo generator: the same seed gives the same numbers on any
 * JavaScript engine, so the invented bank is reproducible.
 */

/** mulberry32 (Tommy Ettinger, public domain): 32-bit state, uniform in [0, 1). */
function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export class Random {
  private readonly next: () => number;
  private spareNormal: number | null = null;

  constructor(seed: number) {
    this.next = mulberry32(seed);
  }

  uniform(lo = 0, hi = 1): number {
    return lo + (hi - lo) * this.next();
  }

  /** Normal variate by the Box–Muller transform (Box & Muller 1958), keeping the pair's second value. */
  normal(mean = 0, sd = 1): number {
    if (this.spareNormal !== null) {
      const z = this.spareNormal;
      this.spareNormal = null;
      return mean + sd * z;
    }
    const u1 = 1 - this.next();
    const u2 = this.next();
    const radius = Math.sqrt(-2 * Math.log(u1));
    this.spareNormal = radius * Math.sin(2 * Math.PI * u2);
    return mean + sd * radius * Math.cos(2 * Math.PI * u2);
  }

  /** Log-normal variate with the given median and standard deviation of ln x. */
  logNormal(median: number, sigmaLn: number): number {
    return median * Math.exp(this.normal(0, sigmaLn));
  }

  /** Integer in [lo, hi], both included. */
  int(lo: number, hi: number): number {
    return lo + Math.floor(this.next() * (hi - lo + 1));
  }

  chance(p: number): boolean {
    return this.next() < p;
  }

  pick<T>(items: readonly T[]): T {
    const item = items[Math.floor(this.next() * items.length)];
    if (item === undefined) throw new Error('Cannot pick from an empty list.');
    return item;
  }
}

export const clamp = (x: number, lo: number, hi: number): number => Math.min(hi, Math.max(lo, x));
export const round = (x: number, decimals: number): number => Math.round(x * 10 ** decimals) / 10 ** decimals;
export const significant = (x: number, digits: number): number => Number(x.toPrecision(digits));
