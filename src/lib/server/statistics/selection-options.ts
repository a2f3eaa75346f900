/**
 * From the bank selection to the statistics core's options: the quality facet becomes the core's
 * quality filter (with the chosen weighting), and the numeric ranges of masked parameters become the
 * core's value-range filter, applied to masked values (value-ranges.ts). Depth, facets and text are
 * applied in SQL by the repository.
 */
import type { BankParameterKey } from '../../schemas/bank-parameters';
import type { BankSelection } from '../../schemas/bank-selection';
import type { QualityWeighting } from '../../schemas/statistics-request';
import type { ParameterKey, QualityChoice, QualityOptions, ValueRanges } from '../../statistics';

/** The selection's range keys of masked parameters and the core's names for them (depth is not masked). */
export const MASKED_RANGE_KEYS: Readonly<Record<Exclude<BankParameterKey, 'depth'>, ParameterKey>> = {
  wn: 'waterContentPct',
  ll: 'liquidLimitPct',
  pi: 'plasticityIndexPct',
  e0: 'initialVoidRatio',
  cc: 'compressionIndex',
  cr: 'recompressionIndex',
  sigmaP: 'preconsolidationStressKpa',
  ocr: 'overconsolidationRatio',
  cvNc: 'cvNcM2PerYear',
  cvOc: 'cvOcM2PerYear',
  cAlpha: 'secondaryCompressionIndex',
};

export function valueRangesOf(selection: BankSelection): ValueRanges {
  const ranges: ValueRanges = {};
  for (const [key, parameter] of Object.entries(MASKED_RANGE_KEYS)) {
    const range = selection[key as keyof typeof MASKED_RANGE_KEYS];
    if (range && (range.min !== undefined || range.max !== undefined)) ranges[parameter] = { ...range };
  }
  return ranges;
}

export function qualityOf(selection: BankSelection, weighting: QualityWeighting = 'equal'): QualityOptions {
  const include = selection.quality?.length ? ([...new Set(selection.quality)].sort() as QualityChoice[]) : undefined;
  return { ...(include ? { include } : {}), weighting };
}
