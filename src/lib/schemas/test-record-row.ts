import { z } from 'zod';
import { IMPORT_FIELDS } from '../import/fields';
import { checkRecord, RowCheckContext } from '../import/row-checks';
import type { SampleQualityClass } from '../import/sample-quality';
import type { TestMethod } from '../import/test-method';
import type { UscsSymbol } from '../import/uscs';
import type { VocabularyEntry } from '../import/vocabulary-match';

/**
 * One imported test record after column mapping and unit conversion, in the bank's SI units: depth m,
 * stress kPa, cv m²/yr, unit weight kN/m³, mv m²/MN, k m/s, percentages in %. Shared by the browser
 * preview and the server, which re-validates every row. The schema checks types, then the physical
 * ranges and the relations between values (row-checks.ts), and fills in what can be worked out: PI from
 * LL − PL, OCR from σ'p/σ'v0, the location cell from easting/northing and the sample quality class.
 */
export interface TestRecordRow {
  projectName: string | null;
  clientName: string | null;
  boreholeId: string;
  sampleId: string | null;
  easting: number | null;
  northing: number | null;
  latitude: number | null;
  longitude: number | null;
  coordinateSystem: string | null;
  notes: string | null;
  /** the vocabulary's own name, and its id */
  region: string;
  regionId: string;
  geologicalUnit: string;
  geologicalUnitId: string;
  locationCell: string | null;
  depthTop: number;
  depthBottom: number;
  uscsSymbol: UscsSymbol | null;
  samplingMethod: string | null;
  waterContentPct: number | null;
  liquidLimitPct: number | null;
  plasticLimitPct: number | null;
  plasticityIndexPct: number | null;
  specificGravity: number | null;
  bulkUnitWeight: number | null;
  initialVoidRatio: number | null;
  organicContentPct: number | null;
  testMethod: TestMethod | null;
  testStandard: string | null;
  compressionIndex: number | null;
  recompressionIndex: number | null;
  preconsolidationStress: number | null;
  verticalEffectiveStress: number | null;
  overconsolidationRatio: number | null;
  cvNc: number | null;
  cvOc: number | null;
  secondaryCompressionIndex: number | null;
  mv: number | null;
  permeability: number | null;
  deltaEOverE0: number | null;
  sampleQualityClass: SampleQualityClass | null;
  /** values the importer worked out rather than read */
  derived: ('plasticityIndexPct' | 'overconsolidationRatio' | 'locationCell' | 'sampleQualityClass')[];
}

/** A consolidation increment after checking (units as RawIncrement). */
export interface TestRecordIncrement {
  incrementNo: number;
  appliedStressKpa: number;
  voidRatioStart: number | null;
  voidRatioEnd: number | null;
  mvM2PerMn: number | null;
  cvRootTimeM2PerYear: number | null;
  cvLogTimeM2PerYear: number | null;
  cAlpha: number | null;
}

export interface TestRecordVocabulary {
  regions: readonly VocabularyEntry[];
  units: readonly VocabularyEntry[];
}

const TEXT_MAX: Readonly<Record<string, number>> = { notes: 2000 };
const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** Blank text and null become absent, text is trimmed, plain numeric text becomes a number (for JSON callers). */
function normaliseInput(input: unknown): unknown {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) return input;
  const source = input as Record<string, unknown>;
  const out: Record<string, unknown> = {};
  for (const field of IMPORT_FIELDS) {
    if (!Object.hasOwn(source, field.key)) continue;
    let value = source[field.key];
    if (typeof value === 'string') value = value.trim();
    if (value === '' || value === null || value === undefined) continue;
    if (field.type === 'text' && typeof value === 'number' && Number.isFinite(value)) value = String(value);
    if (field.type !== 'text' && typeof value === 'string' && PLAIN_NUMBER.test(value)) value = Number(value);
    out[field.key] = value;
  }
  if (Object.hasOwn(source, 'increments') && source.increments !== undefined && source.increments !== null) {
    out.increments = source.increments;
  }
  return out;
}

const numberOrNull = (what: string) =>
  z
    .number({ error: `${what} must be a number.` })
    .nullable()
    .optional();

const incrementSchema = z.object({
  incrementNo: numberOrNull('The increment number'),
  appliedStressKpa: numberOrNull('The applied stress'),
  voidRatioStart: numberOrNull('The void ratio at the start'),
  voidRatioEnd: numberOrNull('The void ratio at the end'),
  mvM2PerMn: numberOrNull('mv'),
  cvRootTimeM2PerYear: numberOrNull('cv (root time)'),
  cvLogTimeM2PerYear: numberOrNull('cv (log time)'),
  cAlpha: numberOrNull('Cα'),
});

function fieldShape() {
  const shape: Record<string, z.ZodType> = {};
  for (const field of IMPORT_FIELDS) {
    if (field.type === 'text') {
      const max = TEXT_MAX[field.key] ?? 200;
      shape[field.key] = z
        .string({ error: `${field.label} must be text.` })
        .max(max, `${field.label} is longer than ${max} characters; shorten it.`)
        .optional();
    } else {
      shape[field.key] = z.number({ error: `${field.label} must be a number, such as 1.25.` }).optional();
    }
  }
  shape.increments = z
    .array(incrementSchema, { error: 'The increments must be a list.' })
    .max(200, 'A test has at most 200 increments.')
    .optional();
  return shape;
}

/** The parsed input the checks receive: text and numbers by field key, all optional. */
export type TestRecordInput = Partial<Record<string, string | number>> & {
  increments?: z.infer<typeof incrementSchema>[];
};

/**
 * The row schema for one vocabulary (regions and geological units are matched against it, by name or
 * slug, ignoring case). Build it once per upload and reuse it for every row. `parse` gives
 * `{ record, increments }`; issues carry the field key as their path (or no path for the whole row).
 */
export function testRecordRowSchema(vocabulary: TestRecordVocabulary) {
  const context = new RowCheckContext(vocabulary);
  return z.preprocess(normaliseInput, z.object(fieldShape())).transform((input, ctx) => {
    const checked = checkRecord(input as TestRecordInput, context);
    for (const issue of checked.issues) {
      ctx.issues.push({ code: 'custom', message: issue.message, path: issue.field ? [issue.field] : [], input: undefined });
    }
    return checked.result ?? z.NEVER;
  });
}
