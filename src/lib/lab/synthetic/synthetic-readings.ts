import { degreeOfConsolidation } from '../../consolidation/terzaghi';
import type { SpecimenDrainage, TimeReading } from '../test-input';
import { MINUTES_PER_YEAR } from '../time-factors';
import type { MeasurementNoise } from './noise';

/** A usual reading schedule for an incremental test, minutes (ASTM D2435/D2435M suggests similar times). */
export const STANDARD_READING_TIMES_MIN: readonly number[] = [0, 0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440];

export interface IncrementHistory {
  /** settlement since the start at the start and at the end of the increment, mm */
  startMm: number;
  endMm: number;
  initialHeightMm: number;
  solidsHeightMm: number;
  cvM2PerYear: number;
  drainage: SpecimenDrainage;
  /** share of the change that happens at once, before the first reading (0–1) */
  immediateShare: number;
  /** Cα (void ratio per log cycle of time) after the end of primary; 0 for none */
  cAlpha: number;
  /** time factor at which secondary compression starts (end of primary), default 2 (U ≈ 99.4 %) */
  secondaryFromTv?: number;
  timesMin: readonly number[];
  noiseMm: number;
}

/**
 * Time–deformation readings of one increment from Terzaghi's solution: d(t) = d_start + immediate part +
 * primary part·U(Tv) + secondary part, Tv = cv·t/Hdr² (Terzaghi 1943; UFC 3-220-10 Eq. 5-15) with U from
 * the exact series, Hdr half (double drainage) or all of the mean height during the increment; secondary
 * compression Cα·Hs·log10(t/tp) after the end of primary tp (Cα scaled down where it would exceed a third
 * of a small increment's change). The primary part is sized so that the last
 * reading lands on `endMm` (before noise); each reading after zero time gets Gaussian noise of `noiseMm`.
 */
export function incrementReadings(h: IncrementHistory, noise: MeasurementNoise): TimeReading[] {
  const change = h.endMm - h.startMm;
  const meanHeightMm = h.initialHeightMm - (h.startMm + h.endMm) / 2;
  const hdrM = (h.drainage === 'double' ? meanHeightMm / 2 : meanHeightMm) / 1000;
  const tvAt = (tMin: number) => (h.cvM2PerYear * (tMin / MINUTES_PER_YEAR)) / (hdrM * hdrM);
  const tpMin = ((h.secondaryFromTv ?? 2) * hdrM * hdrM * MINUTES_PER_YEAR) / h.cvM2PerYear;
  const lastMin = h.timesMin[h.timesMin.length - 1] ?? 0;
  const secondaryAt = (tMin: number) => (change > 0 && tMin > tpMin ? h.cAlpha * h.solidsHeightMm * Math.log10(tMin / tpMin) : 0);
  // a small increment cannot creep more than a third of its change: Cα is scaled down there
  const scale = secondaryAt(lastMin) > 0 && secondaryAt(lastMin) > change / 3 ? change / 3 / secondaryAt(lastMin) : 1;
  const secondaryTotal = scale * secondaryAt(lastMin);
  const immediate = h.immediateShare * (change - secondaryTotal);
  const primary = change - secondaryTotal - immediate;
  const endDegree = degreeOfConsolidation(tvAt(lastMin));
  return h.timesMin.map((t) => {
    const clean =
      t <= 0
        ? h.startMm
        : h.startMm + immediate + (primary * degreeOfConsolidation(tvAt(t))) / endDegree + scale * secondaryAt(t);
    return { elapsedMin: t, deformationMm: clean + (t <= 0 ? 0 : noise.normal(h.noiseMm)) };
  });
}
