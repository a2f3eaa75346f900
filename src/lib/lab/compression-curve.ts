import type { CurvePoint } from './geometry';
import { cannot, type Derived, determined, shown } from './outcome';
import { type SpecimenState, specimenState } from './specimen-state';
import type { IncrementalTestInput } from './test-input';
import { readingsSlip } from './time-readings';

export type Branch = 'loading' | 'unloading' | 'reloading';

/** The specimen at the end of one increment. */
export interface CurveState extends CurvePoint {
  incrementNo: number;
  /** vertical strain since the start of the test, (e0 − e)/(1 + e0), as a fraction */
  strain: number;
  /** settlement since the start, mm; null when only void ratios were given */
  deformationMm: number | null;
  /** specimen height, mm; null without the initial height */
  heightMm: number | null;
  /** first loading beyond every earlier stress, unloading, or reloading up to the largest earlier stress */
  branch: Branch;
}

export interface CurveProblem {
  incrementNo: number;
  branch: Branch;
  message: string;
}

export interface CompressionCurve {
  initial: SpecimenState;
  /** one state per increment, in the order applied */
  states: CurveState[];
  /** increments that move against their load (readings that go backwards) */
  problems: CurveProblem[];
}

/** common practice (our own tolerance): about one 0.01 mm dial division on a 20 mm specimen */
export const BACKWARDS_STRAIN = 0.0005;

/**
 * The e–log σ′ and strain–log σ′ curve of an incremental test: e = e0 − δ/Hs from the deformation δ
 * (ASTM D2435/D2435M), or the void ratio as given, with ε = (e0 − e)/(1 + e0). Each increment is put on a
 * branch by its stress: above every earlier stress it is first (virgin) loading, below the previous
 * stress it is unloading, otherwise reloading. A loading or reloading increment that swells, or an
 * unloading one that compresses, by more than BACKWARDS_STRAIN is listed in `problems`, as is an increment
 * whose own time readings end back from an earlier reading (a slipped gauge).
 */
export function compressionCurve(test: IncrementalTestInput): Derived<CompressionCurve> {
  const state = specimenState(test.specimen);
  if (!state.ok) return cannot('curve', state.reason, state.detail);
  const { e0, solidsHeightMm, initialHeightMm } = state.value;
  const increments = [...test.increments].sort((a, b) => a.incrementNo - b.incrementNo);
  if (increments.length < 2)
    return cannot('curve', 'too-few-points', `the test has ${increments.length} increment(s); at least 2 are needed.`);
  const states: CurveState[] = [];
  const problems: CurveProblem[] = [];
  let maxStress = 0;
  let previous: { stressKpa: number; voidRatio: number; branch: Branch } = { stressKpa: 0, voidRatio: e0, branch: 'loading' };
  for (const [i, inc] of increments.entries()) {
    if (i > 0 && increments[i - 1]?.incrementNo === inc.incrementNo) {
      return cannot('curve', 'missing-input', `increment ${inc.incrementNo} appears twice.`);
    }
    if (!(Number.isFinite(inc.stressKpa) && inc.stressKpa >= 0)) {
      return cannot('curve', 'missing-input', `increment ${inc.incrementNo} has no usable stress.`);
    }
    let voidRatio: number;
    let deformationMm: number | null = null;
    if (typeof inc.deformationMm === 'number' && Number.isFinite(inc.deformationMm)) {
      if (solidsHeightMm === null) {
        return cannot(
          'curve',
          'missing-input',
          'deformations are given but the initial specimen height is not; give the height.',
        );
      }
      deformationMm = inc.deformationMm;
      voidRatio = e0 - inc.deformationMm / solidsHeightMm;
    } else if (typeof inc.voidRatio === 'number' && Number.isFinite(inc.voidRatio)) {
      voidRatio = inc.voidRatio;
      if (solidsHeightMm !== null) deformationMm = (e0 - voidRatio) * solidsHeightMm;
    } else {
      return cannot('curve', 'missing-input', `increment ${inc.incrementNo} has neither a deformation nor a void ratio.`);
    }
    if (!(voidRatio > 0)) {
      return cannot(
        'curve',
        'out-of-range',
        `increment ${inc.incrementNo} gives a void ratio of ${shown(voidRatio)}; check the deformation and e0.`,
      );
    }
    const branch: Branch =
      inc.stressKpa > maxStress
        ? 'loading'
        : inc.stressKpa < previous.stressKpa
          ? 'unloading'
          : inc.stressKpa === previous.stressKpa
            ? previous.branch
            : 'reloading';
    const strainChange = (previous.voidRatio - voidRatio) / (1 + e0);
    const against = branch === 'unloading' ? strainChange > BACKWARDS_STRAIN : strainChange < -BACKWARDS_STRAIN;
    if (against && inc.stressKpa !== previous.stressKpa) {
      problems.push({
        incrementNo: inc.incrementNo,
        branch,
        message: `increment ${inc.incrementNo} (${shown(inc.stressKpa)} kPa) ${branch === 'unloading' ? 'compresses on unloading' : 'swells under a larger load'}: its void ratio goes from ${shown(previous.voidRatio)} to ${shown(voidRatio)}`,
      });
    }
    const slip = readingsSlip(inc, branch === 'unloading' ? -1 : 1);
    if (slip)
      problems.push({
        incrementNo: inc.incrementNo,
        branch,
        message: `increment ${inc.incrementNo} (${shown(inc.stressKpa)} kPa) ${slip}`,
      });
    states.push({
      incrementNo: inc.incrementNo,
      stressKpa: inc.stressKpa,
      voidRatio,
      strain: (e0 - voidRatio) / (1 + e0),
      deformationMm,
      heightMm: initialHeightMm === null || deformationMm === null ? null : initialHeightMm - deformationMm,
      branch,
    });
    maxStress = Math.max(maxStress, inc.stressKpa);
    previous = { stressKpa: inc.stressKpa, voidRatio, branch };
  }
  return determined({ initial: state.value, states, problems });
}

/** First-loading states with stress > 0, in order of stress (the branch Cc and σ′p are read from). */
export function loadingStates(curve: CompressionCurve): CurveState[] {
  return curve.states.filter((s) => s.branch === 'loading' && s.stressKpa > 0);
}

/** The void ratio on first loading at a stress, interpolated linearly in log σ′; null outside the loaded range. */
export function voidRatioOnLoading(curve: CompressionCurve, stressKpa: number): number | null {
  const pts = loadingStates(curve);
  for (let i = 1; i < pts.length; i++) {
    const a = pts[i - 1] as CurveState;
    const b = pts[i] as CurveState;
    if (stressKpa >= a.stressKpa && stressKpa <= b.stressKpa) {
      const f = Math.log10(stressKpa / a.stressKpa) / Math.log10(b.stressKpa / a.stressKpa);
      return a.voidRatio + f * (b.voidRatio - a.voidRatio);
    }
  }
  return pts.length === 1 && pts[0]?.stressKpa === stressKpa ? pts[0].voidRatio : null;
}
