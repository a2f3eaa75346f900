import type { IncrementalTestInput } from '../../../src/lib/lab/test-input';

/**
 * A test given by void ratios (no readings): e0 and one (stress, e) per increment. Used where a check
 * needs exact void ratios rather than deformations with noise.
 */
export function voidRatioTest(e0: number, points: readonly (readonly [number, number])[]): IncrementalTestInput {
  return {
    specimen: { initialHeightMm: null, diameterMm: null, initialVoidRatio: e0 },
    increments: points.map(([stressKpa, voidRatio], i) => ({ incrementNo: i + 1, stressKpa, voidRatio })),
  };
}

/**
 * Void ratios on two straight lines in e–log σ′ meeting at σ′p: slope Cr below and Cc above (the idealised
 * curve of Casagrande's construction; UFC 3-220-10 Fig. 3-12).
 */
export function bilinear(ePAtSigmaP: number, sigmaPKpa: number, cr: number, cc: number) {
  return (stressKpa: number) => {
    const x = Math.log10(stressKpa / sigmaPKpa);
    return ePAtSigmaP - (x < 0 ? cr : cc) * x;
  };
}

/** Stresses from `from` multiplied by `ratio` until `to` is reached. */
export function ladder(from: number, to: number, ratio: number): number[] {
  const out: number[] = [];
  for (let s = from; s <= to * (1 + 1e-9); s *= ratio) out.push(s);
  return out;
}

/** Terzaghi's average degree of consolidation by the exact series, summed here on its own (Terzaghi 1943). */
export function seriesDegree(tv: number): number {
  let sum = 0;
  for (let m = 0; m < 20000; m++) {
    const M = (Math.PI * (2 * m + 1)) / 2;
    sum += (2 / (M * M)) * Math.exp(-M * M * tv);
  }
  return 1 - sum;
}
