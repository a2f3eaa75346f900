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

/** The firm-private values of one record. */
export type PrivateValues = Pick<
  TestRecordPrivateTable,
  | 'project_name'
  | 'client_name'
  | 'borehole_id'
  | 'sample_id'
  | 'easting_m'
  | 'northing_m'
  | 'latitude_deg'
  | 'longitude_deg'
  | 'coordinate_system'
  | 'notes'
>;

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

export const PRIVATE_COLUMNS: readonly { name: keyof PrivateValues; type: string }[] = [
  { name: 'project_name', type: 'text' },
  { name: 'client_name', type: 'text' },
  { name: 'borehole_id', type: 'text' },
  { name: 'sample_id', type: 'text' },
  { name: 'easting_m', type: 'numeric' },
  { name: 'northing_m', type: 'numeric' },
  { name: 'latitude_deg', type: 'numeric' },
  { name: 'longitude_deg', type: 'numeric' },
  { name: 'coordinate_system', type: 'text' },
  { name: 'notes', type: 'text' },
];
