import type { RowError } from './errors';
import type { ImportFieldKey } from './fields';

/** A cell value after reading: text trimmed, numbers in the bank's SI units, null or absent when blank. */
export type RawValue = string | number | null | undefined;

/**
 * One consolidation increment (or decrement) of an incremental-loading test, as read from an AGS4 CONS
 * record. Units: stress kPa, mv m²/MN, cv m²/yr; void ratios and Cα are dimensionless.
 */
export interface RawIncrement {
  incrementNo: number | null;
  appliedStressKpa: number | null;
  voidRatioStart: number | null;
  voidRatioEnd: number | null;
  mvM2PerMn: number | null;
  cvRootTimeM2PerYear: number | null;
  cvLogTimeM2PerYear: number | null;
  cAlpha: number | null;
}

/**
 * A row read from a CSV (after column mapping and unit conversion) or built from AGS4 groups, before
 * validation. Both importers produce this shape, so one validator serves both.
 */
export interface RawRow {
  /** row number (see row-numbers.ts) */
  row: number;
  values: Partial<Record<ImportFieldKey, RawValue>>;
  increments?: RawIncrement[];
  /** problems found while reading and mapping (quotes, cell counts, number formats); validateRows reports them */
  problems?: RowError[];
}
