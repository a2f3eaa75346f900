/**
 * A dense table of a degree-of-consolidation curve against ln(time), read by linear
 * interpolation: the cheap U(t) the Monte Carlo loop needs. With 1024 points over the curve's
 * range (ln-step ≈ 0.016) the interpolation error is below 1e-4 everywhere (bounded by
 * step²/8·|d²U/d(ln t)²| ≤ 3e-5 for the Terzaghi curve; checked in tests).
 * Before the first point U grows as √t (the early-time form of every 1-D curve with a drained
 * face); after the last point U keeps the last value (the table ends where U ≈ 1).
 */

export interface DegreeTable {
  lnStart: number;
  lnStep: number;
  /** Degree (0…1) at ln t = lnStart + i·lnStep. */
  values: Float64Array;
}

/** Nodes per table: ln-step ≈ 0.018 over the usual 8-decade range. */
export const TABLE_POINTS = 1024;

/** Times (years) of the table nodes from tStart to tEnd (> tStart > 0), geometric. */
export function tableTimes(startYears: number, endYears: number, points = TABLE_POINTS): Float64Array {
  const lnStart = Math.log(startYears);
  const lnStep = (Math.log(endYears) - lnStart) / (points - 1);
  const times = new Float64Array(points);
  for (let i = 0; i < points; i++) times[i] = Math.exp(lnStart + i * lnStep);
  return times;
}

/** Builds a table from values already computed at `tableTimes(startYears, endYears, values.length)`. */
export function tableFromValues(startYears: number, endYears: number, values: Float64Array): DegreeTable {
  const lnStart = Math.log(startYears);
  return { lnStart, lnStep: (Math.log(endYears) - lnStart) / (values.length - 1), values };
}

/** Builds a table by evaluating `degreeAt` (years → 0…1) at the table nodes. */
export function tableFromFunction(
  degreeAt: (timeYears: number) => number,
  startYears: number,
  endYears: number,
  points = TABLE_POINTS,
): DegreeTable {
  const times = tableTimes(startYears, endYears, points);
  const values = new Float64Array(points);
  for (let i = 0; i < points; i++) values[i] = degreeAt(times[i] as number);
  return tableFromValues(startYears, endYears, values);
}

/** Degree at ln(time); see the module comment for the behaviour outside the table. */
export function lookupDegree(table: DegreeTable, lnTime: number): number {
  const x = (lnTime - table.lnStart) / table.lnStep;
  const values = table.values;
  if (x <= 0) return (values[0] as number) * Math.exp(0.5 * (lnTime - table.lnStart));
  const last = values.length - 1;
  if (x >= last) return values[last] as number;
  const i = Math.floor(x);
  const a = values[i] as number;
  return a + (x - i) * ((values[i + 1] as number) - a);
}
