/**
 * In-situ vertical stresses in a layered profile with a hydrostatic water table.
 * σv = Σ γ·h (bulk unit weight above the water table, saturated below), u = γw·(z − zw) below the
 * water table, σ'v0 = σv − u (Terzaghi's effective stress principle; UFC 3-220-10 Ch. 5 §5-3).
 */

export interface UnitWeightLayer {
  thicknessM: number;
  /** Bulk unit weight above the water table, kN/m³. */
  unitWeightAboveKnPerM3: number;
  /** Saturated unit weight below the water table, kN/m³. */
  unitWeightBelowKnPerM3: number;
}

export interface VerticalStressKpa {
  totalKpa: number;
  porePressureKpa: number;
  effectiveKpa: number;
}

/** γw in SI (kN/m³), the value the issue prescribes for SI input. */
export const WATER_UNIT_WEIGHT_SI_KN_PER_M3 = 9.81;

/**
 * Total, pore-water and effective vertical stress (kPa) at `depthM` (m below ground, ≥ 0) for
 * layers listed from the ground surface down and a water table at `waterTableDepthM` (≥ 0).
 * Depths below the last layer use the last layer's unit weights. Water unit weight in kN/m³
 * (9.81 by default).
 */
export function verticalStressAtDepth(
  layers: readonly UnitWeightLayer[],
  waterTableDepthM: number,
  depthM: number,
  waterUnitWeightKnPerM3 = WATER_UNIT_WEIGHT_SI_KN_PER_M3,
): VerticalStressKpa {
  let totalKpa = 0;
  let topM = 0;
  for (let i = 0; i < layers.length && topM < depthM; i++) {
    const layer = layers[i] as UnitWeightLayer;
    const isLast = i === layers.length - 1;
    const bottomM = isLast ? Math.max(depthM, topM + layer.thicknessM) : topM + layer.thicknessM;
    const to = Math.min(depthM, bottomM);
    const dryPart = Math.max(0, Math.min(to, waterTableDepthM) - topM);
    const wetPart = to - topM - dryPart;
    totalKpa += dryPart * layer.unitWeightAboveKnPerM3 + wetPart * layer.unitWeightBelowKnPerM3;
    topM = bottomM;
  }
  const porePressureKpa = Math.max(0, depthM - waterTableDepthM) * waterUnitWeightKnPerM3;
  return { totalKpa, porePressureKpa, effectiveKpa: totalKpa - porePressureKpa };
}
