import type { PrivateValues, SharedValues } from './record-to-store';

type Column = { table: 'r'; column: keyof SharedValues } | { table: 'p'; column: keyof PrivateValues };

/** Import field key → the stored column it lands in (see to-record.ts), for fields a person can correct. */
export const FIELD_COLUMNS = {
  projectName: { table: 'p', column: 'project_name' },
  clientName: { table: 'p', column: 'client_name' },
  boreholeId: { table: 'p', column: 'borehole_id' },
  sampleId: { table: 'p', column: 'sample_id' },
  easting: { table: 'p', column: 'easting_m' },
  northing: { table: 'p', column: 'northing_m' },
  latitude: { table: 'p', column: 'latitude_deg' },
  longitude: { table: 'p', column: 'longitude_deg' },
  coordinateSystem: { table: 'p', column: 'coordinate_system' },
  notes: { table: 'p', column: 'notes' },
  locationCell: { table: 'r', column: 'location_cell' },
  depthTop: { table: 'r', column: 'depth_top_m' },
  depthBottom: { table: 'r', column: 'depth_bottom_m' },
  uscsSymbol: { table: 'r', column: 'uscs_symbol' },
  samplingMethod: { table: 'r', column: 'sampling_method' },
  waterContentPct: { table: 'r', column: 'water_content_pct' },
  liquidLimitPct: { table: 'r', column: 'liquid_limit_pct' },
  plasticLimitPct: { table: 'r', column: 'plastic_limit_pct' },
  plasticityIndexPct: { table: 'r', column: 'plasticity_index_pct' },
  specificGravity: { table: 'r', column: 'specific_gravity' },
  bulkUnitWeight: { table: 'r', column: 'bulk_unit_weight_kn_per_m3' },
  initialVoidRatio: { table: 'r', column: 'initial_void_ratio' },
  organicContentPct: { table: 'r', column: 'organic_content_pct' },
  testMethod: { table: 'r', column: 'test_method' },
  testStandard: { table: 'r', column: 'test_standard' },
  compressionIndex: { table: 'r', column: 'compression_index' },
  recompressionIndex: { table: 'r', column: 'recompression_index' },
  preconsolidationStress: { table: 'r', column: 'preconsolidation_stress_kpa' },
  verticalEffectiveStress: { table: 'r', column: 'vertical_effective_stress_kpa' },
  overconsolidationRatio: { table: 'r', column: 'overconsolidation_ratio' },
  cvNc: { table: 'r', column: 'cv_nc_m2_per_year' },
  cvOc: { table: 'r', column: 'cv_oc_m2_per_year' },
  secondaryCompressionIndex: { table: 'r', column: 'secondary_compression_index' },
  mv: { table: 'r', column: 'mv_m2_per_mn' },
  permeability: { table: 'r', column: 'permeability_m_per_s' },
  deltaEOverE0: { table: 'r', column: 'delta_e_over_e0' },
} as const satisfies Record<string, Column>;

export type FieldKey = keyof typeof FIELD_COLUMNS;

export const EDITABLE_FIELDS = Object.keys(FIELD_COLUMNS) as FieldKey[];
