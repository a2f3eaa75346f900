import { Xoshiro128 } from '../../consolidation/random';

/** Seeded Gaussian measurement noise (Box & Muller 1958), reproducible for a given seed. */
export class MeasurementNoise {
  private readonly rng: Xoshiro128;
  private spare: number | null = null;

  constructor(seed: number) {
    this.rng = new Xoshiro128(seed);
  }

  /** A normal variate with mean 0 and the given standard deviation. */
  normal(sd: number): number {
    if (sd === 0) return 0;
    if (this.spare !== null) {
      const z = this.spare;
      this.spare = null;
      return sd * z;
    }
    const radius = Math.sqrt(-2 * Math.log(this.rng.nextUnit()));
    const angle = 2 * Math.PI * this.rng.nextUnit();
    this.spare = radius * Math.sin(angle);
    return sd * radius * Math.cos(angle);
  }

  uniform(lo: number, hi: number): number {
    return lo + (hi - lo) * this.rng.nextUnit();
  }
}
