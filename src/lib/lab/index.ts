/**
 * The laboratory-interpretation core: parameters derived from an oedometer test's own readings, each with
 * the construction that gave it (to draw) or the reason it could not be determined. Pure TypeScript for the
 * browser and the server; a steward's choices go in as `InterpretationChoices` and come back echoed.
 */
export { type Ags4Interpretable, testFromAgs4Row } from './ags4-test';
export type { LogTimeChoice, LogTimeConstruction } from './casagrande-log-time';
export type { CasagrandeChoice, CasagrandeConstruction } from './casagrande-preconsolidation';
export { type Branch, type CompressionCurve, type CurveProblem, type CurveState, compressionCurve } from './compression-curve';
export type { CompressionIndexChoice } from './compression-index';
export {
  type CrsInterpretation,
  type CrsPoint,
  type CrsReading,
  type CrsTestInput,
  crsPoints,
  interpretCrsTest,
  RECOMMENDED_PORE_PRESSURE_RATIO,
} from './crs-test';
export type { CurvePoint, Segment, StressRange, TimeRange } from './geometry';
export type { IncrementChoice, IncrementInterpretation, SecondaryCompression } from './increment-interpretation';
export {
  type IncrementalInterpretation,
  type InterpretationChoices,
  type InterpretationContext,
  interpretIncrementalTest,
} from './interpret-incremental';
export type { NormalisedChart } from './max-curvature';
export {
  type CannotReason,
  type Derived,
  type Determined,
  type LabParameter,
  PARAMETER_LABELS,
  type Undetermined,
} from './outcome';
export { type ReadingsError, type ReadingsResult, type ReadingsTest, readReadingsCsv } from './readings-csv/read-readings';
export type { ReadingsRowError, ReadingsSection } from './readings-csv/readings-rows';
export { TIME_READINGS_MARKER } from './readings-csv/readings-sections';
export { type ReadingsColumnGuideEntry, readingsColumnGuide, readingsTemplateCsv } from './readings-csv/readings-template';
export type { RecompressionIndexChoice } from './recompression-index';
export {
  REVIEW_TOLERANCES,
  type ReviewedParameter,
  type ReviewFlag,
  reviewFlags,
  type SubmittedValues,
  type Tolerance,
} from './review-flags';
export type { SampleQuality } from './sample-quality';
export type { SlopeFit } from './slope-fit';
export type { SpecimenState } from './specimen-state';
export type { StrainEnergyChoice, StrainEnergyConstruction, WorkLine, WorkPoint } from './strain-energy-preconsolidation';
export type { RootTimeChoice, RootTimeConstruction } from './taylor-root-time';
export type { IncrementalTestInput, IncrementInput, SpecimenDrainage, SpecimenInput, TimeReading } from './test-input';
export { T50, T90, TAYLOR_FACTOR } from './time-factors';
export type { TimePoint } from './time-readings';
