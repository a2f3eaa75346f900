/**
 * Converts a parsed request body (`EstimatePreviewInput`, in SI or US units) to the engine's SI
 * `EngineInput`, applying the documented defaults.
 */
import type { EstimateLayerInput, EstimatePreviewInput } from '../schemas/estimate-preview';
import { DEFAULTS, type EngineInput, type EngineLayer } from './engine-input';
import { EngineInputError } from './errors';
import { groupRatioSpec } from './layer-values';
import { convertDrains, convertLoad } from './load-conversion';
import { scaleDepthSpec, scaleSpec } from './spec-scaling';
import { type UnitFactors, unitFactors, WATER_UNIT_WEIGHT } from './units';

function convertLayer(layer: EstimateLayerInput, f: UnitFactors): EngineLayer {
  const compressible = layer.compressible !== false;
  const base = {
    name: layer.name,
    thicknessM: layer.thickness * f.length,
    unitWeightAboveKnPerM3: layer.unitWeightAboveWater * f.unitWeight,
    unitWeightBelowKnPerM3: layer.unitWeightBelowWater * f.unitWeight,
    compressible,
    ccE0Correlation: layer.ccE0Correlation ?? 0,
  };
  if (!compressible) {
    return { ...base, compression: null, preconsolidation: { kind: 'none' }, cvM2PerYear: null, secondary: { kind: 'none' } };
  }
  const e0 = layer.e0 === undefined ? null : scaleSpec(layer.e0, 1);
  let compression: EngineLayer['compression'];
  if (layer.mv !== undefined) compression = { kind: 'mv', mvPerKpa: scaleSpec(layer.mv, f.mv), e0 };
  else if (layer.cc !== undefined && layer.cr !== undefined && e0 !== null) {
    compression = { kind: 'indices', cc: scaleSpec(layer.cc, 1), cr: scaleSpec(layer.cr, 1), e0 };
  } else throw new EngineInputError('layers', `Layer "${layer.name}" needs Cc, Cr and e0, or mv.`);
  const preconsolidation: EngineLayer['preconsolidation'] =
    layer.sigmaP !== undefined
      ? { kind: 'sigmaP', sigmaPKpa: scaleDepthSpec(layer.sigmaP, f.stress) }
      : layer.ocr !== undefined
        ? { kind: 'ocr', ocr: scaleDepthSpec(layer.ocr, 1) }
        : { kind: 'none' };
  if (compression.kind === 'indices' && preconsolidation.kind === 'none') {
    throw new EngineInputError('layers', `Layer "${layer.name}" needs σ'p or OCR.`);
  }
  if (layer.cv === undefined) throw new EngineInputError('layers', `Layer "${layer.name}" needs cv.`);
  const ratio = layer.cAlphaOverCc;
  const secondary: EngineLayer['secondary'] =
    layer.cAlpha !== undefined
      ? { kind: 'cAlpha', cAlpha: scaleSpec(layer.cAlpha, 1) }
      : ratio === undefined
        ? { kind: 'none' }
        : typeof ratio === 'string'
          ? { kind: 'cAlphaOverCc', ratio: groupRatioSpec(ratio), group: ratio }
          : { kind: 'cAlphaOverCc', ratio: scaleSpec(ratio, 1), group: null };
  return { ...base, compression, preconsolidation, cvM2PerYear: scaleSpec(layer.cv, f.cv), secondary };
}

/** The engine input in SI, with defaults applied (design life 50 years, 5000 realisations, seed 1). */
export function toEngineInput(input: EstimatePreviewInput): EngineInput {
  const f = unitFactors(input.unitSystem);
  const options = input.options ?? {};
  const sub = options.sublayers;
  return {
    layers: input.layers.map((l) => convertLayer(l, f)),
    waterTableDepthM: input.waterTableDepth * f.length,
    load: convertLoad(input.load, f),
    drainage: { top: input.drainage.top, bottom: input.drainage.bottom },
    constructionTimeYears: input.constructionTimeYears ?? null,
    drains: convertDrains(input, f),
    designLifeYears: options.designLifeYears ?? DEFAULTS.designLifeYears,
    designLifeDefaulted: options.designLifeYears === undefined,
    timePointsYears: [...(options.timePointsYears ?? [])].sort((a, b) => a - b),
    monteCarlo: {
      realisations: options.monteCarlo?.realisations ?? DEFAULTS.realisations,
      seed: options.monteCarlo?.seed ?? DEFAULTS.seed,
    },
    sublayers:
      sub?.mode === 'fixed'
        ? { mode: 'fixed', perLayer: sub.perLayer }
        : {
            mode: 'auto',
            tolerancePercent: sub?.tolerancePercent ?? DEFAULTS.tolerancePercent,
            maxPerLayer: sub?.maxPerLayer ?? DEFAULTS.maxPerLayer,
          },
    waterUnitWeightKnPerM3: (options.waterUnitWeight ?? WATER_UNIT_WEIGHT[input.unitSystem]) * f.unitWeight,
  };
}
