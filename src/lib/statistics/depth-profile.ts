/**
 * Depth profiles of a selection: for each parameter the points (mid-depth, value) — other firms'
 * masked and shown only when the disclosure rule holds for that panel, the viewer's own unmasked —
 * and, where unit weights and a water table are known, the in-situ vertical effective stress line
 * (σ'v0 = σv − u, from the engine's verticalStressAtDepth) to read σ'p and OCR against.
 */
import { type UnitWeightLayer, verticalStressAtDepth } from '../consolidation/stress-vertical';
import type { StatisticsContext, Withheld } from './context';
import { checkDisclosure } from './disclosure';
import { StatisticsInputError } from './errors';
import { maskedValues } from './masking';
import type { ParameterKey } from './parameters';

export const DEFAULT_PROFILE_PARAMETERS: readonly ParameterKey[] = [
  'waterContentPct',
  'liquidLimitPct',
  'initialVoidRatio',
  'compressionIndex',
  'preconsolidationStressKpa',
  'overconsolidationRatio',
];

export interface ProfilePoints {
  depthM: number[];
  value: number[];
}

export interface ProfilePanel {
  parameter: ParameterKey;
  /** Other firms' tests (masked) when the rule holds for this panel. */
  pooled: { released: true; n: number; firms: number; points: ProfilePoints } | Withheld;
  own: ProfilePoints | null;
}

export interface StressLineInput {
  /** Layers from the ground surface down (the last extends to any depth). */
  layers: readonly UnitWeightLayer[];
  waterTableDepthM: number;
  /** Deepest point of the line, m (default: the deepest point shown). */
  toDepthM?: number;
}

export interface StressLine {
  depthM: number[];
  effectiveStressKpa: number[];
}

export interface DepthProfile {
  panels: ProfilePanel[];
  /** Null when no unit weights and water table were given. */
  effectiveStressLine: StressLine | null;
}

/** A single layer from one unit weight (kN/m³) used above and below the water table. */
export function uniformLayer(unitWeightKnPerM3: number): UnitWeightLayer[] {
  return [{ thicknessM: 1, unitWeightAboveKnPerM3: unitWeightKnPerM3, unitWeightBelowKnPerM3: unitWeightKnPerM3 }];
}

function panel(context: StatisticsContext, key: ParameterKey): ProfilePanel {
  const { columns, classWeights, viewerIndex, rule } = context;
  const raw = columns.values[key];
  const perFirm = new Uint32Array(columns.firmIds.length);
  const own: ProfilePoints = { depthM: [], value: [] };
  const n = raw ? columns.length : 0;
  const usable = (i: number) =>
    Number.isFinite((raw as Float64Array)[i] as number) &&
    Number.isFinite(columns.depthM[i] as number) &&
    (classWeights[columns.qualityClass[i] as number] as number) > 0;
  for (let i = 0; i < n; i++) {
    if (!usable(i)) continue;
    const firm = columns.firmIndex[i] as number;
    perFirm[firm] = (perFirm[firm] as number) + 1;
    if (firm === viewerIndex) {
      own.depthM.push(columns.depthM[i] as number);
      own.value.push((raw as Float64Array)[i] as number);
    }
  }
  const verdict = checkDisclosure(perFirm, rule);
  const ownPoints = own.depthM.length > 0 ? own : null;
  if (!verdict.released) {
    return {
      parameter: key,
      pooled: { released: false, tests: verdict.tests, firms: verdict.firms, reasons: verdict.reasons },
      own: ownPoints,
    };
  }
  const masked = maskedValues(columns, key) as Float64Array;
  const others: ProfilePoints = { depthM: [], value: [] };
  for (let i = 0; i < n; i++) {
    if (!usable(i) || columns.firmIndex[i] === viewerIndex) continue;
    others.depthM.push(columns.depthM[i] as number);
    others.value.push(masked[i] as number);
  }
  return { parameter: key, pooled: { released: true, n: verdict.tests, firms: verdict.firms, points: others }, own: ownPoints };
}

/** σ'v0 at `steps` + 1 depths from the surface to `toDepthM`, kPa. */
export function effectiveStressLine(input: StressLineInput, toDepthM: number, steps = 50): StressLine {
  if (input.layers.length === 0) throw new StatisticsInputError('The stress line needs at least one layer with unit weights.');
  if (!(input.waterTableDepthM >= 0)) throw new StatisticsInputError('The water table depth must be 0 m or more.');
  const depthM = Array.from({ length: steps + 1 }, (_, j) => (toDepthM * j) / steps);
  return {
    depthM,
    effectiveStressKpa: depthM.map((z) => verticalStressAtDepth(input.layers, input.waterTableDepthM, z).effectiveKpa),
  };
}

export function depthProfile(
  context: StatisticsContext,
  parameters: readonly ParameterKey[] = DEFAULT_PROFILE_PARAMETERS,
  stress?: StressLineInput,
): DepthProfile {
  const panels = parameters.map((key) => panel(context, key));
  if (!stress) return { panels, effectiveStressLine: null };
  let deepest = 0;
  for (const p of panels) {
    for (const z of p.own?.depthM ?? []) deepest = Math.max(deepest, z);
    if (p.pooled.released) for (const z of p.pooled.points.depthM) deepest = Math.max(deepest, z);
  }
  const toDepthM = stress.toDepthM ?? deepest;
  return { panels, effectiveStressLine: toDepthM > 0 ? effectiveStressLine(stress, toDepthM) : null };
}
