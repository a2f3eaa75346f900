/**
 * Public entry points of the statistics core. A server module fills `SelectionColumns` from a
 * selection's rows and calls `analyseSelection` (or the parts: `statisticsContext` then
 * `summariseParameter`, `correlatePair`, `compareWithPublished`, `depthProfile`).
 */
export {
  type AnalysisOptions,
  analyseSelection,
  type MethodNotes,
  type SelectionAnalysis,
  STATISTICS_CAUTIONS,
} from './analyse-selection';
export { type BandPoint, regressionBands } from './bands';
export { type CacheKeyInput, type KeyValue, STATISTICS_ALGORITHM_VERSION, statisticsCacheKey } from './cache-key';
export type { PublishedLine } from './chart-lines';
export { checkColumns, columnsFromRecords, type SelectionColumns, type StatisticsRecord } from './columns';
export { type StatisticsContext, type StatisticsOptions, statisticsContext, type Withheld } from './context';
export {
  type CorrelationOptions,
  type CorrelationResult,
  correlatePair,
  type FittedLine,
  pairParameters,
  type ScatterPoints,
} from './correlation';
export {
  type BiasFigures,
  compareWithPublished,
  type PublishedComparison,
  type PublishedCorrelationInfo,
} from './correlation-bias';
export {
  type AxisScale,
  type AxisVariable,
  CORRELATION_PAIR_IDS,
  CORRELATION_PAIRS,
  type CorrelationPair,
  type CorrelationPairId,
  DEFAULT_CORRELATION_PAIRS,
  isCorrelationPairId,
} from './correlation-pairs';
export {
  DEFAULT_PROFILE_PARAMETERS,
  type DepthProfile,
  depthProfile,
  effectiveStressLine,
  type ProfilePanel,
  type StressLine,
  type StressLineInput,
  uniformLayer,
} from './depth-profile';
export {
  checkDisclosure,
  DEFAULT_DISCLOSURE_RULE,
  type DisclosureReason,
  type DisclosureReasonCode,
  type DisclosureRule,
  type DisclosureVerdict,
  disclosureRule,
} from './disclosure';
export { StatisticsInputError } from './errors';
export { type EstimatorRange, estimatorRange } from './estimator-ranges';
export type { DistributionFigures, LogNormalFit } from './figures';
export { maskFactor } from './masking';
export {
  isParameterKey,
  LOG_SCALE_REASON,
  PARAMETER_KEYS,
  PARAMETERS,
  type ParameterDefinition,
  type ParameterKey,
} from './parameters';
export { compareWithPool, percentileRank, tukeyFences } from './pool-comparison';
export { PUBLISHED_CORRELATIONS, type PublishedCorrelation, publishedCorrelation } from './published-correlations';
export { DEFAULT_QUALITY_WEIGHTS, type QualityChoice, type QualityOptions } from './quality';
export { fitLine, type LinearFit } from './regression';
export { compareSiteValues, type SiteComparison } from './site-comparison';
export { type SoilGroup, soilGroupOfUscs } from './soil-groups';
export { type SplitValues, type StressLevel, splitByStressRange, stressLevelRange } from './stress-levels';
export { type ParameterSummary, summariseParameter, summariseParameters } from './summary';
export { filterByValueRanges, type ValueRange, type ValueRanges } from './value-ranges';
