import type { Random } from './random';
import { round } from './random';

/**
 * The invented e–log σ' curve behind each specimen, so that summary values (e0, Cr, Cc, σ'p, Δe/e0,
 * mv) and incremental-loading steps agree with one another.
 *
 * Reloading from a seating stress (σ'v0/20, at most 3 kPa) to σ'v0 the specimen loses Δe = e0·(Δe/e0),
 * linear in log σ' (the sample quality measure of Lunne, Berre & Strandvik 1997 is exactly this loss). Beyond σ'v0 the slope
 * de/dlog σ' runs from Cr to Cc through a logistic step centred on σ'p, `transitionLogCycles` wide:
 * sharp for good samples, blurred for disturbed ones. The straight asymptotes (slope Cr below, Cc
 * above) meet at σ'p, as in Casagrande's construction.
 */
export interface CompressionCurve {
  e0: number;
  deltaEOverE0: number;
  sigmaV0Kpa: number;
  sigmaPKpa: number;
  cr: number;
  cc: number;
  transitionLogCycles: number;
}

export interface DemoIncrement {
  incrementNo: number;
  appliedStressKpa: number;
  voidRatioEnd: number;
  isUnloading: boolean;
}

const softplus = (t: number) => (t > 30 ? t : Math.log1p(Math.exp(t)));

/** Integral of the slope from σ'p: Cr·x + (Cc − Cr)·w·ln(1 + e^(x/w)), x = log10(σ'/σ'p). */
function compression(curve: CompressionCurve, stressKpa: number): number {
  const x = Math.log10(stressKpa / curve.sigmaPKpa);
  const w = curve.transitionLogCycles;
  return curve.cr * x + (curve.cc - curve.cr) * w * softplus(x / w);
}

/** Void ratio on first loading to `stressKpa` (> 0). Strictly decreasing in stress. */
export function voidRatioOnLoading(curve: CompressionCurve, stressKpa: number): number {
  const eAtV0 = curve.e0 * (1 - curve.deltaEOverE0);
  let e: number;
  if (stressKpa <= curve.sigmaV0Kpa) {
    const seating = Math.min(curve.sigmaV0Kpa / 20, 3);
    const fraction = Math.log10(Math.max(stressKpa, seating) / seating) / Math.log10(curve.sigmaV0Kpa / seating);
    e = curve.e0 - (curve.e0 - eAtV0) * fraction;
  } else {
    e = eAtV0 - (compression(curve, stressKpa) - compression(curve, curve.sigmaV0Kpa));
  }
  // A soft floor keeps void ratios positive at the top of the ladder; it is inactive for e ≳ e0/2.
  const floor = 0.08 * curve.e0;
  const width = 0.03 * curve.e0;
  return floor + width * softplus((e - floor) / width);
}

/** Doubling load ladder from 3.125, 6.25 or 12.5 kPa to at least 8·σ'p (16·σ'p for peat), within limits. */
function loadingLadder(curve: CompressionCurve, peat: boolean): number[] {
  const start = curve.sigmaPKpa < 12 ? 3.125 : curve.sigmaPKpa < 25 ? 6.25 : 12.5;
  const [factor, lo, hi] = peat ? [16, 100, 200] : [8, 400, 3200];
  const target = Math.min(hi, Math.max(lo, factor * curve.sigmaPKpa));
  const ladder: number[] = [];
  for (let s = start; ; s *= 2) {
    ladder.push(s);
    if (s >= target) break;
  }
  return ladder;
}

/**
 * Incremental-loading steps consistent with the curve: loading on the doubling ladder, for some
 * tests one unload to a quarter of the stress and reload once past 2·σ'p (swelling slope Cr), and
 * for some a final unloading.
 */
export function demoIncrements(rng: Random, curve: CompressionCurve, peat: boolean): DemoIncrement[] {
  const ladder = loadingLadder(curve, peat);
  const maxStress = ladder[ladder.length - 1] ?? 0;
  const loopAt = rng.chance(0.4) ? ladder.find((s) => s >= 2 * curve.sigmaPKpa && s < maxStress) : undefined;
  const steps: { stress: number; e: number; unloading: boolean }[] = [];
  for (const stress of ladder) {
    const e = voidRatioOnLoading(curve, stress);
    steps.push({ stress, e, unloading: false });
    if (stress === loopAt) {
      const swollen = e + curve.cr * Math.log10(4);
      steps.push({ stress: stress / 4, e: swollen, unloading: true });
      steps.push({ stress, e: e - 0.01 * (swollen - e), unloading: false });
    }
  }
  if (rng.chance(0.5)) {
    const eMax = voidRatioOnLoading(curve, maxStress);
    for (const stress of [maxStress / 4, maxStress / 16]) {
      steps.push({ stress, e: eMax + curve.cr * Math.log10(maxStress / stress), unloading: true });
    }
  }
  return steps.map((step, i) => ({
    incrementNo: i + 1,
    appliedStressKpa: step.stress,
    voidRatioEnd: round(step.e, 4),
    isUnloading: step.unloading,
  }));
}
