import { type CompressionCurve, type CurveState, loadingStates } from './compression-curve';
import { compressionIndex, rangeText, virginStart } from './compression-index';
import { type CurvePoint, intersectionX, type Line, lineAt, lineThrough, type Segment, type StressRange } from './geometry';
import { maxCurvaturePoint, type NormalisedChart, normalisedChart } from './max-curvature';
import { because, cannot, type Derived, determined, shown } from './outcome';
import type { SlopeFit } from './slope-fit';

export interface CasagrandeChoice {
  /** the point of maximum curvature, by its stress on the smooth curve (a steward's choice) */
  maxCurvatureStressKpa?: number;
  /** the stresses whose first-loading points define the virgin line (otherwise Cc's line) */
  virginRange?: StressRange;
}

export interface CasagrandeConstruction {
  sigmaPKpa: number;
  /** the point of maximum curvature on the smooth curve, and who chose it */
  maxCurvature: CurvePoint & { chosenBy: 'auto' | 'person' };
  /** the smooth curve through the first-loading points the curvature was read from */
  smoothCurve: CurvePoint[];
  horizontal: Segment<CurvePoint>;
  tangent: Segment<CurvePoint>;
  bisector: Segment<CurvePoint>;
  /** the virgin line, from the intersection to the end of its range */
  virginLine: Segment<CurvePoint>;
  intersection: CurvePoint;
  virgin: SlopeFit;
  /** the frame the angles are bisected in: draw it square for the bisector to look like one */
  chart: NormalisedChart;
}

/**
 * σ′p by Casagrande's construction (Casagrande 1936, Proc. 1st ICSMFE, Vol. 3: 60–64; UFC 3-220-10
 * Fig. 3-12): at the point of maximum curvature of the e–log σ′ curve draw a horizontal and the tangent,
 * bisect the angle between them, and extend the straight virgin line back to the bisector; the stress
 * at that intersection is σ′p. The curve is a natural cubic spline through the first-loading points;
 * curvature and angles are measured on a square chart spanning those points (so they do not depend on
 * how a plot happens to be stretched). The point of maximum curvature is searched where the curve bends
 * into the virgin line — from two points before the first point on that line to the point after it — or
 * taken where a person put it.
 */
export function casagrandePreconsolidation(
  curve: CompressionCurve,
  choice: CasagrandeChoice = {},
): Derived<CasagrandeConstruction> {
  const virginResult = compressionIndex(curve, choice.virginRange ? { range: choice.virginRange } : {});
  if (!virginResult.ok) return because('sigmaPCasagrande', virginResult);
  const virgin = virginResult.value;
  const loading = loadingStates(curve);
  const windowStart = loading.findIndex((s) => s.stressKpa >= virgin.range.fromKpa * (1 - 1e-9));
  const firstOnLine = choice.virginRange ? windowStart : virginStart(loading, { fit: virgin, start: windowStart });
  if (windowStart < 1 || firstOnLine < 1) {
    return cannot(
      'sigmaPCasagrande',
      'no-virgin-branch',
      `no first-loading point lies before the virgin line (${rangeText(virgin.range)}).`,
    );
  }
  const chart = normalisedChart(loading);
  let point: { x: number; e: number; slope: number };
  if (choice.maxCurvatureStressKpa !== undefined) {
    const s = choice.maxCurvatureStressKpa;
    const first = loading[0] as CurveState;
    const last = loading[loading.length - 1] as CurveState;
    if (!(s >= first.stressKpa && s <= last.stressKpa)) {
      return cannot(
        'sigmaPCasagrande',
        'out-of-range',
        `the chosen point ${shown(s)} kPa lies outside the first loading (${shown(first.stressKpa)}–${shown(last.stressKpa)} kPa).`,
      );
    }
    point = chart.pointAt(Math.log10(s));
  } else {
    const searchFrom = loading[Math.max(0, firstOnLine - 2)] as CurveState;
    const searchTo = loading[Math.min(firstOnLine + 1, loading.length - 1)] as CurveState;
    const found = maxCurvaturePoint(chart, Math.log10(searchFrom.stressKpa), Math.log10(searchTo.stressKpa));
    if (!found.ok) return found;
    point = found.value;
  }
  const bisectorSlope = chart.toData(Math.tan(Math.atan(chart.toChart(point.slope)) / 2));
  const bisector = lineThrough(point.x, point.e, bisectorSlope);
  const x = intersectionX(bisector, virgin.line);
  const xFirst = Math.log10((loading[0] as CurveState).stressKpa);
  const xVirginEnd = Math.log10(virgin.range.toKpa);
  if (x === null || x < xFirst - 1e-9 || x > xVirginEnd + 1e-9) {
    return cannot(
      'sigmaPCasagrande',
      'no-intersection',
      'the bisector does not meet the virgin line within the loaded range; check the chosen point and virgin line.',
    );
  }
  const at = (line: Line, xx: number): CurvePoint => ({ stressKpa: 10 ** xx, voidRatio: lineAt(line, xx) });
  const reach = 0.25 * chart.logSpan;
  const tangent = lineThrough(point.x, point.e, point.slope);
  const horizontal = lineThrough(point.x, point.e, 0);
  return determined({
    sigmaPKpa: 10 ** x,
    maxCurvature: {
      stressKpa: 10 ** point.x,
      voidRatio: point.e,
      chosenBy: choice.maxCurvatureStressKpa === undefined ? 'auto' : 'person',
    },
    smoothCurve: chart.smooth(60),
    horizontal: { from: at(horizontal, point.x), to: at(horizontal, point.x + reach) },
    tangent: { from: at(tangent, point.x - reach / 2), to: at(tangent, point.x + reach) },
    bisector: { from: at(bisector, point.x), to: at(bisector, Math.max(x, point.x) + reach / 4) },
    virginLine: { from: at(virgin.line, Math.min(x, point.x)), to: at(virgin.line, xVirginEnd) },
    intersection: at(virgin.line, x),
    virgin,
    chart: chart.frame,
  });
}
