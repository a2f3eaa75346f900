import type { CompressionCurve, CurveState } from './compression-curve';
import { rangeText } from './compression-index';
import type { StressRange } from './geometry';
import { cannot, type Derived, determined } from './outcome';
import { distinctStresses, fitSlope, type SlopeFit, withinRange } from './slope-fit';

export interface RecompressionIndexChoice {
  /** the stresses of the first unload–reload loop whose points define the line (a steward's choice) */
  range?: StressRange;
}

/**
 * Cr from the unload–reload part of the test: the least-squares e–log σ′ line through the point where the
 * first unloading began and every decrement of that unloading (or, with a chosen range, the points of the
 * first unload–reload loop inside it). Cr = −Δe/Δlog10 σ′ (UFC 3-220-10 Eq. 5-10, Fig. 3-12). Refused
 * without an unloading, or when the unloading compresses instead of swelling.
 */
export function recompressionIndex(curve: CompressionCurve, choice: RecompressionIndexChoice = {}): Derived<SlopeFit> {
  const { states } = curve;
  const first = states.findIndex((s) => s.branch === 'unloading');
  if (first < 1) return cannot('cr', 'no-unloading', 'the test has no unloading, so there is no unload–reload line.');
  let end = first;
  while (end < states.length && states[end]?.branch === 'unloading') end++;
  let loopEnd = end;
  while (loopEnd < states.length && states[loopEnd]?.branch === 'reloading') loopEnd++;
  const problem = curve.problems.find((p) => {
    const i = states.findIndex((s) => s.incrementNo === p.incrementNo);
    return i >= first && i < loopEnd;
  });
  if (problem) return cannot('cr', 'goes-backwards', `${problem.message}.`);
  const loop = states.slice(first - 1, choice.range ? loopEnd : end) as CurveState[];
  const used = choice.range ? withinRange(loop, choice.range) : loop;
  if (distinctStresses(used) < 2) {
    const where = choice.range ? `the chosen range ${rangeText(choice.range)}` : 'the unloading';
    return cannot('cr', 'too-few-points', `${where} holds fewer than 2 points of different stress.`);
  }
  const fit = fitSlope(used, choice.range ? 'person' : 'auto');
  if (!(fit.value > 0)) return cannot('cr', 'goes-backwards', 'the void ratio does not rise as the load is taken off.');
  return determined(fit);
}
