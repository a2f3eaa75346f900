import { IMPORT_FIELDS, type NumberFieldKey, type RequiredFieldKey } from './fields';
import { checkIncrements } from './increment-checks';
import { recordFromRow } from './record-from-row';
import { type RowInput, type RowIssue, type RowIssueField, rowInput } from './row-input';
import { checkPhysicalValues } from './row-physical-checks';
import { checkLocationCell, checkVocabulary } from './row-place-checks';
import { GS_ORGANIC_CONTENT_PCT } from './row-ranges';
import { sampleQualityClass } from './sample-quality';
import { canonicalTestMethod, type TestMethod } from './test-method';
import type { IncrementInput, TestRecordIncrement, TestRecordInput, TestRecordRow, TestRecordVocabulary } from './test-record';
import { canonicalUscs, type UscsSymbol } from './uscs';
import { VocabularyIndex } from './vocabulary-match';

export type { RowIssue } from './row-input';

/** The vocabulary indexes the checks use, built once per upload. */
export class RowCheckContext {
  readonly regions: VocabularyIndex;
  readonly units: VocabularyIndex;
  constructor(vocabulary: TestRecordVocabulary) {
    this.regions = new VocabularyIndex(vocabulary.regions);
    this.units = new VocabularyIndex(vocabulary.units);
  }
}

export interface CheckedRecord {
  issues: RowIssue[];
  result: { record: TestRecordRow; increments: TestRecordIncrement[] } | null;
}

/**
 * Checks one row's values (types already checked by the schema) and works out the derived values.
 * Every problem is reported, not only the first; the record is returned only when there is none.
 */
export function checkRecord(input: TestRecordInput, context: RowCheckContext): CheckedRecord {
  const issues: RowIssue[] = [];
  const row = rowInput(input, issues);
  const incrementInputs = input.increments ?? [];
  checkRequired(input, row);
  const uscsSymbol = checkGroupSymbol(row);
  const physical = checkPhysicalValues(row, isOrganic(row, uscsSymbol));
  const increments = checkIncrements(incrementInputs, row.add);
  checkIsOedometerResult(row, incrementInputs);
  const cell = checkLocationCell(row);
  const testMethod = checkTestMethod(row);
  const region = checkVocabulary(row, 'region', 'regions', context.regions);
  const unit = checkVocabulary(row, 'geologicalUnit', 'geological units', context.units);
  const depthTop = physical.ok('depthTop');
  const depthBottom = physical.ok('depthBottom');
  if (issues.length > 0 || !region || !unit || depthTop === null || depthBottom === null)
    return { issues: issues.sort(byField), result: null };

  const quality = sampleQualityClass(physical.ok('deltaEOverE0'), physical.stresses.ocr);
  const record = recordFromRow(row, {
    region,
    unit,
    depthTop,
    depthBottom,
    uscsSymbol,
    testMethod,
    cell,
    plasticity: physical.plasticity,
    stresses: physical.stresses,
    quality,
  });
  return { issues, result: { record, increments } };
}

const REQUIRED: { readonly [K in RequiredFieldKey]: string } = {
  boreholeId: 'The borehole (or location) id is missing; every test needs the hole it came from. It stays private to your firm.',
  region: 'The region is missing; choose one of the bank’s regions.',
  geologicalUnit: 'The geological unit is missing; choose one of the bank’s geological units.',
  depthTop: 'Depth top is missing; give the depth of the top of the sample below ground level.',
  depthBottom: 'Depth bottom is missing; give the depth of the bottom of the sample below ground level.',
};

function checkRequired(input: TestRecordInput, row: RowInput): void {
  for (const [key, message] of Object.entries(REQUIRED) as [RequiredFieldKey, string][])
    if (input[key] === undefined) row.add(key, message);
}

/** A value from a closed list, in the bank's spelling; null (and a problem unless blank) when it is not on the list. */
function checkClosedList<T>(
  row: RowInput,
  key: 'uscsSymbol' | 'testMethod',
  canonical: (written: string) => T | null,
  refusal: (written: string) => string,
): T | null {
  const written = row.text(key);
  if (written === null) return null;
  const value = canonical(written);
  if (value === null) row.add(key, refusal(written));
  return value;
}

const checkGroupSymbol = (row: RowInput): UscsSymbol | null =>
  checkClosedList(
    row,
    'uscsSymbol',
    canonicalUscs,
    (written) => `"${written}" is not an ASTM D2487 group symbol; use one such as CL, CH, ML, MH, OL, OH, Pt, CL-ML or SM.`,
  );

const checkTestMethod = (row: RowInput): TestMethod | null =>
  checkClosedList(
    row,
    'testMethod',
    canonicalTestMethod,
    (written) => `"${written}" is not a test method Claybank knows; write incremental (or IL) or CRS (constant rate of strain).`,
  );

/** Peat and organic soils (by group symbol or organic content), for which Gs may be lower. */
function isOrganic(row: RowInput, uscsSymbol: UscsSymbol | null): boolean {
  const organicContentPct = row.num('organicContentPct') ?? 0;
  return uscsSymbol === 'Pt' || uscsSymbol === 'OH' || uscsSymbol === 'OL' || organicContentPct >= GS_ORGANIC_CONTENT_PCT;
}

const CONSOLIDATION_KEYS: readonly NumberFieldKey[] = [
  'compressionIndex',
  'cvNc',
  'cvOc',
  'preconsolidationStress',
  'mv',
  'secondaryCompressionIndex',
];

function checkIsOedometerResult(row: RowInput, increments: readonly IncrementInput[]): void {
  if (CONSOLIDATION_KEYS.some((key) => row.num(key) !== null) || increments.length > 0) return;
  row.add(
    null,
    "The row has none of Cc, cv, σ'p, mv or Cα, so it is not an oedometer result. Map the columns that hold them, or remove the row.",
  );
}

const FIELD_ORDER = new Map<RowIssueField, number>(IMPORT_FIELDS.map((f, i) => [f.key, i]));
/** Whole-row problems first, then fields in catalogue order, increments last. */
const byField = (a: RowIssue, b: RowIssue) => order(a.field) - order(b.field);
const order = (field: RowIssueField | null) => (field === null ? -1 : (FIELD_ORDER.get(field) ?? FIELD_ORDER.size));
