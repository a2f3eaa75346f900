import type { CurveState } from './compression-curve';
import type { CurvePoint } from './geometry';
import { cannot, type Derived, determined, shown } from './outcome';
import { NaturalSpline } from './spline';

/** The frame of a square e–log σ′ chart: both spans drawn the same length. */
export interface NormalisedChart {
  stressFromKpa: number;
  stressToKpa: number;
  voidRatioFrom: number;
  voidRatioTo: number;
}

/** common practice (our own rule): a second bend turning this far, this far away, makes the choice ambiguous */
const AMBIGUOUS_SHARPNESS = 0.8;
const AMBIGUOUS_DISTANCE_LOG_CYCLES = 0.2;
const GRID = 400;

/** A spline through first-loading points on a square chart: x = log10 σ′, e, slopes converted both ways. */
export function normalisedChart(loading: readonly CurveState[]) {
  const xs = loading.map((s) => Math.log10(s.stressKpa));
  const es = loading.map((s) => s.voidRatio);
  const x0 = Math.min(...xs);
  const logSpan = Math.max(...xs) - x0;
  const e0 = Math.min(...es);
  const eSpan = Math.max(...es) - e0 || 1;
  const spline = new NaturalSpline(
    xs.map((x) => (x - x0) / logSpan),
    es.map((e) => (e - e0) / eSpan),
  );
  const frame: NormalisedChart = {
    stressFromKpa: 10 ** x0,
    stressToKpa: 10 ** (x0 + logSpan),
    voidRatioFrom: e0,
    voidRatioTo: e0 + eSpan,
  };
  const pointAt = (x: number) => {
    const p = spline.at((x - x0) / logSpan);
    return { x, e: e0 + p.y * eSpan, slope: (p.dy * eSpan) / logSpan, curvature: -p.d2y / (1 + p.dy * p.dy) ** 1.5 };
  };
  return {
    frame,
    logSpan,
    pointAt,
    /** a slope de/dlog10σ′ on the square chart, and back */
    toChart: (slope: number) => (slope * logSpan) / eSpan,
    toData: (slope: number) => (slope * eSpan) / logSpan,
    smooth(count: number): CurvePoint[] {
      return Array.from({ length: count }, (_, i) => {
        const x = x0 + (logSpan * i) / (count - 1);
        return { stressKpa: 10 ** x, voidRatio: pointAt(x).e };
      });
    },
  };
}

export type Chart = ReturnType<typeof normalisedChart>;

/**
 * The point of maximum curvature of the bend towards the virgin line, between two log stresses. Curvature
 * is κ = −v″/(1 + v′²)^1.5 on the square chart (downward bends only). Where the curve has more than one
 * bend (e.g. the end of reloading at σ′v0 and yield at σ′p), the bend that turns through the largest angle
 * is taken — each bend reaching from the least curved point before its peak to the least curved point
 * after it — and its curvature peak is the point. Refused when the curve never bends downwards there, or
 * when a second bend elsewhere turns nearly as far (then a person must choose).
 */
export function maxCurvaturePoint(chart: Chart, fromX: number, toX: number): Derived<{ x: number; e: number; slope: number }> {
  const samples = Array.from({ length: GRID + 1 }, (_, i) => chart.pointAt(fromX + ((toX - fromX) * i) / GRID));
  const kappa = (i: number) => samples[i]?.curvature ?? Number.NEGATIVE_INFINITY;
  const peaks: number[] = [];
  for (let i = 0; i <= GRID; i++) if (kappa(i) > 0 && kappa(i) >= kappa(i - 1) && kappa(i) >= kappa(i + 1)) peaks.push(i);
  if (peaks.length === 0)
    return cannot('sigmaPCasagrande', 'no-virgin-branch', 'the curve does not bend down towards a virgin line.');
  const angle = (i: number) => Math.atan(chart.toChart((samples[i] as (typeof samples)[number]).slope));
  const bends = peaks.map((peak, k) => {
    const left = lowestBetween(kappa, k === 0 ? 0 : (peaks[k - 1] as number), peak);
    const right = lowestBetween(kappa, peak, k === peaks.length - 1 ? GRID : (peaks[k + 1] as number));
    return { peak, turn: angle(left) - angle(right) };
  });
  bends.sort((a, b) => b.turn - a.turn);
  const best = bends[0] as (typeof bends)[number];
  const at = samples[best.peak] as (typeof samples)[number];
  const rival = bends.find((b) => Math.abs((samples[b.peak]?.x ?? at.x) - at.x) > AMBIGUOUS_DISTANCE_LOG_CYCLES);
  if (rival && rival.turn >= AMBIGUOUS_SHARPNESS * best.turn) {
    return cannot(
      'sigmaPCasagrande',
      'too-noisy',
      `the curve bends about as far at ${shown(10 ** at.x)} kPa as at ${shown(10 ** (samples[rival.peak]?.x ?? 0))} kPa; choose the point of maximum curvature.`,
    );
  }
  return determined(at);
}

/** The sample index of least curvature from `from` to `to` (inclusive). */
function lowestBetween(kappa: (i: number) => number, from: number, to: number): number {
  let best = from;
  for (let i = from; i <= to; i++) if (kappa(i) < kappa(best)) best = i;
  return best;
}
