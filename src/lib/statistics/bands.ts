/**
 * Confidence band of the mean response and prediction band of a new observation about a fitted line,
 * ŷ ± t(1 − α/2, n − 2)·s·√(1/n + (x − x̄)²/Sxx) and ŷ ± t·s·√(1 + 1/n + (x − x̄)²/Sxx). Source:
 * Draper & Smith (1998), Applied Regression Analysis, 3rd ed., §1.4 (from memory). For a fit through
 * masked values the line's uncertainty uses the estimation sd s_e and the scatter of a new true value
 * the residual sd s: ŷ ± t·s_e·√h and ŷ ± t·√(s² + s_e²·h), h = 1/n + (x − x̄)²/Sxx; both reduce to the
 * formulas above when s_e = s.
 */
import type { LinearFit } from './regression';
import { twoSidedT } from './student-t';

export interface BandPoint {
  x: number;
  fit: number;
  confidenceLow: number;
  confidenceHigh: number;
  predictionLow: number;
  predictionHigh: number;
}

/** Band points at each x (on the fit's own axes), for a band `level` such as 0.9. */
export function regressionBands(fit: LinearFit, xs: readonly number[], level = 0.9): BandPoint[] {
  const t = twoSidedT(level, fit.degreesOfFreedom);
  return xs.map((x) => {
    const y = fit.intercept + fit.slope * x;
    const leverage = 1 / fit.n + (x - fit.xMean) ** 2 / fit.sxx;
    const confidence = t * fit.estimationSd * Math.sqrt(leverage);
    const prediction = t * Math.sqrt(fit.residualSd ** 2 + fit.estimationSd ** 2 * leverage);
    return {
      x,
      fit: y,
      confidenceLow: y - confidence,
      confidenceHigh: y + confidence,
      predictionLow: y - prediction,
      predictionHigh: y + prediction,
    };
  });
}
