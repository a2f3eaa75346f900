/**
 * Parameter distributions and the map from a standard normal score z to a parameter value, so
 * that every distribution can be sampled through one (possibly correlated) normal score — a
 * Gaussian copula. All parameters the engine samples are non-negative, so a normal distribution
 * given by mean and sd is truncated at 0. P10/P50/P90 triples are fitted in `percentile-fit.ts`
 * by forms that pass through all three percentiles.
 */
import type { ParameterSpec } from './engine-input';
import { fitPercentiles, type PercentileFit, percentileFitAtScore } from './percentile-fit';
import { normalCdf, normalQuantile } from './special-functions';

export { fitPercentiles, Z90 } from './percentile-fit';

export type Distribution =
  | PercentileFit
  | { kind: 'normal'; mean: number; sd: number }
  | { kind: 'lognormal'; mu: number; sigma: number; fitted: boolean }
  | { kind: 'triangular'; min: number; mode: number; max: number };

/**
 * Turns a parameter spec into a distribution. Log-normal specs give the arithmetic mean m and
 * sd s of the value: σ² = ln(1 + s²/m²), μ = ln m − σ²/2 (standard moments of the log-normal).
 */
export function distributionFromSpec(spec: ParameterSpec): Distribution {
  if (typeof spec === 'number') return { kind: 'constant', value: spec };
  switch (spec.type) {
    case 'normal':
      return spec.sd === 0 ? { kind: 'constant', value: spec.mean } : { kind: 'normal', mean: spec.mean, sd: spec.sd };
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

/**
 * Probability mass a normal distribution puts below 0 (removed by truncation); 0 otherwise (a
 * P10/P50/P90 fit with P10 = 0 holds its lowest tenth at 0 rather than removing it).
 */
export function massBelowZero(d: Distribution): number {
  return d.kind === 'normal' ? normalCdf(-d.mean / d.sd) : 0;
}

/**
 * Value of the distribution at standard normal score z (Gaussian copula): for a normal,
 * mean + sd·z (truncated at 0, see `truncatedAtZero`); log-normal exp(μ + σz); triangular by its
 * inverse CDF at Φ(z); a P10/P50/P90 fit by its quantile function at Φ(z). z = 0 gives the median.
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
      return truncatedAtZero(d.mean, d.sd, z);
    case 'johnsonQpd':
    case 'twoPiece':
      return percentileFitAtScore(d, z);
  }
}

/**
 * Truncation at 0 by renormalising the CDF. When less than 1e-6 of the mass lies below 0 the
 * untruncated value is used wherever it is positive (the two differ by under 1e-6 in
 * probability), which avoids a quantile evaluation per sample.
 */
function truncatedAtZero(mean: number, sd: number, z: number): number {
  const plain = mean + sd * z;
  if (mean - 4.75 * sd > 0 && plain > 0) return plain;
  const lowMass = normalCdf(-mean / sd);
  if (lowMass < 1e-6 && plain > 0) return plain;
  return mean + sd * normalQuantile(lowMass + normalCdf(z) * (1 - lowMass));
}

/** Median of the (truncated) distribution: the value used by the deterministic run. */
export function medianOf(d: Distribution): number {
  return valueAtScore(d, 0);
}

/** Median of a parameter spec. */
export function specMedian(spec: ParameterSpec): number {
  return medianOf(distributionFromSpec(spec));
}

/** Plain description for the result's list of sampled parameters, e.g. "log-normal through P10/P50/P90". */
export function describeDistribution(d: Distribution): string {
  switch (d.kind) {
    case 'constant':
      return 'fixed value';
    case 'normal':
      return 'normal';
    case 'lognormal':
      return d.fitted ? 'log-normal through P10/P50/P90' : 'log-normal';
    case 'triangular':
      return 'triangular';
    case 'johnsonQpd':
      return 'Johnson quantile-parameterized (J-QPD-S) through P10/P50/P90';
    case 'twoPiece':
      return d.log ? 'two-piece log-normal through P10/P50/P90' : 'two-piece normal through P10/P50/P90, 0 below P10';
  }
}
