import { FIELD_BY_KEY, IMPORT_FIELDS, type ImportFieldKey } from '../../lib/import';
import { fieldUnitLabel } from '../../lib/import/field-labels';

/** Import field key → the name the records API uses for the stored value (which carries the SI unit). */
const STORED_NAME: Partial<Record<ImportFieldKey, string>> = {
  easting: 'eastingM',
  northing: 'northingM',
  latitude: 'latitudeDeg',
  longitude: 'longitudeDeg',
  depthTop: 'depthTopM',
  depthBottom: 'depthBottomM',
  bulkUnitWeight: 'bulkUnitWeightKnPerM3',
  preconsolidationStress: 'preconsolidationStressKpa',
  verticalEffectiveStress: 'verticalEffectiveStressKpa',
  cvNc: 'cvNcM2PerYear',
  cvOc: 'cvOcM2PerYear',
  mv: 'mvM2PerMn',
  permeability: 'permeabilityMPerS',
};

export function storedName(field: string): string {
  return STORED_NAME[field as ImportFieldKey] ?? field;
}

/** A field's column heading with the bank's unit: "Depth top (m)", "LL (%)", "Cc". */
export function fieldHeading(field: string, unit: string | null = fieldUnitLabel(field)): string {
  const label = FIELD_BY_KEY.get(field)?.label ?? field;
  if (!unit || label.endsWith(`(${unit})`)) return label;
  return `${label} (${unit})`;
}

const SHORT_LABELS: Partial<Record<ImportFieldKey, string>> = {
  uscsSymbol: 'ASTM D2487',
  cvNc: 'cv NC',
  cvOc: 'cv OC',
};

/** A narrow column heading for dense tables: "cv NC (m²/yr)", "ASTM D2487". */
export function columnHeading(field: string): string {
  const short = SHORT_LABELS[field as ImportFieldKey];
  if (!short) return fieldHeading(field);
  const unit = fieldUnitLabel(field);
  return unit ? `${short} (${unit})` : short;
}

/** "6–6.45" from a record's depths (m). */
export function depthRange(top: unknown, bottom: unknown, format: (value: unknown) => string): string {
  return `${format(top)}–${format(bottom)}`;
}

/** The values shown per record in the submission tables, after the depth range, in this order. */
export const TABLE_FIELDS: readonly ImportFieldKey[] = [
  'uscsSymbol',
  'waterContentPct',
  'liquidLimitPct',
  'plasticLimitPct',
  'plasticityIndexPct',
  'initialVoidRatio',
  'compressionIndex',
  'recompressionIndex',
  'preconsolidationStress',
  'verticalEffectiveStress',
  'overconsolidationRatio',
  'cvNc',
  'cvOc',
  'secondaryCompressionIndex',
];

export const PRIVATE_FIELDS = IMPORT_FIELDS.filter((f) => f.scope === 'private');
export const SHARED_FIELDS = IMPORT_FIELDS.filter((f) => f.scope === 'shared');
