import type { TestRecordIncrement, TestRecordRow } from '../schemas/test-record-row';
import { fieldName, fieldUnitLabel } from './field-labels';
import { FIELD_BY_KEY, IMPORT_FIELDS } from './fields';
import { formulaFlagReason } from './formula-text';
import { identifyingReasons, type PrivateValue } from './identifying-text';
import { formatValue } from './row-ranges';
import { SAMPLE_QUALITY_LABELS } from './sample-quality';
import type { ValidRow } from './validate-rows';

/** What stays with the firm. */
export interface PrivatePart {
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
}

/** What enters the shared bank: shared-scope fields, the coarse location cell, derived values and increments. */
export type SharedPart = Omit<TestRecordRow, keyof PrivatePart | 'derived'> & { increments: TestRecordIncrement[] };

/**
 * Shared free text for the data steward to look at: text that may identify the firm's project or site,
 * and text a spreadsheet may run as a formula.
 */
export interface AnonymityFlag {
  field: string;
  reason: string;
}

/** Shared text fields that hold free text (the others are checked against closed lists). */
const FREE_TEXT_SHARED = IMPORT_FIELDS.filter(
  (f) =>
    f.scope === 'shared' &&
    f.type === 'text' &&
    !['region', 'geologicalUnit', 'locationCell', 'uscsSymbol', 'testMethod'].includes(f.key),
).map((f) => f.key);

/**
 * Splits a valid row into the part that stays private to the firm and the part others see. The shared
 * part never holds project, client, borehole or sample ids, coordinates or notes; its location is the
 * 5 km cell (given, or worked out from easting/northing during validation). Shared free text that looks
 * identifying is flagged, with a reason that does not repeat the private value.
 */
export function splitRow(validRow: ValidRow): { shared: SharedPart; private: PrivatePart; flags: AnonymityFlag[] } {
  const {
    projectName,
    clientName,
    boreholeId,
    sampleId,
    easting,
    northing,
    latitude,
    longitude,
    coordinateSystem,
    notes,
    derived: _derived,
    ...sharedFields
  } = validRow.record;
  const privatePart: PrivatePart = {
    projectName,
    clientName,
    boreholeId,
    sampleId,
    easting,
    northing,
    latitude,
    longitude,
    coordinateSystem,
    notes,
  };
  const privateValues: PrivateValue[] = [
    { what: 'the project name', value: projectName },
    { what: 'the client name', value: clientName },
    { what: 'the borehole id', value: boreholeId },
    { what: 'the sample id', value: sampleId },
  ];
  const flags: AnonymityFlag[] = [];
  for (const key of FREE_TEXT_SHARED) {
    const text = (validRow.record as unknown as Record<string, unknown>)[key];
    if (typeof text !== 'string') continue;
    for (const reason of identifyingReasons(text, privateValues))
      flags.push({ field: key, reason: `${FIELD_BY_KEY.get(key)?.label} ${reason}.` });
    const formula = formulaFlagReason(FIELD_BY_KEY.get(key)?.label ?? key, text);
    if (formula) flags.push({ field: key, reason: formula });
  }
  return { shared: { ...sharedFields, increments: validRow.increments }, private: privatePart, flags };
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
    const worked = validRow.record.derived.includes(field.key as TestRecordRow['derived'][number]) ? ' (worked out)' : '';
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
