import { fitLine, type Segment, type TimeRange } from './geometry';
import { cannot, type Derived, determined, shown } from './outcome';
import { NaturalSpline } from './spline';
import { cvFromTime, T90, TAYLOR_FACTOR } from './time-factors';
import { type PreparedReadings, type TimePoint, timesWithin } from './time-readings';

export interface RootTimeChoice {
  /** the readings the initial straight line is fitted to (a steward's choice), minutes */
  fitRangeMin?: TimeRange;
}

export interface RootTimeConstruction {
  cvM2PerYear: number;
  t90Min: number;
  /** corrected zero: the initial line at √t = 0 */
  d0Mm: number;
  d90Mm: number;
  /** d0 + (d90 − d0)/0.9 */
  d100Mm: number;
  drainagePathMm: number;
  /** straight on the √t chart */
  initialLine: Segment<TimePoint>;
  /** from d0 with abscissae TAYLOR_FACTOR times the initial line's; straight on the √t chart */
  factoredLine: Segment<TimePoint>;
  fitPoints: TimePoint[];
  fitRange: TimeRange;
  chosenBy: 'auto' | 'person';
}

/** common practice (our own rule): the straight part is taken from readings within the first half of the change */
const EARLY_SHARE = 0.5;
/** common practice (our own rule): scatter about the initial line above this share of the change is noise */
const MAX_SCATTER = 0.03;

/**
 * cv by Taylor's root-time method (Taylor 1948, Fundamentals of Soil Mechanics; UFC 3-220-10 §5-5.3.4.1,
 * Fig. 5-21; ASTM D2435/D2435M): deformation against √t; a straight line through the early readings gives
 * the corrected zero d0 at √t = 0; a second line from d0 with abscissae TAYLOR_FACTOR (≈ 1.15) times larger
 * cuts the readings at t90 (see `crossing`); cv = T90·Hdr²/t90 with T90 from the exact series.
 */
export function taylorRootTime(
  prepared: PreparedReadings,
  drainagePathMm: number,
  choice: RootTimeChoice = {},
): Derived<RootTimeConstruction> {
  const { times, y } = prepared;
  const yFirst = y[0] as number;
  const yLast = y[y.length - 1] as number;
  const fitIndices = choice.fitRangeMin
    ? timesWithin(prepared, choice.fitRangeMin)
    : y.flatMap((v, i) => (v - yFirst <= EARLY_SHARE * (yLast - yFirst) ? [i] : []));
  if (fitIndices.length < 3) {
    const why = choice.fitRangeMin ? 'the chosen range holds' : 'the first half of the change has';
    return cannot(
      'cvRootTime',
      'too-few-points',
      `${why} ${fitIndices.length} reading(s); the initial straight line needs 3 (read early: 0.1, 0.25, 0.5, 1 min).`,
    );
  }
  const roots = times.map(Math.sqrt);
  const fit = fitLine(
    fitIndices.map((i) => roots[i] as number),
    fitIndices.map((i) => y[i] as number),
  );
  if (!(fit.slope > 0)) return cannot('cvRootTime', 'no-intersection', 'the early readings do not rise with √t.');
  if (fit.rmsResidual > MAX_SCATTER * prepared.changeMm) {
    return cannot(
      'cvRootTime',
      'too-noisy',
      `the early readings scatter by ${shown(fit.rmsResidual)} mm about their straight line.`,
    );
  }
  const d0 = fit.intercept;
  const factoredSlope = fit.slope / TAYLOR_FACTOR;
  const root = crossing(roots, y, d0, factoredSlope, fitIndices.at(-1) as number);
  if (root === null)
    return cannot('cvRootTime', 'incomplete', 'the readings never reach the 1.15 line: they end before 90 % consolidation.');
  const t90Min = root * root;
  const d90 = d0 + factoredSlope * root;
  const reach = Math.max(root * 1.3, Math.sqrt(times[Math.min(times.length - 1, (fitIndices.at(-1) as number) + 1)] as number));
  const at = (r: number, slope: number) => prepared.toPoint(r * r, d0 + slope * r);
  return determined({
    cvM2PerYear: cvFromTime(T90, drainagePathMm, t90Min),
    t90Min,
    d0Mm: prepared.sign * d0,
    d90Mm: prepared.sign * d90,
    d100Mm: prepared.sign * (d0 + (d90 - d0) / 0.9),
    drainagePathMm,
    initialLine: { from: at(0, fit.slope), to: at(reach, fit.slope) },
    factoredLine: { from: at(0, factoredSlope), to: at(reach, factoredSlope) },
    fitPoints: fitIndices.map((i) => prepared.toPoint(times[i] as number, y[i] as number)),
    fitRange: { fromMin: times[fitIndices[0] as number] as number, toMin: times[fitIndices.at(-1) as number] as number },
    chosenBy: choice.fitRangeMin ? 'person' : 'auto',
  });
}

/**
 * The first √t after reading `from` (the end of the straight part) where the readings fall from above the
 * factored line to on or below it: bracketed between two readings, then found by bisection on a natural
 * cubic spline through the readings in √t.
 */
function crossing(roots: readonly number[], y: readonly number[], d0: number, slope: number, from: number): number | null {
  const spline = new NaturalSpline(roots, y);
  const gap = (r: number) => spline.at(r).y - (d0 + slope * r);
  for (let i = from + 1; i < roots.length; i++) {
    let lo = roots[i - 1] as number;
    let hi = roots[i] as number;
    if (!(gap(lo) > 0 && gap(hi) <= 0)) continue;
    for (let k = 0; k < 60; k++) {
      const mid = (lo + hi) / 2;
      if (gap(mid) > 0) lo = mid;
      else hi = mid;
    }
    return (lo + hi) / 2;
  }
  return null;
}
