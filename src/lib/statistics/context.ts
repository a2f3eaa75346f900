/**
 * What every computation over one selection shares: the columns, whose data is "own", the quality
 * weights and the disclosure rule. Built once per request by `statisticsContext`.
 */
import { checkColumns, firmIndexOf, type SelectionColumns } from './columns';
import { type DisclosureReason, type DisclosureRule, disclosureRule } from './disclosure';
import { isWeighted, type QualityOptions, qualityWeightTable } from './quality';

export interface StatisticsOptions {
  /** The viewer's firm: its tests are shown to it unmasked, and alone when the rule is not met. */
  viewerFirmId: string | null;
  /** Thresholds set by the platform admin (defaults: 5 tests, 2 firms, 75 %). */
  rule?: Partial<DisclosureRule>;
  quality?: QualityOptions;
}

export interface StatisticsContext {
  columns: SelectionColumns;
  /** Index of the viewer's firm in `columns.firmIds`, −1 when it has no rows. */
  viewerIndex: number;
  /** Weight per quality class code (0 unknown, 1–4); 0 drops the class. */
  classWeights: Float64Array;
  weighted: boolean;
  rule: DisclosureRule;
}

export function statisticsContext(columns: SelectionColumns, options: StatisticsOptions): StatisticsContext {
  checkColumns(columns);
  const classWeights = qualityWeightTable(options.quality);
  return {
    columns,
    viewerIndex: firmIndexOf(columns, options.viewerFirmId),
    classWeights,
    weighted: isWeighted(classWeights),
    rule: disclosureRule(options.rule),
  };
}

/** A pooled figure the rule withholds: the counts and, in plain words, why. */
export interface Withheld {
  released: false;
  tests: number;
  firms: number;
  reasons: DisclosureReason[];
}
