import { fieldName, fieldUnitLabel } from './field-labels';
import {
  FIELD_BY_KEY,
  IMPORT_FIELDS,
  type ImportFieldSpec,
  type PrivateFieldKey,
  type SharedFieldKey,
  type TextFieldKey,
} from './fields';
import { formulaFlagReason } from './formula-text';
import { identifyingReasons, type PrivateValue } from './identifying-text';
import { formatValue } from './row-ranges';
import { SAMPLE_QUALITY_LABELS } from './sample-quality';
import type { DerivedValue, TestRecordIncrement, TestRecordRow } from './test-record';
import type { ValidRow } from './validate-rows';

/** Values of a checked record that are not fields of the table but are shared: vocabulary ids and the quality class. */
const SHARED_RESOLVED = ['regionId', 'geologicalUnitId', 'sampleQualityClass'] as const;

/** What stays with the firm: every field the field table marks private. */
export type PrivatePart = Pick<TestRecordRow, PrivateFieldKey>;

/** What enters the shared bank: the fields marked shared (location as the 5 km cell), the vocabulary ids, the quality class and the increments. */
export type SharedPart = Pick<TestRecordRow, SharedFieldKey | (typeof SHARED_RESOLVED)[number]> & {
  increments: TestRecordIncrement[];
};

/**
 * Shared free text for the data steward to look at: text that may identify the firm's project or site,
 * and text a spreadsheet may run as a formula.
 */
export interface AnonymityFlag {
  field: string;
  reason: string;
}

/**
 * How a flag names each private text value when shared free text contains it; null where the value is
 * not looked for. Every private text field must be listed, so a new one is a decision, not an oversight.
 */
const PRIVATE_TEXT_NAMES: { readonly [K in PrivateFieldKey & TextFieldKey]: string | null } = {
  projectName: 'the project name',
  clientName: 'the client name',
  boreholeId: 'the borehole id',
  sampleId: 'the sample id',
  coordinateSystem: null,
  notes: null,
};

/** Shared text fields checked against closed lists; the other shared text fields hold free text. */
const CLOSED_LIST_FIELDS: readonly SharedFieldKey[] = ['region', 'geologicalUnit', 'locationCell', 'uscsSymbol', 'testMethod'];
const FREE_TEXT_SHARED = IMPORT_FIELDS.filter(
  (f): f is Extract<(typeof IMPORT_FIELDS)[number], { scope: 'shared'; type: 'text' }> =>
    f.scope === 'shared' && f.type === 'text' && !CLOSED_LIST_FIELDS.includes(f.key),
).map((f) => f.key);

/**
 * Splits a record by the field table: each listed field goes to the private or the shared part as its
 * scope says, and the shared part also gets the vocabulary ids and the quality class. Anything else on
 * the record goes to neither part, so only a field marked shared can ever reach the shared record.
 */
export function splitByScope(
  record: object,
  fields: readonly Pick<ImportFieldSpec, 'key' | 'scope'>[],
): { shared: Record<string, unknown>; private: Record<string, unknown> } {
  const values = record as Readonly<Record<string, unknown>>;
  const shared: Record<string, unknown> = {};
  const own: Record<string, unknown> = {};
  for (const field of fields) (field.scope === 'private' ? own : shared)[field.key] = values[field.key] ?? null;
  for (const key of SHARED_RESOLVED) shared[key] = values[key] ?? null;
  return { shared, private: own };
}

/**
 * Splits a valid row into the part that stays private to the firm and the part others see, by the
 * field table (`fields`, the import fields unless a test gives another). The shared part never holds a
 * private field; its location is the 5 km cell (given, or worked out from easting/northing during
 * validation). Shared free text that looks identifying is flagged, with a reason that does not repeat
 * the private value.
 */
export function splitRow(
  validRow: ValidRow,
  fields: readonly Pick<ImportFieldSpec, 'key' | 'scope'>[] = IMPORT_FIELDS,
): { shared: SharedPart; private: PrivatePart; flags: AnonymityFlag[] } {
  const parts = splitByScope(validRow.record, fields);
  const shared = { ...parts.shared, increments: validRow.increments } as SharedPart;
  const privatePart = parts.private as PrivatePart;
  return { shared, private: privatePart, flags: identifyingFlags(validRow.record, privatePart) };
}

function identifyingFlags(record: TestRecordRow, privatePart: PrivatePart): AnonymityFlag[] {
  const privateValues: PrivateValue[] = [];
  for (const [key, what] of Object.entries(PRIVATE_TEXT_NAMES) as [keyof typeof PRIVATE_TEXT_NAMES, string | null][])
    if (what !== null) privateValues.push({ what, value: privatePart[key] });
  const flags: AnonymityFlag[] = [];
  for (const key of FREE_TEXT_SHARED) {
    const text = record[key];
    if (typeof text !== 'string') continue;
    for (const reason of identifyingReasons(text, privateValues))
      flags.push({ field: key, reason: `${FIELD_BY_KEY.get(key)?.label} ${reason}.` });
    const formula = formulaFlagReason(FIELD_BY_KEY.get(key)?.label ?? key, text);
    if (formula) flags.push({ field: key, reason: formula });
  }
  return flags;
}

export interface SharedViewEntry {
  field: string;
  label: string;
  /** formatted with its unit, as others will see it */
  value: string;
}

/** "What others will see" for a row: the shared values, in catalogue order, formatted with units. */
export function sharedView(validRow: ValidRow): SharedViewEntry[] {
  const { shared } = splitRow(validRow);
  const record = shared as unknown as Record<string, unknown>;
  const entries: SharedViewEntry[] = [];
  for (const field of IMPORT_FIELDS) {
    if (field.scope !== 'shared') continue;
    const value = record[field.key];
    if (value === null || value === undefined) continue;
    const unit = fieldUnitLabel(field.key);
    const shown = typeof value === 'number' ? `${formatValue(value)}${unit ? ` ${unit}` : ''}` : String(value);
    const worked = validRow.record.derived.includes(field.key as DerivedValue) ? ' (worked out)' : '';
    entries.push({ field: field.key, label: fieldName(field.key), value: shown + worked });
  }
  if (shared.sampleQualityClass !== null) {
    entries.push({
      field: 'sampleQualityClass',
      label: 'Sample quality',
      value: `class ${shared.sampleQualityClass}, ${SAMPLE_QUALITY_LABELS[shared.sampleQualityClass]} (worked out)`,
    });
  }
  if (shared.increments.length > 0)
    entries.push({ field: 'increments', label: 'Increments', value: `${shared.increments.length} loading steps` });
  return entries;
}
