import { fitLine, type Line, lineAt, type Segment } from './geometry';
import { cannot, type Derived, determined, shown } from './outcome';
import type { NaturalSpline } from './spline';
import type { TimePoint } from './time-readings';

/**
 * The parts of Casagrande's log-time construction that read the smooth curve: the inflection (steepest
 * point) and its tangent, the straight secondary tail, and the time the curve reaches a level.
 */

/**
 * common practice (our own rules): a reading joins the tail when it lies within 0.5 % of the change
 * (0.005 mm at least) of the line through the later ones; the tail is at most half as steep as the inflection
 */
const TAIL_STRAIGHTNESS = 0.005;
const TAIL_MIN_MM = 0.005;
const TAIL_SLOPE_SHARE = 0.5;

export type Inflection = Derived<{ x: number; y: number; slope: number }>;

export function steepest(spline: NaturalSpline, from: number, to: number): Inflection {
  let best = { x: from, y: 0, slope: Number.NEGATIVE_INFINITY };
  for (let i = 0; i <= 400; i++) {
    const x = from + ((to - from) * i) / 400;
    const p = spline.at(x);
    if (p.dy > best.slope) best = { x, y: p.y, slope: p.dy };
  }
  if (!(best.slope > 0)) return cannot('cvLogTime', 'no-intersection', 'the readings do not rise with log time.');
  return determined(best);
}

export function inflectionAt(spline: NaturalSpline, timeMin: number, xs: readonly number[]): Inflection {
  const x = Math.log10(timeMin);
  if (!(x >= (xs[0] as number) && x <= (xs[xs.length - 1] as number))) {
    return cannot('cvLogTime', 'out-of-range', `the chosen inflection ${shown(timeMin)} min lies outside the readings.`);
  }
  const p = spline.at(x);
  if (!(p.dy > 0)) return cannot('cvLogTime', 'no-intersection', `the curve does not rise at the chosen ${shown(timeMin)} min.`);
  return determined({ x, y: p.y, slope: p.dy });
}

/**
 * The trailing readings after the inflection that lie on one straight line: the last three, then
 * each earlier reading in turn while it lies within TAIL_STRAIGHTNESS of the change (at least TAIL_MIN_MM)
 * of the line through the later ones; the line must be at most TAIL_SLOPE_SHARE as steep as the inflection.
 */
export function autoTail(
  xs: readonly number[],
  y: readonly number[],
  inflection: { x: number; slope: number },
  change: number,
): number[] {
  const n = xs.length;
  const tolerance = Math.max(TAIL_STRAIGHTNESS * change, TAIL_MIN_MM);
  const lineFrom = (start: number) => {
    const idx = Array.from({ length: n - start }, (_, k) => start + k);
    return {
      idx,
      fit: fitLine(
        idx.map((i) => xs[i] as number),
        idx.map((i) => y[i] as number),
      ),
    };
  };
  const usable = (start: number) => {
    if (start < 0 || !((xs[start] as number) > inflection.x)) return false;
    const { idx, fit } = lineFrom(start);
    return (
      fit.slope <= TAIL_SLOPE_SHARE * inflection.slope &&
      idx.every((i) => Math.abs((y[i] as number) - lineAt(fit, xs[i] as number)) <= tolerance)
    );
  };
  if (!usable(n - 3)) return [];
  let start = n - 3;
  while (start > 0 && (xs[start - 1] as number) > inflection.x) {
    const { fit } = lineFrom(start);
    if (Math.abs((y[start - 1] as number) - lineAt(fit, xs[start - 1] as number)) > tolerance) break;
    start--;
  }
  return Array.from({ length: n - start }, (_, i) => start + i);
}

/** The first log time at which the smooth curve reaches `level`, by bisection within the bracketing readings. */
export function crossing(spline: NaturalSpline, xs: readonly number[], level: number): number | null {
  for (let i = 1; i < xs.length; i++) {
    let lo = xs[i - 1] as number;
    let hi = xs[i] as number;
    if (spline.at(lo).y > level) return null;
    if (spline.at(hi).y < level) continue;
    for (let k = 0; k < 60; k++) {
      const mid = (lo + hi) / 2;
      if (spline.at(mid).y < level) lo = mid;
      else hi = mid;
    }
    return (lo + hi) / 2;
  }
  return null;
}

export function segment(line: Line, from: number, to: number, point: (x: number, y: number) => TimePoint): Segment<TimePoint> {
  return { from: point(from, lineAt(line, from)), to: point(to, lineAt(line, to)) };
}
