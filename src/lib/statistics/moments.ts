/**
 * Weighted mean and variance over runs of values sharing a weight, by two passes (mean first, then
 * squared deviations) for accuracy. The variance uses reliability weights,
 * s² = Σw(x − m)² / (V1 − V2/V1) with V1 = Σw and V2 = Σw², which is the usual n − 1 sample variance
 * when the weights are equal; the effective number of tests is Kish's V1²/V2 (Kish 1965, Survey
 * Sampling, Wiley — from memory).
 */
import type { WeightedRun } from './percentiles';

export interface Moments {
  count: number;
  mean: number;
  /** Sample variance; NaN for fewer than 2 values. */
  variance: number;
  /** Weighted mean of the squared values. */
  meanSquare: number;
  effectiveCount: number;
}

export function momentsOfRuns(runs: readonly WeightedRun[]): Moments {
  let count = 0;
  let v1 = 0;
  let v2 = 0;
  let sum = 0;
  for (const { values, weight } of runs) {
    let runSum = 0;
    for (let i = 0; i < values.length; i++) runSum += values[i] as number;
    count += values.length;
    sum += weight * runSum;
    v1 += weight * values.length;
    v2 += weight * weight * values.length;
  }
  const mean = sum / v1;
  let squares = 0;
  let raw = 0;
  for (const { values, weight } of runs) {
    let runSquares = 0;
    let runRaw = 0;
    for (let i = 0; i < values.length; i++) {
      const x = values[i] as number;
      const d = x - mean;
      runSquares += d * d;
      runRaw += x * x;
    }
    squares += weight * runSquares;
    raw += weight * runRaw;
  }
  const variance = count < 2 ? Number.NaN : squares / (v1 - v2 / v1);
  return { count, mean, variance, meanSquare: raw / v1, effectiveCount: (v1 * v1) / v2 };
}
