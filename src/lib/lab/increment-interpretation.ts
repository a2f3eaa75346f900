import { WATER_UNIT_WEIGHT_SI_KN_PER_M3 } from '../consolidation/stress-vertical';
import { casagrandeLogTime, type LogTimeChoice, type LogTimeConstruction } from './casagrande-log-time';
import type { Branch, CompressionCurve, CurveState } from './compression-curve';
import type { TimeRange } from './geometry';
import { because, cannot, type Derived, determined } from './outcome';
import { type RootTimeChoice, type RootTimeConstruction, taylorRootTime } from './taylor-root-time';
import type { IncrementInput, SpecimenDrainage } from './test-input';
import { MINUTES_PER_YEAR } from './time-factors';
import { drainagePathMm, prepareReadings } from './time-readings';

export interface IncrementChoice {
  rootTime?: RootTimeChoice;
  logTime?: LogTimeChoice;
}

export interface SecondaryCompression {
  /** Cα = −Δe/Δlog10 t over the tail after the end of primary consolidation */
  cAlpha: number;
  tailRange: TimeRange;
}

export interface IncrementInterpretation {
  incrementNo: number;
  stressKpa: number;
  /** the stress before this increment (0 for the first) */
  previousStressKpa: number;
  branch: Branch;
  voidRatioStart: number;
  voidRatioEnd: number;
  /** mean specimen height during the increment, mm (null without the initial height) */
  meanHeightMm: number | null;
  /** coefficient of volume compressibility, m²/MN */
  mv: Derived<number>;
  rootTime: Derived<RootTimeConstruction>;
  logTime: Derived<LogTimeConstruction>;
  cAlpha: Derived<SecondaryCompression>;
  /** k = cv·mv·γw from each cv, m/s */
  kRootTime: Derived<number>;
  kLogTime: Derived<number>;
}

/**
 * Everything one increment gives: mv = (Δe/(1 + e_start))/Δσ′ (UFC 3-220-10 §5-5.2, mv form); cv by
 * Taylor's and by Casagrande's fitting of its time–deformation readings, with the drainage path half the
 * mean height (both faces drained) or all of it; Cα from the straight tail after the end of primary
 * consolidation, Cα = Δd/Hs per log cycle of time (ASTM D2435/D2435M); and k = cv·mv·γw (Terzaghi's
 * definition of cv; γw = 9.81 kN/m³).
 */
export function interpretIncrement(
  curve: CompressionCurve,
  index: number,
  input: IncrementInput | undefined,
  drainage: SpecimenDrainage,
  choice: IncrementChoice = {},
): IncrementInterpretation {
  const state = curve.states[index] as CurveState;
  const before = curve.states[index - 1];
  const previousStressKpa = before?.stressKpa ?? 0;
  const voidRatioStart = before?.voidRatio ?? curve.initial.e0;
  const h0 = curve.initial.initialHeightMm;
  const startDeformation = before ? before.deformationMm : 0;
  const meanHeightMm =
    h0 === null || state.deformationMm === null || startDeformation === null
      ? null
      : h0 - (startDeformation + state.deformationMm) / 2;
  const mv = compressibility(state, voidRatioStart, previousStressKpa);
  const sign = state.stressKpa < previousStressKpa ? -1 : 1;
  const rootPrepared = prepareReadings('cvRootTime', input?.readings, sign);
  const logPrepared = prepareReadings('cvLogTime', input?.readings, sign);
  const noHeight = (p: 'cvRootTime' | 'cvLogTime') =>
    cannot(p, 'missing-input', 'the specimen height is not known, so there is no drainage path.');
  const hdr = meanHeightMm === null ? null : drainagePathMm(meanHeightMm, drainage);
  const rootTime = !rootPrepared.ok
    ? rootPrepared
    : hdr === null
      ? noHeight('cvRootTime')
      : taylorRootTime(rootPrepared.value, hdr, choice.rootTime);
  const logTime = !logPrepared.ok
    ? logPrepared
    : hdr === null
      ? noHeight('cvLogTime')
      : casagrandeLogTime(logPrepared.value, hdr, choice.logTime);
  return {
    incrementNo: state.incrementNo,
    stressKpa: state.stressKpa,
    previousStressKpa,
    branch: state.branch,
    voidRatioStart,
    voidRatioEnd: state.voidRatio,
    meanHeightMm,
    mv,
    rootTime,
    logTime,
    cAlpha: secondary(logTime, curve.initial.solidsHeightMm, sign),
    kRootTime: permeability(rootTime, mv),
    kLogTime: permeability(logTime, mv),
  };
}

function compressibility(state: CurveState, voidRatioStart: number, previousStressKpa: number): Derived<number> {
  const dStress = state.stressKpa - previousStressKpa;
  if (dStress === 0) return cannot('mv', 'out-of-range', 'the stress does not change in this increment.');
  const mvPerKpa = (voidRatioStart - state.voidRatio) / (1 + voidRatioStart) / dStress;
  if (!(mvPerKpa > 0)) return cannot('mv', 'goes-backwards', 'the void ratio moves against the change of load.');
  return determined(mvPerKpa * 1000);
}

function secondary(
  logTime: Derived<LogTimeConstruction>,
  solidsHeightMm: number | null,
  sign: number,
): Derived<SecondaryCompression> {
  if (!logTime.ok) return because('cAlpha', logTime);
  if (sign < 0) return cannot('cAlpha', 'out-of-range', 'the increment unloads; Cα is read on loading increments.');
  if (solidsHeightMm === null) return cannot('cAlpha', 'missing-input', 'the specimen height is not known.');
  const { tail } = logTime.value;
  if (!(tail.mmPerLogCycle >= 0)) return cannot('cAlpha', 'goes-backwards', 'the tail after primary consolidation swells.');
  return determined({ cAlpha: tail.mmPerLogCycle / solidsHeightMm, tailRange: tail.range });
}

function permeability(cv: Derived<{ cvM2PerYear: number }>, mv: Derived<number>): Derived<number> {
  if (!cv.ok) return because('k', cv);
  if (!mv.ok) return because('k', mv);
  const cvM2PerS = cv.value.cvM2PerYear / (MINUTES_PER_YEAR * 60);
  return determined(cvM2PerS * (mv.value / 1000) * WATER_UNIT_WEIGHT_SI_KN_PER_M3);
}
