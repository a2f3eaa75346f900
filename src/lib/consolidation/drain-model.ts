/**
 * Per-layer radial consolidation towards vertical drains for a profile (Barron 1948; Hansbo 1981).
 * Drains are taken to run from the ground surface to the base of the deepest compressible layer;
 * they discharge at the top, and also at the bottom when the base of the profile is pervious.
 */
import type { EngineInput } from './engine-input';
import { hansboDrainFactor, influenceDiameterM, wellResistanceMean } from './vertical-drains';

export interface DrainGeometry {
  influenceDiameterM: number;
  spacingRatio: number;
  /** Length drained from one end, m (used for well resistance). */
  drainLengthM: number;
}

/** Influence diameter de (m), n = de/dw and the drained length l (m) of the profile's drains; null without drains. */
export function drainGeometry(input: EngineInput): DrainGeometry | null {
  const drains = input.drains;
  if (!drains) return null;
  const de = influenceDiameterM(drains.spacingM, drains.pattern);
  let depth = 0;
  let deepest = 0;
  for (const layer of input.layers) {
    depth += layer.thicknessM;
    if (layer.compressible) deepest = depth;
  }
  const drainLengthM = input.drainage.bottom === 'pervious' ? deepest / 2 : deepest;
  return { influenceDiameterM: de, spacingRatio: de / drains.drainDiameterM, drainLengthM };
}

/**
 * Hansbo's drain factor μ for a layer with horizontal coefficient ch (m²/yr) and mv (1/kPa):
 * kh = ch·mv·γw (m/yr) feeds the well resistance when qw is given. Dimensionless.
 */
export function layerDrainFactor(input: EngineInput, geometry: DrainGeometry, chM2PerYear: number, mvPerKpa: number): number {
  const drains = input.drains;
  if (!drains) return Number.NaN;
  const khMPerYear = chM2PerYear * mvPerKpa * input.waterUnitWeightKnPerM3;
  const fr = drains.dischargeM3PerYear ? wellResistanceMean(geometry.drainLengthM, khMPerYear, drains.dischargeM3PerYear) : 0;
  return hansboDrainFactor({
    spacingRatio: geometry.spacingRatio,
    smearRatio: drains.smearRatio,
    khOverKs: drains.khOverKs,
    wellResistance: fr,
  });
}
