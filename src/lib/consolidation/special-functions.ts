/**
 * erfc, the standard normal CDF and its inverse, accurate to about 1e-14 (absolute) over the
 * whole real line. Pure JavaScript; `Math` has no erf.
 */

const SQRT_PI = Math.sqrt(Math.PI);

/**
 * Complementary error function erfc(x) for any finite x.
 * Maclaurin series of erf for |x| < 2 (Abramowitz & Stegun 1964, Eq. 7.1.5) and the continued
 * fraction for erfc at x ≥ 2 (A&S Eq. 7.1.14), evaluated backwards with 80 terms.
 */
export function erfc(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  if (x < 0) return 2 - erfc(-x);
  if (x < 2) {
    const x2 = x * x;
    let term = x;
    let sum = x;
    for (let n = 1; n < 80; n++) {
      term *= -x2 / n;
      const contribution = term / (2 * n + 1);
      sum += contribution;
      if (Math.abs(contribution) < 1e-17) break;
    }
    return 1 - (2 / SQRT_PI) * sum;
  }
  if (x > 27) return 0;
  let f = x;
  for (let k = 80; k >= 1; k--) f = x + k / 2 / f;
  return Math.exp(-x * x) / (SQRT_PI * f);
}

/** Standard normal cumulative distribution Φ(z) = ½·erfc(−z/√2). */
export function normalCdf(z: number): number {
  return 0.5 * erfc(-z / Math.SQRT2);
}

const A = [-39.69683028665376, 220.9460984245205, -275.9285104469687, 138.357751867269, -30.66479806614716, 2.506628277459239];
const B = [-54.47609879822406, 161.5858368580409, -155.6989798598866, 66.80131188771972, -13.28068155288572];
const C = [
  -0.007784894002430293, -0.3223964580411365, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783,
];
const D = [0.007784695709041462, 0.3224671290700398, 2.445134137142996, 3.754408661907416];

function coef(list: readonly number[], i: number): number {
  return list[i] ?? 0;
}

/**
 * Inverse standard normal CDF Φ⁻¹(p) for 0 < p < 1 (±Infinity at 0 and 1).
 * Acklam's rational approximation (relative error 1.15e-9) refined by one Halley step on erfc,
 * which brings it to machine precision.
 */
export function normalQuantile(p: number): number {
  if (p <= 0) return Number.NEGATIVE_INFINITY;
  if (p >= 1) return Number.POSITIVE_INFINITY;
  const pLow = 0.02425;
  let x: number;
  if (p < pLow || p > 1 - pLow) {
    const q = Math.sqrt(-2 * Math.log(p < pLow ? p : 1 - p));
    const num = ((((coef(C, 0) * q + coef(C, 1)) * q + coef(C, 2)) * q + coef(C, 3)) * q + coef(C, 4)) * q + coef(C, 5);
    const den = (((coef(D, 0) * q + coef(D, 1)) * q + coef(D, 2)) * q + coef(D, 3)) * q + 1;
    x = p < pLow ? num / den : -num / den;
  } else {
    const q = p - 0.5;
    const r = q * q;
    const num = (((((coef(A, 0) * r + coef(A, 1)) * r + coef(A, 2)) * r + coef(A, 3)) * r + coef(A, 4)) * r + coef(A, 5)) * q;
    const den = ((((coef(B, 0) * r + coef(B, 1)) * r + coef(B, 2)) * r + coef(B, 3)) * r + coef(B, 4)) * r + 1;
    x = num / den;
  }
  const e = normalCdf(x) - p;
  const u = e * Math.sqrt(2 * Math.PI) * Math.exp((x * x) / 2);
  return x - u / (1 + (x * u) / 2);
}
