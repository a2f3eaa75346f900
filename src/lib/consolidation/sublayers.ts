/**
 * Division of compressible layers into sublayers, with stresses taken at sublayer mid-points
 * ("thick layers should be divided into a series of sublayers" — UFC 3-220-10 §5-5.2.2), and the
 * refinement loop that doubles the division until the total settlement stops changing.
 */

export interface SublayerGeometry {
  layerIndex: number;
  topM: number;
  bottomM: number;
  midM: number;
  thicknessM: number;
}

/**
 * Splits each layer into `countsPerLayer[i]` equal sublayers (0 for a layer that does not settle).
 * Depths in m from the ground surface.
 */
export function divideLayers(thicknessesM: readonly number[], countsPerLayer: readonly number[]): SublayerGeometry[] {
  const result: SublayerGeometry[] = [];
  let topM = 0;
  thicknessesM.forEach((thicknessM, layerIndex) => {
    const count = countsPerLayer[layerIndex] ?? 0;
    const h = thicknessM / Math.max(count, 1);
    for (let j = 0; j < count; j++) {
      const subTop = topM + j * h;
      result.push({ layerIndex, topM: subTop, bottomM: subTop + h, midM: subTop + h / 2, thicknessM: h });
    }
    topM += thicknessM;
  });
  return result;
}

export interface SublayerConvergence {
  countsPerLayer: number[];
  totalM: number;
  /** Relative change of the total at the last refinement, % (0 for a fixed division). */
  changePercent: number;
  converged: boolean;
  refinements: number;
}

/**
 * Starts at one sublayer per compressible layer and doubles every layer's count until the total
 * settlement (from `totalFor`, m) changes by less than `tolerancePercent` %, or a layer would exceed
 * `maxPerLayer`. The finer division is the one reported. Mid-point integration of the settlement
 * converges as the square of the sublayer thickness except near a ground-surface singularity of
 * σ'v0, where it is slower but still monotone.
 */
export function refineUntilConverged(
  compressible: readonly boolean[],
  totalFor: (countsPerLayer: number[]) => number,
  tolerancePercent: number,
  maxPerLayer: number,
): SublayerConvergence {
  let count = 1;
  let counts = compressible.map((c) => (c ? count : 0));
  let total = totalFor(counts);
  let refinements = 0;
  for (;;) {
    if (count * 2 > maxPerLayer) {
      return { countsPerLayer: counts, totalM: total, changePercent: Number.NaN, converged: false, refinements };
    }
    count *= 2;
    const finer = compressible.map((c) => (c ? count : 0));
    const finerTotal = totalFor(finer);
    refinements++;
    const changePercent = finerTotal === 0 ? 0 : (100 * Math.abs(finerTotal - total)) / Math.abs(finerTotal);
    counts = finer;
    total = finerTotal;
    if (changePercent < tolerancePercent) {
      return { countsPerLayer: counts, totalM: total, changePercent, converged: true, refinements };
    }
    if (count * 2 > maxPerLayer) {
      return { countsPerLayer: counts, totalM: total, changePercent, converged: false, refinements };
    }
  }
}
