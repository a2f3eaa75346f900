/**
 * Sampled parameter columns for a Monte Carlo run: one Float64Array of `realisations` values per
 * layer parameter (constants filled in), drawn through standard normal scores so that Cc and e0
 * can be correlated (Gaussian copula: z_e0 = ρ·z_Cc + √(1 − ρ²)·z′). Scores are drawn layer by
 * layer in a fixed parameter order, and only for parameters with spread.
 */
import { type Distribution, distributionFromSpec, hasSpread, valueAtScore } from './distributions';
import type { DepthParameterSpec, EngineInput, ParameterSpec } from './engine-input';
import { fillStandardNormals, type Xoshiro128 } from './random';

export interface ParameterColumn {
  /** −1 for a profile-wide parameter (the drains' ch or ch/cv). */
  layerIndex: number;
  /** Trade name: Cc, Cr, e0, mv, σ'p, OCR, cv, Cα, Cα/Cc, ch, ch/cv. */
  parameter: string;
  distribution: Distribution;
  values: Float64Array;
}

export interface LayerColumns {
  layerIndex: number;
  cc: Float64Array;
  cr: Float64Array;
  e0: Float64Array;
  /** mv, 1/kPa. */
  mv: Float64Array;
  /** σ'p (kPa) or OCR when given as one value per layer; 1 for a profile. */
  preconsolidation: Float64Array;
  cv: Float64Array;
  /** Cα or Cα/Cc (0 when none). */
  secondary: Float64Array;
  /** ch, m²/yr, when drains are present (0 otherwise). */
  ch: Float64Array;
}

const isProfile = (spec: DepthParameterSpec): spec is { type: 'linear'; top: number; bottom: number } =>
  typeof spec === 'object' && spec.type === 'linear';

interface Drawn {
  values: Float64Array;
  scores: Float64Array | null;
}

/**
 * Samples every compressible layer's parameters, then the drains' ch (or ch/cv), which is one
 * value per realisation shared by all layers.
 */
export function sampleColumns(
  input: EngineInput,
  rng: Xoshiro128,
  n: number,
): { layers: LayerColumns[]; varying: ParameterColumn[] } {
  const varying: ParameterColumn[] = [];
  const draw = (
    layerIndex: number,
    parameter: string,
    spec: ParameterSpec | null,
    fallback: number,
    correlateWith: Float64Array | null = null,
    rho = 0,
  ): Drawn => {
    const values = new Float64Array(n);
    if (spec === null) return { values: values.fill(fallback), scores: null };
    const distribution = distributionFromSpec(spec);
    if (!hasSpread(distribution)) return { values: values.fill(valueAtScore(distribution, 0)), scores: null };
    const scores = new Float64Array(n);
    fillStandardNormals(rng, scores);
    if (correlateWith && rho !== 0) {
      const b = Math.sqrt(1 - rho * rho);
      for (let i = 0; i < n; i++) scores[i] = rho * (correlateWith[i] as number) + b * (scores[i] as number);
    }
    for (let i = 0; i < n; i++) values[i] = valueAtScore(distribution, scores[i] as number);
    varying.push({ layerIndex, parameter, distribution, values });
    return { values, scores };
  };
  const layers: LayerColumns[] = [];
  input.layers.forEach((layer, i) => {
    if (!layer.compressible) return;
    const c = layer.compression;
    const indices = c?.kind === 'indices' ? c : null;
    const cc = draw(i, 'Cc', indices ? indices.cc : null, Number.NaN);
    const e0Spec = indices ? indices.e0 : c?.kind === 'mv' ? c.e0 : null;
    const e0 = draw(i, 'e0', e0Spec, Number.NaN, cc.scores, layer.ccE0Correlation);
    const cr = draw(i, 'Cr', indices ? indices.cr : null, Number.NaN);
    const mv = draw(i, 'mv', c?.kind === 'mv' ? c.mvPerKpa : null, Number.NaN);
    const pre = layer.preconsolidation;
    const preSpec = pre.kind === 'sigmaP' ? pre.sigmaPKpa : pre.kind === 'ocr' ? pre.ocr : null;
    const preName = pre.kind === 'sigmaP' ? "σ'p" : 'OCR';
    const preconsolidation = draw(i, preName, preSpec && !isProfile(preSpec) ? preSpec : null, 1);
    const cv = draw(i, 'cv', layer.cvM2PerYear, Number.NaN);
    const sec = layer.secondary;
    const secondary =
      sec.kind === 'cAlpha'
        ? draw(i, 'Cα', sec.cAlpha, 0)
        : sec.kind === 'cAlphaOverCc'
          ? draw(i, 'Cα/Cc', sec.ratio, 0)
          : { values: new Float64Array(n), scores: null };
    layers.push({
      layerIndex: i,
      cc: cc.values,
      cr: cr.values,
      e0: e0.values,
      mv: mv.values,
      preconsolidation: preconsolidation.values,
      cv: cv.values,
      secondary: secondary.values,
      ch: new Float64Array(n),
    });
  });
  const drainCh = input.drains?.ch;
  if (drainCh) {
    const shared =
      drainCh.kind === 'ch' ? draw(-1, 'ch', drainCh.chM2PerYear, 0).values : draw(-1, 'ch/cv', drainCh.chOverCv, 0).values;
    for (const layer of layers) {
      for (let r = 0; r < n; r++) {
        layer.ch[r] = drainCh.kind === 'ch' ? (shared[r] as number) : (shared[r] as number) * (layer.cv[r] as number);
      }
    }
  }
  return { layers, varying };
}

/** True when any parameter the Monte Carlo run would sample has a spread. */
export function hasAnySpread(input: EngineInput): boolean {
  const spread = (spec: DepthParameterSpec | null | undefined) =>
    spec !== null &&
    spec !== undefined &&
    !(typeof spec === 'object' && spec.type === 'linear') &&
    hasSpread(distributionFromSpec(spec));
  const drains = input.drains?.ch;
  if (drains && spread(drains.kind === 'ch' ? drains.chM2PerYear : drains.chOverCv)) return true;
  return input.layers.some((layer) => {
    if (!layer.compressible) return false;
    const c = layer.compression;
    const pre = layer.preconsolidation;
    const sec = layer.secondary;
    const specs = [
      c?.kind === 'indices' ? c.cc : null,
      c?.kind === 'indices' ? c.cr : null,
      c?.kind === 'indices' ? c.e0 : c?.e0,
      c?.kind === 'mv' ? c.mvPerKpa : null,
      pre.kind === 'sigmaP' ? pre.sigmaPKpa : pre.kind === 'ocr' ? pre.ocr : null,
      layer.cvM2PerYear,
      sec.kind === 'cAlpha' ? sec.cAlpha : sec.kind === 'cAlphaOverCc' ? sec.ratio : null,
    ];
    return specs.some(spread);
  });
}
