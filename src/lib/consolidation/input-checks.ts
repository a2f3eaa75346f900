/**
 * Physically impossible inputs, refused before (and, for the void ratio, after) the deterministic
 * run with the request field named. The schema already refuses what is impossible field by field
 * (e0, thickness, cv ≤ 0, a water table above ground, P10 > P50, triangular min > mode…); these
 * are the impossibilities that need two fields or the unit system. Messages use the request's units.
 */
import type { DeterministicResult } from './deterministic';
import { specMedian } from './distributions';
import type { EngineInput } from './engine-input';
import type { InputIssue } from './errors';
import type { UnitFactors } from './units';
import { influenceDiameterM } from './vertical-drains';

/**
 * Unit weight of water, kN/m³: 9.81 fresh, about 10.05 sea water, up to about 11.8 saturated
 * brine (density 1.2 t/m³); 9.7 allows warm fresh water (from memory: density tables). Outside,
 * the value is almost surely in the other unit system.
 */
export const WATER_UNIT_WEIGHT_RANGE_KN_PER_M3 = { min: 9.7, max: 12 } as const;

const fmt = (x: number) => Number(x.toPrecision(3)).toString();

/** Issues with the SI engine input (empty when it can be computed). */
export function impossibleInputIssues(input: EngineInput, factors: UnitFactors): InputIssue[] {
  const issues: InputIssue[] = [];
  const u = factors.labels;
  const weight = (knPerM3: number) => `${fmt(knPerM3 / factors.unitWeight)} ${u.unitWeight}`;
  const gammaW = input.waterUnitWeightKnPerM3;
  const range = WATER_UNIT_WEIGHT_RANGE_KN_PER_M3;
  if (gammaW < range.min || gammaW > range.max) {
    issues.push({
      path: 'options.waterUnitWeight',
      message: `The unit weight of water must be between ${weight(range.min)} and ${weight(range.max)} (fresh water ${weight(9.81)}, sea water about ${weight(10.05)}); ${weight(gammaW)} looks like a value in the other unit system.`,
    });
  } else {
    input.layers.forEach((layer, i) => {
      if (layer.unitWeightBelowKnPerM3 > gammaW) return;
      issues.push({
        path: `layers.${i}.unitWeightBelowWater`,
        message: `Layer "${layer.name}": the saturated unit weight below the water table (${weight(layer.unitWeightBelowKnPerM3)}) must be greater than that of water (${weight(gammaW)}), or the effective stress would fall with depth. Saturated soils weigh about ${weight(14)} to ${weight(22)}; check the value and the unit system.`,
      });
    });
  }
  input.layers.forEach((layer, i) => {
    const c = layer.compression;
    if (!layer.compressible || c?.kind !== 'indices') return;
    const cc = specMedian(c.cc);
    const cr = specMedian(c.cr);
    if (cr < cc) return;
    issues.push({
      path: `layers.${i}.cr`,
      message: `Layer "${layer.name}": Cr (${fmt(cr)}) must be below Cc (${fmt(cc)}): reloading is always stiffer than virgin compression. Cr is typically 5–10 % of Cc (UFC 3-220-10 §5-5.2.1).`,
    });
  });
  const drains = input.drains;
  if (drains) {
    const length = (m: number) => `${fmt(m / factors.length)} ${u.depth}`;
    const size = (m: number) => `${fmt(m / factors.drainSize)} ${u.drainSize}`;
    const deM = influenceDiameterM(drains.spacingM, drains.pattern);
    const zone = `the zone each drain serves (de = ${length(deM)} for a ${drains.pattern} spacing of ${length(drains.spacingM)})`;
    if (drains.drainDiameterM >= deM) {
      issues.push({
        path: 'verticalDrains.spacing',
        message: `The drain (equivalent diameter ${size(drains.drainDiameterM)}) is as wide as ${zone}: widen the spacing, or check the drain size and its unit (${u.drainSize}).`,
      });
    } else if (drains.smearRatio * drains.drainDiameterM >= deM) {
      issues.push({
        path: 'verticalDrains.smear.ratio',
        message: `The smear zone (ds = ${fmt(drains.smearRatio)} × dw = ${size(drains.smearRatio * drains.drainDiameterM)}) fills ${zone}: use a smaller smear ratio or a wider spacing.`,
      });
    }
  }
  return issues;
}

/**
 * Issues with the deterministic result: a compression that would take the void ratio to zero or
 * below (Δe = ε·(1 + e0) ≥ e0), or an mv strain of 100 % or more. The log-stress formulas
 * (UFC 3-220-10 Eqs. 5-12 to 5-14) have no such limit, so the input combination is refused.
 */
export function impossibleResultIssues(det: DeterministicResult): InputIssue[] {
  const issues: InputIssue[] = [];
  det.input.layers.forEach((layer, i) => {
    const v = det.values[i];
    if (!layer.compressible || !v) return;
    const worst = Math.max(0, ...det.sublayers.filter((s) => s.layerIndex === i).map((s) => s.strain));
    const usesMv = layer.compression?.kind === 'mv';
    const e0 = v.e0;
    const limit = Number.isFinite(e0) ? e0 / (1 + e0) : 1;
    if (worst < limit) return;
    issues.push({
      path: `layers.${i}.${usesMv ? 'mv' : 'cc'}`,
      message: Number.isFinite(e0)
        ? `Layer "${layer.name}": the computed strain (${fmt(100 * worst)} %) would take the void ratio from e0 = ${fmt(e0)} to zero or below. ${usesMv ? 'mv' : 'Cc'}, e0 and the load do not fit together; check them and their units.`
        : `Layer "${layer.name}": mv × Δσ gives a strain of ${fmt(100 * worst)} %, which is impossible; check mv and its unit.`,
    });
  });
  return issues;
}
