/**
 * The importer's row validator, shared by the browser preview and the server (which re-validates every
 * row). It checks types, then the physical ranges and the relations between values (row-checks.ts), and
 * fills in what can be worked out: PI from LL − PL, OCR from σ'p/σ'v0, the location cell from
 * easting/northing and the sample quality class. The record types are in test-record.ts.
 */
import { z } from 'zod';
import { IMPORT_FIELDS, type ImportFieldKey } from './fields';
import { checkRecord, RowCheckContext } from './row-checks';
import type { IncrementInput, TestRecordIncrement, TestRecordInput, TestRecordRow, TestRecordVocabulary } from './test-record';

const TEXT_MAX: Readonly<Partial<Record<ImportFieldKey, number>>> = { notes: 2000 };
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

const incrementSchema: z.ZodType<IncrementInput> = z.object({
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

/**
 * The row schema for one vocabulary (regions and geological units are matched against it, by name or
 * slug, ignoring case). Build it once per upload and reuse it for every row. `parse` gives
 * `{ record, increments }`; issues carry the field key as their path (or no path for the whole row).
 */
export function testRecordRowSchema(
  vocabulary: TestRecordVocabulary,
): z.ZodType<{ record: TestRecordRow; increments: TestRecordIncrement[] }, unknown> {
  const context = new RowCheckContext(vocabulary);
  return z.preprocess(normaliseInput, z.object(fieldShape())).transform((input, ctx) => {
    const checked = checkRecord(input as TestRecordInput, context);
    for (const issue of checked.issues) {
      ctx.issues.push({ code: 'custom', message: issue.message, path: issue.field ? [issue.field] : [], input: undefined });
    }
    return checked.result ?? z.NEVER;
  });
}
