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

  // source: Hadlock & Bickel (2017), Decision Analysis 14(1):35–64 — J-QPD-S passes through the
  // given 10th, 50th and 90th percentiles by construction; here checked against the definition of
  // a percentile (Q(Φ(∓1.2816)) = P10, P90, Q(Φ(0)) = P50), for every shape of triple.
  it.each([
    ['skewed to high values', 0.4, 0.5, 0.7, 'johnsonQpd'],
    ['skewed to low values', 700, 900, 1000, 'johnsonQpd'],
    ['nearly symmetric', 96, 100, 104.5, 'johnsonQpd'],
    ['very wide', 0.01, 1, 2, 'johnsonQpd'],
    ['symmetric in ln space', 1, 2, 4, 'lognormal'],
    ['tied P10 = P50', 0.5, 0.5, 0.7, 'twoPiece'],
    ['tied P50 = P90', 0.3, 0.5, 0.5, 'twoPiece'],
    ['P10 = 0 (a value that may be 0)', 0, 0.02, 0.05, 'twoPiece'],
  ] as const)('fits P10/P50/P90 %s through all three percentiles', (_, p10, p50, p90, kind) => {
    const d = fitPercentiles(p10, p50, p90);
    expect(d.kind).toBe(kind);
    expect(valueAtScore(d, -Z90)).toBeCloseTo(p10, 12);
    expect(valueAtScore(d, 0)).toBeCloseTo(p50, 12);
    expect(valueAtScore(d, Z90)).toBeCloseTo(p90, 12);
    expect(medianOf(d)).toBeCloseTo(p50, 12);
  });

  it.each([
    [0.4, 0.5, 0.7],
    [700, 900, 1000],
    [0.01, 1, 2],
    [0, 0.02, 0.05],
  ])('samples P10/P50/P90 %s, %s, %s with those percentiles (empirical CDF within 4 standard errors)', (p10, p50, p90) => {
    // source: sample fraction below a true p-quantile has sd √(p(1−p)/n) (binomial count, standard result).
    const n = 200_000;
    const values = sample({ type: 'p10p50p90', p10, p50, p90 }, n);
    const fractionBelow = (x: number) => values.filter((v) => v <= x).length / n;
    const bound = (p: number) => 4 * Math.sqrt((p * (1 - p)) / n);
    expect(Math.abs(fractionBelow(p10) - 0.1)).toBeLessThan(bound(0.1));
    expect(Math.abs(fractionBelow(p50) - 0.5)).toBeLessThan(bound(0.5));
    expect(Math.abs(fractionBelow(p90) - 0.9)).toBeLessThan(bound(0.9));
    expect(values.every((v) => v >= 0 && Number.isFinite(v))).toBe(true);
  });

  it('gives a smooth, increasing quantile function for a skewed triple (no kink at P50)', () => {
    const d = fitPercentiles(0.4, 0.5, 0.7);
    const zs = Array.from({ length: 801 }, (_, i) => -4 + i / 100);
    const q = zs.map((z) => valueAtScore(d, z));
    for (let i = 1; i < q.length; i++) expect(q[i] as number).toBeGreaterThan(q[i - 1] as number);
    // slope just below and just above z = 0 agree (the two-piece forms have a jump in slope there)
    const slope = (z: number) => (valueAtScore(d, z + 1e-6) - valueAtScore(d, z - 1e-6)) / 2e-6;
    expect(slope(-1e-4) / slope(1e-4)).toBeCloseTo(1, 3);
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
