/**
 * Scalar parameter values of one layer for one evaluation — the medians for the deterministic
 * ("likely") run, or one Monte Carlo realisation — and the preconsolidation pressure they give at
 * a depth.
 */
import { specMedian } from './distributions';
import type { DepthParameterSpec, EngineLayer, Preconsolidation } from './engine-input';
import { C_ALPHA_OVER_CC, type CAlphaOverCcGroup } from './secondary';

export interface LayerValues {
  cc: number;
  cr: number;
  e0: number;
  /** mv, 1/kPa (NaN when Cc/Cr are used). */
  mvPerKpa: number;
  /** σ'p in kPa or OCR, whichever the layer gives as a single value (NaN for a profile). */
  preconsolidation: number;
  cvM2PerYear: number;
  /** Cα, or Cα/Cc for a ratio layer (0 when no secondary compression is given). */
  secondary: number;
}

function depthMedian(spec: DepthParameterSpec): number {
  return typeof spec === 'object' && spec.type === 'linear' ? Number.NaN : specMedian(spec);
}

/** The ratio spec for a Cα/Cc group: triangular over the published ± range. */
export function groupRatioSpec(group: CAlphaOverCcGroup) {
  const { central, halfRange } = C_ALPHA_OVER_CC[group];
  return { type: 'triangular' as const, min: central - halfRange, mode: central, max: central + halfRange };
}

/** Median values of a compressible layer's parameters (distributions replaced by their medians). */
export function medianLayerValues(layer: EngineLayer): LayerValues {
  const c = layer.compression;
  const pre = layer.preconsolidation;
  const sec = layer.secondary;
  return {
    cc: c?.kind === 'indices' ? specMedian(c.cc) : Number.NaN,
    cr: c?.kind === 'indices' ? specMedian(c.cr) : Number.NaN,
    e0: c?.kind === 'indices' ? specMedian(c.e0) : c?.e0 ? specMedian(c.e0) : Number.NaN,
    mvPerKpa: c?.kind === 'mv' ? specMedian(c.mvPerKpa) : Number.NaN,
    preconsolidation: pre.kind === 'sigmaP' ? depthMedian(pre.sigmaPKpa) : pre.kind === 'ocr' ? depthMedian(pre.ocr) : Number.NaN,
    cvM2PerYear: layer.cvM2PerYear === null ? Number.NaN : specMedian(layer.cvM2PerYear),
    secondary: sec.kind === 'cAlpha' ? specMedian(sec.cAlpha) : sec.kind === 'cAlphaOverCc' ? specMedian(sec.ratio) : 0,
  };
}

function linearAt(spec: DepthParameterSpec, fraction: number): number | null {
  if (typeof spec === 'object' && spec.type === 'linear') return spec.top + (spec.bottom - spec.top) * fraction;
  return null;
}

/**
 * σ'p (kPa) at a sublayer mid-point: the layer's σ'p, σ'p interpolated along a linear profile,
 * or OCR (single value or profile) × σ'v0. `fraction` is the mid-point's position in the layer
 * (0 top, 1 base); `scalar` the layer's single σ'p or OCR value for this evaluation. NaN when the
 * layer uses mv. Source: OCR = σ'p/σ'v0, UFC 3-220-10 Eq. 5-1.
 */
export function preconsolidationKpa(pre: Preconsolidation, scalar: number, fraction: number, sigmaV0Kpa: number): number {
  if (pre.kind === 'sigmaP') return linearAt(pre.sigmaPKpa, fraction) ?? scalar;
  if (pre.kind === 'ocr') return (linearAt(pre.ocr, fraction) ?? scalar) * sigmaV0Kpa;
  return Number.NaN;
}
