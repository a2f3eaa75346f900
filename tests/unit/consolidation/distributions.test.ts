import { describe, expect, it } from 'vitest';
import {
  distributionFromSpec,
  fitPercentiles,
  massBelowZero,
  medianOf,
  valueAtScore,
  Z90,
} from '../../../src/lib/consolidation/distributions';
import { fillStandardNormals, Xoshiro128 } from '../../../src/lib/consolidation/random';
import { normalCdf, normalQuantile } from '../../../src/lib/consolidation/special-functions';

function sample(spec: Parameters<typeof distributionFromSpec>[0], n = 200_000, seed = 7) {
  const d = distributionFromSpec(spec);
  const z = new Float64Array(n);
  fillStandardNormals(new Xoshiro128(seed), z);
  return Float64Array.from(z, (x) => valueAtScore(d, x));
}

function meanSd(values: Float64Array) {
  const mean = values.reduce((s, v) => s + v, 0) / values.length;
  const sd = Math.sqrt(values.reduce((s, v) => s + (v - mean) ** 2, 0) / (values.length - 1));
  return { mean, sd };
}

describe('parameter distributions', () => {
  it('log-normal specs keep the arithmetic mean and sd they were given', () => {
    // source: log-normal moments, σ² = ln(1 + s²/m²), μ = ln m − σ²/2 (standard result)
    const { mean, sd } = meanSd(sample({ type: 'lognormal', mean: 2, sd: 1.2 }));
    expect(mean).toBeCloseTo(2, 1);
    expect(sd / 1.2).toBeCloseTo(1, 1);
  });

  it('fits P10/P50/P90: roughly symmetric → normal with mean P50 and sd from the P10–P90 span', () => {
    const d = fitPercentiles(96, 100, 104.5);
    expect(d.kind).toBe('normal');
    expect(valueAtScore(d, -Z90)).toBeCloseTo(95.75, 12);
    expect(valueAtScore(d, 0)).toBeCloseTo(100, 12);
    expect(valueAtScore(d, Z90)).toBeCloseTo(104.25, 12);
  });

  it('fits P10/P50/P90: skewed to high values → log-normal with median P50 and the P10–P90 log spread', () => {
    const d = fitPercentiles(1, 2, 4);
    expect(d.kind).toBe('lognormal');
    expect(valueAtScore(d, -Z90)).toBeCloseTo(1, 12);
    expect(medianOf(d)).toBeCloseTo(2, 12);
    expect(valueAtScore(d, Z90)).toBeCloseTo(4, 12);
  });

  it('fits P10/P50/P90: skewed to low values → split normal through all three', () => {
    const d = fitPercentiles(700, 900, 1000);
    expect(d.kind).toBe('splitNormal');
    expect(valueAtScore(d, -Z90)).toBeCloseTo(700, 9);
    expect(valueAtScore(d, 0)).toBeCloseTo(900, 12);
    expect(valueAtScore(d, Z90)).toBeCloseTo(1000, 9);
  });

  it('gives the triangular median and CDF', () => {
    // source: triangular distribution, median = b − √((b − a)(b − c)/2) when c < (a + b)/2 (standard result, from memory)
    const d = distributionFromSpec({ type: 'triangular', min: 0, mode: 1, max: 4 });
    expect(medianOf(d)).toBeCloseTo(4 - Math.sqrt(6), 12);
    const values = sample({ type: 'triangular', min: 0, mode: 1, max: 4 });
    expect(values.filter((v) => v < 1).length / values.length).toBeCloseTo(0.25, 2);
    expect(values.reduce((m, v) => Math.min(m, v), Number.POSITIVE_INFINITY)).toBeGreaterThanOrEqual(0);
    expect(values.reduce((m, v) => Math.max(m, v), 0)).toBeLessThanOrEqual(4);
  });

  it('truncates a normal distribution at zero and reports the mass removed', () => {
    const d = distributionFromSpec({ type: 'normal', mean: 1, sd: 1 });
    expect(massBelowZero(d)).toBeCloseTo(normalCdf(-1), 12);
    const values = sample({ type: 'normal', mean: 1, sd: 1 });
    expect(values.reduce((m, v) => Math.min(m, v), Number.POSITIVE_INFINITY)).toBeGreaterThan(0);
    const f0 = normalCdf(-1);
    expect(medianOf(d)).toBeCloseTo(1 + normalQuantile(f0 + 0.5 * (1 - f0)), 12);
  });

  it('turns zero-spread specs into constants', () => {
    for (const spec of [
      { type: 'normal', mean: 3, sd: 0 },
      { type: 'lognormal', mean: 3, sd: 0 },
      { type: 'triangular', min: 3, mode: 3, max: 3 },
      { type: 'p10p50p90', p10: 3, p50: 3, p90: 3 },
    ] as const) {
      expect(distributionFromSpec(spec)).toEqual({ kind: 'constant', value: 3 });
    }
  });
});

describe('standard normal functions', () => {
  it('match published values', () => {
    // source: Abramowitz & Stegun (1964) Table 7.1 / 26.1 (from memory): erfc-based Φ(1.96) = 0.9750021, z0.9 = 1.2815516
    expect(normalCdf(1.96)).toBeCloseTo(0.9750021, 7);
    expect(normalQuantile(0.9)).toBeCloseTo(1.2815516, 7);
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(normalCdf(-6.5))).toBeCloseTo(-6.5, 9);
  });
});
