/**
 * The pairs the correlation charts offer, with the axes the trade plots them on: cv on a log axis
 * (it spans orders of magnitude), the others on linear axes; σ'p and OCR against depth.
 */
import type { ParameterKey } from './parameters';

export type AxisScale = 'linear' | 'log';
/** A chart axis: a parameter, or the specimen's depth (never masked). */
export type AxisVariable = ParameterKey | 'depthM';

export const CORRELATION_PAIR_IDS = [
  'cc-ll',
  'cc-wn',
  'cc-e0',
  'cc-pi',
  'cr-cc',
  'calpha-cc',
  'cv-ll',
  'sigmap-depth',
  'ocr-depth',
] as const;
export type CorrelationPairId = (typeof CORRELATION_PAIR_IDS)[number];

export interface CorrelationPair {
  id: CorrelationPairId;
  /** Regressor (horizontal axis). */
  x: AxisVariable;
  /** Response (vertical axis). */
  y: ParameterKey;
  xScale: AxisScale;
  yScale: AxisScale;
}

const pair = (id: CorrelationPairId, x: AxisVariable, y: ParameterKey, yScale: AxisScale = 'linear'): CorrelationPair => ({
  id,
  x,
  y,
  xScale: 'linear',
  yScale,
});

export const CORRELATION_PAIRS: Readonly<Record<CorrelationPairId, CorrelationPair>> = {
  'cc-ll': pair('cc-ll', 'liquidLimitPct', 'compressionIndex'),
  'cc-wn': pair('cc-wn', 'waterContentPct', 'compressionIndex'),
  'cc-e0': pair('cc-e0', 'initialVoidRatio', 'compressionIndex'),
  'cc-pi': pair('cc-pi', 'plasticityIndexPct', 'compressionIndex'),
  'cr-cc': pair('cr-cc', 'compressionIndex', 'recompressionIndex'),
  'calpha-cc': pair('calpha-cc', 'compressionIndex', 'secondaryCompressionIndex'),
  'cv-ll': pair('cv-ll', 'liquidLimitPct', 'cvNcM2PerYear', 'log'),
  'sigmap-depth': pair('sigmap-depth', 'depthM', 'preconsolidationStressKpa'),
  'ocr-depth': pair('ocr-depth', 'depthM', 'overconsolidationRatio'),
};

/** The six pairs of the acceptance benchmark and the default correlation set. */
export const DEFAULT_CORRELATION_PAIRS: readonly CorrelationPairId[] = ['cc-ll', 'cc-wn', 'cc-e0', 'cc-pi', 'cr-cc', 'calpha-cc'];

export function isCorrelationPairId(value: unknown): value is CorrelationPairId {
  return typeof value === 'string' && (CORRELATION_PAIR_IDS as readonly string[]).includes(value);
}
