/**
 * The running integral D(t) = ∫₀ᵗ (1 − U(s)) ds of a tabulated degree curve U, so that the
 * Duhamel (ramp-loading) average over [a, t] costs two look-ups:
 * (1/tc)·∫ₐᵗ U ds = [(t − a) − (D(t) − D(a))]/tc.
 * D is built on the degree table's nodes by Simpson's rule in ln s (U linear in ln s between
 * nodes, as the degree table reads it) and read by cubic Hermite interpolation in ln t with its
 * exact slope dD/d(ln t) = t·(1 − U(t)); relative error about 1e-9 of D.
 */
import type { DegreeTable } from './degree-table';

export interface DeficitTable {
  lnStart: number;
  lnStep: number;
  deficit: Float64Array;
  /** dD/d(ln t) = t·(1 − U) at each node. */
  slope: Float64Array;
  startYears: number;
  startDegree: number;
  endYears: number;
  endDegree: number;
}

/** Builds the running integral of 1 − U from a degree table (times in years). */
export function deficitTable(table: DegreeTable): DeficitTable {
  const { lnStart, lnStep, values } = table;
  const n = values.length;
  const deficit = new Float64Array(n);
  const slope = new Float64Array(n);
  const startYears = Math.exp(lnStart);
  const u0 = values[0] as number;
  deficit[0] = startYears * (1 - (2 / 3) * u0);
  for (let k = 0; k < n; k++) slope[k] = Math.exp(lnStart + k * lnStep) * (1 - (values[k] as number));
  for (let k = 0; k + 1 < n; k++) {
    const uMid = ((values[k] as number) + (values[k + 1] as number)) / 2;
    const midSlope = Math.exp(lnStart + (k + 0.5) * lnStep) * (1 - uMid);
    deficit[k + 1] = (deficit[k] as number) + (lnStep / 6) * ((slope[k] as number) + 4 * midSlope + (slope[k + 1] as number));
  }
  return {
    lnStart,
    lnStep,
    deficit,
    slope,
    startYears,
    startDegree: u0,
    endYears: Math.exp(lnStart + (n - 1) * lnStep),
    endDegree: values[n - 1] as number,
  };
}

/** D at ln t (t in years); D(0) = 0. */
export function lookupDeficit(d: DeficitTable, lnTime: number): number {
  const x = (lnTime - d.lnStart) / d.lnStep;
  const last = d.deficit.length - 1;
  if (x <= 0) {
    const t = Math.exp(lnTime);
    return t * (1 - (2 / 3) * d.startDegree * Math.sqrt(t / d.startYears));
  }
  if (x >= last) return (d.deficit[last] as number) + (Math.exp(lnTime) - d.endYears) * (1 - d.endDegree);
  const k = x | 0;
  const s = x - k;
  const s2 = s * s;
  const s3 = s2 * s;
  return (
    (2 * s3 - 3 * s2 + 1) * (d.deficit[k] as number) +
    (s3 - 2 * s2 + s) * d.lnStep * (d.slope[k] as number) +
    (-2 * s3 + 3 * s2) * (d.deficit[k + 1] as number) +
    (s3 - s2) * d.lnStep * (d.slope[k + 1] as number)
  );
}
