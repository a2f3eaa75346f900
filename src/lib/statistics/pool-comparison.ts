import { quantileSorted } from 'simple-statistics';

/**
 * Where one value sits in a pool of values: the mid-rank percentile (ties count half), 0–100.
 * Returns null for an empty pool. Input must be sorted ascending.
 */
export function percentileRank(sortedPool: readonly number[], value: number): number | null {
  const n = sortedPool.length;
  if (n === 0 || !Number.isFinite(value)) return null;
  let below = 0;
  let equal = 0;
  for (const x of sortedPool) {
    if (x < value) below++;
    else if (x === value) equal++;
  }
  return (100 * (below + 0.5 * equal)) / n;
}

export interface Fences {
  lower: number;
  upper: number;
}

/**
 * Tukey's fences from the quartiles: Q1 − k·IQR and Q3 + k·IQR. k = 1.5 marks "outside", k = 3
 * "far out" (Tukey 1977, Exploratory Data Analysis). Quartiles by the linear-interpolation quantile
 * (Hyndman & Fan type 7). Null for fewer than 4 values.
 */
export function tukeyFences(sortedPool: readonly number[], k = 3): Fences | null {
  if (sortedPool.length < 4) return null;
  const q1 = quantileSorted(sortedPool as number[], 0.25);
  const q3 = quantileSorted(sortedPool as number[], 0.75);
  const iqr = q3 - q1;
  return { lower: q1 - k * iqr, upper: q3 + k * iqr };
}

export interface PoolComparison {
  percentile: number | null;
  outlier: 'low' | 'high' | null;
  poolSize: number;
}

/**
 * Compares a value with a pool; `logScale` for quantities that spread over orders of magnitude
 * (cv, k), where fences are taken on log10 values (common practice: cv and k are treated as
 * log-normal).
 */
export function compareWithPool(pool: readonly number[], value: number | null, logScale = false): PoolComparison | null {
  if (value === null || !Number.isFinite(value)) return null;
  const transform = (x: number) => (logScale ? Math.log10(x) : x);
  const usable = pool.filter((x) => Number.isFinite(x) && (!logScale || x > 0)).map(transform);
  if (logScale && value <= 0) return null;
  usable.sort((a, b) => a - b);
  const v = transform(value);
  const fences = tukeyFences(usable);
  const outlier = fences ? (v < fences.lower ? 'low' : v > fences.upper ? 'high' : null) : null;
  return { percentile: percentileRank(usable, v), outlier, poolSize: usable.length };
}
