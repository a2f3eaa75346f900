/**
 * The figures of one distribution (a card): n, mean, sd, coefficient of variation, P5–P95, and for cv
 * and k the log-normal fit. Percentiles are type 7 (percentiles.ts); for log parameters they are taken
 * on natural logarithms and interpolated there (geometrically).
 *
 * Masked values (masking.ts) carry known extra variance σu²: Var(ln F) on logarithms, and
 * Var(F)/(1 + Var(F))·mean(x̃²) on linear values (an unbiased estimate of Var(F)·mean(x²)). The sd is
 * corrected by the method of moments, s = √(s̃² − σu²) (0 if negative), and the percentiles are pulled
 * towards the mean by the same ratio, P = m + (s/s̃)(P̃ − m) — exact for a normal distribution of the
 * values (logarithms for cv and k), a close approximation otherwise.
 */
import { normalQuantile } from '../consolidation/special-functions';
import { momentsOfRuns } from './moments';
import { percentilesBySelection } from './order-statistics';
import type { ParameterScale } from './parameters';
import { type WeightedRun, weightedPercentilesOfRuns } from './percentiles';

export interface LogNormalFit {
  /** exp of the mean natural logarithm. */
  geometricMean: number;
  /** sd of the natural logarithms (null below 2 tests). */
  lnSd: number | null;
  /** sd of the base-10 logarithms (null below 2 tests). */
  log10Sd: number | null;
  /** Percentiles of the fitted log-normal, exp(μ + zσ) (null below 2 tests). */
  fittedP10: number | null;
  fittedP50: number;
  fittedP90: number | null;
}

export interface DistributionFigures {
  /** Tests behind the figures. */
  n: number;
  firms: number;
  /** Kish's effective number of tests (equals n without weighting). */
  nEffective: number;
  /** For cv and k: the mean of the fitted log-normal, exp(μ + σ²/2). */
  mean: number;
  /** Null below 2 tests. For cv and k: the fitted log-normal's sd. */
  sd: number | null;
  coefficientOfVariation: number | null;
  p5: number;
  p10: number;
  p50: number;
  p90: number;
  p95: number;
  logNormal: LogNormalFit | null;
}

/** Masking noise to remove: on logarithms a constant mean and variance, on linear values a variance ratio. */
export type NoiseCorrection =
  | { kind: 'none' }
  | { kind: 'log'; lnMean: number; lnVariance: number }
  | { kind: 'linear'; factorVariance: number };

const PROBABILITIES = [0.05, 0.1, 0.5, 0.9, 0.95] as const;
const Z90 = normalQuantile(0.9);

/**
 * Figures from runs of values (natural logarithms for log parameters), ≥ 1 value in all, which it
 * reorders. `weighted` says whether run weights differ (one run otherwise).
 */
export function figuresFromRuns(
  runs: readonly WeightedRun[],
  scale: ParameterScale,
  firms: number,
  weighted: boolean,
  noise: NoiseCorrection,
): DistributionFigures {
  const moments = momentsOfRuns(runs);
  const raw = weighted
    ? weightedPercentilesOfRuns(
        runs.map((r) => ({ values: r.values.sort(), weight: r.weight })),
        PROBABILITIES,
      )
    : percentilesBySelection((runs[0] as WeightedRun).values, PROBABILITIES);
  let noiseVariance = 0;
  let centre = moments.mean;
  if (noise.kind === 'log') {
    noiseVariance = noise.lnVariance;
    centre -= noise.lnMean;
  } else if (noise.kind === 'linear') {
    noiseVariance = (noise.factorVariance / (1 + noise.factorVariance)) * moments.meanSquare;
  }
  const hasSpread = moments.count >= 2;
  const variance = hasSpread ? Math.max(0, moments.variance - noiseVariance) : Number.NaN;
  const shrink = hasSpread && moments.variance > 0 ? Math.sqrt(variance / moments.variance) : 1;
  const [p5, p10, p50, p90, p95] = raw.map((p) => centre + shrink * (p - moments.mean)) as [
    number,
    number,
    number,
    number,
    number,
  ];
  const base = { n: moments.count, firms, nEffective: moments.effectiveCount };
  if (scale === 'linear') {
    const sd = hasSpread ? Math.sqrt(variance) : null;
    const mean = centre;
    return {
      ...base,
      mean,
      sd,
      coefficientOfVariation: sd === null || mean === 0 ? null : sd / Math.abs(mean),
      p5,
      p10,
      p50,
      p90,
      p95,
      logNormal: null,
    };
  }
  const mu = centre;
  const sigma = hasSpread ? Math.sqrt(variance) : null;
  const spreadFactor = sigma === null ? null : Math.sqrt(Math.expm1(sigma * sigma));
  const mean = Math.exp(mu + (sigma ?? 0) ** 2 / 2);
  return {
    ...base,
    mean,
    sd: spreadFactor === null ? null : mean * spreadFactor,
    coefficientOfVariation: spreadFactor,
    p5: Math.exp(p5),
    p10: Math.exp(p10),
    p50: Math.exp(p50),
    p90: Math.exp(p90),
    p95: Math.exp(p95),
    logNormal: {
      geometricMean: Math.exp(mu),
      lnSd: sigma,
      log10Sd: sigma === null ? null : sigma / Math.LN10,
      fittedP10: sigma === null ? null : Math.exp(mu - Z90 * sigma),
      fittedP50: Math.exp(mu),
      fittedP90: sigma === null ? null : Math.exp(mu + Z90 * sigma),
    },
  };
}
