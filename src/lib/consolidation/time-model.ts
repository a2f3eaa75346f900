/**
 * Deterministic degree of consolidation of each layer with time: vertical drainage (series or
 * solver), radial drainage to vertical drains combined by Carrillo (1942), and ramp loading
 * (Olson 1977, the solver with a time-varying load, or Duhamel superposition when drains are
 * present). Times in years from the start of loading.
 */
import { specMedian } from './distributions';
import { type DrainGeometry, drainGeometry, layerDrainFactor } from './drain-model';
import type { EngineInput } from './engine-input';
import type { LayerValues } from './layer-values';
import type { SublayerSettlement } from './profile-settlement';
import { rampFromStep } from './ramp-loading';
import { carrilloCombined, radialDegree } from './vertical-drains';
import { buildVerticalModel, type VerticalModel } from './vertical-model';

export interface TimeModel {
  vertical: VerticalModel;
  drains: { geometry: DrainGeometry; chM2PerYear: Float64Array; drainFactor: Float64Array } | null;
  /** Primary settlement of each layer, m. */
  layerPrimaryM: Float64Array;
  /** Degree (0…1) of layer i at time t, relative to its final primary settlement. */
  layerDegree: (layerIndex: number, timeYears: number) => number;
  /** Settlement-weighted degree of a set of layers. */
  degreeOf: (layerIndices: readonly number[], timeYears: number) => number;
}

/** Builds the deterministic time model for sublayer settlements (m) and median layer values. */
export function buildTimeModel(
  input: EngineInput,
  sublayers: readonly SublayerSettlement[],
  values: readonly (LayerValues | null)[],
): TimeModel {
  const vertical = buildVerticalModel(input, sublayers, values);
  const layerPrimaryM = new Float64Array(input.layers.length);
  for (const s of sublayers) layerPrimaryM[s.layerIndex] = (layerPrimaryM[s.layerIndex] as number) + s.primaryM;
  const geometry = drainGeometry(input);
  let drains: TimeModel['drains'] = null;
  if (geometry && input.drains) {
    const chM2PerYear = new Float64Array(input.layers.length);
    const drainFactor = new Float64Array(input.layers.length);
    const ch = input.drains.ch;
    values.forEach((v, i) => {
      if (!v) return;
      chM2PerYear[i] = ch.kind === 'ch' ? specMedian(ch.chM2PerYear) : specMedian(ch.chOverCv) * v.cvM2PerYear;
      drainFactor[i] = layerDrainFactor(input, geometry, chM2PerYear[i] as number, vertical.layerMvPerKpa[i] as number);
    });
    drains = { geometry, chM2PerYear, drainFactor };
  }
  const tc = input.constructionTimeYears ?? 0;

  const stepCombined = (i: number, t: number): number => {
    const uv = vertical.stepDegree(i, t);
    if (!drains) return uv;
    const ur = radialDegree(
      drains.chM2PerYear[i] as number,
      t,
      drains.geometry.influenceDiameterM,
      drains.drainFactor[i] as number,
    );
    return carrilloCombined(uv, ur);
  };
  const layerDegree = (i: number, t: number): number => {
    if (tc <= 0) return stepCombined(i, t);
    if (!drains) return vertical.rampDegree(i, t);
    return rampFromStep((s) => stepCombined(i, s), t, tc);
  };
  const degreeOf = (layerIndices: readonly number[], t: number): number => {
    let sum = 0;
    let weight = 0;
    for (const i of layerIndices) {
      const w = layerPrimaryM[i] as number;
      sum += w * layerDegree(i, t);
      weight += w;
    }
    return weight > 0 ? sum / weight : layerIndices.length ? layerDegree(layerIndices[0] as number, t) : 1;
  };
  return { vertical, drains, layerPrimaryM, layerDegree, degreeOf };
}

/**
 * Time (years) at which a non-decreasing degree curve first reaches `target` (0 < target < 1), by
 * bisection on ln t inside [1e−9, 1e6]·hint, hint > 0. Returns Infinity if never reached.
 */
export function timeToReach(degreeAt: (t: number) => number, target: number, hintYears: number): number {
  let lo = Math.log(hintYears * 1e-9);
  let hi = Math.log(hintYears * 1e6);
  if (degreeAt(Math.exp(hi)) < target) return Number.POSITIVE_INFINITY;
  if (degreeAt(Math.exp(lo)) >= target) return Math.exp(lo);
  for (let k = 0; k < 64; k++) {
    const mid = (lo + hi) / 2;
    if (degreeAt(Math.exp(mid)) >= target) hi = mid;
    else lo = mid;
  }
  return Math.exp((lo + hi) / 2);
}
