/**
 * Parameter distributions and the map from a standard normal score z to a parameter value, so
 * that every distribution can be sampled through one (possibly correlated) normal score — a
 * Gaussian copula. All parameters the engine samples are non-negative, so normal and split-normal
 * distributions are truncated at 0.
 */
import type { ParameterSpec } from './engine-input';
import { normalCdf, normalQuantile } from './special-functions';

export type Distribution =
  | { kind: 'constant'; value: number }
  | { kind: 'normal'; mean: number; sd: number; fitted: boolean }
  | { kind: 'lognormal'; mu: number; sigma: number; fitted: boolean }
  | { kind: 'triangular'; min: number; mode: number; max: number }
  | { kind: 'splitNormal'; median: number; sdLow: number; sdHigh: number };

/** z of the 90th percentile of the standard normal distribution. */
export const Z90 = 1.2815515655446004;

/**
 * Fits a distribution to the bank's P10/P50/P90 (all ≥ 0, P10 ≤ P50 ≤ P90):
 * - equal: a constant;
 * - roughly symmetric, 0.8 ≤ (P90 − P50)/(P50 − P10) ≤ 1.25: normal, mean P50,
 *   sd = (P90 − P10)/(2·1.2816);
 * - skewed to high values (ratio > 1.25) with P10 > 0: log-normal with median P50 and
 *   σ(ln) = ln(P90/P10)/(2·1.2816) — it honours P50 and the P10–P90 spread in log space;
 * - otherwise (skewed to low values, or P10 = 0): split normal with sd below and above P50 set
 *   from P10 and P90, which honours all three percentiles.
 * The 0.8–1.25 band and the choice of fits are ours (common practice for bank statistics: cv and
 * k log-normal, e.g. the product's statistics pages).
 */
export function fitPercentiles(p10: number, p50: number, p90: number): Distribution {
  if (p10 === p90) return { kind: 'constant', value: p50 };
  const below = p50 - p10;
  const above = p90 - p50;
  const ratio = below > 0 ? above / below : Number.POSITIVE_INFINITY;
  if (ratio >= 0.8 && ratio <= 1.25) return { kind: 'normal', mean: p50, sd: (p90 - p10) / (2 * Z90), fitted: true };
  if (ratio > 1.25 && p10 > 0) {
    return { kind: 'lognormal', mu: Math.log(p50), sigma: Math.log(p90 / p10) / (2 * Z90), fitted: true };
  }
  return { kind: 'splitNormal', median: p50, sdLow: below / Z90, sdHigh: above / Z90 };
}

/**
 * Turns a parameter spec into a distribution. Log-normal specs give the arithmetic mean m and
 * sd s of the value: σ² = ln(1 + s²/m²), μ = ln m − σ²/2 (standard moments of the log-normal).
 */
export function distributionFromSpec(spec: ParameterSpec): Distribution {
  if (typeof spec === 'number') return { kind: 'constant', value: spec };
  switch (spec.type) {
    case 'normal':
      return spec.sd === 0
        ? { kind: 'constant', value: spec.mean }
        : { kind: 'normal', mean: spec.mean, sd: spec.sd, fitted: false };
    case 'lognormal': {
      if (spec.sd === 0) return { kind: 'constant', value: spec.mean };
      const sigma2 = Math.log(1 + (spec.sd * spec.sd) / (spec.mean * spec.mean));
      return { kind: 'lognormal', mu: Math.log(spec.mean) - sigma2 / 2, sigma: Math.sqrt(sigma2), fitted: false };
    }
    case 'triangular':
      return spec.min === spec.max ? { kind: 'constant', value: spec.mode } : { kind: 'triangular', ...spec };
    case 'p10p50p90':
      return fitPercentiles(spec.p10, spec.p50, spec.p90);
  }
}

/** True when the distribution has any spread. */
export function hasSpread(d: Distribution): boolean {
  return d.kind !== 'constant';
}

/** Probability mass a normal or split normal puts below 0 (removed by truncation); 0 otherwise. */
export function massBelowZero(d: Distribution): number {
  if (d.kind === 'normal') return normalCdf(-d.mean / d.sd);
  if (d.kind === 'splitNormal') return normalCdf(-d.median / d.sdLow);
  return 0;
}

/**
 * Value of the distribution at standard normal score z (Gaussian copula): for a normal,
 * mean + sd·z (truncated at 0, see `truncatedAtZero`);
 * log-normal exp(μ + σz); triangular by its inverse CDF at Φ(z); split normal median + sd·z with
 * the sd of the side. z = 0 gives the median.
 */
export function valueAtScore(d: Distribution, z: number): number {
  switch (d.kind) {
    case 'constant':
      return d.value;
    case 'lognormal':
      return Math.exp(d.mu + d.sigma * z);
    case 'triangular': {
      const p = normalCdf(z);
      const span = d.max - d.min;
      const split = (d.mode - d.min) / span;
      return p < split ? d.min + Math.sqrt(p * span * (d.mode - d.min)) : d.max - Math.sqrt((1 - p) * span * (d.max - d.mode));
    }
    case 'normal':
      return truncatedAtZero(d.mean, d.sd, d.sd, z);
    case 'splitNormal':
      return truncatedAtZero(d.median, d.sdLow, d.sdHigh, z);
  }
}

/**
 * Truncation at 0 by renormalising the CDF. When less than 1e-6 of the mass lies below 0 the
 * untruncated value is used wherever it is positive (the two differ by under 1e-6 in
 * probability), which avoids a quantile evaluation per sample.
 */
function truncatedAtZero(median: number, sdLow: number, sdHigh: number, z: number): number {
  const plain = median + (z < 0 ? sdLow : sdHigh) * z;
  if (median - 4.75 * sdLow > 0 && plain > 0) return plain;
  const lowMass = sdLow > 0 ? normalCdf(-median / sdLow) : 0;
  if (lowMass < 1e-6 && plain > 0) return plain;
  // Split-normal CDF: F(x) = Φ((x − m)/sdLow) below m scaled so both halves hold half the mass.
  const p = lowMass + normalCdf(z) * (1 - lowMass);
  const zz = normalQuantile(p);
  return median + (zz < 0 ? sdLow : sdHigh) * zz;
}

/** Median of the (truncated) distribution: the value used by the deterministic run. */
export function medianOf(d: Distribution): number {
  return valueAtScore(d, 0);
}

/** Median of a parameter spec. */
export function specMedian(spec: ParameterSpec): number {
  return medianOf(distributionFromSpec(spec));
}

/** Plain description for the result's methods list, e.g. "log-normal fitted to P10/P50/P90". */
export function describeDistribution(d: Distribution): string {
  switch (d.kind) {
    case 'constant':
      return 'fixed value';
    case 'normal':
      return d.fitted ? 'normal fitted to P10/P50/P90' : 'normal';
    case 'lognormal':
      return d.fitted ? 'log-normal fitted to P10/P50/P90' : 'log-normal';
    case 'triangular':
      return 'triangular';
    case 'splitNormal':
      return 'split normal fitted to P10/P50/P90';
  }
}
