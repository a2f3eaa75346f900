import { describe, expect, it } from 'vitest';
import { fillStandardNormals, Xoshiro128 } from '../../../src/lib/consolidation/random';

describe('seeded random numbers', () => {
  it('repeats a sequence for the same seed and differs for another seed', () => {
    const a = new Xoshiro128(42);
    const b = new Xoshiro128(42);
    const c = new Xoshiro128(43);
    const seqA = Array.from({ length: 20 }, () => a.nextUint32());
    const seqB = Array.from({ length: 20 }, () => b.nextUint32());
    const seqC = Array.from({ length: 20 }, () => c.nextUint32());
    expect(seqA).toEqual(seqB);
    expect(seqA).not.toEqual(seqC);
  });

  it('gives uniforms strictly inside (0, 1) with mean 1/2 and variance 1/12', () => {
    const rng = new Xoshiro128(1);
    const n = 200_000;
    let sum = 0;
    let sumSq = 0;
    let min = 1;
    let max = 0;
    for (let i = 0; i < n; i++) {
      const u = rng.nextUnit();
      sum += u;
      sumSq += u * u;
      min = Math.min(min, u);
      max = Math.max(max, u);
    }
    const mean = sum / n;
    expect(min).toBeGreaterThan(0);
    expect(max).toBeLessThan(1);
    expect(mean).toBeCloseTo(0.5, 2);
    expect(sumSq / n - mean * mean).toBeCloseTo(1 / 12, 3);
  });

  it('gives standard normals: mean 0, sd 1, 95 % within ±1.96', () => {
    const z = new Float64Array(200_001);
    fillStandardNormals(new Xoshiro128(9), z);
    const mean = z.reduce((s, v) => s + v, 0) / z.length;
    const sd = Math.sqrt(z.reduce((s, v) => s + (v - mean) ** 2, 0) / z.length);
    expect(mean).toBeCloseTo(0, 2);
    expect(sd).toBeCloseTo(1, 2);
    expect(z.filter((v) => Math.abs(v) < 1.96).length / z.length).toBeCloseTo(0.95, 2);
  });
});
