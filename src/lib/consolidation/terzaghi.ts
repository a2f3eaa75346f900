/**
 * Terzaghi's one-dimensional consolidation of a single homogeneous layer under an instantaneous,
 * uniform load (linear theory: constant cv and mv).
 *
 * Governing equation ∂u/∂t = cv·∂²u/∂z², time factor Tv = cv·t/Hdr² — UFC 3-220-10 Eq. 5-15;
 * Terzaghi (1925, 1943). Average degree of consolidation by the exact series
 * U = 1 − Σ (2/M²)·exp(−M²·Tv), M = π(2m+1)/2.
 */

export type Boundary = 'pervious' | 'impervious';

/** Below this Tv, U = 2·√(Tv/π) differs from the exact series by less than 1e-12. */
const SMALL_TV = 0.05;

/**
 * Average degree of consolidation U (0…1) at time factor Tv ≥ 0.
 * Tv < 0.05: U = 2√(Tv/π), the leading term of the exact image (erfc) series; the next term is
 * of order √Tv·exp(−1/Tv) < 1e-12 there. Tv ≥ 0.05: the Fourier series, summed until the next term
 * is below 1e-15 (at most a few dozen terms). Error < 1e-9 for every Tv > 0.
 * Source: Terzaghi (1943); UFC 3-220-10 Eq. 5-15 and Fig. 5-16.
 */
export function degreeOfConsolidation(tv: number): number {
  if (!(tv > 0)) return 0;
  if (tv < SMALL_TV) return 2 * Math.sqrt(tv / Math.PI);
  let remaining = 0;
  for (let m = 0; m < 10000; m++) {
    const M = (Math.PI * (2 * m + 1)) / 2;
    const term = (2 / (M * M)) * Math.exp(-M * M * tv);
    remaining += term;
    if (term < 1e-15) break;
  }
  return 1 - remaining;
}

/**
 * Time factor Tv that gives average degree U (0 ≤ U < 1; Infinity at U = 1).
 * U < 0.2523 (Tv < 0.05): Tv = πU²/4 exactly; otherwise the inverse of the exact series by
 * Newton's method from Tv = −(4/π²)·ln((π²/8)(1 − U)) (one-term form), bracketed by bisection.
 * Accurate to 1e-12 in Tv. Source: Terzaghi (1943); check values T50 = 0.1967, T90 = 0.8481.
 */
export function timeFactorForDegree(u: number): number {
  if (!(u > 0)) return 0;
  if (u >= 1) return Number.POSITIVE_INFINITY;
  const uSmall = 2 * Math.sqrt(SMALL_TV / Math.PI);
  if (u < uSmall) return (Math.PI * u * u) / 4;
  let lo = SMALL_TV;
  let hi = Math.max(1, -(4 / (Math.PI * Math.PI)) * Math.log(((Math.PI * Math.PI) / 8) * (1 - u)) + 1);
  let tv = Math.min(Math.max(-(4 / (Math.PI * Math.PI)) * Math.log(((Math.PI * Math.PI) / 8) * (1 - u)), lo), hi);
  for (let i = 0; i < 100; i++) {
    const f = degreeOfConsolidation(tv) - u;
    if (f > 0) hi = tv;
    else lo = tv;
    const slope = degreeSlope(tv);
    let next = tv - f / slope;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    if (Math.abs(next - tv) < 1e-13 * Math.max(1, tv)) return next;
    tv = next;
  }
  return tv;
}

/** dU/dTv = Σ 2·exp(−M²Tv) (series; valid for Tv ≥ 0.05). */
function degreeSlope(tv: number): number {
  let sum = 0;
  for (let m = 0; m < 10000; m++) {
    const M = (Math.PI * (2 * m + 1)) / 2;
    const term = 2 * Math.exp(-M * M * tv);
    sum += term;
    if (term < 1e-16) break;
  }
  return sum;
}

/**
 * ∫₀^Tv U(T) dT, used by ramp loading (Olson 1977). Tv < 0.05: (4/3)·Tv^1.5/√π;
 * otherwise Tv − Σ 2(1 − exp(−M²Tv))/M⁴. Dimensionless; Tv ≥ 0.
 */
export function integratedDegree(tv: number): number {
  if (!(tv > 0)) return 0;
  if (tv < SMALL_TV) return ((4 / 3) * tv * Math.sqrt(tv)) / Math.sqrt(Math.PI);
  let sum = 0;
  for (let m = 0; m < 20000; m++) {
    const M = (Math.PI * (2 * m + 1)) / 2;
    const M4 = M * M * M * M;
    const term = (2 * (1 - Math.exp(-M * M * tv))) / M4;
    sum += term;
    if (2 / M4 < 1e-16) break;
  }
  return tv - sum;
}

/**
 * Drainage path length Hdr, m: the layer thickness for one-way drainage, half of it for two-way
 * drainage. Throws if both boundaries are impervious (no drainage path exists).
 * Source: UFC 3-220-10 §5-5.3.
 */
export function drainagePathM(thicknessM: number, top: Boundary, bottom: Boundary): number {
  if (top === 'pervious' && bottom === 'pervious') return thicknessM / 2;
  if (top === 'pervious' || bottom === 'pervious') return thicknessM;
  throw new RangeError('A layer with both boundaries impervious has no drainage path.');
}

/** Time factor Tv = cv·t/Hdr² (UFC 3-220-10 Eq. 5-15); cv m²/yr, t years, Hdr m. */
export function timeFactor(cvM2PerYear: number, timeYears: number, drainagePathLengthM: number): number {
  return (cvM2PerYear * timeYears) / (drainagePathLengthM * drainagePathLengthM);
}

/** Average degree U (0…1) after `timeYears`, for cv (m²/yr) and Hdr (m). Source as `degreeOfConsolidation`. */
export function degreeAtTime(timeYears: number, cvM2PerYear: number, drainagePathLengthM: number): number {
  return degreeOfConsolidation(timeFactor(cvM2PerYear, timeYears, drainagePathLengthM));
}

/** Time in years to reach average degree U (0 ≤ U < 1): t = Tv(U)·Hdr²/cv. Source as `timeFactorForDegree`. */
export function timeForDegreeYears(u: number, cvM2PerYear: number, drainagePathLengthM: number): number {
  return (timeFactorForDegree(u) * drainagePathLengthM * drainagePathLengthM) / cvM2PerYear;
}
