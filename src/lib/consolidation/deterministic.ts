/**
 * The deterministic ("likely") estimate: every distribution replaced by its median, stresses and
 * settlement per sublayer with automatic or fixed sublayering, and the time model.
 */
import type { EngineInput } from './engine-input';
import { type LayerValues, medianLayerValues } from './layer-values';
import { type SublayerSettlement, settleSublayers, sublayerStresses } from './profile-settlement';
import { type StressIncrease, stressIncreaseFor } from './stress-increase';
import { divideLayers, refineUntilConverged, type SublayerConvergence } from './sublayers';
import { buildTimeModel, type TimeModel, timeToReach } from './time-model';

/**
 * Degree of consolidation taken as the end of primary consolidation, from which secondary
 * compression is counted (common practice; UFC 3-220-10 Eq. 5-18 leaves tp to the engineer).
 */
export const END_OF_PRIMARY_DEGREE = 0.95;

export interface DeterministicResult {
  input: EngineInput;
  values: (LayerValues | null)[];
  stress: StressIncrease;
  sublayering: SublayerConvergence & { mode: 'auto' | 'fixed' };
  sublayers: SublayerSettlement[];
  time: TimeModel;
  /** End of primary consolidation per drainage group, years. */
  endOfPrimaryYears: Float64Array;
  /** Secondary settlement per log10 cycle of time per layer, m. */
  layerSecondaryPerCycleM: Float64Array;
  primaryM: number;
  t50Years: number;
  t90Years: number;
  /** Primary and secondary settlement (m) at time t (years). */
  settlementAt: (timeYears: number) => { primaryM: number; secondaryM: number };
  /** Secondary settlement of layer i at time t, m. */
  layerSecondaryAt: (layerIndex: number, timeYears: number) => number;
}

/**
 * Runs the deterministic estimate for an SI engine input (see engine-input.ts). Stresses in kPa,
 * settlements in m, times in years. Throws `EngineInputError` for a non-positive σ'v0.
 */
export function runDeterministic(input: EngineInput): DeterministicResult {
  const values = input.layers.map((layer) => (layer.compressible ? medianLayerValues(layer) : null));
  const stress = stressIncreaseFor(input.load);
  const thicknesses = input.layers.map((l) => l.thicknessM);
  const compressible = input.layers.map((l) => l.compressible);
  const settle = (counts: number[]) => {
    const geometry = divideLayers(thicknesses, counts);
    return settleSublayers(input, sublayerStresses(input, geometry, stress, values), values);
  };
  const total = (subs: readonly SublayerSettlement[]) => subs.reduce((sum, s) => sum + s.primaryM, 0);

  let sublayering: DeterministicResult['sublayering'];
  if (input.sublayers.mode === 'fixed') {
    const perLayer = input.sublayers.perLayer;
    const counts = compressible.map((c) => (c ? perLayer : 0));
    sublayering = {
      mode: 'fixed',
      countsPerLayer: counts,
      totalM: total(settle(counts)),
      changePercent: 0,
      converged: true,
      refinements: 0,
    };
  } else {
    const { tolerancePercent, maxPerLayer } = input.sublayers;
    sublayering = { mode: 'auto', ...refineUntilConverged(compressible, (c) => total(settle(c)), tolerancePercent, maxPerLayer) };
  }
  const sublayers = settle(sublayering.countsPerLayer);
  const time = buildTimeModel(input, sublayers, values);
  const groups = time.vertical.groups;
  const endOfPrimaryYears = new Float64Array(
    groups.map((g) => timeToReach((t) => time.degreeOf(g.layerIndices, t), END_OF_PRIMARY_DEGREE, g.tauYears)),
  );
  const layerSecondaryPerCycleM = new Float64Array(input.layers.length);
  for (const s of sublayers) {
    layerSecondaryPerCycleM[s.layerIndex] = (layerSecondaryPerCycleM[s.layerIndex] as number) + s.secondaryPerCycleM;
  }

  const compressibleLayers = input.layers.flatMap((l, i) => (l.compressible ? [i] : []));
  const hint = Math.max(...groups.map((g) => g.tauYears));
  const overall = (t: number) => time.degreeOf(compressibleLayers, t);
  const layerSecondaryAt = (i: number, t: number): number => {
    const tp = endOfPrimaryYears[time.vertical.groupOfLayer[i] as number] as number;
    return t > tp ? (layerSecondaryPerCycleM[i] as number) * Math.log10(t / tp) : 0;
  };
  const primaryM = total(sublayers);
  return {
    input,
    values,
    stress,
    sublayering,
    sublayers,
    time,
    endOfPrimaryYears,
    layerSecondaryPerCycleM,
    primaryM,
    t50Years: timeToReach(overall, 0.5, hint),
    t90Years: timeToReach(overall, 0.9, hint),
    layerSecondaryAt,
    settlementAt: (t) => {
      let primary = 0;
      let secondary = 0;
      for (const i of compressibleLayers) {
        primary += (time.layerPrimaryM[i] as number) * time.layerDegree(i, t);
        secondary += layerSecondaryAt(i, t);
      }
      return { primaryM: primary, secondaryM: secondary };
    },
  };
}
