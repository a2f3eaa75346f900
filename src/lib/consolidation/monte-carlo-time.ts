/**
 * Degree of consolidation of one Monte Carlo realisation at a time, and the times at which the
 * settlement-weighted degree of a set of layers reaches a target (tp, t90).
 */
import { lookupDeficit } from './deficit-table';
import type { MonteCarloPlan } from './monte-carlo-plan';
import { rampFromStep } from './ramp-loading';

export interface LayerStepState {
  /** ln of each drainage group's time-scale factor λ = τ_det/τ_realisation. */
  lnLambda: Float64Array;
  /** 8·ch/(de²·μ) of each plan layer, 1/yr (0 without drains). */
  radialRate: Float64Array;
  hasDrains: boolean;
  constructionYears: number;
}

type PlanLayer = MonteCarloPlan['layers'][number];

function tableDegree(plan: MonteCarloPlan, li: number, lnShifted: number): number {
  const table = (plan.layers[li] as PlanLayer).table;
  const x = (lnShifted - table.lnStart) / table.lnStep;
  const values = table.values;
  if (x <= 0) return (values[0] as number) * Math.exp(0.5 * x * table.lnStep);
  const last = values.length - 1;
  if (x >= last) return values[last] as number;
  const k = x | 0;
  const a = values[k] as number;
  return a + (x - k) * ((values[k + 1] as number) - a);
}

function stepDegree(plan: MonteCarloPlan, state: LayerStepState, li: number, timeYears: number): number {
  if (!(timeYears > 0)) return 0;
  const group = (plan.layers[li] as PlanLayer).group;
  const uv = tableDegree(plan, li, Math.log(timeYears) + (state.lnLambda[group] as number));
  if (!state.hasDrains) return uv;
  return 1 - (1 - uv) * Math.exp(-(state.radialRate[li] as number) * timeYears);
}

/**
 * Ramp loading without drains: the realisation's curve is U_det(λt), so its running deficit is
 * D_det(λt)/λ and the Duhamel average needs two look-ups (see deficit-table.ts).
 */
function rampWithoutDrains(plan: MonteCarloPlan, state: LayerStepState, li: number, timeYears: number): number {
  const layer = plan.layers[li] as PlanLayer;
  const deficit = layer.deficit;
  if (!deficit) return rampFromStep((s) => stepDegree(plan, state, li, s), timeYears, state.constructionYears);
  const tc = state.constructionYears;
  const lnLambda = state.lnLambda[layer.group] as number;
  const start = timeYears - tc;
  const atEnd = lookupDeficit(deficit, Math.log(timeYears) + lnLambda);
  const atStart = start > 0 ? lookupDeficit(deficit, Math.log(start) + lnLambda) : 0;
  const window = start > 0 ? tc : timeYears;
  return (window - (atEnd - atStart) / Math.exp(lnLambda)) / tc;
}

/** Degree (0…1) of plan layer li at time t (years), with drains and ramp loading as configured. */
export function layerDegreeAt(plan: MonteCarloPlan, state: LayerStepState, li: number, timeYears: number): number {
  if (!(timeYears > 0)) return 0;
  if (state.constructionYears > 0) {
    if (!state.hasDrains) return rampWithoutDrains(plan, state, li, timeYears);
    return rampFromStep((s) => stepDegree(plan, state, li, s), timeYears, state.constructionYears);
  }
  return stepDegree(plan, state, li, timeYears);
}

/**
 * ln(time) at which the weighted degree of `layers` reaches `target` (general case: several
 * groups, drains or ramp loading), starting from the guess `lnGuess`: the bracket is widened
 * until it holds the crossing, then closed by the Illinois variant of regula falsi to 1e-10 in
 * ln t. +Infinity if the degree never reaches the target.
 */
export function rootOnLogTime(
  plan: MonteCarloPlan,
  state: LayerStepState,
  layers: readonly number[],
  weights: Float64Array,
  target: number,
  lnGuess: number,
): number {
  let weightSum = 0;
  for (const li of layers) weightSum += weights[li] as number;
  const excess = (lnT: number) => {
    const t = Math.exp(lnT);
    let sum = 0;
    for (const li of layers) {
      const w = weightSum > 0 ? (weights[li] as number) / weightSum : 1 / layers.length;
      sum += w * layerDegreeAt(plan, state, li, t);
    }
    return sum - target;
  };
  let lo = lnGuess - 0.5;
  let hi = lnGuess + 0.5;
  let fLo = excess(lo);
  let fHi = excess(hi);
  for (let k = 0; k < 40 && fLo >= 0; k++) {
    hi = lo;
    fHi = fLo;
    lo -= 2;
    fLo = excess(lo);
  }
  for (let k = 0; k < 40 && fHi < 0; k++) {
    lo = hi;
    fLo = fHi;
    hi += 2;
    fHi = excess(hi);
  }
  if (fHi < 0) return Number.POSITIVE_INFINITY;
  let side = 0;
  for (let k = 0; k < 100 && hi - lo > 1e-10; k++) {
    const x = (lo * fHi - hi * fLo) / (fHi - fLo);
    const fx = excess(x);
    if (fx === 0) return x;
    if (fx < 0) {
      lo = x;
      fLo = fx;
      if (side === -1) fHi /= 2;
      side = -1;
    } else {
      hi = x;
      fHi = fx;
      if (side === 1) fLo /= 2;
      side = 1;
    }
  }
  return (lo + hi) / 2;
}
