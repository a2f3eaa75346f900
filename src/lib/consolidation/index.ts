/**
 * Public entry points of the consolidation engine. The API route needs only `previewEstimate`,
 * `EngineInputError` and the result types; the formula functions are exported for other pure
 * modules (lab interpretation, statistics) and for tests.
 */
export { STANDING_CAUTIONS } from './cautions';
export { EngineInputError, type InputIssue } from './errors';
export { excessPorePressureRatio } from './isochrones';
export { CURVE_POINTS, previewEstimate } from './preview';
export type {
  EstimatePreviewResult,
  PreviewCurve,
  PreviewLayerSettlement,
  PreviewRanges,
  PreviewSublayer,
  PreviewWarning,
  RangeTriple,
} from './preview-result';
export { olsonRampDegree } from './ramp-loading';
export { C_ALPHA_OVER_CC, cAlphaFromRatio, secondaryStrain } from './secondary';
export { indexStrain, mvStrain, settlementFromStrainM } from './settlement-primary';
export { circleCentreStressKpa, circleStressKpa } from './stress-circle';
export { cornerInfluenceFactor, rectangleStressKpa } from './stress-rectangle';
export { embankmentStressKpa, stripStressKpa } from './stress-strip';
export { twoToOneStressKpa } from './stress-two-to-one';
export { verticalStressAtDepth, WATER_UNIT_WEIGHT_SI_KN_PER_M3 } from './stress-vertical';
export {
  degreeAtTime,
  degreeOfConsolidation,
  drainagePathM,
  timeFactor,
  timeFactorForDegree,
  timeForDegreeYears,
} from './terzaghi';
export { solveLayeredConsolidation } from './time-rate-fd';
export { type UnitLabels, type UnitSystem, unitFactors } from './units';
export {
  bandDrainDiameter,
  barronSpacingFunction,
  barronSpacingFunctionApprox,
  carrilloCombined,
  hansboDrainFactor,
  influenceDiameterM,
  radialDegree,
} from './vertical-drains';
