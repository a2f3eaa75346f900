/**
 * An invented e–log σ′ curve with known parameters, for demo readings and round-trip tests.
 *
 * First loading: from e0 the specimen loses Δe = e0·(Δe/e0) on reloading from a seating stress
 * (σ′v0/20, at most 1 kPa) to σ′v0, linearly in log σ′ (the loss Lunne, Berre & Strandvik 1997 measure;
 * a good sample keeps most of its in-situ effective stress as suction, so this part may be flatter than Cr);
 * above σ′v0 the slope runs from Cr to Cc through a bend `bendLogCycles` wide centred on σ′p,
 * so that the straight asymptotes (slope Cr below, Cc above) meet exactly at σ′p. Unloading and reloading
 * below the largest stress so far follow a line of slope Cr from the curve at that stress.
 */
export interface SyntheticCurve {
  e0: number;
  cc: number;
  cr: number;
  sigmaPKpa: number;
  /** in-situ vertical effective stress, kPa (≤ σ′p) */
  sigmaV0Kpa: number;
  deltaEOverE0: number;
  /** width of the bend at σ′p in log cycles; 0 gives a sharp corner */
  bendLogCycles: number;
}

/** Throws a RangeError for parameters no specimen could have. */
export function checkSyntheticCurve(curve: SyntheticCurve): void {
  if (!(curve.e0 > 0 && curve.cr > 0 && curve.cc > curve.cr))
    throw new RangeError('A synthetic curve needs e0 > 0 and 0 < Cr < Cc.');
  if (!(curve.sigmaV0Kpa > 1 && curve.sigmaPKpa >= curve.sigmaV0Kpa))
    throw new RangeError('A synthetic curve needs σ′p ≥ σ′v0 > 1 kPa.');
  if (!(curve.deltaEOverE0 >= 0 && curve.deltaEOverE0 < 0.5)) throw new RangeError('A synthetic curve needs 0 ≤ Δe/e0 < 0.5.');
  if (!(curve.bendLogCycles >= 0)) throw new RangeError('A synthetic curve needs a bend width ≥ 0.');
}

const softplus = (t: number) => (t > 30 ? t : Math.log1p(Math.exp(t)));

function compression(curve: SyntheticCurve, stressKpa: number): number {
  const x = Math.log10(stressKpa / curve.sigmaPKpa);
  const w = curve.bendLogCycles;
  const beyond = w > 1e-9 ? w * softplus(x / w) : Math.max(0, x);
  return curve.cr * x + (curve.cc - curve.cr) * beyond;
}

/** Void ratio on first loading to `stressKpa`. */
export function firstLoadingVoidRatio(curve: SyntheticCurve, stressKpa: number): number {
  const eAtV0 = curve.e0 * (1 - curve.deltaEOverE0);
  if (stressKpa <= curve.sigmaV0Kpa) {
    const seating = Math.min(curve.sigmaV0Kpa / 20, 1);
    if (stressKpa <= seating) return curve.e0;
    return curve.e0 - (curve.e0 - eAtV0) * (Math.log10(stressKpa / seating) / Math.log10(curve.sigmaV0Kpa / seating));
  }
  return eAtV0 - (compression(curve, stressKpa) - compression(curve, curve.sigmaV0Kpa));
}

/** Void ratio at the end of each stage of a loading schedule (first loading, unloading, reloading). */
export function scheduleVoidRatios(curve: SyntheticCurve, stressesKpa: readonly number[]): number[] {
  checkSyntheticCurve(curve);
  let maxStress = 0;
  return stressesKpa.map((s) => {
    maxStress = Math.max(maxStress, s);
    if (s >= maxStress) return firstLoadingVoidRatio(curve, s);
    return firstLoadingVoidRatio(curve, maxStress) + curve.cr * Math.log10(maxStress / s);
  });
}

/** A doubling schedule from `startKpa` to at least `toKpa`, optionally with a final unloading by quarters. */
export function doublingSchedule(startKpa: number, toKpa: number, unloadSteps = 0): number[] {
  const out: number[] = [];
  for (let s = startKpa; ; s *= 2) {
    out.push(s);
    if (s >= toKpa) break;
  }
  let s = out[out.length - 1] as number;
  for (let i = 0; i < unloadSteps; i++) {
    s /= 4;
    out.push(s);
  }
  return out;
}
