import { WATER_UNIT_WEIGHT_SI_KN_PER_M3 } from '../consolidation/stress-vertical';
import type { CrsPoint, CrsTestInput } from './crs-test';
import { because, cannot, type Derived, determined, shown } from './outcome';
import { specimenState } from './specimen-state';
import { MINUTES_PER_YEAR } from './time-factors';

/** common practice: ub/σv between 3 % and 15 % (ASTM D4186 guidance, from memory) */
export const RECOMMENDED_PORE_PRESSURE_RATIO = { from: 0.03, to: 0.15 } as const;

/**
 * Each CRS reading as a point: σ′v = σv − (2/3)·ub, e and ε from the deformation, and from this reading
 * and the one before k = ε̇·H²·γw/(2·ub) (H the mean height, ub the mean base pressure) and
 * cv = k/(mv·γw) with mv = Δε/Δσ′v (Wissa et al. 1971 linear theory; ASTM D4186/D4186M).
 */
export function crsPoints(test: CrsTestInput): Derived<CrsPoint[]> {
  const state = specimenState(test.specimen);
  if (!state.ok) return because('crs', state);
  const { e0, initialHeightMm: h0, solidsHeightMm: hs } = state.value;
  if (h0 === null || hs === null)
    return cannot('crs', 'missing-input', 'the initial specimen height is needed for strains and k.');
  const readings = [...test.readings].sort((a, b) => a.elapsedMin - b.elapsedMin);
  if (readings.length < 5)
    return cannot('crs', 'too-few-points', `the test has ${readings.length} readings; at least 5 are needed.`);
  const out: CrsPoint[] = [];
  for (const [i, r] of readings.entries()) {
    if (![r.elapsedMin, r.axialStressKpa, r.basePorePressureKpa, r.deformationMm].every(Number.isFinite)) {
      return cannot('crs', 'missing-input', `the reading at ${shown(r.elapsedMin)} min has a blank or non-numeric value.`);
    }
    const before = readings[i - 1];
    if (before && r.elapsedMin === before.elapsedMin)
      return cannot('crs', 'missing-input', `two readings are at ${shown(r.elapsedMin)} min.`);
    if (before && r.deformationMm < before.deformationMm - 0.01) {
      return cannot(
        'crs',
        'goes-backwards',
        `the deformation falls from ${shown(before.deformationMm)} to ${shown(r.deformationMm)} mm at ${shown(r.elapsedMin)} min.`,
      );
    }
    const effective = r.axialStressKpa - (2 / 3) * r.basePorePressureKpa;
    const strain = r.deformationMm / h0;
    const ratio = r.axialStressKpa > 0 ? r.basePorePressureKpa / r.axialStressKpa : 0;
    let kMPerS: number | null = null;
    let cvM2PerYear: number | null = null;
    const previous = out[i - 1];
    if (before && previous && r.basePorePressureKpa > 0 && effective > previous.effectiveStressKpa) {
      const strainRatePerS = (strain - previous.strain) / ((r.elapsedMin - before.elapsedMin) * 60);
      const heightM = (h0 - (r.deformationMm + before.deformationMm) / 2) / 1000;
      const ub = (r.basePorePressureKpa + before.basePorePressureKpa) / 2;
      kMPerS = (strainRatePerS * heightM * heightM * WATER_UNIT_WEIGHT_SI_KN_PER_M3) / (2 * ub);
      const mvPerKpa = (strain - previous.strain) / (effective - previous.effectiveStressKpa);
      cvM2PerYear = (kMPerS / (mvPerKpa * WATER_UNIT_WEIGHT_SI_KN_PER_M3)) * MINUTES_PER_YEAR * 60;
    }
    out.push({
      elapsedMin: r.elapsedMin,
      effectiveStressKpa: effective,
      voidRatio: e0 - r.deformationMm / hs,
      strain,
      porePressureRatio: ratio,
      kMPerS,
      cvM2PerYear,
      inRecommendedRange: ratio >= RECOMMENDED_PORE_PRESSURE_RATIO.from && ratio <= RECOMMENDED_PORE_PRESSURE_RATIO.to,
    });
  }
  return determined(out);
}
