/**
 * A distribution through a parameter's P10, P50 and P90, so that the ranges given are the ranges
 * sampled: every form here has exactly those three percentiles.
 *
 * Main form: the semi-bounded Johnson quantile-parameterized distribution J-QPD-S (Hadlock &
 * Bickel 2017, "Johnson Quantile-Parameterized Distributions", Decision Analysis 14(1):35–64),
 * with lower bound 0 and α = 0.1:
 *   c = Φ⁻¹(0.9); L, B, H = ln P10, ln P50, ln P90; n = sgn(L + H − 2B);
 *   θ = P10, P50 or P90 for n = 1, 0, −1;
 *   δ = sinh(arccosh((H − L) / (2·min(B − L, H − B)))) / c;  κ = min(B − L, H − B) / (δ·c);
 *   Q(p) = θ·exp(κ·sinh(asinh(δ·Φ⁻¹(p)) + asinh(n·c·δ))).
 * It is smooth, always positive and defined for every strictly ordered triple with P10 > 0.
 * Where it is not defined the fit falls back to forms that still pass through all three points:
 * - ln P50 − ln P10 = ln P90 − ln P50 (n = 0, the limit δ → 0): log-normal, median P50,
 *   σ = (H − B)/c;
 * - a tie (P10 = P50 or P50 = P90) with P10 > 0: two-piece normal in ln space, median P50 and
 *   σ = (B − L)/c below, (H − B)/c above (each half holds half the probability);
 * - P10 = 0 (only for quantities that may be 0): two-piece normal in linear space, sd = P50/c
 *   below and (P90 − P50)/c above, held at 0 where it would go negative — the 10 % of values at
 *   or below P10 = 0 are exactly 0.
 */
/** z of the 90th percentile of the standard normal distribution, Φ⁻¹(0.9). */
export const Z90 = 1.2815515655446004;

export type PercentileFit =
  | { kind: 'constant'; value: number }
  | { kind: 'lognormal'; mu: number; sigma: number; fitted: true }
  | { kind: 'johnsonQpd'; theta: number; kappa: number; delta: number; shift: number }
  | { kind: 'twoPiece'; median: number; sdLow: number; sdHigh: number; log: boolean };

/** Relative size of (L + H − 2B) below which the triple is taken as log-symmetric. */
const LOG_SYMMETRY_TOLERANCE = 1e-9;

/** Fits P10 ≤ P50 ≤ P90 (all ≥ 0). */
export function fitPercentiles(p10: number, p50: number, p90: number): PercentileFit {
  if (p10 === p90) return { kind: 'constant', value: p50 };
  if (p10 === 0) return { kind: 'twoPiece', median: p50, sdLow: p50 / Z90, sdHigh: (p90 - p50) / Z90, log: false };
  const L = Math.log(p10);
  const B = Math.log(p50);
  const H = Math.log(p90);
  const below = B - L;
  const above = H - B;
  if (below === 0 || above === 0) return { kind: 'twoPiece', median: p50, sdLow: below / Z90, sdHigh: above / Z90, log: true };
  const skew = L + H - 2 * B;
  if (Math.abs(skew) <= LOG_SYMMETRY_TOLERANCE * (H - L)) return { kind: 'lognormal', mu: B, sigma: above / Z90, fitted: true };
  const n = Math.sign(skew);
  const narrow = Math.min(below, above);
  const delta = Math.sinh(Math.acosh((H - L) / (2 * narrow))) / Z90;
  return {
    kind: 'johnsonQpd',
    theta: n > 0 ? p10 : p90,
    kappa: narrow / (delta * Z90),
    delta,
    shift: Math.asinh(n * Z90 * delta),
  };
}

/** Value of a percentile fit at standard normal score z, i.e. Q(Φ(z)). */
export function percentileFitAtScore(d: Exclude<PercentileFit, { kind: 'constant' | 'lognormal' }>, z: number): number {
  if (d.kind === 'johnsonQpd') return d.theta * Math.exp(d.kappa * Math.sinh(Math.asinh(d.delta * z) + d.shift));
  const step = (z < 0 ? d.sdLow : d.sdHigh) * z;
  return d.log ? d.median * Math.exp(step) : Math.max(0, d.median + step);
}
