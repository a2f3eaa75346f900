/**
 * Stresses and primary settlement of every sublayer of a profile, for one set of layer values.
 */
import type { EngineInput } from './engine-input';
import { EngineInputError } from './errors';
import { type LayerValues, preconsolidationKpa } from './layer-values';
import { cAlphaFromRatio } from './secondary';
import { indexStrain, mvStrain, type StressState } from './settlement-primary';
import type { StressIncrease } from './stress-increase';
import { verticalStressAtDepth } from './stress-vertical';
import type { SublayerGeometry } from './sublayers';

export interface SublayerStresses extends SublayerGeometry {
  sigmaV0Kpa: number;
  deltaSigmaKpa: number;
  /** NaN for an mv layer. */
  sigmaPKpa: number;
}

export interface SublayerSettlement extends SublayerStresses {
  sigmaFinalKpa: number;
  state: StressState;
  strain: number;
  primaryM: number;
  /** Cα used (0 when none). */
  cAlpha: number;
  /** Secondary settlement per log10 cycle of time after tp: Cα/(1+e0)·H, m. */
  secondaryPerCycleM: number;
}

/**
 * σ'v0, Δσ and σ'p (kPa) at each sublayer mid-point. Throws `EngineInputError` where σ'v0 ≤ 0
 * (a saturated unit weight at or below γw) since the log-stress formulas need σ'v0 > 0.
 */
export function sublayerStresses(
  input: EngineInput,
  geometry: readonly SublayerGeometry[],
  stress: StressIncrease,
  values: readonly (LayerValues | null)[],
): SublayerStresses[] {
  let layerTopM = 0;
  const layerTops = input.layers.map((l) => {
    const top = layerTopM;
    layerTopM += l.thicknessM;
    return top;
  });
  return geometry.map((g) => {
    const layer = input.layers[g.layerIndex];
    const v = values[g.layerIndex];
    if (!layer || !v) throw new EngineInputError(`layers.${g.layerIndex}`, 'Sublayer refers to a missing layer.');
    const sigmaV0Kpa = verticalStressAtDepth(
      input.layers,
      input.waterTableDepthM,
      g.midM,
      input.waterUnitWeightKnPerM3,
    ).effectiveKpa;
    if (!(sigmaV0Kpa > 0)) {
      throw new EngineInputError(
        `layers.${g.layerIndex}.unitWeightBelowWater`,
        `Effective stress at ${g.midM.toFixed(2)} m in layer "${layer.name}" is not positive: the saturated unit weight must exceed the unit weight of water.`,
      );
    }
    const fraction = (g.midM - (layerTops[g.layerIndex] ?? 0)) / layer.thicknessM;
    return {
      ...g,
      sigmaV0Kpa,
      deltaSigmaKpa: Math.max(0, stress.atDepthKpa(g.midM)),
      sigmaPKpa: preconsolidationKpa(layer.preconsolidation, v.preconsolidation, fraction, sigmaV0Kpa),
    };
  });
}

/** Primary strain and settlement (UFC 3-220-10 Eqs. 5-12 to 5-14, or ε = mv·Δσ) of each sublayer. */
export function settleSublayers(
  input: EngineInput,
  stresses: readonly SublayerStresses[],
  values: readonly (LayerValues | null)[],
): SublayerSettlement[] {
  return stresses.map((s) => {
    const layer = input.layers[s.layerIndex];
    const v = values[s.layerIndex] as LayerValues;
    const sigmaFinalKpa = s.sigmaV0Kpa + s.deltaSigmaKpa;
    let strain: number;
    let state: StressState;
    if (layer?.compression?.kind === 'mv') {
      strain = mvStrain(v.mvPerKpa, s.deltaSigmaKpa);
      state = 'mv (linear)';
    } else {
      ({ strain, state } = indexStrain(v.cc, v.cr, v.e0, s.sigmaV0Kpa, s.deltaSigmaKpa, s.sigmaPKpa));
    }
    const sec = layer?.secondary;
    const cAlpha =
      sec?.kind === 'cAlpha'
        ? v.secondary
        : sec?.kind === 'cAlphaOverCc'
          ? cAlphaFromRatio(v.secondary, v.cc, v.cr, state === 'overconsolidated')
          : 0;
    return {
      ...s,
      sigmaFinalKpa,
      state,
      strain,
      primaryM: strain * s.thicknessM,
      cAlpha,
      secondaryPerCycleM: cAlpha > 0 ? (cAlpha / (1 + v.e0)) * s.thicknessM : 0,
    };
  });
}
