import { describe, expect, it } from 'vitest';
import { compareWithPool, percentileRank, tukeyFences } from '../../../src/lib/statistics/pool-comparison';

describe('percentile rank (mid-rank definition)', () => {
  // source: Crocker (1969) / common statistics texts — percentile rank = (B + 0.5·E)/N × 100
  it.each([
    [[1, 2, 3, 4], 2.5, 50],
    [[1, 2, 3, 4], 1, 12.5],
    [[1, 2, 3, 4], 4, 87.5],
    [[1, 2, 3, 4], 10, 100],
    [[1, 2, 3, 4], 0, 0],
    [[5, 5, 5, 5], 5, 50],
  ])('pool %j, value %d → %d', (pool, value, expected) => {
    expect(percentileRank(pool, value)).toBeCloseTo(expected, 10);
  });

  it('is null for an empty pool', () => {
    expect(percentileRank([], 1)).toBeNull();
  });
});

describe("Tukey's fences", () => {
  // source: Hyndman & Fan (1996) type 7 quartiles, as R's quantile() default: for 1..9, Q1 = 3, Q3 = 7
  it('uses type-7 quartiles: 1..9 gives Q1 3, Q3 7, IQR 4, far-out fences −9 and 19', () => {
    expect(tukeyFences([1, 2, 3, 4, 5, 6, 7, 8, 9], 3)).toEqual({ lower: -9, upper: 19 });
    expect(tukeyFences([1, 2, 3, 4, 5, 6, 7, 8, 9], 1.5)).toEqual({ lower: -3, upper: 13 });
  });

  it('needs at least four values', () => {
    expect(tukeyFences([1, 2, 3])).toBeNull();
  });
});

describe('comparison with a deposit pool', () => {
  const ccPool = [0.6, 0.7, 0.75, 0.8, 0.85, 0.9, 0.95, 1.0, 1.1, 1.2];
  it('flags a Cc far above the pool as a high outlier', () => {
    expect(compareWithPool(ccPool, 4.5)).toMatchObject({ outlier: 'high', percentile: 100, poolSize: 10 });
  });

  it('leaves a typical value alone', () => {
    expect(compareWithPool(ccPool, 0.88)).toMatchObject({ outlier: null });
  });

  it('judges cv on a log scale: 20× the median is far out, 3× is not', () => {
    // common practice: cv is log-normally distributed
    const cvPool = [0.5, 0.7, 0.9, 1.0, 1.1, 1.3, 1.6, 2.0, 2.5, 3.0];
    expect(compareWithPool(cvPool, 25, true)?.outlier).toBe('high');
    expect(compareWithPool(cvPool, 3.3, true)?.outlier).toBeNull();
  });

  it('returns null for a missing value', () => {
    expect(compareWithPool(ccPool, null)).toBeNull();
  });
});
