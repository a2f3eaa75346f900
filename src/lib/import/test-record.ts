import type { IMPORT_FIELDS } from './fields';
import type { RawIncrement } from './raw-row';
import type { SampleQualityClass } from './sample-quality';
import type { TestMethod } from './test-method';
import type { UscsSymbol } from './uscs';
import type { VocabularyEntry } from './vocabulary-match';

type FieldRow = (typeof IMPORT_FIELDS)[number];
type FieldValue<F extends FieldRow> = F['type'] extends 'text' ? string : number;

/** Every field of the table by key: text or number, null when blank unless the field is required. */
type FieldValues = {
  [F in FieldRow as F['key']]: F['required'] extends true ? FieldValue<F> : FieldValue<F> | null;
};

/** Values the importer works out rather than reads; marked on screen as worked out. */
export type DerivedValue = 'plasticityIndexPct' | 'overconsolidationRatio' | 'locationCell' | 'sampleQualityClass';

/**
 * One imported test record after column mapping, unit conversion and every check, in the bank's SI
 * units: depth m, stress kPa, cv m²/yr, unit weight kN/m³, mv m²/MN, k m/s, percentages in %. One value
 * per field of the field table (fields.ts), with the closed lists narrowed, plus what the checks add:
 * the vocabulary ids, the sample quality class and which values were worked out.
 */
export type TestRecordRow = Omit<FieldValues, 'uscsSymbol' | 'testMethod'> & {
  uscsSymbol: UscsSymbol | null;
  testMethod: TestMethod | null;
  /** the vocabulary entry's id (`region` and `geologicalUnit` hold its own name) */
  regionId: string;
  geologicalUnitId: string;
  sampleQualityClass: SampleQualityClass | null;
  derived: DerivedValue[];
};

/** A consolidation increment after checking (units as RawIncrement); number and stress are always there. */
export type TestRecordIncrement = Omit<RawIncrement, 'incrementNo' | 'appliedStressKpa'> & {
  incrementNo: number;
  appliedStressKpa: number;
};

/** An increment as the row schema receives it: every value may be missing. */
export type IncrementInput = { [K in keyof RawIncrement]?: RawIncrement[K] };

/** The parsed input the checks receive: text and numbers by field key, all optional. */
export type TestRecordInput = { [K in keyof FieldValues]?: string | number } & {
  increments?: IncrementInput[];
};

export interface TestRecordVocabulary {
  regions: readonly VocabularyEntry[];
  units: readonly VocabularyEntry[];
}
