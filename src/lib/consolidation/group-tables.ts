/**
 * The per-layer degree tables of a Monte Carlo plan in flat arrays, for the fast path
 * (instantaneous load, no drains): table reads and the time at which a drainage group's
 * settlement-weighted degree reaches a target. All layers of a group share the group's table
 * grid, so the weighted sum of their tables is piecewise linear on that grid and its crossing is
 * found exactly by binary search over the nodes.
 */
import type { MonteCarloPlan } from './monte-carlo-plan';

/** Flat table access for the Monte Carlo fast path. */
export class GroupTables {
  private readonly values: Float64Array[];
  private readonly lnStart: Float64Array;
  private readonly lnStep: Float64Array;
  private readonly groupLayers: Int32Array[];
  private readonly weights: Float64Array;

  constructor(plan: MonteCarloPlan) {
    this.values = plan.layers.map((l) => l.table.values);
    this.lnStart = Float64Array.from(plan.layers, (l) => l.table.lnStart);
    this.lnStep = Float64Array.from(plan.layers, (l) => l.table.lnStep);
    this.groupLayers = plan.groups.map((g) => Int32Array.from(g.layers));
    this.weights = new Float64Array(plan.layers.length);
  }

  /** Degree of plan layer li at ln(time) already shifted by the group's ln λ (see degree-table.ts). */
  degree(li: number, lnShifted: number): number {
    const values = this.values[li] as Float64Array;
    const step = this.lnStep[li] as number;
    const x = (lnShifted - (this.lnStart[li] as number)) / step;
    if (x <= 0) return (values[0] as number) * Math.exp(0.5 * x * step);
    const last = values.length - 1;
    if (x >= last) return values[last] as number;
    const k = x | 0;
    const a = values[k] as number;
    return a + (x - k) * ((values[k + 1] as number) - a);
  }

  /**
   * Settlement (m) of group g at one time: Σ sᵢ·Uᵢ + Σ secondaryᵢ·log10(t/tp), with ln t already
   * shifted by the group's ln λ for the table read and `lnOverTp` = ln(t/tp).
   */
  groupSettlement(
    g: number,
    lnShifted: number,
    layerSettlement: Float64Array,
    layerSecondaryPerCycle: Float64Array,
    lnOverTp: number,
  ): number {
    const layers = this.groupLayers[g] as Int32Array;
    const first = layers[0] as number;
    const step = this.lnStep[first] as number;
    const x = (lnShifted - (this.lnStart[first] as number)) / step;
    const last = (this.values[first] as Float64Array).length - 1;
    const secondaryFactor = lnOverTp > 0 ? lnOverTp * Math.LOG10E : 0;
    let total = 0;
    if (x > 0 && x < last) {
      const k = x | 0;
      const frac = x - k;
      for (let j = 0; j < layers.length; j++) {
        const li = layers[j] as number;
        const values = this.values[li] as Float64Array;
        const a = values[k] as number;
        total += (layerSettlement[li] as number) * (a + frac * ((values[k + 1] as number) - a));
        total += (layerSecondaryPerCycle[li] as number) * secondaryFactor;
      }
      return total;
    }
    for (let j = 0; j < layers.length; j++) {
      const li = layers[j] as number;
      total += (layerSettlement[li] as number) * this.degree(li, lnShifted);
      total += (layerSecondaryPerCycle[li] as number) * secondaryFactor;
    }
    return total;
  }

  /** ln(time) at which group g's degree, weighted by `layerSettlement`, reaches `target`. */
  root(g: number, layerSettlement: Float64Array, target: number, lnLambda: number): number {
    const layers = this.groupLayers[g] as Int32Array;
    const weights = this.weights;
    const m = layers.length;
    let sum = 0;
    for (let j = 0; j < m; j++) sum += layerSettlement[layers[j] as number] as number;
    for (let j = 0; j < m; j++) weights[j] = sum > 0 ? (layerSettlement[layers[j] as number] as number) / sum : 1 / m;
    const first = layers[0] as number;
    const lnStart = this.lnStart[first] as number;
    const lnStep = this.lnStep[first] as number;
    const count = (this.values[first] as Float64Array).length;
    const w0 = this.weightedAt(layers, 0);
    if (w0 >= target) return lnStart + 2 * Math.log(target / w0) - lnLambda;
    if (this.weightedAt(layers, count - 1) < target) return Number.POSITIVE_INFINITY;
    let lo = 0;
    let hi = count - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >>> 1;
      if (this.weightedAt(layers, mid) >= target) hi = mid;
      else lo = mid;
    }
    const a = this.weightedAt(layers, lo);
    const b = this.weightedAt(layers, hi);
    return lnStart + (lo + (target - a) / (b - a)) * lnStep - lnLambda;
  }

  private weightedAt(layers: Int32Array, k: number): number {
    let sum = 0;
    for (let j = 0; j < layers.length; j++) {
      sum += (this.weights[j] as number) * ((this.values[layers[j] as number] as Float64Array)[k] as number);
    }
    return sum;
  }
}
