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

/**
 * The checked record: every field of the table, as read or as the checks resolved it, with the
 * vocabulary ids and the worked-out values. One object literal (a fixed shape is several times cheaper
 * than adding 40 keys in a loop, at 100,000 rows); the TestRecordRow type, derived from the field table,
 * makes a field added there fail to compile until it is read here.
 */
export function recordFromRow(row: RowInput, resolved: ResolvedValues): TestRecordRow {
  const { region, unit, cell, plasticity, stresses } = resolved;
  return {
    projectName: row.text('projectName'),
    clientName: row.text('clientName'),
    boreholeId: row.text('boreholeId') ?? '',
    sampleId: row.text('sampleId'),
    easting: row.num('easting'),
    northing: row.num('northing'),
    latitude: row.num('latitude'),
    longitude: row.num('longitude'),
    coordinateSystem: row.text('coordinateSystem'),
    notes: row.text('notes'),
    region: region.name,
    regionId: region.id,
    geologicalUnit: unit.name,
    geologicalUnitId: unit.id,
    locationCell: cell.value,
    depthTop: resolved.depthTop,
    depthBottom: resolved.depthBottom,
    uscsSymbol: resolved.uscsSymbol,
    samplingMethod: row.text('samplingMethod'),
    waterContentPct: row.num('waterContentPct'),
    liquidLimitPct: row.num('liquidLimitPct'),
    plasticLimitPct: row.num('plasticLimitPct'),
    plasticityIndexPct: plasticity.pi,
    specificGravity: row.num('specificGravity'),
    bulkUnitWeight: row.num('bulkUnitWeight'),
    initialVoidRatio: row.num('initialVoidRatio'),
    organicContentPct: row.num('organicContentPct'),
    testMethod: resolved.testMethod,
    testStandard: row.text('testStandard'),
    compressionIndex: row.num('compressionIndex'),
    recompressionIndex: row.num('recompressionIndex'),
    preconsolidationStress: row.num('preconsolidationStress'),
    verticalEffectiveStress: row.num('verticalEffectiveStress'),
    overconsolidationRatio: stresses.ocr,
    cvNc: row.num('cvNc'),
    cvOc: row.num('cvOc'),
    secondaryCompressionIndex: row.num('secondaryCompressionIndex'),
    mv: row.num('mv'),
    permeability: row.num('permeability'),
    deltaEOverE0: row.num('deltaEOverE0'),
    sampleQualityClass: resolved.quality,
    derived: derivedValues(resolved),
  };
}

function derivedValues({ cell, plasticity, stresses, quality }: ResolvedValues): DerivedValue[] {
  const derived: DerivedValue[] = [];
  if (plasticity.derived) derived.push('plasticityIndexPct');
  if (stresses.derived) derived.push('overconsolidationRatio');
  if (cell.derived) derived.push('locationCell');
  if (quality !== null) derived.push('sampleQualityClass');
  return derived;
}
