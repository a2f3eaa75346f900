import { FIELD_BY_KEY, fieldKeysWithScope, type PrivateFieldKey, type PrivatePart } from '../../import';
import type { ImportFlag, TestRecordPrivateTable, TestRecordTable } from '../db/bank-tables';

/** The shared (anonymised) values of one record, in the bank's columns and units. */
export type SharedValues = Pick<
  TestRecordTable,
  | 'region_id'
  | 'geological_unit_id'
  | 'location_cell'
  | 'depth_top_m'
  | 'depth_bottom_m'
  | 'uscs_symbol'
  | 'sampling_method'
  | 'water_content_pct'
  | 'liquid_limit_pct'
  | 'plastic_limit_pct'
  | 'plasticity_index_pct'
  | 'specific_gravity'
  | 'bulk_unit_weight_kn_per_m3'
  | 'initial_void_ratio'
  | 'organic_content_pct'
  | 'test_method'
  | 'test_standard'
  | 'compression_index'
  | 'recompression_index'
  | 'preconsolidation_stress_kpa'
  | 'vertical_effective_stress_kpa'
  | 'overconsolidation_ratio'
  | 'cv_nc_m2_per_year'
  | 'cv_oc_m2_per_year'
  | 'secondary_compression_index'
  | 'mv_m2_per_mn'
  | 'permeability_m_per_s'
  | 'delta_e_over_e0'
  | 'sample_quality_class'
>;

/**
 * The private table's column for each field the import table marks private. Keyed by that table's
 * private keys, so a new private field does not compile until it is given a private column.
 */
const PRIVATE_COLUMN_OF = {
  projectName: 'project_name',
  clientName: 'client_name',
  boreholeId: 'borehole_id',
  sampleId: 'sample_id',
  easting: 'easting_m',
  northing: 'northing_m',
  latitude: 'latitude_deg',
  longitude: 'longitude_deg',
  coordinateSystem: 'coordinate_system',
  notes: 'notes',
} as const satisfies { readonly [K in PrivateFieldKey]: keyof TestRecordPrivateTable };

/** The firm-private values of one record. */
export type PrivateValues = Pick<TestRecordPrivateTable, (typeof PRIVATE_COLUMN_OF)[PrivateFieldKey]>;

/** One load increment of the raw oedometer readings. */
export interface IncrementToStore {
  incrementNo: number;
  appliedStressKpa: number;
  isUnloading: boolean;
  durationHours: number | null;
  endDeformationMm: number | null;
  endVoidRatio: number | null;
  specimenHeightMm: number | null;
}

/** One validated, anonymised row of an upload, ready to store. */
export interface RecordToStore {
  rowNumber: number;
  shared: SharedValues;
  private: PrivateValues;
  increments: IncrementToStore[];
  flags: ImportFlag[];
}

export const SHARED_COLUMNS: readonly { name: keyof SharedValues; type: string }[] = [
  { name: 'region_id', type: 'uuid' },
  { name: 'geological_unit_id', type: 'uuid' },
  { name: 'location_cell', type: 'text' },
  { name: 'depth_top_m', type: 'numeric' },
  { name: 'depth_bottom_m', type: 'numeric' },
  { name: 'uscs_symbol', type: 'text' },
  { name: 'sampling_method', type: 'text' },
  { name: 'water_content_pct', type: 'numeric' },
  { name: 'liquid_limit_pct', type: 'numeric' },
  { name: 'plastic_limit_pct', type: 'numeric' },
  { name: 'plasticity_index_pct', type: 'numeric' },
  { name: 'specific_gravity', type: 'numeric' },
  { name: 'bulk_unit_weight_kn_per_m3', type: 'numeric' },
  { name: 'initial_void_ratio', type: 'numeric' },
  { name: 'organic_content_pct', type: 'numeric' },
  { name: 'test_method', type: 'text' },
  { name: 'test_standard', type: 'text' },
  { name: 'compression_index', type: 'numeric' },
  { name: 'recompression_index', type: 'numeric' },
  { name: 'preconsolidation_stress_kpa', type: 'numeric' },
  { name: 'vertical_effective_stress_kpa', type: 'numeric' },
  { name: 'overconsolidation_ratio', type: 'numeric' },
  { name: 'cv_nc_m2_per_year', type: 'numeric' },
  { name: 'cv_oc_m2_per_year', type: 'numeric' },
  { name: 'secondary_compression_index', type: 'numeric' },
  { name: 'mv_m2_per_mn', type: 'numeric' },
  { name: 'permeability_m_per_s', type: 'numeric' },
  { name: 'delta_e_over_e0', type: 'numeric' },
  { name: 'sample_quality_class', type: 'integer' },
];

const PRIVATE_KEYS = fieldKeysWithScope('private');
const SQL_TYPE = { text: 'text', number: 'numeric', integer: 'integer' } as const;

export const PRIVATE_COLUMNS: readonly { name: keyof PrivateValues; type: string }[] = PRIVATE_KEYS.map((key) => ({
  name: PRIVATE_COLUMN_OF[key],
  type: SQL_TYPE[FIELD_BY_KEY.get(key)?.type ?? 'text'],
}));

/** The private part of a split row, in the private table's columns. */
export function toPrivateValues(part: PrivatePart): PrivateValues {
  return Object.fromEntries(PRIVATE_KEYS.map((key) => [PRIVATE_COLUMN_OF[key], part[key]])) as PrivateValues;
}
