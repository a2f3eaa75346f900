import type { CurveState } from './compression-curve';
import { type CurvePoint, fitLine, type Line, type Segment, type StressRange, stressSegment } from './geometry';

/** A straight line fitted on the e–log σ′ chart over a stated range of stresses. */
export interface SlopeFit {
  /** the index: −Δe/Δlog10 σ′ (Cc or Cr), positive */
  value: number;
  range: StressRange;
  /** the laboratory points the line was fitted to */
  points: CurvePoint[];
  /** e = slope·log10(σ′) + intercept */
  line: Line;
  /** the fitted line across its range, to draw */
  segment: Segment<CurvePoint>;
  /** root mean square residual of the fit, in void ratio */
  rmsResidual: number;
  chosenBy: 'auto' | 'person';
}

/** Least-squares line of e on log10 σ′ through at least two states of different stress. */
export function fitSlope(states: readonly CurveState[], chosenBy: SlopeFit['chosenBy']): SlopeFit {
  const fit = fitLine(
    states.map((s) => Math.log10(s.stressKpa)),
    states.map((s) => s.voidRatio),
  );
  const stresses = states.map((s) => s.stressKpa);
  const range = { fromKpa: Math.min(...stresses), toKpa: Math.max(...stresses) };
  return {
    value: -fit.slope,
    range,
    points: states.map(({ stressKpa, voidRatio }) => ({ stressKpa, voidRatio })),
    line: { slope: fit.slope, intercept: fit.intercept },
    segment: stressSegment(fit, range.fromKpa, range.toKpa),
    rmsResidual: fit.rmsResidual,
    chosenBy,
  };
}

export function distinctStresses(states: readonly CurveState[]): number {
  return new Set(states.map((s) => s.stressKpa)).size;
}

export function withinRange(states: readonly CurveState[], range: StressRange): CurveState[] {
  const lo = Math.min(range.fromKpa, range.toKpa) * (1 - 1e-9);
  const hi = Math.max(range.fromKpa, range.toKpa) * (1 + 1e-9);
  return states.filter((s) => s.stressKpa >= lo && s.stressKpa <= hi);
}
