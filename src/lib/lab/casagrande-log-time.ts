import { fitLine, intersectionX, lineAt, lineThrough, type Segment, type TimeRange } from './geometry';
import { autoTail, crossing, inflectionAt, segment, steepest } from './log-time-parts';
import { cannot, type Derived, determined, shown } from './outcome';
import { NaturalSpline } from './spline';
import { cvFromTime, T50 } from './time-factors';
import { type PreparedReadings, type TimePoint, timesWithin } from './time-readings';

export interface LogTimeChoice {
  /** the time of the inflection point whose tangent is drawn (a steward's choice), minutes */
  inflectionMin?: number;
  /** the readings the secondary (tail) line is fitted to, minutes */
  tailRangeMin?: TimeRange;
}

export interface LogTimeConstruction {
  cvM2PerYear: number;
  t50Min: number;
  d0Mm: number;
  d50Mm: number;
  d100Mm: number;
  t100Min: number;
  drainagePathMm: number;
  /** the pairs (t, 4t) that placed d0 = d(t) − (d(4t) − d(t)) */
  d0Pairs: { t1Min: number; t2Min: number; d1Mm: number; d2Mm: number }[];
  inflection: TimePoint & { chosenBy: 'auto' | 'person' };
  /** straight on the log t chart */
  tangent: Segment<TimePoint>;
  tail: {
    points: TimePoint[];
    range: TimeRange;
    segment: Segment<TimePoint>;
    mmPerLogCycle: number;
    chosenBy: 'auto' | 'person';
  };
  smoothCurve: TimePoint[];
}

/** common practice (our own rules): d0 pairs end within the first 40 % of the change; tail scatter above 3 % of it is noise */
const D0_SHARE = 0.4;
const MAX_TAIL_SCATTER = 0.03;

/**
 * cv by Casagrande's log-time method (Casagrande & Fadum 1940; UFC 3-220-10 §5-5.3.4.1, Fig. 5-21; ASTM
 * D2435/D2435M): deformation against log t; d0 from pairs of early times t and 4t (the parabola of the
 * early curve), d0 = d(t) − (d(4t) − d(t)), averaged over the pairs; d100 where the tangent at the
 * inflection meets the straight secondary tail; t50 where the curve reaches (d0 + d100)/2;
 * cv = T50·Hdr²/t50 with T50 from the exact series. The curve between readings is a natural cubic spline
 * in log t, which gives the inflection (steepest point), d(4t) between readings and t50.
 */
export function casagrandeLogTime(
  prepared: PreparedReadings,
  drainagePathMm: number,
  choice: LogTimeChoice = {},
): Derived<LogTimeConstruction> {
  const { times, y } = prepared;
  const xs = times.map(Math.log10);
  const spline = new NaturalSpline(xs, y);
  const yFirst = y[0] as number;
  const yLast = y[y.length - 1] as number;
  const change = yLast - yFirst;
  const d0Pairs: LogTimeConstruction['d0Pairs'] = [];
  for (const [i, t1] of times.entries()) {
    const t2 = 4 * t1;
    if (t2 > (times[times.length - 1] as number)) break;
    const y2 = spline.at(Math.log10(t2)).y;
    if (y2 - yFirst > D0_SHARE * change) break;
    d0Pairs.push({ t1Min: t1, t2Min: t2, d1Mm: y[i] as number, d2Mm: y2 });
  }
  if (d0Pairs.length === 0) {
    return cannot(
      'cvLogTime',
      'too-few-points',
      'no early reading t has its 4t within the first 40 % of the change, so d0 cannot be placed (read from 0.1 min).',
    );
  }
  const d0 = d0Pairs.reduce((s, p) => s + 2 * p.d1Mm - p.d2Mm, 0) / d0Pairs.length;
  const lastX = xs[xs.length - 1] as number;
  const inflection =
    choice.inflectionMin !== undefined
      ? inflectionAt(spline, choice.inflectionMin, xs)
      : steepest(spline, xs[0] as number, lastX);
  if (!inflection.ok) return inflection;
  const tangent = lineThrough(inflection.value.x, inflection.value.y, inflection.value.slope);
  const tailIndices = choice.tailRangeMin
    ? timesWithin(prepared, choice.tailRangeMin)
    : autoTail(xs, y, inflection.value, change);
  if (tailIndices.length < 2) {
    const why = choice.tailRangeMin
      ? 'the chosen tail range holds fewer than 2 readings'
      : 'the readings end before primary consolidation is over (no flat tail after the steep part)';
    return cannot('cvLogTime', 'incomplete', `${why}.`);
  }
  const tailFit = fitLine(
    tailIndices.map((i) => xs[i] as number),
    tailIndices.map((i) => y[i] as number),
  );
  if (tailFit.rmsResidual > MAX_TAIL_SCATTER * change) {
    return cannot('cvLogTime', 'too-noisy', `the tail readings scatter by ${shown(tailFit.rmsResidual)} mm about their line.`);
  }
  const x100 = intersectionX(tangent, tailFit);
  if (x100 === null || x100 <= inflection.value.x) {
    return cannot(
      'cvLogTime',
      'no-intersection',
      'the tangent at the inflection does not meet the tail line after the inflection.',
    );
  }
  const d100 = lineAt(tailFit, x100);
  const d50 = (d0 + d100) / 2;
  const x50 = crossing(spline, xs, d50);
  if (x50 === null)
    return cannot('cvLogTime', 'too-few-points', 'the first reading is already past 50 % consolidation; read earlier.');
  const t50Min = 10 ** x50;
  const point = (x: number, v: number) => prepared.toPoint(10 ** x, v);
  const tailRange = { fromMin: times[tailIndices[0] as number] as number, toMin: times[tailIndices.at(-1) as number] as number };
  return determined({
    cvM2PerYear: cvFromTime(T50, drainagePathMm, t50Min),
    t50Min,
    d0Mm: prepared.sign * d0,
    d50Mm: prepared.sign * d50,
    d100Mm: prepared.sign * d100,
    t100Min: 10 ** x100,
    drainagePathMm,
    d0Pairs: d0Pairs.map((p) => ({ ...p, d1Mm: prepared.sign * p.d1Mm, d2Mm: prepared.sign * p.d2Mm })),
    inflection: {
      ...point(inflection.value.x, inflection.value.y),
      chosenBy: choice.inflectionMin === undefined ? 'auto' : 'person',
    },
    tangent: segment(tangent, inflection.value.x - 0.6, x100 + 0.3, point),
    tail: {
      points: tailIndices.map((i) => point(xs[i] as number, y[i] as number)),
      range: tailRange,
      segment: segment(tailFit, x100 - 0.3, lastX, point),
      mmPerLogCycle: tailFit.slope,
      chosenBy: choice.tailRangeMin ? 'person' : 'auto',
    },
    smoothCurve: Array.from({ length: 60 }, (_, i) => {
      const x = (xs[0] as number) + ((lastX - (xs[0] as number)) * i) / 59;
      return point(x, spline.at(x).y);
    }),
  });
}
