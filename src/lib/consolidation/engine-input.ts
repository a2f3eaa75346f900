/**
 * The engine's own, SI-only description of an estimate, produced from the request body by
 * `input-conversion.ts`. Every number carries its unit in its name.
 */
import type { TwoToOneShape } from './stress-two-to-one';
import type { Boundary } from './terzaghi';

/** A parameter: a fixed value or a distribution, in SI units. */
export type ParameterSpec =
  | number
  | { type: 'normal'; mean: number; sd: number }
  | { type: 'lognormal'; mean: number; sd: number }
  | { type: 'triangular'; min: number; mode: number; max: number }
  | { type: 'p10p50p90'; p10: number; p50: number; p90: number };

/** A parameter that may vary linearly with depth within its layer (values at top and bottom). */
export type DepthParameterSpec = ParameterSpec | { type: 'linear'; top: number; bottom: number };

export type Compression =
  | { kind: 'indices'; cc: ParameterSpec; cr: ParameterSpec; e0: ParameterSpec }
  | { kind: 'mv'; mvPerKpa: ParameterSpec; e0: ParameterSpec | null };

export type Preconsolidation =
  | { kind: 'sigmaP'; sigmaPKpa: DepthParameterSpec }
  | { kind: 'ocr'; ocr: DepthParameterSpec }
  | { kind: 'none' };

export type Secondary =
  | { kind: 'none' }
  | { kind: 'cAlpha'; cAlpha: ParameterSpec }
  | { kind: 'cAlphaOverCc'; ratio: ParameterSpec; group: string | null };

export interface EngineLayer {
  name: string;
  thicknessM: number;
  unitWeightAboveKnPerM3: number;
  unitWeightBelowKnPerM3: number;
  compressible: boolean;
  compression: Compression | null;
  preconsolidation: Preconsolidation;
  cvM2PerYear: ParameterSpec | null;
  secondary: Secondary;
  ccE0Correlation: number;
}

export type EngineLoad =
  | { kind: 'wideFill'; pressureKpa: number }
  | { kind: 'embankment'; pressureKpa: number; crestWidthM: number; sideSlopeWidthM: number; pointOffsetM: number }
  | { kind: 'rectangle'; pressureKpa: number; widthM: number; lengthM: number; pointXM: number; pointYM: number }
  | { kind: 'strip'; pressureKpa: number; widthM: number; pointOffsetM: number }
  | { kind: 'circle'; pressureKpa: number; diameterM: number; pointOffsetM: number }
  | { kind: 'twoToOne'; pressureKpa: number; shape: TwoToOneShape; widthM: number; lengthM: number };

export interface EngineDrains {
  pattern: 'square' | 'triangular';
  spacingM: number;
  /** Equivalent drain diameter dw, m (band drains converted by Hansbo 1979). */
  drainDiameterM: number;
  bandDrain: boolean;
  smearRatio: number;
  khOverKs: number;
  dischargeM3PerYear: number | null;
  ch: { kind: 'ch'; chM2PerYear: ParameterSpec } | { kind: 'ratio'; chOverCv: ParameterSpec };
}

export type SublayerControl =
  | { mode: 'auto'; tolerancePercent: number; maxPerLayer: number }
  | { mode: 'fixed'; perLayer: number };

export interface EngineInput {
  layers: EngineLayer[];
  waterTableDepthM: number;
  load: EngineLoad;
  drainage: { top: Boundary; bottom: Boundary };
  constructionTimeYears: number | null;
  drains: EngineDrains | null;
  designLifeYears: number;
  designLifeDefaulted: boolean;
  timePointsYears: number[];
  monteCarlo: { realisations: number; seed: number };
  sublayers: SublayerControl;
  waterUnitWeightKnPerM3: number;
}

/** Defaults the engine applies when the request leaves them out (reported in warnings and methods). */
export const DEFAULTS = {
  designLifeYears: 50,
  realisations: 5000,
  seed: 1,
  tolerancePercent: 0.5,
  maxPerLayer: 128,
} as const;
