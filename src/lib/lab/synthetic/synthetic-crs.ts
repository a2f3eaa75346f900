import type { CrsTestInput } from '../crs-test';
import { MINUTES_PER_YEAR } from '../time-factors';
import { MeasurementNoise } from './noise';
import { checkSyntheticCurve, firstLoadingVoidRatio, type SyntheticCurve } from './synthetic-curve';

export interface SyntheticCrsOptions {
  curve: SyntheticCurve;
  cvM2PerYear: number;
  /** axial strain rate, per hour (e.g. 0.01 for 1 %/h) */
  strainRatePerHour: number;
  /** final strain, e.g. 0.25 */
  finalStrain: number;
  readingEveryMin: number;
  seed: number;
  initialHeightMm?: number;
  /** standard deviation of deformation readings (mm) and of pressure readings (kPa); defaults 0.001 and 0.05 */
  noiseMm?: number;
  noiseKpa?: number;
}

/**
 * An invented CRS test in the steady state of the linear theory (Wissa et al. 1971): at each reading the
 * strain ε = ε̇·t fixes e on the chosen curve and so σ′v; mv = −(de/dσ′)/(1 + e0) from the curve; the base
 * pore pressure is ub = ε̇·H²/(2·cv·mv) and the total stress σv = σ′v + (2/3)·ub.
 */
export function syntheticCrsTest(o: SyntheticCrsOptions): CrsTestInput {
  checkSyntheticCurve(o.curve);
  const { curve } = o;
  const h0 = o.initialHeightMm ?? 20;
  const noise = new MeasurementNoise(o.seed);
  const ratePerS = o.strainRatePerHour / 3600;
  const cvM2PerS = o.cvM2PerYear / (MINUTES_PER_YEAR * 60);
  const count = Math.floor(o.finalStrain / o.strainRatePerHour / (o.readingEveryMin / 60));
  const readings = [];
  for (let i = 1; i <= count; i++) {
    const t = i * o.readingEveryMin;
    const strain = ratePerS * t * 60;
    const stress = stressAt(curve, curve.e0 - strain * (1 + curve.e0));
    const mvPerKpa =
      (firstLoadingVoidRatio(curve, stress * 0.999) - firstLoadingVoidRatio(curve, stress * 1.001)) /
      (0.002 * stress) /
      (1 + curve.e0);
    const heightM = (h0 * (1 - strain)) / 1000;
    const ub = (ratePerS * heightM * heightM) / (2 * cvM2PerS * mvPerKpa);
    readings.push({
      elapsedMin: t,
      axialStressKpa: stress + (2 / 3) * ub + noise.normal(o.noiseKpa ?? 0.05),
      basePorePressureKpa: ub + noise.normal(o.noiseKpa ?? 0.05),
      deformationMm: strain * h0 + noise.normal(o.noiseMm ?? 0.001),
    });
  }
  return { specimen: { initialHeightMm: h0, diameterMm: 63.5, initialVoidRatio: curve.e0 }, readings };
}

/** The first-loading stress at which the curve reaches void ratio e (bisection in log σ′). */
function stressAt(curve: SyntheticCurve, e: number): number {
  let lo = -2;
  let hi = 6;
  for (let k = 0; k < 80; k++) {
    const mid = (lo + hi) / 2;
    if (firstLoadingVoidRatio(curve, 10 ** mid) > e) lo = mid;
    else hi = mid;
  }
  return 10 ** ((lo + hi) / 2);
}
