/**
 * Ordinary least squares for one straight line y = a + b·x, with r, R², the standard errors of slope
 * and intercept and the residual sd. Centred two-pass sums, and the residual sum of squares from the
 * residuals themselves, so that an ill-conditioned set such as NIST StRD Norris keeps 1e-9 accuracy.
 * Formulas: Draper & Smith (1998), Applied Regression Analysis, 3rd ed., ch. 1 (from memory):
 * b = Sxy/Sxx, a = ȳ − b·x̄, s² = SSE/(n − 2), se(b) = s/√Sxx, se(a) = s·√(1/n + x̄²/Sxx).
 */

/** Centred sums of a set of (x, y) pairs. */
export interface LineSums {
  n: number;
  xMean: number;
  yMean: number;
  sxx: number;
  syy: number;
  sxy: number;
  /** Residual sum of squares about the fitted line. */
  sse: number;
  /** Residual sum of squares behind the standard errors, when it differs from `sse` (masked fits). */
  estimationSse?: number;
}

export interface LinearFit {
  n: number;
  degreesOfFreedom: number;
  slope: number;
  intercept: number;
  slopeStandardError: number;
  interceptStandardError: number;
  /** s = √(SSE/(n − 2)): the scatter of observations about the line. */
  residualSd: number;
  /**
   * The sd behind the standard errors and the confidence band. Equals `residualSd` for a plain fit;
   * for a fit through masked values it also holds the masking noise, which makes the line itself
   * less certain even though the scatter of true values about it is smaller (regression-masked.ts).
   */
  estimationSd: number;
  r: number;
  rSquared: number;
  xMean: number;
  sxx: number;
}

/** The line through centred sums; null for fewer than 3 pairs or no spread in x. */
export function fitFromSums(sums: LineSums): LinearFit | null {
  const { n, xMean, yMean, sxx, syy, sxy } = sums;
  if (n < 3 || !(sxx > 0)) return null;
  const slope = sxy / sxx;
  const intercept = yMean - slope * xMean;
  const sse = Math.max(0, sums.sse);
  const residualSd = Math.sqrt(sse / (n - 2));
  const estimationSd = sums.estimationSse === undefined ? residualSd : Math.sqrt(Math.max(0, sums.estimationSse) / (n - 2));
  const r = syy > 0 ? Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy))) : 0;
  return {
    n,
    degreesOfFreedom: n - 2,
    slope,
    intercept,
    slopeStandardError: estimationSd / Math.sqrt(sxx),
    interceptStandardError: estimationSd * Math.sqrt(1 / n + (xMean * xMean) / sxx),
    residualSd,
    estimationSd,
    r,
    rSquared: syy > 0 ? 1 - sse / syy : 0,
    xMean,
    sxx,
  };
}

/** Centred sums of the first `count` pairs. */
export function lineSums(x: ArrayLike<number>, y: ArrayLike<number>, count = x.length): LineSums {
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < count; i++) {
    sx += x[i] as number;
    sy += y[i] as number;
  }
  const xMean = sx / count;
  const yMean = sy / count;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < count; i++) {
    const dx = (x[i] as number) - xMean;
    const dy = (y[i] as number) - yMean;
    sxx += dx * dx;
    syy += dy * dy;
    sxy += dx * dy;
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  let sse = 0;
  for (let i = 0; i < count; i++) {
    const e = (y[i] as number) - yMean - slope * ((x[i] as number) - xMean);
    sse += e * e;
  }
  return { n: count, xMean, yMean, sxx, syy, sxy, sse };
}

/** OLS of y on x over the first `count` pairs (all finite); null for fewer than 3 or no spread in x. */
export function fitLine(x: ArrayLike<number>, y: ArrayLike<number>, count = x.length): LinearFit | null {
  if (count < 3) return null;
  return fitFromSums(lineSums(x, y, count));
}
