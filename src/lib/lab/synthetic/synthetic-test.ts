import type { IncrementalTestInput, SpecimenDrainage } from '../test-input';
import { MeasurementNoise } from './noise';
import { type SyntheticCurve, scheduleVoidRatios } from './synthetic-curve';
import { incrementReadings, STANDARD_READING_TIMES_MIN } from './synthetic-readings';

export interface SyntheticTestOptions {
  curve: SyntheticCurve;
  /** applied stresses in order, kPa (unloading where a stress falls) */
  stressesKpa: readonly number[];
  /** cv of every increment, m²/yr, or one per increment */
  cvM2PerYear: number | readonly number[];
  seed: number;
  initialHeightMm?: number;
  diameterMm?: number;
  specificGravity?: number;
  drainage?: SpecimenDrainage;
  /** Cα/Cc on virgin loading (Cα/Cr below σ′p), none on unloading; default 0 */
  cAlphaOverCc?: number;
  /** share of each increment's change that happens at once; default 0 */
  immediateShare?: number;
  /** standard deviation of every deformation reading, mm; default 0.002 */
  noiseMm?: number;
  /** reading times, minutes; null for a test without time readings; default STANDARD_READING_TIMES_MIN */
  readingTimesMin?: readonly number[] | null;
}

/**
 * An invented incremental-loading test with known parameters: a specimen whose dry mass gives e0 exactly
 * (Hs = Md/(Gs·ρw·A)), end-of-increment deformations on the chosen e–log σ′ curve (d = (e0 − e)·Hs), and
 * for each increment time–deformation readings from Terzaghi's solution with the chosen cv, all with
 * Gaussian measurement noise. The same seed gives the same test.
 */
export function syntheticIncrementalTest(o: SyntheticTestOptions): IncrementalTestInput {
  const h0 = o.initialHeightMm ?? 20;
  const diameter = o.diameterMm ?? 75;
  const gs = o.specificGravity ?? 2.7;
  const { curve } = o;
  const hs = h0 / (1 + curve.e0);
  const areaCm2 = (Math.PI * (diameter / 10) ** 2) / 4;
  const noise = new MeasurementNoise(o.seed);
  const noiseMm = o.noiseMm ?? 0.002;
  const times = o.readingTimesMin === undefined ? STANDARD_READING_TIMES_MIN : o.readingTimesMin;
  const voidRatios = scheduleVoidRatios(curve, o.stressesKpa);
  let startMm = 0;
  let maxStress = 0;
  const increments = o.stressesKpa.map((stressKpa, i) => {
    const cleanEnd = (curve.e0 - (voidRatios[i] as number)) * hs;
    const virgin = stressKpa > maxStress && stressKpa > curve.sigmaPKpa;
    const unloading = i > 0 && stressKpa < (o.stressesKpa[i - 1] as number);
    maxStress = Math.max(maxStress, stressKpa);
    const cv = typeof o.cvM2PerYear === 'number' ? o.cvM2PerYear : (o.cvM2PerYear[i] as number);
    const readings =
      times === null
        ? undefined
        : incrementReadings(
            {
              startMm,
              endMm: cleanEnd,
              initialHeightMm: h0,
              solidsHeightMm: hs,
              cvM2PerYear: cv,
              drainage: o.drainage ?? 'double',
              immediateShare: o.immediateShare ?? 0,
              cAlpha: unloading ? 0 : (o.cAlphaOverCc ?? 0) * (virgin ? curve.cc : curve.cr),
              timesMin: times,
              noiseMm,
            },
            noise,
          );
    const end = readings ? (readings[readings.length - 1]?.deformationMm ?? cleanEnd) : cleanEnd + noise.normal(noiseMm);
    startMm = end;
    return { incrementNo: i + 1, stressKpa, deformationMm: end, ...(readings ? { readings } : {}) };
  });
  return {
    specimen: {
      initialHeightMm: h0,
      diameterMm: diameter,
      specificGravity: gs,
      dryMassG: (gs * areaCm2 * (h0 / 10)) / (1 + curve.e0),
      waterContentPct: (100 * curve.e0) / gs,
    },
    increments,
    drainage: o.drainage ?? 'double',
  };
}
