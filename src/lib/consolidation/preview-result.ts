/**
 * Shape of `previewEstimate`'s result (the JSON body of a successful preview). Every figure is in
 * the request's unit system; `units` names the unit of each kind of figure. Times are always in
 * years from the start of loading; degrees of consolidation are fractions 0…1.
 */
import type { UnitLabels, UnitSystem } from './units';

export interface RangeTriple {
  p10: number;
  p50: number;
  p90: number;
}

export interface PreviewWarning {
  /** UPPER_SNAKE code from the closed list in warnings.ts. */
  code: string;
  /** Dotted path of the request field concerned, or null for the estimate as a whole. */
  field: string | null;
  message: string;
}

export interface PreviewLayerSettlement {
  name: string;
  top: number;
  bottom: number;
  compressible: boolean;
  /** Ultimate primary settlement (settlement unit). */
  primary: number;
  /** Secondary compression to the design life (settlement unit). */
  secondary: number;
  total: number;
  sublayerCount: number;
  /** End of primary consolidation (U = 95 %) of the layer's drainage group, years; null if free-draining. */
  endOfPrimaryYears: number | null;
}

export interface PreviewSublayer {
  layer: string;
  top: number;
  bottom: number;
  mid: number;
  /** σ'v0 at the mid-point (stress unit). */
  sigmaV0: number;
  deltaSigma: number;
  /** σ'p at the mid-point; null for an mv layer. */
  sigmaP: number | null;
  sigmaFinal: number;
  state: string;
  /** Primary vertical strain, fraction. */
  strain: number;
  primary: number;
  secondary: number;
}

export interface PreviewCurve {
  timeYears: number[];
  /** Settlement-weighted average degree of primary consolidation, 0…1. */
  degree: number[];
  primary: number[];
  secondary: number[];
  total: number[];
}

export interface PreviewRanges {
  method: string;
  realisations: number;
  seed: number;
  /** Ultimate primary settlement. */
  finalPrimary: RangeTriple;
  /** Ultimate primary plus secondary to the design life. */
  finalSettlement: RangeTriple;
  t90Years: RangeTriple;
  curve: { timeYears: number[]; p10: number[]; p50: number[]; p90: number[] };
  atTimes: Array<{ timeYears: number } & RangeTriple>;
  drivers: {
    method: string;
    finalSettlement: Array<{ layer: string; parameter: string; rankCorrelation: number; share: number }>;
    t90: Array<{ layer: string; parameter: string; rankCorrelation: number; share: number }>;
  };
  sampled: Array<{ layer: string; parameter: string; distribution: string }>;
}

export interface EstimatePreviewResult {
  unitSystem: UnitSystem;
  units: UnitLabels;
  settlement: {
    primary: number;
    secondary: number;
    /** Ultimate primary plus secondary to the design life. */
    total: number;
    designLifeYears: number;
    layers: PreviewLayerSettlement[];
  };
  sublayers: PreviewSublayer[];
  sublayering: {
    mode: 'auto' | 'fixed';
    countsPerLayer: number[];
    tolerancePercent: number | null;
    /** Change of the total at the last doubling, %; null for a fixed division. */
    changePercent: number | null;
    converged: boolean;
    refinements: number;
  };
  stressIncrease: { method: string; pressure: number };
  timeCurve: PreviewCurve;
  /** The requested time points (options.timePointsYears). */
  atTimes: Array<{ timeYears: number; degree: number; primary: number; secondary: number; total: number }>;
  t50Years: number;
  t90Years: number;
  /** Null when every parameter is a single value. */
  ranges: PreviewRanges | null;
  methods: string[];
  warnings: PreviewWarning[];
  cautions: string[];
}
