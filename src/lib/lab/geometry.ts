import { linearRegression } from 'simple-statistics';

/**
 * Geometry returned with every construction, for a chart to draw. Points are in the data's own units
 * (stress kPa, void ratio, time min, deformation mm, work kJ/m³); a segment is straight on the chart
 * the construction belongs to (e–log σ′: log stress axis; root time: √t axis; log time: log t axis),
 * so a renderer joins its two ends with a straight line on that chart.
 */
export interface CurvePoint {
  stressKpa: number;
  voidRatio: number;
}

export interface Segment<P> {
  from: P;
  to: P;
}

/** A stress range a person chose (or the interpretation chose and reports), kPa, both ends included. */
export interface StressRange {
  fromKpa: number;
  toKpa: number;
}

/** A time range, minutes since the increment was applied, both ends included. */
export interface TimeRange {
  fromMin: number;
  toMin: number;
}

/** y = slope·x + intercept, in whatever transformed axes the caller uses (log10 stress, √t, …). */
export interface Line {
  slope: number;
  intercept: number;
}

export interface FittedLine extends Line {
  /** root mean square of the residuals, in y units */
  rmsResidual: number;
}

/** Least-squares line through (x, y) pairs (at least two distinct x). */
export function fitLine(xs: readonly number[], ys: readonly number[]): FittedLine {
  const pairs = xs.map((x, i) => [x, ys[i] as number]);
  const { m, b } = linearRegression(pairs);
  let sum = 0;
  for (const [x, y] of pairs) sum += ((y as number) - (m * (x as number) + b)) ** 2;
  return { slope: m, intercept: b, rmsResidual: Math.sqrt(sum / pairs.length) };
}

export function lineAt(line: Line, x: number): number {
  return line.slope * x + line.intercept;
}

/** The x where two lines meet, or null when they are parallel. */
export function intersectionX(a: Line, b: Line): number | null {
  const d = a.slope - b.slope;
  if (Math.abs(d) < 1e-15) return null;
  return (b.intercept - a.intercept) / d;
}

/** The line through a point with a given slope. */
export function lineThrough(x: number, y: number, slope: number): Line {
  return { slope, intercept: y - slope * x };
}

/** A segment of a line on the e–log σ′ chart between two stresses. */
export function stressSegment(line: Line, fromKpa: number, toKpa: number): Segment<CurvePoint> {
  return {
    from: { stressKpa: fromKpa, voidRatio: lineAt(line, Math.log10(fromKpa)) },
    to: { stressKpa: toKpa, voidRatio: lineAt(line, Math.log10(toKpa)) },
  };
}

export function inRange(value: number, range: { from: number; to: number }): boolean {
  const lo = Math.min(range.from, range.to);
  const hi = Math.max(range.from, range.to);
  const slack = 1e-9 * Math.max(1, Math.abs(hi));
  return value >= lo - slack && value <= hi + slack;
}
