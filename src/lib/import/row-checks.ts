import type { TestRecordIncrement, TestRecordInput, TestRecordRow, TestRecordVocabulary } from '../schemas/test-record-row';
import { IMPORT_FIELDS } from './fields';
import { checkIncrements } from './increment-checks';
import { type RowIssue, rowInput } from './row-input';
import { checkAtterbergLimits, checkCompressionIndices, checkDepths, checkRanges, checkStresses } from './row-physical-checks';
import { checkLocationCell, checkVocabulary } from './row-place-checks';
import { GS_ORGANIC_CONTENT_PCT } from './row-ranges';
import { sampleQualityClass } from './sample-quality';
import { canonicalTestMethod } from './test-method';
import { canonicalUscs } from './uscs';
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

const REQUIRED: Readonly<Record<string, string>> = {
  boreholeId: 'The borehole (or location) id is missing; every test needs the hole it came from. It stays private to your firm.',
  region: 'The region is missing; choose one of the bank’s regions.',
  geologicalUnit: 'The geological unit is missing; choose one of the bank’s geological units.',
  depthTop: 'Depth top is missing; give the depth of the top of the sample below ground level.',
  depthBottom: 'Depth bottom is missing; give the depth of the bottom of the sample below ground level.',
};

const FIELD_ORDER = new Map<string, number>(IMPORT_FIELDS.map((f, i) => [f.key, i]));
/** Whole-row problems first, then fields in catalogue order, increments last. */
const byField = (a: RowIssue, b: RowIssue) => order(a.field) - order(b.field);
const order = (field: string | null) => (field === null ? -1 : (FIELD_ORDER.get(field) ?? FIELD_ORDER.size));

const CONSOLIDATION_KEYS = ['compressionIndex', 'cvNc', 'cvOc', 'preconsolidationStress', 'mv', 'secondaryCompressionIndex'];

/**
 * Checks one row's values (types already checked by the schema) and works out the derived values.
 * Every problem is reported, not only the first; the record is returned only when there is none.
 */
export function checkRecord(
  input: TestRecordInput,
  context: RowCheckContext,
): { issues: RowIssue[]; result: { record: TestRecordRow; increments: TestRecordIncrement[] } | null } {
  const issues: RowIssue[] = [];
  const row = rowInput(input, issues);
  for (const [key, message] of Object.entries(REQUIRED)) if (input[key] === undefined) row.add(key, message);

  const uscsText = row.text('uscsSymbol');
  const uscs = uscsText === null ? null : canonicalUscs(uscsText);
  if (uscsText !== null && uscs === null) {
    row.add(
      'uscsSymbol',
      `"${uscsText}" is not an ASTM D2487 group symbol; use one such as CL, CH, ML, MH, OL, OH, Pt, CL-ML or SM.`,
    );
  }
  const organic =
    uscs === 'Pt' || uscs === 'OH' || uscs === 'OL' || (row.num('organicContentPct') ?? 0) >= GS_ORGANIC_CONTENT_PCT;
  const ok = checkRanges(row, organic);
  checkDepths(row, ok);
  const plasticity = checkAtterbergLimits(row, ok);
  checkCompressionIndices(row, ok);
  const stresses = checkStresses(row, ok);

  const increments = checkIncrements(input.increments ?? [], row.add);
  if (!CONSOLIDATION_KEYS.some((key) => row.num(key) !== null) && (input.increments ?? []).length === 0) {
    row.add(
      null,
      "The row has none of Cc, cv, σ'p, mv or Cα, so it is not an oedometer result. Map the columns that hold them, or remove the row.",
    );
  }

  const cell = checkLocationCell(row);
  const methodText = row.text('testMethod');
  const method = methodText === null ? null : canonicalTestMethod(methodText);
  if (methodText !== null && method === null) {
    row.add(
      'testMethod',
      `"${methodText}" is not a test method Claybank knows; write incremental (or IL) or CRS (constant rate of strain).`,
    );
  }
  const region = checkVocabulary(row, 'region', 'regions', context.regions);
  const unit = checkVocabulary(row, 'geologicalUnit', 'geological units', context.units);
  const top = ok('depthTop');
  const bottom = ok('depthBottom');
  if (issues.length > 0 || !region || !unit || top === null || bottom === null)
    return { issues: issues.sort(byField), result: null };

  const quality = sampleQualityClass(ok('deltaEOverE0'), stresses.ocr);
  const derived: TestRecordRow['derived'] = [];
  if (plasticity.derived) derived.push('plasticityIndexPct');
  if (stresses.derived) derived.push('overconsolidationRatio');
  if (cell.derived) derived.push('locationCell');
  if (quality !== null) derived.push('sampleQualityClass');
  const record: TestRecordRow = {
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
    depthTop: top,
    depthBottom: bottom,
    uscsSymbol: uscs,
    samplingMethod: row.text('samplingMethod'),
    waterContentPct: row.num('waterContentPct'),
    liquidLimitPct: row.num('liquidLimitPct'),
    plasticLimitPct: row.num('plasticLimitPct'),
    plasticityIndexPct: plasticity.pi,
    specificGravity: row.num('specificGravity'),
    bulkUnitWeight: row.num('bulkUnitWeight'),
    initialVoidRatio: row.num('initialVoidRatio'),
    organicContentPct: row.num('organicContentPct'),
    testMethod: method,
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
    sampleQualityClass: quality,
    derived,
  };
  return { issues, result: { record, increments } };
}
