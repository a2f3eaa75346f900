import { timeFactorForDegree } from '../consolidation/terzaghi';

/**
 * Time factors of the fitting methods, computed from Terzaghi's exact series for the average degree of
 * consolidation, U = 1 − Σ (2/M²)·exp(−M²·Tv) with M = π(2m + 1)/2 (Terzaghi 1943; UFC 3-220-10 Eq. 5-15),
 * inverted numerically — not read from a table.
 */

/** Tv at U = 50 % (Casagrande's log-time method), ≈ 0.197 */
export const T50 = timeFactorForDegree(0.5);
/** Tv at U = 90 % (Taylor's root-time method), ≈ 0.848 */
export const T90 = timeFactorForDegree(0.9);

/**
 * Taylor's factor: at U = 90 % the theoretical √Tv is this many times the √Tv of the initial straight line
 * U = 2·√(Tv/π) (exact while U < about 0.6). Taylor (1948), Fundamentals of Soil Mechanics, gives it as 1.15.
 */
export const TAYLOR_FACTOR = Math.sqrt(T90 / ((Math.PI / 4) * 0.9 * 0.9));

export const MINUTES_PER_YEAR = 365.25 * 24 * 60;

/** cv in m²/yr from a time factor, drainage path (mm) and time (min): cv = Tv·Hdr²/t (UFC 3-220-10 Eq. 5-15). */
export function cvFromTime(timeFactor: number, drainagePathMm: number, timeMin: number): number {
  const hdrM = drainagePathMm / 1000;
  return (timeFactor * hdrM * hdrM) / (timeMin / MINUTES_PER_YEAR);
}
