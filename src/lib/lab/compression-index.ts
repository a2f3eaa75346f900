import { type CompressionCurve, type CurveState, loadingStates } from './compression-curve';
import type { StressRange } from './geometry';
import { cannot, type Derived, determined, shown } from './outcome';
import { distinctStresses, fitSlope, type SlopeFit, withinRange } from './slope-fit';

export interface CompressionIndexChoice {
  /** the stresses whose first-loading points define the virgin line (a steward's choice) */
  range?: StressRange;
}

/** points in the steepest window (common practice: three points define a straight virgin line) */
const WINDOW = 3;
/** common practice (our own rule): a virgin line is at least twice as steep as the flattest part before it */
export const MIN_VIRGIN_STEEPENING = 2;
/** common practice (our own rule): scatter about the virgin line above this share of its void-ratio span is noise */
export const MAX_VIRGIN_SCATTER = 0.08;

/**
 * Cc, the steepest slope of the first-loading (virgin) e–log σ′ curve: the least-squares line through
 * the three consecutive first-loading points that give the steepest slope (the first such when several
 * tie), or through the points of a range a person chose, with the range reported. Cc = −Δe/Δlog10 σ′ (Terzaghi & Peck; UFC 3-220-10
 * Fig. 3-12 and Eq. 5-11). Refused when the loading goes backwards, when fewer than three first-loading
 * points exist, when the steepest part is at the very start or not clearly steeper than the part before
 * it (no virgin branch), or when the points scatter about the line.
 */
export function compressionIndex(curve: CompressionCurve, choice: CompressionIndexChoice = {}): Derived<SlopeFit> {
  const problem = curve.problems.find((p) => p.branch !== 'unloading');
  if (problem) return cannot('cc', 'goes-backwards', `${problem.message}.`);
  const loading = loadingStates(curve);
  if (choice.range) {
    const chosen = withinRange(loading, choice.range);
    if (distinctStresses(chosen) < 2) {
      return cannot(
        'cc',
        'too-few-points',
        `the chosen range ${rangeText(choice.range)} holds ${chosen.length} first-loading point(s); choose one with at least 2.`,
      );
    }
    return determined(fitSlope(chosen, 'person'));
  }
  const window = steepestWindow(loading);
  if (!window.ok) return window;
  const fit = window.value.fit;
  const span = Math.abs(fit.segment.from.voidRatio - fit.segment.to.voidRatio);
  if (fit.rmsResidual > MAX_VIRGIN_SCATTER * span) {
    return cannot(
      'cc',
      'too-noisy',
      `the points of the steepest part (${rangeText(fit.range)}) scatter by ${shown(fit.rmsResidual)} in e about their line.`,
    );
  }
  return determined(fit);
}

/** The steepest three-point window of first loading, checked to be a virgin line that follows a flatter part. */
export function steepestWindow(loading: readonly CurveState[]): Derived<{ fit: SlopeFit; start: number }> {
  if (loading.length < WINDOW) {
    return cannot(
      'cc',
      'too-few-points',
      `the test has ${loading.length} first-loading point(s); at least ${WINDOW} are needed.`,
    );
  }
  let best: { fit: SlopeFit; start: number } | null = null;
  for (let start = 0; start + WINDOW <= loading.length; start++) {
    const fit = fitSlope(loading.slice(start, start + WINDOW), 'auto');
    if (!best || fit.value > best.fit.value * (1 + 1e-9)) best = { fit, start };
  }
  if (!best || !(best.fit.value > 0))
    return cannot('cc', 'no-virgin-branch', 'the void ratio does not fall with increasing load.');
  if (best.start === 0) {
    return cannot(
      'cc',
      'no-virgin-branch',
      `the curve is steepest at the start of loading (${rangeText(best.fit.range)}), so it shows no bend into a virgin line.`,
    );
  }
  let flattest = Number.POSITIVE_INFINITY;
  for (let i = 1; i <= best.start; i++) {
    const a = loading[i - 1] as CurveState;
    const b = loading[i] as CurveState;
    flattest = Math.min(flattest, (a.voidRatio - b.voidRatio) / Math.log10(b.stressKpa / a.stressKpa));
  }
  if (best.fit.value < MIN_VIRGIN_STEEPENING * flattest) {
    return cannot(
      'cc',
      'no-virgin-branch',
      `the steepest part (slope ${shown(best.fit.value)} over ${rangeText(best.fit.range)}) is less than ${MIN_VIRGIN_STEEPENING} times the slope before it (${shown(flattest)}); the loading may stop before yield, or the sample is disturbed.`,
    );
  }
  return { ok: true, value: best };
}

/** common practice (our own rule): a point is on the virgin line when within a tenth of a virgin step of it */
const ON_LINE_SHARE = 0.1;

/**
 * The index of the first first-loading point on the virgin line: from the start of the steepest window,
 * earlier points are taken while each lies within ON_LINE_SHARE of Cc × its step in log σ′ of the line.
 */
export function virginStart(loading: readonly CurveState[], window: { fit: SlopeFit; start: number }): number {
  const { line, value: cc } = window.fit;
  let start = window.start;
  while (start > 1) {
    const a = loading[start - 1] as CurveState;
    const b = loading[start] as CurveState;
    const offLine = Math.abs(a.voidRatio - (line.slope * Math.log10(a.stressKpa) + line.intercept));
    if (offLine > ON_LINE_SHARE * cc * Math.log10(b.stressKpa / a.stressKpa)) break;
    start--;
  }
  return start;
}

export function rangeText(range: StressRange): string {
  return `${shown(range.fromKpa)}–${shown(range.toKpa)} kPa`;
}
