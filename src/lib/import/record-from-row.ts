import { IMPORT_FIELDS } from './fields';
import type { RowInput } from './row-input';
import type { SampleQualityClass } from './sample-quality';
import type { TestMethod } from './test-method';
import type { DerivedValue, TestRecordRow } from './test-record';
import type { UscsSymbol } from './uscs';
import type { VocabularyEntry } from './vocabulary-match';

/** What the checks resolved or worked out for a row that passed them all. */
export interface ResolvedValues {
  region: VocabularyEntry;
  unit: VocabularyEntry;
  depthTop: number;
  depthBottom: number;
  uscsSymbol: UscsSymbol | null;
  testMethod: TestMethod | null;
  cell: { value: string | null; derived: boolean };
  plasticity: { pi: number | null; derived: boolean };
  stresses: { ocr: number | null; derived: boolean };
  quality: SampleQualityClass | null;
}

type Resolved =
  | 'boreholeId'
  | 'region'
  | 'geologicalUnit'
  | 'depthTop'
  | 'depthBottom'
  | 'uscsSymbol'
  | 'testMethod'
  | 'locationCell'
  | 'plasticityIndexPct'
  | 'overconsolidationRatio';

/** Every field of the table as read (text or number, null when blank), before the resolved values are laid over it. */
function readFields(
  row: RowInput,
): Omit<TestRecordRow, Resolved | 'regionId' | 'geologicalUnitId' | 'sampleQualityClass' | 'derived'> {
  const values: Record<string, string | number | null> = {};
  for (const field of IMPORT_FIELDS) values[field.key] = field.type === 'text' ? row.text(field.key) : row.num(field.key);
  return values as ReturnType<typeof readFields>;
}

/** The checked record: every field of the table, with the vocabulary ids and the worked-out values. */
export function recordFromRow(row: RowInput, resolved: ResolvedValues): TestRecordRow {
  const { region, unit, cell, plasticity, stresses, quality } = resolved;
  const derived: DerivedValue[] = [];
  if (plasticity.derived) derived.push('plasticityIndexPct');
  if (stresses.derived) derived.push('overconsolidationRatio');
  if (cell.derived) derived.push('locationCell');
  if (quality !== null) derived.push('sampleQualityClass');
  return {
    ...readFields(row),
    boreholeId: row.text('boreholeId') ?? '',
    region: region.name,
    regionId: region.id,
    geologicalUnit: unit.name,
    geologicalUnitId: unit.id,
    locationCell: cell.value,
    depthTop: resolved.depthTop,
    depthBottom: resolved.depthBottom,
    uscsSymbol: resolved.uscsSymbol,
    plasticityIndexPct: plasticity.pi,
    testMethod: resolved.testMethod,
    overconsolidationRatio: stresses.ocr,
    sampleQualityClass: quality,
    derived,
  };
}
