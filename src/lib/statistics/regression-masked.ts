/**
 * A straight-line fit through masked values (masking.ts), corrected for the masking noise by the
 * method of moments for errors in variables (Fuller 1987, Measurement Error Models, Wiley, §1.1–1.2,
 * from memory): noise with known variance σᵢ² in x inflates Sxx by about (1 − 1/n)·Σσᵢ² and flattens
 * the slope; noise in y inflates Syy and the residual sd. The corrected sums are
 * Sxx* = Sxx − (1 − 1/n)Σσx², Syy* = Syy − (1 − 1/n)Σσy², Sxy unchanged (the two noises are
 * independent), and the line is fitted to them. R², r and the residual sd describe the true scatter
 * (corrected sums); the standard errors and the confidence band use the scatter of the masked points
 * about the corrected line, since the masking noise does make the line less certain (an approximation
 * of Fuller's variance that is close while the reliability Sxx* ÷ Sxx is high). Below a reliability of 0.5 the correction is unstable
 * and the plain fit is returned, flagged.
 */
import { fitFromSums, type LinearFit, lineSums } from './regression';

/** Noise the masking adds to one axis as plotted. */
export type AxisNoise =
  /** Unmasked (depth). */
  | { kind: 'none' }
  /** A masked value on a linear axis: variance Var(F)·x² per point, zero mean. */
  | { kind: 'relative'; factorVariance: number }
  /** A masked value on a log10 axis: the same mean and variance at every point. */
  | { kind: 'additive'; mean: number; variance: number };

export interface MaskedFit {
  fit: LinearFit;
  /** Sxx* ÷ Sxx: the share of the x spread that is not masking noise. */
  reliability: number;
  /** False when the reliability was too low to correct and `fit` is the plain fit of masked values. */
  corrected: boolean;
}

export const MIN_RELIABILITY = 0.5;

function noiseTotal(values: ArrayLike<number>, count: number, noise: AxisNoise): number {
  if (noise.kind === 'none') return 0;
  if (noise.kind === 'additive') return count * noise.variance;
  let squares = 0;
  for (let i = 0; i < count; i++) squares += (values[i] as number) ** 2;
  return (noise.factorVariance / (1 + noise.factorVariance)) * squares;
}

const meanShift = (noise: AxisNoise) => (noise.kind === 'additive' ? noise.mean : 0);

/** Fit of masked y on masked x (first `count` pairs, already on the plotted axes). */
export function fitMaskedLine(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  count: number,
  xNoise: AxisNoise,
  yNoise: AxisNoise,
): MaskedFit | null {
  if (count < 3) return null;
  const sums = lineSums(x, y, count);
  const plain = fitFromSums(sums);
  if (!plain) return null;
  const keep = 1 - 1 / count;
  const sxx = sums.sxx - keep * noiseTotal(x, count, xNoise);
  const reliability = sxx / sums.sxx;
  if (!(reliability >= MIN_RELIABILITY)) return { fit: plain, reliability, corrected: false };
  const syy = Math.max(0, sums.syy - keep * noiseTotal(y, count, yNoise));
  const slope = sums.sxy / sxx;
  const fit = fitFromSums({
    n: count,
    xMean: sums.xMean - meanShift(xNoise),
    yMean: sums.yMean - meanShift(yNoise),
    sxx,
    syy,
    sxy: sums.sxy,
    sse: syy - slope * sums.sxy,
    estimationSse: sums.syy - 2 * slope * sums.sxy + slope * slope * sums.sxx,
  });
  return fit ? { fit, reliability, corrected: true } : null;
}
