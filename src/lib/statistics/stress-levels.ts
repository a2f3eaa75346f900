/**
 * The normally consolidated / overconsolidated split of per-increment results (cv and Cα of a test's
 * stress levels), so each test contributes one NC and one OC value. A level counts as NC when its
 * final effective stress reaches the test's σ'p, OC below it — Cα and cv change sharply at σ'p
 * because the soil moves from recompression to virgin compression (Cα/Cc concept, Mesri & Godlewski
 * 1977; Mesri & Castro 1987, from memory). Without σ'p the range the laboratory declared is used.
 */

export type StressRange = 'NC' | 'OC';

export interface StressLevel {
  stressFromKpa: number;
  stressToKpa: number;
  /** The range the laboratory declared. */
  stressRange: StressRange;
  cvM2PerYear: number | null;
  secondaryCompressionIndex: number | null;
}

export interface SplitValues {
  cvNcM2PerYear: number | null;
  cvOcM2PerYear: number | null;
  secondaryCompressionIndexNc: number | null;
  secondaryCompressionIndexOc: number | null;
}

export function stressLevelRange(level: StressLevel, preconsolidationStressKpa: number | null): StressRange {
  if (preconsolidationStressKpa === null || !(preconsolidationStressKpa > 0)) return level.stressRange;
  return level.stressToKpa >= preconsolidationStressKpa ? 'NC' : 'OC';
}

/**
 * One value per range for one test: the mean Cα and the geometric mean cv (cv is summarised on
 * logarithms, parameters.ts) of the levels in each range; null where a range has none.
 */
export function splitByStressRange(levels: readonly StressLevel[], preconsolidationStressKpa: number | null): SplitValues {
  const sums = { NC: { cvLog: 0, cvCount: 0, ca: 0, caCount: 0 }, OC: { cvLog: 0, cvCount: 0, ca: 0, caCount: 0 } };
  for (const level of levels) {
    const range = sums[stressLevelRange(level, preconsolidationStressKpa)];
    if (level.cvM2PerYear !== null && level.cvM2PerYear > 0 && Number.isFinite(level.cvM2PerYear)) {
      range.cvLog += Math.log(level.cvM2PerYear);
      range.cvCount++;
    }
    if (level.secondaryCompressionIndex !== null && Number.isFinite(level.secondaryCompressionIndex)) {
      range.ca += level.secondaryCompressionIndex;
      range.caCount++;
    }
  }
  const cv = (r: typeof sums.NC) => (r.cvCount ? Math.exp(r.cvLog / r.cvCount) : null);
  const ca = (r: typeof sums.NC) => (r.caCount ? r.ca / r.caCount : null);
  return {
    cvNcM2PerYear: cv(sums.NC),
    cvOcM2PerYear: cv(sums.OC),
    secondaryCompressionIndexNc: ca(sums.NC),
    secondaryCompressionIndexOc: ca(sums.OC),
  };
}
