import type { TimeRange } from './geometry';
import { cannot, type Derived, determined, type LabParameter, shown } from './outcome';
import type { TimeReading } from './test-input';

/** A time–deformation point to draw: minutes since the increment was applied, settlement since the start, mm. */
export interface TimePoint {
  timeMin: number;
  deformationMm: number;
}

/**
 * The readings of one increment made ready for fitting: times above zero, ascending, and turned so that the
 * movement the load causes is positive (`sign` = −1 for a swelling unloading). `y` is sign × deformation.
 */
export interface PreparedReadings {
  times: number[];
  y: number[];
  sign: 1 | -1;
  /** |last − first| of the readings above zero time, mm */
  changeMm: number;
  toPoint(timeMin: number, y: number): TimePoint;
}

export const MIN_READINGS = 6;
/** common practice (our own rule): the least movement worth fitting, mm (a few dial divisions) */
export const MIN_CHANGE_MM = 0.02;
/** common practice (our own rule): a reading may fall back by one 0.01 mm dial division, or this share of the change, before it counts as backwards */
const BACKWARDS_MM = 0.01;
const BACKWARDS_SHARE = 0.03;

/** Checks and orders an increment's readings; `expectedSign` is +1 for loading, −1 for unloading. */
export function prepareReadings(
  parameter: LabParameter,
  readings: readonly TimeReading[] | undefined,
  expectedSign: 1 | -1,
): Derived<PreparedReadings> {
  if (!readings || readings.length === 0)
    return cannot(parameter, 'no-readings', 'the increment has no time–deformation readings.');
  const used = readings.filter((r) => r.elapsedMin > 0).sort((a, b) => a.elapsedMin - b.elapsedMin);
  for (const [i, r] of used.entries()) {
    if (!Number.isFinite(r.elapsedMin) || !Number.isFinite(r.deformationMm)) {
      return cannot(parameter, 'missing-input', 'a reading has no usable time or deformation.');
    }
    if (i > 0 && used[i - 1]?.elapsedMin === r.elapsedMin) {
      return cannot(parameter, 'missing-input', `two readings are at the same time (${shown(r.elapsedMin)} min).`);
    }
  }
  if (used.length < MIN_READINGS) {
    return cannot(
      parameter,
      'too-few-points',
      `the increment has ${used.length} readings after the load went on; at least ${MIN_READINGS} are needed.`,
    );
  }
  const first = used[0] as TimeReading;
  const last = used[used.length - 1] as TimeReading;
  const changeMm = Math.abs(last.deformationMm - first.deformationMm);
  if (changeMm < MIN_CHANGE_MM) {
    return cannot(
      parameter,
      'too-noisy',
      `the specimen moves only ${shown(changeMm)} mm during the increment, too little to fit.`,
    );
  }
  const sign: 1 | -1 = last.deformationMm >= first.deformationMm ? 1 : -1;
  if (sign !== expectedSign) {
    return cannot(
      parameter,
      'goes-backwards',
      `the readings ${sign === 1 ? 'compress' : 'swell'} although the increment ${expectedSign === 1 ? 'adds' : 'removes'} load.`,
    );
  }
  const tolerance = backwardsTolerance(changeMm);
  let peak = first;
  for (const r of used) {
    if (sign * (peak.deformationMm - r.deformationMm) > tolerance) {
      return cannot(
        parameter,
        'goes-backwards',
        `the reading at ${shown(r.elapsedMin)} min (${shown(r.deformationMm)} mm) goes back past the one at ${shown(peak.elapsedMin)} min (${shown(peak.deformationMm)} mm).`,
      );
    }
    if (sign * (r.deformationMm - peak.deformationMm) > 0) peak = r;
  }
  return determined({
    times: used.map((r) => r.elapsedMin),
    y: used.map((r) => sign * r.deformationMm),
    sign,
    changeMm,
    toPoint: (timeMin, y) => ({ timeMin, deformationMm: sign * y }),
  });
}

/** How far (mm) a reading may fall back against the load before it counts as going backwards. */
export function backwardsTolerance(changeMm: number): number {
  return Math.max(BACKWARDS_MM, BACKWARDS_SHARE * changeMm);
}

export function timesWithin(prepared: PreparedReadings, range: TimeRange): number[] {
  const lo = Math.min(range.fromMin, range.toMin) * (1 - 1e-9);
  const hi = Math.max(range.fromMin, range.toMin) * (1 + 1e-9);
  return prepared.times.flatMap((t, i) => (t >= lo && t <= hi ? [i] : []));
}

/** Drainage path, mm: half the mean height during the increment for drainage at both faces, the whole of it for one. */
export function drainagePathMm(meanHeightMm: number, drainage: 'double' | 'single'): number {
  return drainage === 'double' ? meanHeightMm / 2 : meanHeightMm;
}

/**
 * When an increment's own time readings end further back than an earlier reading (against the load, by
 * more than the tolerance of `prepareReadings`), its end value cannot be trusted: the gauge may have slipped.
 */
export function readingsSlip(inc: { readings?: readonly TimeReading[] }, sign: 1 | -1): string | null {
  const readings = inc.readings?.filter((r) => r.elapsedMin > 0 && Number.isFinite(r.deformationMm));
  if (!readings || readings.length < 2) return null;
  const ordered = [...readings].sort((a, b) => a.elapsedMin - b.elapsedMin);
  const last = ordered[ordered.length - 1] as TimeReading;
  const peak = ordered.reduce((p, r) => (sign * (r.deformationMm - p.deformationMm) > 0 ? r : p));
  const change = Math.abs(last.deformationMm - (ordered[0] as TimeReading).deformationMm);
  const back = sign * (peak.deformationMm - last.deformationMm);
  if (back <= backwardsTolerance(change)) return null;
  return `ends ${shown(back)} mm back from its own reading at ${shown(peak.elapsedMin)} min: the gauge may have slipped`;
}
